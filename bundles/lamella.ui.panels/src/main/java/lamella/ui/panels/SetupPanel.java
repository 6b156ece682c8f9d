package lamella.ui.panels;

import lamella.ui.api.Area;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Composite;
import org.osgi.service.component.annotations.Component;

/** Technique, geometry and their settings, with a steady temperature-rise estimate. */
@Component(service = WorkbenchPanel.class)
public final class SetupPanel implements WorkbenchPanel {

    @Override
    public String id() {
        return "setup";
    }

    @Override
    public String title() {
        return "Set-up";
    }

    @Override
    public Area preferredArea() {
        return Area.LEFT;
    }

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        return new SetupView(parent, workbench);
    }
}
