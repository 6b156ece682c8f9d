package lamella.ui.api;

import org.eclipse.swt.widgets.Composite;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * A panel of the workbench, offered as a service; the workbench shows every live one and removes it when its bundle
 * goes. Called on the UI thread only.
 */
@ConsumerType
public interface WorkbenchPanel {

    /** A stable id, used by saved arrangements: {@code stack}, {@code signal}. */
    String id();

    /** The tab's title. */
    String title();

    /** Where it opens by default. */
    Area preferredArea();

    /** Creates the panel's controls inside parent. */
    PanelView open(Composite parent, Workbench workbench);
}
