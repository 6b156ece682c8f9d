package lamella.ui.panels;

import lamella.api.fit.CurveFitService;
import lamella.ui.api.Area;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Composite;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

/** A property map: the case's map block fitted here, or a map's results opened; images, read-out, each position's fit. */
@Component(service = WorkbenchPanel.class)
public final class MapPanel implements WorkbenchPanel {

    private final CurveFitService curves;

    @Activate
    public MapPanel(@Reference CurveFitService curves) {
        this.curves = curves;
    }

    @Override
    public String id() {
        return "map";
    }

    @Override
    public String title() {
        return "Map";
    }

    @Override
    public Area preferredArea() {
        return Area.CENTER;
    }

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        return new MapView(parent, workbench, curves);
    }
}
