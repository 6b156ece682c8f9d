package lamella.charts.plan;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Rectangle;
import java.awt.Shape;
import java.awt.geom.Ellipse2D;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lamella.api.fit.SensitivityTable;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PlannedSensitivity;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYLineAnnotation;
import org.jfree.chart.annotations.XYPolygonAnnotation;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.PaintScale;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.text.TextUtils;
import org.jfree.chart.title.PaintScaleLegend;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.chart.util.ShapeUtils;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.jfree.svg.SVGGraphics2D;

/**
 * The plan's pictures as JFreeChart charts, and as PNG and SVG.
 *
 * <p>The objective map colours every plan of a {@link PlanGrid} by its objective in per cent (a log colour scale when
 * it spans more than a factor of three), draws contour lines at 1, 2 and 5 × 10ⁿ % through the grid (marching
 * squares on log σ), marks the best plan on the map and the case as written, and crosses the plans beyond a limit
 * (grey) or that the model cannot evaluate (red). Axes are in the trade's units, logarithmic for log-spaced keys.
 */
public final class PlanCharts {

    /** Colour stops from low (good) to high σ: dark blue through teal and green to pale yellow. */
    private static final Color[] STOPS = {new Color(0x2B, 0x1A, 0x5E), new Color(0x2C, 0x4F, 0x8F),
            new Color(0x1F, 0x86, 0x8C), new Color(0x3C, 0xAE, 0x68), new Color(0xB4, 0xD0, 0x3F),
            new Color(0xF4, 0xEE, 0x9A)};
    /** Cells whose targets the plan cannot separate (σ = ∞). */
    public static final Color UNIDENTIFIABLE = new Color(0x55, 0x55, 0x55);
    private static final Color BEYOND = new Color(0x80, 0x80, 0x80);
    private static final Color FAILED = new Color(0xC0, 0x10, 0x10);
    private static final Font TITLE = new Font(Font.SANS_SERIF, Font.BOLD, 15);
    private static final Font SUBTITLE = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    private static final Font LABEL = new Font(Font.SANS_SERIF, Font.PLAIN, 13);
    private static final Font TICKS = new Font(Font.SANS_SERIF, Font.PLAIN, 12);
    private static final Color[] LINES = {new Color(0x1F, 0x4E, 0x9A), new Color(0xC8, 0x5A, 0x12),
            new Color(0x2E, 0x8B, 0x3E), new Color(0x8E, 0x2C, 0x8E), new Color(0xB0, 0x1E, 0x2E),
            new Color(0x11, 0x8C, 0x9C), new Color(0x6B, 0x5B, 0x1E), new Color(0x44, 0x44, 0x44)};

    static {
        // Rotated text as text, not glyph outlines, in SVG (as the report bundle does).
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private PlanCharts() {
    }

    /** The drawn contour lines of the last map, for checks: each segment x0, y0, x1, y1 in plotted units. */
    public record Contours(List<double[]> segments, List<Double> levels) {
    }

    /** The objective over the grid's two keys. */
    public static JFreeChart objectiveMap(PlanGrid g) {
        return map(g, null);
    }

    /** The same map, telling the contour segments drawn to {@code contours} (for tests and read-outs). */
    public static JFreeChart objectiveMap(PlanGrid g, List<double[]> contours) {
        return map(g, contours);
    }

    private static JFreeChart map(PlanGrid g, List<double[]> contoursOut) {
        double[] xs = g.xs();
        double[] ys = g.ys();
        TradeUnit xu = TradeUnit.of(g.xName(), xs[xs.length - 1]);
        TradeUnit yu = TradeUnit.of(g.yName(), ys[ys.length - 1]);
        boolean xLog = PlanGrid.logSpaced(xs);
        boolean yLog = PlanGrid.logSpaced(ys);
        double[] px = scaled(xs, xu.factor());
        double[] py = scaled(ys, yu.factor());
        double[] xEdges = edges(px, xLog);
        double[] yEdges = edges(py, yLog);
        double[][] percent = new double[xs.length][ys.length];
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < xs.length; i++) {
            for (int j = 0; j < ys.length; j++) {
                PlannedResult p = g.at(i, j);
                double v = p == null ? Double.NaN : 100 * p.objective();
                percent[i][j] = v;
                if (Double.isFinite(v) && v > 0) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        if (!(lo < hi)) {
            double mid = Double.isFinite(lo) ? lo : 1;
            lo = mid / 1.1;
            hi = mid * 1.1;
        }
        boolean logColour = hi / lo > 3;
        Scale scale = new Scale(lo, hi, logColour);
        ValueAxis xAxis = axis(xu.label(g.xName()), xLog);
        ValueAxis yAxis = axis(yu.label(g.yName()), yLog);
        xAxis.setRange(xEdges[0], xEdges[xEdges.length - 1]);
        yAxis.setRange(yEdges[0], yEdges[yEdges.length - 1]);
        XYSeriesCollection marks = new XYSeriesCollection();
        XYLineAndShapeRenderer markRenderer = new XYLineAndShapeRenderer(false, true);
        XYPlot plot = new XYPlot(marks, xAxis, yAxis, markRenderer);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinesVisible(false);
        plot.setRangeGridlinesVisible(false);
        plot.setOutlinePaint(Color.GRAY);
        XYSeries beyond = new XYSeries("beyond a limit (×)", false);
        XYSeries failed = new XYSeries("cannot be evaluated (×)", false);
        boolean anyUnidentifiable = false;
        for (int i = 0; i < xs.length; i++) {
            for (int j = 0; j < ys.length; j++) {
                PlannedResult p = g.at(i, j);
                if (p == null) {
                    continue;
                }
                double v = percent[i][j];
                Paint fill = null;
                if (Double.isFinite(v)) {
                    fill = scale.getPaint(v);
                } else if (v == Double.POSITIVE_INFINITY) {
                    fill = UNIDENTIFIABLE;
                    anyUnidentifiable = true;
                }
                if (fill != null) {
                    markRenderer.addAnnotation(new XYPolygonAnnotation(new double[] {xEdges[i], yEdges[j],
                            xEdges[i + 1], yEdges[j], xEdges[i + 1], yEdges[j + 1], xEdges[i], yEdges[j + 1]}, null,
                            null, fill), Layer.BACKGROUND);
                }
                if (p.status() == PlannedResult.Status.BEYOND_LIMIT) {
                    beyond.add(px[i], py[j]);
                } else if (p.status() == PlannedResult.Status.NOT_EVALUABLE) {
                    failed.add(px[i], py[j]);
                }
            }
        }
        List<Double> levels = levels(lo, hi);
        List<double[]> segments = contours(percent, px, py, xLog, yLog, levels, markRenderer);
        if (contoursOut != null) {
            contoursOut.addAll(segments);
        }
        PlannedResult best = g.best();
        XYSeries bestMark = new XYSeries("best plan on this map (○)", false);
        bestMark.add(xu.factor() * (Double) best.values().get(g.xKey()),
                yu.factor() * (Double) best.values().get(g.yKey()));
        XYSeries baseMark = new XYSeries("the case as written (◇)", false);
        double[] base = g.baseline();
        if (Double.isFinite(base[0]) && Double.isFinite(base[1])) {
            baseMark.add(xu.factor() * base[0], yu.factor() * base[1]);
        }
        int s = 0;
        marks.addSeries(bestMark);
        markRenderer.setSeriesShape(s, new Ellipse2D.Double(-8, -8, 16, 16));
        markRenderer.setSeriesPaint(s, Color.WHITE);
        markRenderer.setSeriesOutlinePaint(s, Color.BLACK);
        markRenderer.setSeriesOutlineStroke(s, new BasicStroke(2.5f));
        s++;
        marks.addSeries(baseMark);
        markRenderer.setSeriesShape(s, ShapeUtils.createDiamond(8));
        markRenderer.setSeriesPaint(s, Color.WHITE);
        markRenderer.setSeriesOutlinePaint(s, Color.BLACK);
        markRenderer.setSeriesOutlineStroke(s, new BasicStroke(2f));
        s++;
        Shape cross = ShapeUtils.createDiagonalCross(6, 1.2f);
        if (beyond.getItemCount() > 0) {
            marks.addSeries(beyond);
            markRenderer.setSeriesShape(s, cross);
            markRenderer.setSeriesPaint(s, BEYOND);
            s++;
        }
        if (failed.getItemCount() > 0) {
            marks.addSeries(failed);
            markRenderer.setSeriesShape(s, cross);
            markRenderer.setSeriesPaint(s, FAILED);
            s++;
        }
        if (anyUnidentifiable) {
            marks.addSeries(new XYSeries("a target unidentifiable (dark grey)", false));
            markRenderer.setSeriesShape(s, new Rectangle(-6, -6, 12, 12));
            markRenderer.setSeriesPaint(s, UNIDENTIFIABLE);
        }
        markRenderer.setUseOutlinePaint(true);
        markRenderer.setDrawOutlines(true);
        markRenderer.setUseFillPaint(false);
        JFreeChart chart = new JFreeChart(null, TITLE, plot, true);
        chart.setTitle(new TextTitle("Plans: " + g.outcome().objective(), TITLE));
        List<String> held = g.held();
        String sub = (held.isEmpty() ? "" : "held at the best plan of this map: " + String.join(", ", held) + "; ")
                + "contours at " + String.join(", ", levels.stream().map(PlanCharts::percentText).toList());
        TextTitle subtitle = new TextTitle(sub, SUBTITLE);
        subtitle.setPosition(RectangleEdge.TOP);
        chart.addSubtitle(subtitle);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setPadding(new RectangleInsets(8, 8, 8, 12));
        chart.getLegend().setItemFont(TICKS);
        chart.getLegend().setFrame(BlockBorder.NONE);
        chart.getLegend().setPosition(RectangleEdge.BOTTOM);
        ValueAxis barAxis = axis(g.outcome().objective() + " (%)", logColour);
        barAxis.setRange(lo, hi);
        PaintScaleLegend bar = new PaintScaleLegend(scale, barAxis);
        bar.setPosition(RectangleEdge.RIGHT);
        bar.setAxisLocation(AxisLocation.BOTTOM_OR_RIGHT);
        bar.setStripWidth(18);
        bar.setMargin(new RectangleInsets(8, 12, 8, 4));
        bar.setSubdivisionCount(256);
        chart.addSubtitle(bar);
        return chart;
    }

    /**
     * Sensitivity curves of a plan's measurements: every input whose largest |S| reaches 5 % of the largest of all,
     * one colour per input, solid for the first measurement and dashed for the others.
     */
    public static JFreeChart sensitivity(String title, List<PlannedSensitivity> curves) {
        if (curves.isEmpty()) {
            throw new IllegalArgumentException("no measurement to draw");
        }
        SensitivityTable first = curves.get(0).table();
        double largest = 0;
        for (PlannedSensitivity c : curves) {
            for (double[] row : c.table().values()) {
                for (double v : row) {
                    if (Double.isFinite(v)) {
                        largest = Math.max(largest, Math.abs(v));
                    }
                }
            }
        }
        double[] x0 = first.x();
        TradeUnit xu = TradeUnit.of(first.xColumn(), x0.length == 0 ? 1 : x0[x0.length - 1]);
        boolean xLog = x0.length > 1 && x0[0] > 0 && x0[x0.length - 1] / x0[0] >= 10;
        XYSeriesCollection data = new XYSeriesCollection();
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, false);
        List<String> labels = new ArrayList<>();
        int series = 0;
        for (int m = 0; m < curves.size(); m++) {
            SensitivityTable t = curves.get(m).table();
            for (int j = 0; j < t.parameters().size(); j++) {
                double peak = 0;
                for (double v : t.values()[j]) {
                    if (Double.isFinite(v)) {
                        peak = Math.max(peak, Math.abs(v));
                    }
                }
                if (!(peak >= 0.05 * largest) || peak == 0) {
                    continue;
                }
                String label = t.label(j);
                if (!labels.contains(label)) {
                    labels.add(label);
                }
                String name = label + (curves.size() > 1 ? " — " + curves.get(m).measurement() : "");
                XYSeries xy = new XYSeries(name, false);
                for (int i = 0; i < t.x().length; i++) {
                    if (Double.isFinite(t.values()[j][i])) {
                        xy.add(xu.factor() * t.x()[i], t.values()[j][i]);
                    }
                }
                data.addSeries(xy);
                r.setSeriesPaint(series, LINES[labels.indexOf(label) % LINES.length]);
                r.setSeriesStroke(series, m == 0 ? new BasicStroke(2f)
                        : new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 1f,
                        new float[] {7f, 5f}, 0f));
                series++;
            }
        }
        ValueAxis xAxis = axis(xu.label(first.xColumn()), xLog);
        NumberAxis yAxis = new NumberAxis(first.phaseLike() ? "sensitivity ∂φ/∂ln p (°)"
                : "sensitivity ∂ln(" + first.signal() + ")/∂ln p");
        yAxis.setLabelFont(LABEL);
        yAxis.setTickLabelFont(TICKS);
        XYPlot plot = new XYPlot(data, xAxis, yAxis, r);
        plot.setBackgroundPaint(Color.WHITE);
        plot.setDomainGridlinePaint(new Color(0xDD, 0xDD, 0xDD));
        plot.setRangeGridlinePaint(new Color(0xDD, 0xDD, 0xDD));
        plot.setOutlinePaint(Color.GRAY);
        JFreeChart chart = new JFreeChart(null, TITLE, plot, true);
        chart.setTitle(new TextTitle(title, TITLE));
        TextTitle sub = new TextTitle("signal " + first.signal() + "; inputs with |S| below 5 % of the largest not"
                + " drawn" + (curves.size() > 1 ? "; dashed: the plan's other measurements" : ""), SUBTITLE);
        chart.addSubtitle(sub);
        chart.setBackgroundPaint(Color.WHITE);
        chart.getLegend().setItemFont(TICKS);
        chart.getLegend().setFrame(BlockBorder.NONE);
        return chart;
    }

    /** The chart as a PNG image. */
    public static byte[] png(JFreeChart chart, int width, int height) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ChartUtils.writeChartAsPNG(out, chart, width, height);
        } catch (IOException e) {
            throw new UncheckedIOException("a PNG encoder failed writing to memory", e);
        }
        return out.toByteArray();
    }

    /** The chart as a standalone SVG document. */
    public static String svg(JFreeChart chart, int width, int height) {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        chart.draw(g, new Rectangle(0, 0, width, height));
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + g.getSVGElement() + "\n";
    }

    private static ValueAxis axis(String label, boolean log) {
        ValueAxis a;
        if (log) {
            a = new PlainLogAxis(label);
        } else {
            NumberAxis n = new NumberAxis(label);
            n.setAutoRangeIncludesZero(false);
            a = n;
        }
        a.setLabelFont(LABEL);
        a.setTickLabelFont(TICKS);
        return a;
    }

    private static double[] scaled(double[] v, double f) {
        double[] out = new double[v.length];
        for (int i = 0; i < v.length; i++) {
            out[i] = f * v[i];
        }
        return out;
    }

    /** Cell edges halfway between values (in ln for a log axis), the outer ones half a step beyond the ends. */
    static double[] edges(double[] v, boolean log) {
        int n = v.length;
        double[] e = new double[n + 1];
        for (int i = 1; i < n; i++) {
            e[i] = log ? Math.sqrt(v[i - 1] * v[i]) : (v[i - 1] + v[i]) / 2;
        }
        if (n == 1) {
            e[0] = log ? v[0] / 1.5 : v[0] - Math.max(Math.abs(v[0]) * 0.25, 1e-12);
            e[1] = log ? v[0] * 1.5 : v[0] + Math.max(Math.abs(v[0]) * 0.25, 1e-12);
            return e;
        }
        e[0] = log ? v[0] * v[0] / e[1] : 2 * v[0] - e[1];
        e[n] = log ? v[n - 1] * v[n - 1] / e[n - 1] : 2 * v[n - 1] - e[n - 1];
        return e;
    }

    /** 1, 2 and 5 × 10ⁿ % between lo and hi; decades only when that gives more than eight. */
    static List<Double> levels(double lo, double hi) {
        List<Double> out = new ArrayList<>();
        for (int d = (int) Math.floor(Math.log10(lo)) - 1; d <= (int) Math.ceil(Math.log10(hi)); d++) {
            for (double m : new double[] {1, 2, 5}) {
                double v = m * Math.pow(10, d);
                if (v > lo && v < hi) {
                    out.add(v);
                }
            }
        }
        if (out.size() > 8) {
            out.removeIf(v -> Math.abs(Math.log10(v) - Math.rint(Math.log10(v))) > 1e-9);
        }
        return out;
    }

    private static String percentText(double v) {
        return (v >= 1 ? String.format(Locale.ROOT, "%.0f", v) : String.format(Locale.ROOT, "%s", (float) v)) + " %";
    }

    /**
     * Marching squares on ln of the objective over the grid of plan values: every square whose four corners have a
     * finite objective contributes the segments where a level crosses its edges (linear interpolation in ln σ
     * along an edge, positions interpolated in ln along a log axis). An ambiguous saddle joins by the centre's side.
     */
    private static List<double[]> contours(double[][] z, double[] px, double[] py, boolean xLog, boolean yLog,
                                           List<Double> levels, XYLineAndShapeRenderer layer) {
        List<double[]> all = new ArrayList<>();
        BasicStroke stroke = new BasicStroke(1.4f);
        Color ink = new Color(0, 0, 0, 200);
        for (double level : levels) {
            double c = Math.log(level);
            List<double[]> segments = new ArrayList<>();
            for (int i = 0; i + 1 < px.length; i++) {
                for (int j = 0; j + 1 < py.length; j++) {
                    double[] v = {z[i][j], z[i + 1][j], z[i + 1][j + 1], z[i][j + 1]};
                    boolean ok = true;
                    for (double x : v) {
                        ok &= Double.isFinite(x) && x > 0;
                    }
                    if (!ok) {
                        continue;
                    }
                    double[] l = {Math.log(v[0]) - c, Math.log(v[1]) - c, Math.log(v[2]) - c, Math.log(v[3]) - c};
                    // corners 0:(i,j) 1:(i+1,j) 2:(i+1,j+1) 3:(i,j+1); edges k from corner k to k+1
                    double[][] cross = new double[4][];
                    int count = 0;
                    for (int k = 0; k < 4; k++) {
                        double a = l[k];
                        double b = l[(k + 1) % 4];
                        if ((a < 0) != (b < 0)) {
                            double t = a / (a - b);
                            double[] p0 = corner(k, i, j);
                            double[] p1 = corner((k + 1) % 4, i, j);
                            cross[k] = new double[] {p0[0] + t * (p1[0] - p0[0]), p0[1] + t * (p1[1] - p0[1])};
                            count++;
                        }
                    }
                    if (count == 2) {
                        double[] a = null;
                        for (double[] p : cross) {
                            if (p != null) {
                                if (a == null) {
                                    a = p;
                                } else {
                                    segments.add(new double[] {a[0], a[1], p[0], p[1]});
                                }
                            }
                        }
                    } else if (count == 4) {
                        boolean centreHigh = (l[0] + l[1] + l[2] + l[3]) / 4 >= 0;
                        boolean corner0High = l[0] >= 0;
                        if (centreHigh == corner0High) {
                            segments.add(new double[] {cross[0][0], cross[0][1], cross[1][0], cross[1][1]});
                            segments.add(new double[] {cross[2][0], cross[2][1], cross[3][0], cross[3][1]});
                        } else {
                            segments.add(new double[] {cross[3][0], cross[3][1], cross[0][0], cross[0][1]});
                            segments.add(new double[] {cross[1][0], cross[1][1], cross[2][0], cross[2][1]});
                        }
                    }
                }
            }
            double[] longest = null;
            double longestLength = -1;
            for (double[] sgm : segments) {
                double[] s = {at(px, sgm[0], xLog), at(py, sgm[1], yLog), at(px, sgm[2], xLog), at(py, sgm[3], yLog)};
                layer.addAnnotation(new XYLineAnnotation(s[0], s[1], s[2], s[3], stroke, ink), Layer.BACKGROUND);
                all.add(s);
                double length = Math.hypot(sgm[2] - sgm[0], sgm[3] - sgm[1]);
                if (length > longestLength) {
                    longestLength = length;
                    longest = s;
                }
            }
            if (longest != null) {
                XYTextAnnotation text = new XYTextAnnotation(percentText(level), (longest[0] + longest[2]) / 2,
                        (longest[1] + longest[3]) / 2);
                text.setFont(SUBTITLE);
                text.setPaint(Color.BLACK);
                text.setBackgroundPaint(new Color(255, 255, 255, 190));
                text.setTextAnchor(TextAnchor.CENTER);
                layer.addAnnotation(text, Layer.BACKGROUND);
            }
        }
        return all;
    }

    private static double[] corner(int k, int i, int j) {
        return switch (k) {
            case 0 -> new double[] {i, j};
            case 1 -> new double[] {i + 1, j};
            case 2 -> new double[] {i + 1, j + 1};
            default -> new double[] {i, j + 1};
        };
    }

    /** The plotted coordinate of a fractional grid index. */
    private static double at(double[] v, double index, boolean log) {
        int i = (int) Math.min(v.length - 2, Math.max(0, Math.floor(index)));
        double t = index - i;
        return log ? v[i] * Math.pow(v[i + 1] / v[i], t) : v[i] + t * (v[i + 1] - v[i]);
    }

    /** Colours from {@link #STOPS} over [lo, hi] %, in log σ when asked. */
    private record Scale(double lower, double upper, boolean log) implements PaintScale {

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
            double t = log ? Math.log(value / lower) / Math.log(upper / lower) : (value - lower) / (upper - lower);
            t = Double.isFinite(t) ? Math.min(1, Math.max(0, t)) : 1;
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
