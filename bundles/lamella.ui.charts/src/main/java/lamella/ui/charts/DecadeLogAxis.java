package lamella.ui.charts;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.TickType;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.Range;

/**
 * A base-10 log axis labelled at whole decades (and at 2 and 5 times a decade when it spans less than three), with
 * unlabelled ticks at the other multiples; JFreeChart's own ticks fall at fractional exponents, which no one reads.
 */
public final class DecadeLogAxis extends LogAxis {

    private static final double FINE_SPAN = 1e3;

    public DecadeLogAxis(String label) {
        super(label);
        setMinorTickMarksVisible(true);
        setLowerMargin(0.03);
        setUpperMargin(0.03);
    }

    @Override
    @SuppressWarnings("rawtypes")
    public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea, RectangleEdge edge) {
        Range r = getRange();
        boolean fine = r.getUpperBound() / r.getLowerBound() < FINE_SPAN;
        int first = (int) Math.floor(Math.log10(r.getLowerBound()));
        int last = (int) Math.ceil(Math.log10(r.getUpperBound()));
        TextAnchor anchor = edge == RectangleEdge.TOP ? TextAnchor.BOTTOM_CENTER
                : edge == RectangleEdge.LEFT ? TextAnchor.CENTER_RIGHT
                : edge == RectangleEdge.RIGHT ? TextAnchor.CENTER_LEFT
                : TextAnchor.TOP_CENTER;
        List<NumberTick> ticks = new ArrayList<>();
        for (int n = first; n <= last; n++) {
            for (int m = 1; m <= 9; m++) {
                double v = m * Math.pow(10, n);
                if (r.contains(v)) {
                    boolean labelled = m == 1 || (fine && (m == 2 || m == 5));
                    String text = labelled ? (m == 1 ? "" : m + "×") + "10" + AxisReading.superscript(n) : "";
                    ticks.add(new NumberTick(labelled ? TickType.MAJOR : TickType.MINOR, v, text, anchor, anchor, 0));
                }
            }
        }
        return ticks;
    }
}
