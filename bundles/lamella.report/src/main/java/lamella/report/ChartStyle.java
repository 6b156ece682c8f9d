package lamella.report;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Stroke;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;

/**
 * The look shared by every plot of a report: white ground, faint grid, one sans-serif family, and series told
 * apart by dash pattern as well as by colour so that a grey print still reads.
 */
final class ChartStyle {

    static final Color DATA = new Color(0x22, 0x22, 0x22);
    static final Color MODEL = new Color(0x1F, 0x5F, 0xA8);
    static final Color REFERENCE = new Color(0x88, 0x88, 0x88);

    /** Series colours, chosen to stay apart for the common forms of colour blindness. */
    private static final Color[] SERIES = {
            new Color(0x1F, 0x5F, 0xA8), new Color(0xC4, 0x5A, 0x12), new Color(0x2E, 0x8B, 0x57),
            new Color(0x8E, 0x3B, 0x8E), new Color(0xB8, 0x93, 0x0B), new Color(0x4A, 0xA3, 0xC9),
            new Color(0x7A, 0x4E, 0x2D), new Color(0xC0, 0x39, 0x5B), new Color(0x5B, 0x5E, 0xA6),
            new Color(0x6B, 0x8E, 0x23), new Color(0xE0, 0x8A, 0x9E), new Color(0x00, 0x6D, 0x6F)};
    /** Hue step for series beyond the list: the golden angle, which keeps successive hues far apart. */
    private static final float GOLDEN_TURN = 0.381966f;
    private static final float[][] DASHES = {null, {9f, 4f}, {2f, 3f}, {9f, 3f, 2f, 3f}};

    private static final String FAMILY = Font.SANS_SERIF;
    private static final Font TITLE = new Font(FAMILY, Font.BOLD, 16);
    private static final Font AXIS_LABEL = new Font(FAMILY, Font.PLAIN, 15);
    private static final Font TICKS = new Font(FAMILY, Font.PLAIN, 13);
    private static final Font LEGEND = new Font(FAMILY, Font.PLAIN, 13);
    private static final Color GRID = new Color(0xDD, 0xDD, 0xDD);
    private static final Color MINOR_GRID = new Color(0xF0, 0xF0, 0xF0);

    private ChartStyle() {
    }

    /** Distinct for every series: bar charts have no dash pattern to tell equal colours apart. */
    static Paint seriesPaint(int i) {
        if (i < SERIES.length) {
            return SERIES[i];
        }
        return Color.getHSBColor(((i - SERIES.length) * GOLDEN_TURN) % 1f, 0.65f, 0.7f);
    }

    /** Dashes cycle beside the colours, so that curves stay apart in a grey print as well. */
    static Stroke seriesStroke(int i) {
        float[] dash = DASHES[i % DASHES.length];
        return dash == null ? new BasicStroke(2f)
                : new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    static Stroke referenceStroke(boolean dashed) {
        return dashed ? new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[]{5f, 4f}, 0f)
                : new BasicStroke(1f);
    }

    static JFreeChart chart(String title, Plot plot, boolean legend) {
        JFreeChart chart = new JFreeChart(null, TITLE, plot, legend);
        chart.setTitle(new TextTitle(title, TITLE));
        chart.setBackgroundPaint(Color.WHITE);
        chart.setTextAntiAlias(true);
        chart.setAntiAlias(true);
        // Room on the right for the last tick label, which JFreeChart centres on the plot's edge.
        chart.setPadding(new RectangleInsets(8, 8, 8, 24));
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlinePaint(REFERENCE);
        if (plot instanceof XYPlot xy) {
            xy.setDomainGridlinePaint(GRID);
            // Faint lines at the unlabelled ticks of a log axis (2…9 times a decade) help to read values off it.
            xy.setDomainMinorGridlinesVisible(true);
            xy.setDomainMinorGridlinePaint(MINOR_GRID);
            xy.setRangeGridlinePaint(GRID);
            axis(xy.getDomainAxis());
            axis(xy.getRangeAxis());
        } else if (plot instanceof CategoryPlot c) {
            c.setRangeGridlinePaint(GRID);
            axis(c.getDomainAxis());
            axis(c.getRangeAxis());
        }
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
        a.setLabelFont(AXIS_LABEL);
        a.setTickLabelFont(TICKS);
        a.setLabelPaint(DATA);
        a.setTickLabelPaint(DATA);
        a.setTickMarkOutsideLength(5f);
        a.setMinorTickMarkOutsideLength(3f);
    }
}
