package lamella.ui.workbench;

import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Layout;

/**
 * Holds a panel in its tab and lays it out over the tab's room; in an area dragged almost shut (less room than a
 * floor) the panel is not shown until the area has room again. GTK reports a negative size
 * ({@code gtk_box_gadget_distribute: assertion 'size >= 0' failed in GtkScrollbar}) for a scroll bar given less
 * room than its own least size, as the tables of a panel squeezed to a few pixels are.
 */
final class PanelHolder extends Layout {

    /** The least room a panel is shown in. */
    static final int FLOOR_WIDTH = 160;
    static final int FLOOR_HEIGHT = 120;

    private final Control panel;

    private PanelHolder(Control panel) {
        this.panel = panel;
    }

    /** A holder in the folder with the panel moved into it; it goes with the folder, the panel is moved out first. */
    static Composite around(Composite folder, Control panel) {
        Composite holder = new Composite(folder, SWT.NONE);
        holder.setLayout(new PanelHolder(panel));
        panel.setParent(holder);
        return holder;
    }

    @Override
    protected Point computeSize(Composite holder, int wHint, int hHint, boolean flushCache) {
        return panel.isDisposed() ? new Point(0, 0) : panel.computeSize(wHint, hHint, flushCache);
    }

    @Override
    protected void layout(Composite holder, boolean flushCache) {
        if (panel.isDisposed() || panel.getParent() != holder) {
            return;
        }
        Rectangle room = holder.getClientArea();
        boolean fits = room.width >= FLOOR_WIDTH && room.height >= FLOOR_HEIGHT;
        if (!fits) {
            panel.setVisible(false);
            return;
        }
        if (!panel.getBounds().equals(room)) {
            panel.setBounds(room);
        }
        panel.setVisible(true);
    }
}
