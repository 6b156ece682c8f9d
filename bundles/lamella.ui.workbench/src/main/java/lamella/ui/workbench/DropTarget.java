package lamella.ui.workbench;

import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;

/**
 * Where a dragged tab would land: next to which panel, in which zone of its area, and the part of the screen to
 * mark meanwhile (display coordinates).
 */
record DropTarget(String panelId, Zone zone, Rectangle highlight) {

    /** An edge zone is the outer quarter of the area; the tab row and the middle join the area's tabs. */
    static Zone zoneOf(Rectangle area, int tabHeight, Point p) {
        if (p.y < area.y + tabHeight) {
            return Zone.TABS;
        }
        double rx = (p.x - area.x) / (double) area.width;
        double ry = (p.y - area.y) / (double) area.height;
        double edge = Math.min(Math.min(rx, 1 - rx), Math.min(ry, 1 - ry));
        if (edge > 0.25) {
            return Zone.TABS;
        }
        if (edge == rx) {
            return Zone.LEFT;
        }
        if (edge == 1 - rx) {
            return Zone.RIGHT;
        }
        return edge == ry ? Zone.TOP : Zone.BOTTOM;
    }

    /** The half of the area a new area would take, or the whole area when the panel joins its tabs. */
    static Rectangle highlight(Rectangle a, Zone zone) {
        switch (zone) {
            case LEFT:
                return new Rectangle(a.x, a.y, a.width / 2, a.height);
            case RIGHT:
                return new Rectangle(a.x + a.width / 2, a.y, a.width - a.width / 2, a.height);
            case TOP:
                return new Rectangle(a.x, a.y, a.width, a.height / 2);
            case BOTTOM:
                return new Rectangle(a.x, a.y + a.height / 2, a.width, a.height - a.height / 2);
            default:
                return new Rectangle(a.x, a.y, a.width, a.height);
        }
    }
}
