package lamella.map;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Rectangle;
import java.awt.Shape;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYLineAnnotation;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.XYBlockRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.chart.util.ShapeUtils;
import org.jfree.data.xy.DefaultXYDataset;
import org.jfree.data.xy.DefaultXYZDataset;
import org.jfree.svg.SVGGraphics2D;

/**
 * One map image: a cell of colour per position (stage coordinates in µm), a colour bar labelled with the quantity and
 * its unit, a scale bar in µm, and a cross on every position that has no value (failed, or a σ the data cannot give).
 * Drawn with the charts bundle (JFreeChart), as PNG and as SVG.
 */
public final class MapImages {

    static final int WIDTH = 900;

    /** Colour stops from low to high: dark blue through teal and green to pale yellow, light rising throughout. */
    private static final Color[] STOPS = {new Color(0x2B, 0x1A, 0x5E), new Color(0x2C, 0x4F, 0x8F),
            new Color(0x1F, 0x86, 0x8C), new Color(0x3C, 0xAE, 0x68), new Color(0xB4, 0xD0, 0x3F),
            new Color(0xF4, 0xEE, 0x9A)};
    private static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 16);
    private static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 14);
    private static final Font TICKS = new Font(Font.SANS_SERIF, Font.PLAIN, 12);

    static {
        // Rotated text as text, not glyph outlines, in SVG (as the report bundle does; Java 17 needs no workaround).
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    /** The drawn picture in both formats. */
    record Image(byte[] png, String svg) {
    }

    private MapImages() {
    }

    /**
     * @param title     what the map shows
     * @param barLabel  the colour bar's label with its unit
     * @param xM        stage x of each position, m
     * @param yM        stage y, m
     * @param values    the value of each position; NaN or ±∞ where there is none (marked)
     */
    static Image draw(String title, String barLabel, double[] xM, double[] yM, double[] values) {
        JFreeChart chart = chart(title, barLabel, xM, yM, values);
        XYPlot plot = chart.getXYPlot();
        double aspect = plot.getRangeAxis().getRange().getLength() / plot.getDomainAxis().getRange().getLength();
        int plotWidth = WIDTH - 220;
        int heightPx = (int) Math.round(Math.min(1400, Math.max(300, plotWidth * aspect + 160)));
        return new Image(png(chart, heightPx), svg(chart, heightPx));
    }

    /**
     * The map as a chart, for the files above and for the workbench's Map panel: axes x and y in µm, the colour bar
     * on the right, a scale bar under the positions, a cross on each position without a value (series 0 of dataset 1).
     *
     * @param title     what the map shows
     * @param barLabel  the colour bar's label with its unit
     * @param xM        stage x of each position, m
     * @param yM        stage y, m
     * @param values    the value of each position; NaN or ±∞ where there is none (marked)
     */
    public static JFreeChart chart(String title, String barLabel, double[] xM, double[] yM, double[] values) {
        int n = xM.length;
        double[] xs = new double[n];
        double[] ys = new double[n];
        for (int i = 0; i < n; i++) {
            xs[i] = xM[i] * 1e6;
            ys[i] = yM[i] * 1e6;
        }
        double[] step = cellSize(xs, ys);
        int shown = 0;
        int marked = 0;
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (double v : values) {
            if (Double.isFinite(v)) {
                shown++;
                lo = Math.min(lo, v);
                hi = Math.max(hi, v);
            } else {
                marked++;
            }
        }
        if (shown == 0) {
            lo = 0;
            hi = 1;
        } else if (!(hi > lo)) {
            double pad = lo == 0 ? 1 : Math.abs(lo) * 1e-3;
            lo -= pad;
            hi += pad;
        }
        double[][] cells = new double[3][shown];
        double[][] crosses = new double[2][marked];
        int a = 0;
        int b = 0;
        for (int i = 0; i < n; i++) {
            if (Double.isFinite(values[i])) {
                cells[0][a] = xs[i];
                cells[1][a] = ys[i];
                cells[2][a++] = values[i];
            } else {
                crosses[0][b] = xs[i];
                crosses[1][b++] = ys[i];
            }
        }
        DefaultXYZDataset data = new DefaultXYZDataset();
        data.addSeries("value", cells);
        Gradient scale = new Gradient(lo, hi);
        XYBlockRenderer blocks = new XYBlockRenderer();
        blocks.setPaintScale(scale);
        blocks.setBlockWidth(step[0]);
        blocks.setBlockHeight(step[1]);
        blocks.setDefaultSeriesVisibleInLegend(false);
        NumberAxis x = new NumberAxis("x (µm)");
        NumberAxis y = new NumberAxis("y (µm)");
        for (NumberAxis axis : List.of(x, y)) {
            axis.setLabelFont(LABEL);
            axis.setTickLabelFont(TICKS);
            axis.setAutoRangeIncludesZero(false);
        }
        XYPlot plot = new XYPlot(data, x, y, blocks);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        plot.setOutlinePaint(Color.GRAY);
        if (marked > 0) {
            DefaultXYDataset failed = new DefaultXYDataset();
            failed.addSeries("no value (marked ×)", crosses);
            XYLineAndShapeRenderer cross = new XYLineAndShapeRenderer(false, true);
            float r = (float) Math.max(3.0, Math.min(7.0, 0.35 * WIDTH / Math.max(1, Math.sqrt(n))));
            Shape shape = ShapeUtils.createDiagonalCross(r, r / 4);
            cross.setSeriesShape(0, shape);
            cross.setSeriesPaint(0, new Color(0xC0, 0x10, 0x10));
            plot.setDataset(1, failed);
            plot.setRenderer(1, cross);
        }
        double xMin = min(xs) - step[0] / 2;
        double xMax = max(xs) + step[0] / 2;
        double yMin = min(ys) - step[1] / 2;
        double yMax = max(ys) + step[1] / 2;
        double height = yMax - yMin;
        double barRoom = 0.12 * Math.max(height, xMax - xMin);
        x.setRange(xMin, xMax);
        y.setRange(yMin - barRoom, yMax);
        scaleBar(plot, xMin, xMax, yMin - 0.55 * barRoom);
        JFreeChart chart = new JFreeChart(null, TITLE, plot, marked > 0);
        chart.setTitle(new TextTitle(title, TITLE));
        chart.setBackgroundPaint(Color.WHITE);
        chart.setPadding(new RectangleInsets(8, 8, 8, 16));
        if (marked > 0) {
            LegendTitle legend = chart.getLegend();
            legend.setItemFont(TICKS);
            legend.setFrame(BlockBorder.NONE);
            legend.setPosition(RectangleEdge.BOTTOM);
        }
        NumberAxis barAxis = new NumberAxis(barLabel);
        barAxis.setLabelFont(LABEL);
        barAxis.setTickLabelFont(TICKS);
        barAxis.setRange(lo, hi);
        double magnitude = Math.max(Math.abs(lo), Math.abs(hi));
        if (magnitude >= 1e5 || magnitude < 1e-2) {
            // 54,000,000 or 0.000031 is hard to read on a colour bar: powers of ten instead
            barAxis.setNumberFormatOverride(new DecimalFormat("0.0##E0", DecimalFormatSymbols.getInstance(Locale.ROOT)));
        }
        PaintScaleLegend bar = new PaintScaleLegend(scale, barAxis);
        bar.setPosition(RectangleEdge.RIGHT);
        bar.setAxisLocation(AxisLocation.BOTTOM_OR_RIGHT);
        bar.setStripWidth(18);
        bar.setMargin(new RectangleInsets(8, 12, 8, 4));
        bar.setSubdivisionCount(256);
        chart.addSubtitle(bar);
        return chart;
    }

    /** A bar of a round length (1, 2 or 5 × 10ⁿ µm) near a fifth of the width, under the lowest positions. */
    private static void scaleBar(XYPlot plot, double xMin, double xMax, double yBar) {
        double width = xMax - xMin;
        double target = width / 5;
        double decade = Math.pow(10, Math.floor(Math.log10(target)));
        double length = decade;
        for (double m : new double[] {1, 2, 5}) {
            if (m * decade <= target) {
                length = m * decade;
            }
        }
        double x0 = xMin + 0.04 * width;
        plot.addAnnotation(new XYLineAnnotation(x0, yBar, x0 + length, yBar, new BasicStroke(4f), Color.BLACK));
        XYTextAnnotation label = new XYTextAnnotation(format(length) + " µm", x0 + length + 0.02 * width, yBar);
        label.setFont(LABEL);
        label.setTextAnchor(TextAnchor.CENTER_LEFT);
        plot.addAnnotation(label);
    }

    static String format(double v) {
        return v >= 1 && v == Math.rint(v) ? String.format(Locale.ROOT, "%d", (long) v)
                : String.format(Locale.ROOT, "%s", (float) v);
    }

    /** The size of one position's cell: the grid's steps where positions share rows and columns, else the spacing. */
    static double[] cellSize(double[] xs, double[] ys) {
        double[] ux = Arrays.stream(xs).distinct().sorted().toArray();
        double[] uy = Arrays.stream(ys).distinct().sorted().toArray();
        int n = xs.length;
        if ((double) ux.length * uy.length <= 2.0 * n) {
            return new double[] {smallestStep(ux, uy), smallestStep(uy, ux)};
        }
        double s = MapEngine.spacing(max(xs) - min(xs), max(ys) - min(ys), n);
        return new double[] {s, s};
    }

    private static double smallestStep(double[] u, double[] other) {
        double best = Double.POSITIVE_INFINITY;
        for (int i = 1; i < u.length; i++) {
            best = Math.min(best, u[i] - u[i - 1]);
        }
        if (Double.isFinite(best)) {
            return best;
        }
        double alt = Double.POSITIVE_INFINITY;
        for (int i = 1; i < other.length; i++) {
            alt = Math.min(alt, other[i] - other[i - 1]);
        }
        return Double.isFinite(alt) ? alt : 1.0;
    }

    private static double min(double[] v) {
        return Arrays.stream(v).min().orElse(0);
    }

    private static double max(double[] v) {
        return Arrays.stream(v).max().orElse(1);
    }

    private static byte[] png(JFreeChart chart, int height) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ChartUtils.writeChartAsPNG(out, chart, WIDTH, height);
        } catch (IOException e) {
            throw new UncheckedIOException("a PNG encoder failed writing to memory", e);
        }
        return out.toByteArray();
    }

    /** A standalone SVG document, without a document type pointing to the web (as the report bundle writes). */
    private static String svg(JFreeChart chart, int height) {
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, height);
        chart.draw(g, new Rectangle(0, 0, WIDTH, height));
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + g.getSVGElement() + "\n";
    }

    /** A continuous colour scale through {@link #STOPS}. */
    private record Gradient(double lower, double upper) implements PaintScale {

        @Override
        public double getLowerBound() {
            return lower;
        }

        @Override
        public double getUpperBound() {
            return upper;
        }

        @Override
        public Paint getPaint(double value) {
            double t = (value - lower) / (upper - lower);
            t = Double.isFinite(t) ? Math.min(1, Math.max(0, t)) : 0;
            double at = t * (STOPS.length - 1);
            int i = Math.min(STOPS.length - 2, (int) Math.floor(at));
            double f = at - i;
            Color c0 = STOPS[i];
            Color c1 = STOPS[i + 1];
            return new Color(mix(c0.getRed(), c1.getRed(), f), mix(c0.getGreen(), c1.getGreen(), f),
                    mix(c0.getBlue(), c1.getBlue(), f));
        }

        private static int mix(int a, int b, double f) {
            return (int) Math.round(a + (b - a) * f);
        }
    }
}
