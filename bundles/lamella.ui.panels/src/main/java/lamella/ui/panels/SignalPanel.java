package lamella.ui.panels;

import lamella.ui.api.Area;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Composite;
import org.osgi.service.component.annotations.Component;

/** Data and model together, updated live as the case changes. */
@Component(service = WorkbenchPanel.class)
public final class SignalPanel implements WorkbenchPanel {

    @Override
    public String id() {
        return "signal";
    }

    @Override
    public String title() {
        return "Signal";
    }

    @Override
    public Area preferredArea() {
        return Area.CENTER;
    }

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        return new SignalView(parent, workbench);
    }
}
