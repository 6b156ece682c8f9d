package lamella.ui.api;

import org.eclipse.swt.widgets.Control;
import org.osgi.annotation.versioning.ConsumerType;

/** An open panel: its top control, and what to release when it closes. */
@ConsumerType
public interface PanelView {

    Control control();

    /** Called when the panel closes; the control is disposed by the workbench afterwards. */
    default void close() {
    }
}
