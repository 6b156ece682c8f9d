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
        t.setHeaderVisible(true);
        t.setLinesVisible(true);
        return t;
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
