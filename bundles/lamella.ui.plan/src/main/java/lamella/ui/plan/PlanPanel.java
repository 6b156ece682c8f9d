package lamella.ui.plan;

import lamella.api.plan.PlanService;
import lamella.ui.api.Area;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Composite;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

/** Experiment design: the case's plan block, its plans ranked by the σ their fit would give, and their map. */
@Component(service = WorkbenchPanel.class)
public final class PlanPanel implements WorkbenchPanel {

    @Reference
    private PlanService planner;

    public PlanPanel() {
    }

    PlanPanel(PlanService planner) {
        this.planner = planner;
    }

    @Override
    public String id() {
        return "plan";
    }

    @Override
    public String title() {
        return "Plan";
    }

    @Override
    public Area preferredArea() {
        return Area.CENTER;
    }

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        return new PlanView(parent, workbench, planner);
    }
}
