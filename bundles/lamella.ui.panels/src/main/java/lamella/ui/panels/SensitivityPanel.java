package lamella.ui.panels;

import lamella.ui.api.Area;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Composite;
import org.osgi.service.component.annotations.Component;

/** Sensitivity of the signal to every numeric input over x. */
@Component(service = WorkbenchPanel.class)
public final class SensitivityPanel implements WorkbenchPanel {

    @Override
    public String id() {
        return "sensitivity";
    }

    @Override
    public String title() {
        return "Sensitivity";
    }

    @Override
    public Area preferredArea() {
        return Area.CENTER;
    }

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        return new SensitivityView(parent, workbench);
    }
}
