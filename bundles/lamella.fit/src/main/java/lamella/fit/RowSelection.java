package lamella.fit;

import java.util.List;

/**
 * Which rows of a dataset a fit uses: inside its {@code x_range}, outside each of its {@code exclude} ranges (x in the
 * data's SI unit, ends included), and not marked {@code excluded} or {@code outlier} in the data file — conditioning
 * marks rows rather than dropping them, and the fit is where they are left out.
 *
 * @param from     the lowest x used (−∞: no lower limit)
 * @param to       the highest x used (+∞: no upper limit)
 * @param excluded closed x ranges left out, each {from, to}
 */
record RowSelection(double from, double to, List<double[]> excluded) {

    static final RowSelection ALL = new RowSelection(Double.NEGATIVE_INFINITY, Double.POSITIVE_INFINITY, List.of());

    /** The columns of the normalised CSV that mark rows. */
    static final List<String> MARKS = List.of("excluded", "outlier");

    RowSelection {
        excluded = List.copyOf(excluded);
    }

    boolean keeps(double x) {
        if (x < from || x > to) {
            return false;
        }
        for (double[] r : excluded) {
            if (x >= r[0] && x <= r[1]) {
                return false;
            }
        }
        return true;
    }

    /** Which rows of the table are used. */
    boolean[] rows(DataTable table, String xColumn) {
        double[] x = table.column(xColumn);
        boolean[] keep = new boolean[x.length];
        for (int i = 0; i < x.length; i++) {
            keep[i] = keeps(x[i]);
        }
        for (String mark : MARKS) {
            if (table.has(mark)) {
                double[] m = table.column(mark);
                for (int i = 0; i < m.length; i++) {
                    keep[i] &= m[i] == 0;
                }
            }
        }
        return keep;
    }

    static double[] select(double[] values, boolean[] keep) {
        int n = 0;
        for (boolean k : keep) {
            n += k ? 1 : 0;
        }
        double[] out = new double[n];
        int at = 0;
        for (int i = 0; i < values.length; i++) {
            if (keep[i]) {
                out[at++] = values[i];
            }
        }
        return out;
    }
}
