package lamella.ui.charts;

import lamella.charts.DecadeAxis;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Stroke;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;

/**
 * The look of every workbench plot, close to the report's so that a plot on screen and in the report read alike:
 * white ground, faint grid, one sans-serif family, series told apart by dash as well as colour.
 */
public final class PlotLook {

    public static final Color DATA = new Color(0x22, 0x22, 0x22);
    public static final Color MODEL = new Color(0x1F, 0x5F, 0xA8);
    public static final Color REFERENCE = new Color(0x88, 0x88, 0x88);

    /** Colours that stay distinct for the common forms of colour blindness. */
    private static final Color[] SERIES = {
            new Color(0x1F, 0x5F, 0xA8), new Color(0xC4, 0x5A, 0x12), new Color(0x2E, 0x8B, 0x57),
            new Color(0x8E, 0x3B, 0x8E), new Color(0xB8, 0x93, 0x0B), new Color(0x4A, 0xA3, 0xC9),
            new Color(0x7A, 0x4E, 0x2D), new Color(0xC0, 0x39, 0x5B)};
    private static final float[][] DASHES = {null, {9f, 4f}, {2f, 3f}, {9f, 3f, 2f, 3f}};
    private static final String FAMILY = Font.SANS_SERIF;
    private static final Font TITLE = new Font(FAMILY, Font.BOLD, 14);
    private static final Font AXIS_LABEL = new Font(FAMILY, Font.PLAIN, 13);
    private static final Font TICKS = new Font(FAMILY, Font.PLAIN, 12);
    private static final Font LEGEND = new Font(FAMILY, Font.PLAIN, 12);
    private static final Color GRID = new Color(0xDD, 0xDD, 0xDD);
    private static final Color MINOR_GRID = new Color(0xF0, 0xF0, 0xF0);

    static {
        // Rotated axis labels as text, not glyph outlines: the workaround JFreeChart applies by default is for JDKs
        // long gone, and outlines make SVG exports unsearchable.
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private PlotLook() {
    }

    public static Paint seriesPaint(int i) {
        return SERIES[i % SERIES.length];
    }

    /** Dashes cycle more slowly than colours, so series that share a colour differ in dash. */
    public static Stroke seriesStroke(int i) {
        float[] dash = DASHES[(i / SERIES.length + i) % DASHES.length];
        return dash == null ? new BasicStroke(2f)
                : new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    /** A linear value axis that does not insist on showing zero. */
    public static NumberAxis linear(String label) {
        NumberAxis a = new NumberAxis(label);
        a.setAutoRangeIncludesZero(false);
        return a;
    }

    /** An x axis: decades for frequency and delay sweeps of positive values, linear otherwise. */
    public static ValueAxis xAxis(String label, boolean logarithmic, double[] x) {
        ValueAxis a = logarithmic ? decades(label) : linear(label);
        a.setAutoRangeMinimumSize(leastSpan(x));
        return a;
    }

    private static ValueAxis decades(String label) {
        DecadeAxis a = new DecadeAxis(label);
        a.setLowerMargin(0.03);
        a.setUpperMargin(0.03);
        return a;
    }

    /**
     * The narrowest range an axis may take: a millionth of the largest magnitude, so that data in SI units (delays of
     * nanoseconds) keep their own scale; JFreeChart's default of 10⁻⁸ would widen such a span into negative times.
     */
    public static double leastSpan(double[] values) {
        double largest = 0;
        for (double v : values) {
            if (Double.isFinite(v)) {
                largest = Math.max(largest, Math.abs(v));
            }
        }
        return largest > 0 ? 1e-6 * largest : 1;
    }

    /** A chart with this look; title may be null. */
    public static JFreeChart chart(String title, XYPlot plot, boolean legend) {
        JFreeChart chart = new JFreeChart(null, TITLE, plot, legend);
        if (title != null) {
            chart.setTitle(new TextTitle(title, TITLE));
        }
        chart.setBackgroundPaint(Color.WHITE);
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(true);
        // Room on the right for the last tick label, which JFreeChart centres on the plot's edge.
        chart.setPadding(new RectangleInsets(6, 6, 6, 22));
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlinePaint(REFERENCE);
        plot.setDomainGridlinePaint(GRID);
        plot.setDomainMinorGridlinesVisible(true);
        plot.setDomainMinorGridlinePaint(MINOR_GRID);
        plot.setRangeGridlinePaint(GRID);
        axis(plot.getDomainAxis());
        axis(plot.getRangeAxis());
        LegendTitle l = chart.getLegend();
        if (l != null) {
            l.setPosition(RectangleEdge.BOTTOM);
            l.setFrame(BlockBorder.NONE);
            l.setItemFont(LEGEND);
            l.setBackgroundPaint(Color.WHITE);
        }
        return chart;
    }

    private static void axis(Axis a) {
        if (a == null) {
            return;
        }
        a.setLabelFont(AXIS_LABEL);
        a.setTickLabelFont(TICKS);
        a.setLabelPaint(DATA);
        a.setTickLabelPaint(DATA);
        a.setTickMarkOutsideLength(4f);
        a.setMinorTickMarkOutsideLength(2f);
    }
}
