package lamella.ui.panels;

import lamella.ui.api.Area;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Composite;
import org.osgi.service.component.annotations.Component;

/** Fits the free inputs: progress and cancel, values ± σ, correlations, residuals, the budget, the report. */
@Component(service = WorkbenchPanel.class)
public final class FitPanel implements WorkbenchPanel {

    @Override
    public String id() {
        return "fit";
    }

    @Override
    public String title() {
        return "Fit";
    }

    @Override
    public Area preferredArea() {
        return Area.LEFT;
    }

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        return new FitView(parent, workbench);
    }
}
