package lamella.charts;

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
 * A base-10 log axis ticked as a reader expects: labels at whole decades (10⁻¹⁰, 10⁻⁹, …), also at 2 and 5 times
 * a decade when the axis spans less than three decades, and unlabelled ticks at the other integer multiples.
 * JFreeChart's own log axis places ticks at fractional exponents (10^4.2), which nobody reads off a plot. Labels are
 * plain text with superscript digits, so that an SVG keeps them as text rather than as outlines.
 */
public final class DecadeAxis extends LogAxis {

    private static final double FINE_SPAN = 1e3;
    private static final String SUPERSCRIPT_DIGITS = "⁰¹²³⁴⁵⁶⁷⁸⁹";

    public DecadeAxis(String label) {
        super(label);
        setMinorTickMarksVisible(true);
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
                if (!r.contains(v)) {
                    continue;
                }
                boolean labelled = m == 1 || (fine && (m == 2 || m == 5));
                ticks.add(new NumberTick(labelled ? TickType.MAJOR : TickType.MINOR, v,
                        labelled ? (m == 1 ? "" : m + "×") + powerOfTen(n) : "", anchor, anchor, 0));
            }
        }
        return ticks;
    }

    /** 10 with a superscript exponent, such as 10⁻⁹. */
    public static String powerOfTen(int exponent) {
        StringBuilder b = new StringBuilder("10");
        if (exponent < 0) {
            b.append('⁻');
        }
        for (char c : Integer.toString(Math.abs(exponent)).toCharArray()) {
            b.append(SUPERSCRIPT_DIGITS.charAt(c - '0'));
        }
        return b.toString();
    }
}
