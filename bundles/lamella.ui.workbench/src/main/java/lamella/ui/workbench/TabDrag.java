package lamella.ui.workbench;

import java.util.Optional;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.custom.CTabItem;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Listener;
import org.eclipse.swt.widgets.Shell;

/**
 * Dragging a tab: past a few pixels a translucent marker shows where the panel would go — the whole area to join
 * its tabs, or the half against an edge to split it — and releasing the button moves it there. Escape cancels.
 */
final class TabDrag implements Listener {

    private static final int THRESHOLD_PX = 8;
    private static final int MARKER_ALPHA = 90;

    private final CTabFolder folder;
    private final ArrangementView view;
    private String panelId;
    private Point start;
    private Shell marker;
    private DropTarget target;

    private TabDrag(CTabFolder folder, ArrangementView view) {
        this.folder = folder;
        this.view = view;
    }

    static void attach(CTabFolder folder, ArrangementView view) {
        TabDrag drag = new TabDrag(folder, view);
        for (int type : new int[] {SWT.MouseDown, SWT.MouseMove, SWT.MouseUp, SWT.KeyDown}) {
            folder.addListener(type, drag);
        }
        folder.addListener(SWT.Dispose, e -> drag.hideMarker());
    }

    @Override
    public void handleEvent(Event e) {
        switch (e.type) {
            case SWT.MouseDown:
                CTabItem item = e.button == 1 ? folder.getItem(new Point(e.x, e.y)) : null;
                panelId = item == null ? null : (String) item.getData(ArrangementView.PANEL);
                start = new Point(e.x, e.y);
                break;
            case SWT.MouseMove:
                if (panelId != null && (e.stateMask & SWT.BUTTON1) != 0 && far(e)) {
                    track(folder.toDisplay(e.x, e.y));
                }
                break;
            case SWT.MouseUp:
                finish();
                break;
            case SWT.KeyDown:
                if (e.keyCode == SWT.ESC) {
                    panelId = null;
                    hideMarker();
                }
                break;
            default:
                break;
        }
    }

    private boolean far(Event e) {
        return marker != null || Math.abs(e.x - start.x) + Math.abs(e.y - start.y) > THRESHOLD_PX;
    }

    private void track(Point onDisplay) {
        Optional<DropTarget> t = view.dropAt(onDisplay);
        target = t.orElse(null);
        if (target == null) {
            hideMarker();
            return;
        }
        if (marker == null) {
            marker = new Shell(folder.getShell(), SWT.NO_TRIM | SWT.ON_TOP | SWT.TOOL);
            marker.setBackground(AreaLook.dropColour(folder.getDisplay()));
            marker.setAlpha(MARKER_ALPHA);
            marker.setEnabled(false);
        }
        marker.setBounds(target.highlight());
        marker.setVisible(true);
    }

    private void finish() {
        String moving = panelId;
        DropTarget where = target;
        panelId = null;
        target = null;
        boolean dragged = marker != null;
        hideMarker();
        if (dragged && moving != null && where != null) {
            // The drop rebuilds the areas, this folder included, so it runs after the event has been handled.
            folder.getDisplay().asyncExec(() -> view.move(moving, where.panelId(), where.zone()));
        }
    }

    private void hideMarker() {
        if (marker != null && !marker.isDisposed()) {
            marker.dispose();
        }
        marker = null;
    }
}
