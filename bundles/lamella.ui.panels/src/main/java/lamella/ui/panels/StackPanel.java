package lamella.ui.panels;

import lamella.ui.api.Area;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Composite;
import org.osgi.service.component.annotations.Component;

/** The layers of the sample as an editable table, with their fit roles and a drawn cross-section. */
@Component(service = WorkbenchPanel.class)
public final class StackPanel implements WorkbenchPanel {

    @Override
    public String id() {
        return "stack";
    }

    @Override
    public String title() {
        return "Stack";
    }

    @Override
    public Area preferredArea() {
        return Area.LEFT;
    }

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        return new StackView(parent, workbench);
    }
}
