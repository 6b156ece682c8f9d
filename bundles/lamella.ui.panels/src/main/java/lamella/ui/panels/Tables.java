package lamella.ui.panels;

import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;

/** Read-only result tables: headers with units, columns as wide as their widest cell. */
final class Tables {

    /** Wider cells are cut, with the whole text in reach by widening the column, so every column stays in view. */
    private static final int WIDEST = 260;

    private Tables() {
    }

    static Table create(Composite parent) {
        Table t = new Table(parent, SWT.BORDER | SWT.FULL_SELECTION);
        startWithRoom(t);
        t.setHeaderVisible(true);
        t.setLinesVisible(true);
        return t;
    }

    /** Rows a table laid out by {@link #showEveryRow} has room for when it is still empty. */
    private static final int FEWEST_ROWS = 2;
    /** Room for a horizontal scroll bar, which appears when the columns are wider than the table. */
    private static final int SCROLL_BAR = 18;

    /**
     * Makes a table in a grid as tall as its header and every row (at least a few), so that its rows are never
     * squeezed out of sight: the composite around it scrolls instead. Call again after filling it.
     */
    static void showEveryRow(Table t) {
        if (t.getLayoutData() instanceof org.eclipse.swt.layout.GridData gd) {
            int rows = Math.max(FEWEST_ROWS, t.getItemCount());
            gd.heightHint = t.getHeaderHeight() + rows * t.getItemHeight() + 2 * t.getBorderWidth() + SCROLL_BAR;
        }
    }

    /** The size a scrolled control has until its first layout. */
    static final int START_WIDTH = 400;
    static final int START_HEIGHT = 160;

    /**
     * Gives a table or scrolled composite a workable size before its panel is first laid out: an ancestor resized
     * first has GTK draw it at no size with its scroll bars, which GTK reports as a negative size.
     */
    static void startWithRoom(org.eclipse.swt.widgets.Scrollable s) {
        s.setSize(START_WIDTH, START_HEIGHT);
    }

    /** The least height of a scrolled part laid out in a grid: a header, two rows and a scroll bar. */
    static final int LEAST_HEIGHT = 96;

    /**
     * Keeps a table or scrolled part laid out in a grid at least {@link #LEAST_HEIGHT} tall: in a panel made short,
     * what lies below it is cut off at the panel's edge instead of the part being squeezed, which GTK reports as a
     * scroll bar of negative size.
     */
    static void keepLeastHeight(org.eclipse.swt.widgets.Control c) {
        if (c.getLayoutData() instanceof org.eclipse.swt.layout.GridData gd) {
            gd.minimumHeight = Math.max(gd.minimumHeight, LEAST_HEIGHT);
        }
    }

    /** Replaces columns and rows. */
    static void fill(Table t, String[] headings, java.util.List<String[]> rows) {
        t.setRedraw(false);
        try {
            t.removeAll();
            for (TableColumn c : t.getColumns()) {
                c.dispose();
            }
            for (String h : headings) {
                TableColumn c = new TableColumn(t, SWT.LEFT);
                c.setText(h);
            }
            for (String[] r : rows) {
                new TableItem(t, SWT.NONE).setText(r);
            }
            for (TableColumn c : t.getColumns()) {
                c.pack();
                c.setWidth(Math.min(c.getWidth() + 10, WIDEST));
            }
        } finally {
            t.setRedraw(true);
        }
    }
}
