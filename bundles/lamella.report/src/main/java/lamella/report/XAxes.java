package lamella.report;

import lamella.charts.DecadeAxis;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;

/**
 * The x axis of a plot over a data column: logarithmic for frequencies, which sweep decades, and for TDTR delays,
 * whose ratio is usually read on a log delay axis (common practice, no source); linear otherwise, and whenever a
 * value is not positive, since a log axis cannot show it.
 */
final class XAxes {

    private XAxes() {
    }

    static boolean logarithmic(String column, double[] x) {
        boolean sweep = column.endsWith("_hz") || column.equals("delay_s");
        if (!sweep || x.length == 0) {
            return false;
        }
        for (double v : x) {
            if (!(v > 0) || Double.isInfinite(v)) {
                return false;
            }
        }
        return true;
    }

    static ValueAxis of(String column, String technique, double[] x) {
        String label = ColumnWords.x(column, technique);
        if (logarithmic(column, x)) {
            LogAxis a = new DecadeAxis(label);
            a.setAutoRangeMinimumSize(leastSpan(x));
            // A few percent of a decade either side, so the first and last points do not sit on the frame.
            a.setLowerMargin(0.03);
            a.setUpperMargin(0.03);
            return a;
        }
        NumberAxis a = new NumberAxis(label);
        a.setAutoRangeIncludesZero(false);
        a.setAutoRangeMinimumSize(leastSpan(x));
        return a;
    }

    /**
     * The narrowest range an axis over these values may take. JFreeChart's default of 10⁻⁸ in axis units widens
     * a span of nanoseconds into negative times (and breaks a log axis); a millionth of the largest magnitude
     * keeps any data in SI units at its own scale, and 1 stands for data that are all zero.
     */
    static double leastSpan(double[]... values) {
        double largest = 0;
        for (double[] column : values) {
            for (double v : column) {
                if (Double.isFinite(v)) {
                    largest = Math.max(largest, Math.abs(v));
                }
            }
        }
        return largest > 0 ? 1e-6 * largest : 1;
    }
}
