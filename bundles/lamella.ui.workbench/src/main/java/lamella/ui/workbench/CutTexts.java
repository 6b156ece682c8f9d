package lamella.ui.workbench;

import java.util.ArrayList;
import java.util.List;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.ScrolledComposite;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;

/**
 * What a reader cannot read in full where a panel is now: a label, button, chooser or group title narrower than its
 * text, a wrapped label shorter than its lines, a table heading narrower than its words or a column beyond the
 * table's width, a control cut off by the edge of the room it is in. What a scrolled composite's scroll bars reach
 * is not cut: its content may run below its view, and beside it where it scrolls sideways.
 */
final class CutTexts {

    /** Pixels a text may lack before it counts as cut (rounding of font metrics). */
    private static final int SLACK = 2;
    /** A chooser's arrow and padding beside its text. */
    private static final int CHOOSER_ARROW = 30;
    /** A table heading's padding and its sort arrow's room. */
    private static final int HEADING_PADDING = 6;

    private CutTexts() {
    }

    /** One line per cut text, naming the control and what it shows; empty when everything is readable. */
    static List<String> in(Composite root) {
        List<String> out = new ArrayList<>();
        List<Control> shown = new ArrayList<>();
        shown.add(root);
        shown.addAll(WidgetFinder.visible(root));
        for (Control c : shown) {
            Rectangle b = c.getBounds();
            if (b.width <= 0 || b.height <= 0) {
                continue;
            }
            check(c, b, out);
            int hidden = c == root ? 0 : hiddenSideways(c, root);
            if (hidden > SLACK) {
                out.add(name(c) + ": " + hidden + " px cut off at the edge of its room");
            }
        }
        return out;
    }

    /** Whether one control shows its text cut short where it is now. */
    static boolean isCut(Control c) {
        Rectangle b = c.getBounds();
        List<String> out = new ArrayList<>();
        if (b.width > 0 && b.height > 0) {
            check(c, b, out);
        }
        return !out.isEmpty() || b.width <= 0;
    }

    private static void check(Control c, Rectangle b, List<String> out) {
        if (c instanceof Label l && (l.getStyle() & SWT.SEPARATOR) == 0 && !l.getText().isEmpty()) {
            if ((l.getStyle() & SWT.WRAP) != 0) {
                int needs = l.computeSize(b.width, SWT.DEFAULT).y;
                if (needs > b.height + SLACK) {
                    out.add(name(c) + ": needs " + needs + " px of height, has " + b.height);
                }
            } else {
                wide(c, l.computeSize(SWT.DEFAULT, SWT.DEFAULT), b, out);
            }
        } else if (c instanceof Button button && !button.getText().isEmpty()) {
            wide(c, button.computeSize(SWT.DEFAULT, SWT.DEFAULT), b, out);
        } else if (c instanceof Combo combo && !combo.getText().isEmpty()) {
            int needs = textWidth(combo, combo.getText()) + CHOOSER_ARROW;
            if (needs > b.width + SLACK) {
                out.add(name(c) + ": needs " + needs + " px, has " + b.width);
            }
        } else if (c instanceof Group g && !g.getText().isEmpty()) {
            int needs = textWidth(g, g.getText()) + 2 * HEADING_PADDING;
            if (needs > b.width + SLACK) {
                out.add(name(c) + ": title needs " + needs + " px, has " + b.width);
            }
        } else if (c instanceof Table t && t.getHeaderVisible()) {
            headings(t, out);
        }
    }

    private static void wide(Control c, Point needs, Rectangle b, List<String> out) {
        if (needs.x > b.width + SLACK) {
            out.add(name(c) + ": needs " + needs.x + " px, has " + b.width);
        }
    }

    private static void headings(Table t, List<String> out) {
        // A table that scrolls sideways reaches every column by its scroll bar.
        boolean scrolls = t.getHorizontalBar() != null && t.getHorizontalBar().getVisible();
        int room = scrolls ? Integer.MAX_VALUE / 2 : t.getClientArea().width;
        int x = 0;
        for (TableColumn column : t.getColumns()) {
            String heading = column.getText();
            int needs = textWidth(t, heading) + 2 * HEADING_PADDING;
            if (!heading.isEmpty() && column.getWidth() + SLACK < needs) {
                out.add("heading '" + heading + "': needs " + needs + " px, has " + column.getWidth());
            }
            if (x + Math.min(column.getWidth(), needs) > room + SLACK) {
                out.add("heading '" + heading + "': beyond the table's " + room + " px (starts at " + x + ")");
            }
            x += column.getWidth();
        }
    }

    /** How much of a control's width lies outside the rooms around it, up to root or a sideways scroll. */
    private static int hiddenSideways(Control c, Composite root) {
        Rectangle b = c.getBounds();
        Point origin = c.getParent().toDisplay(b.x, b.y);
        int left = origin.x;
        int right = origin.x + b.width;
        int visibleLeft = Integer.MIN_VALUE;
        int visibleRight = Integer.MAX_VALUE;
        for (Composite p = c.getParent(); p != null; p = p.getParent()) {
            if (p instanceof ScrolledComposite s && s.getHorizontalBar() != null
                    && s.getHorizontalBar().getVisible()) {
                // Its content is reached by scrolling; only the rooms inside it may cut.
                break;
            }
            Rectangle area = p.getClientArea();
            Point at = p.toDisplay(area.x, area.y);
            visibleLeft = Math.max(visibleLeft, at.x);
            visibleRight = Math.min(visibleRight, at.x + area.width);
            if (p == root) {
                break;
            }
        }
        return Math.max(0, visibleLeft - left) + Math.max(0, right - visibleRight);
    }

    private static int textWidth(Control c, String text) {
        GC gc = new GC(c);
        try {
            gc.setFont(c.getFont());
            return gc.textExtent(text).x;
        } finally {
            gc.dispose();
        }
    }

    private static String name(Control c) {
        String kind = c.getClass().getSimpleName().toLowerCase(java.util.Locale.ROOT);
        String text = c instanceof Label l ? l.getText()
                : c instanceof Button b ? b.getText()
                : c instanceof Combo k ? k.getText()
                : c instanceof Group g ? g.getText() : "";
        text = text.replace('\n', ' ');
        return kind + (text.isEmpty() ? "" : " '" + (text.length() > 60 ? text.substring(0, 57) + "…" : text) + "'");
    }
}
