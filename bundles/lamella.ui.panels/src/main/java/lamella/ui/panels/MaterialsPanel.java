package lamella.ui.panels;

import lamella.ui.api.Area;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Composite;
import org.osgi.service.component.annotations.Component;

/** The live material libraries, searchable, with the provenance of every value. */
@Component(service = WorkbenchPanel.class)
public final class MaterialsPanel implements WorkbenchPanel {

    @Override
    public String id() {
        return "materials";
    }

    @Override
    public String title() {
        return "Materials";
    }

    @Override
    public Area preferredArea() {
        return Area.LEFT;
    }

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        return new MaterialsView(parent, workbench);
    }
}
