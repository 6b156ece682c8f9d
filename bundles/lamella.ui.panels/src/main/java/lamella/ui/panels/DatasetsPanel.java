package lamella.ui.panels;

import lamella.ui.api.Area;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Composite;
import org.osgi.service.component.annotations.Component;

/** Every dataset of the fit with its own settings, fitted range, points left out, σ source and data with σ bars. */
@Component(service = WorkbenchPanel.class)
public final class DatasetsPanel implements WorkbenchPanel {

    @Override
    public String id() {
        return "datasets";
    }

    @Override
    public String title() {
        return "Datasets";
    }

    @Override
    public Area preferredArea() {
        return Area.LEFT;
    }

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        return new DatasetsView(parent, workbench);
    }
}
