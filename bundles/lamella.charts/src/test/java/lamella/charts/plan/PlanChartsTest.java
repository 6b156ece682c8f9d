package lamella.charts.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import lamella.api.ParameterRef;
import lamella.api.fit.SensitivityTable;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PlannedSensitivity;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.RectangleEdge;
import org.junit.jupiter.api.Test;
import org.xml.sax.InputSource;

/**
 * The plan pictures drawn from an outcome whose objective is a known function of the two keys (a bowl in ln f and
 * ln r, invented for the check: these tests check the drawing, not the physics), so that where the colours and
 * contour lines must fall is known.
 */
class PlanChartsTest {

    private static final double[] F = {1e5, 3.16e5, 1e6, 3.16e6, 1e7};
    private static final double[] R = {2e-6, 4e-6, 8e-6, 1.6e-5};

    /** The invented objective: 1 % at 1 MHz and 5 µm, rising as the square of the logarithms away from it. */
    static double objective(double f, double r) {
        double a = Math.log(f / 1e6);
        double b = Math.log(r / 5e-6);
        return 0.01 * (1 + a * a + b * b);
    }

    static PlanOutcome outcome(double[] f, double[] r) {
        List<PlannedResult> plans = new ArrayList<>();
        for (double x : f) {
            for (double y : r) {
                plans.add(plan(List.of(x, y), objective(x, y), PlannedResult.Status.RANKED));
            }
        }
        plans.sort((a, b) -> Double.compare(a.objective(), b.objective()));
        List<PlannedResult> ranked = new ArrayList<>();
        for (int i = 0; i < plans.size(); i++) {
            PlannedResult p = plans.get(i);
            boolean beyond = p.values().equals(List.of(f[f.length - 1], r[0]));
            boolean failed = p.values().equals(List.of(f[0], r[r.length - 1]));
            ranked.add(beyond ? plan(p.values(), p.objective(), PlannedResult.Status.BEYOND_LIMIT)
                    : failed ? plan(p.values(), Double.NaN, PlannedResult.Status.NOT_EVALUABLE) : p.ranked(i + 1));
        }
        ranked.sort((a, b) -> Integer.compare(rank(a), rank(b)));
        return new PlanOutcome("the largest relative σ of the targets", List.of("film.k_through_w_mk"),
                List.of("measurement.modulation_hz", "geometry.pump_radius_m"), List.of(), List.of(),
                plan(List.of(9.8e6, 1e-5), objective(9.8e6, 1e-5), PlannedResult.Status.BASELINE), ranked, List.of());
    }

    private static int rank(PlannedResult p) {
        return p.status() == PlannedResult.Status.RANKED ? p.rank() : p.status() == PlannedResult.Status.BEYOND_LIMIT
                ? 1000 : 2000;
    }

    private static PlannedResult plan(List<Object> values, double objective, PlannedResult.Status status) {
        return new PlannedResult(0, values, status, status == PlannedResult.Status.RANKED ? "" : "invented",
                objective, List.of(), List.of(), Double.NaN, Double.NaN, 1);
    }

    private static List<Object> values(double... v) {
        List<Object> out = new ArrayList<>();
        for (double x : v) {
            out.add(x);
        }
        return out;
    }

    @Test
    void theMapIsColouredByTheObjectiveWithTheBestDarkAndTheWorstLight() throws Exception {
        PlanGrid g = PlanGrid.of(outcome(F, R), 0, 1);
        JFreeChart chart = PlanCharts.objectiveMap(g);
        ChartRenderingInfo info = new ChartRenderingInfo();
        BufferedImage image = chart.createBufferedImage(960, 720, info);
        XYPlot plot = chart.getXYPlot();
        var area = info.getPlotInfo().getDataArea();
        Set<Integer> colours = new HashSet<>();
        for (int x = (int) area.getMinX() + 2; x < area.getMaxX() - 2; x += 4) {
            for (int y = (int) area.getMinY() + 2; y < area.getMaxY() - 2; y += 4) {
                colours.add(image.getRGB(x, y));
            }
        }
        assertTrue(colours.size() > 30, "a map of many colours, got " + colours.size());
        int best = pixel(image, plot, area, 1.0, 4.0, 2);
        int worst = pixel(image, plot, area, 10, 16, 25);
        assertTrue(lightness(best) < 0.35 * 255, "the lowest σ is dark: " + Integer.toHexString(best));
        assertTrue(lightness(worst) > 0.6 * 255, "the highest σ is light: " + Integer.toHexString(worst));
        // the best plan (1 MHz, 4 µm is the grid point nearest the bowl's bottom) and the case as written are marked
        assertEquals(1e6, (Double) g.best().values().get(0));
        assertEquals(4e-6, (Double) g.best().values().get(1));
        var marks = plot.getDataset();
        assertEquals("best plan on this map (○)", marks.getSeriesKey(0));
        assertEquals(1.0, marks.getXValue(0, 0), 1e-12, "MHz");
        assertEquals(4.0, marks.getYValue(0, 0), 1e-12, "µm");
        assertEquals("the case as written (◇)", marks.getSeriesKey(1));
        assertEquals(9.8, marks.getXValue(1, 0), 1e-12);
        assertEquals(10.0, marks.getYValue(1, 0), 1e-12);
        assertEquals("beyond a limit (×)", marks.getSeriesKey(2));
        assertEquals("cannot be evaluated (×)", marks.getSeriesKey(3));
    }

    /** The pixel at a data point (in plotted units), from a point a few pixels inside its cell. */
    private static int pixel(BufferedImage image, XYPlot plot, java.awt.geom.Rectangle2D area, double x, double y,
                             int offset) {
        double px = plot.getDomainAxis().valueToJava2D(x, area, RectangleEdge.BOTTOM);
        double py = plot.getRangeAxis().valueToJava2D(y, area, RectangleEdge.LEFT);
        return image.getRGB((int) px + 12 + offset, (int) py - 12 - offset);
    }

    private static double lightness(int rgb) {
        return 0.3 * ((rgb >> 16) & 0xFF) + 0.59 * ((rgb >> 8) & 0xFF) + 0.11 * (rgb & 0xFF);
    }

    @Test
    void contourLinesLieWhereTheObjectiveTakesTheirLevel() {
        PlanGrid g = PlanGrid.of(outcome(F, R), 0, 1);
        List<double[]> segments = new ArrayList<>();
        PlanCharts.objectiveMap(g, segments);
        assertTrue(segments.size() >= 6, "contour segments drawn: " + segments.size());
        List<Double> levels = PlanCharts.levels(1.0 + 1e-9, 100 * objective(1e5, 1.6e-5));
        assertTrue(levels.contains(2.0) && levels.contains(5.0), levels.toString());
        for (double[] s : segments) {
            for (int e = 0; e < 4; e += 2) {
                double v = 100 * objective(s[e] * 1e6, s[e + 1] * 1e-6);
                double nearest = levels.stream().min((a, b) -> Double.compare(Math.abs(Math.log(a / v)),
                        Math.abs(Math.log(b / v)))).orElseThrow();
                // linear interpolation of ln σ between grid points of a quadratic bowl: within 25 % of the level
                assertEquals(nearest, v, 0.25 * nearest, "segment end at " + s[e] + " MHz, " + s[e + 1] + " µm");
            }
        }
    }

    @Test
    void axesAreInTheTradesUnitsAndLogarithmicForLogSpacedKeys() {
        JFreeChart chart = PlanCharts.objectiveMap(PlanGrid.of(outcome(F, R), 0, 1));
        XYPlot plot = chart.getXYPlot();
        assertInstanceOf(LogAxis.class, plot.getDomainAxis());
        assertEquals("measurement.modulation_hz (MHz)", plot.getDomainAxis().getLabel());
        assertInstanceOf(LogAxis.class, plot.getRangeAxis());
        assertEquals("geometry.pump_radius_m (µm)", plot.getRangeAxis().getLabel());
        double[] thickness = {5e-8, 6e-8, 7e-8, 8e-8};
        PlanOutcome linear = outcome(F, thickness);
        PlanOutcome renamed = new PlanOutcome(linear.objective(), linear.targets(),
                List.of("measurement.modulation_hz", "layers.transducer.thickness_m"), List.of(), List.of(),
                linear.baseline(), linear.plans(), List.of());
        XYPlot p2 = PlanCharts.objectiveMap(PlanGrid.of(renamed, 0, 1)).getXYPlot();
        assertInstanceOf(NumberAxis.class, p2.getRangeAxis());
        assertEquals("layers.transducer.thickness_m (nm)", p2.getRangeAxis().getLabel());
        assertFalse(PlanGrid.logSpaced(thickness));
        assertTrue(PlanGrid.logSpaced(R));
    }

    @Test
    void theSvgParsesAndCarriesTheColourBarWithItsUnit() throws Exception {
        JFreeChart chart = PlanCharts.objectiveMap(PlanGrid.of(outcome(F, R), 0, 1));
        String svg = PlanCharts.svg(chart, 960, 720);
        var doc = DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new InputSource(new StringReader(svg)));
        assertEquals("svg", doc.getDocumentElement().getNodeName());
        assertTrue(doc.getElementsByTagName("text").getLength() > 10, "labels kept as text");
        assertTrue(svg.contains("the largest relative σ of the targets (%)"), "colour bar label with its unit");
        assertTrue(svg.contains("2 %") && svg.contains("5 %"), "contour labels");
        byte[] bytes = PlanCharts.png(chart, 960, 720);
        // kept for a look at the picture: target/plan-charts/objective.png
        java.nio.file.Files.createDirectories(java.nio.file.Path.of("target/plan-charts"));
        java.nio.file.Files.write(java.nio.file.Path.of("target/plan-charts/objective.png"), bytes);
        BufferedImage png = ImageIO.read(new ByteArrayInputStream(bytes));
        assertEquals(960, png.getWidth());
        assertEquals(720, png.getHeight());
    }

    /** A third key is held at the best plan's value; a key measured only together is not mappable. */
    @Test
    void aMapIsASliceThroughTheBestPlan() {
        List<PlannedResult> plans = new ArrayList<>();
        for (double x : F) {
            for (double y : R) {
                for (double t : new double[] {6e-8, 9e-8}) {
                    plans.add(plan(values(x, y, t), objective(x, y) * (t > 7e-8 ? 1.5 : 1), PlannedResult.Status.RANKED));
                }
            }
        }
        plans.add(plan(List.of(1e6, 4e-6, List.of(6e-8, 9e-8)), 0.001, PlannedResult.Status.RANKED));
        plans.sort((a, b) -> Double.compare(a.objective(), b.objective()));
        PlanOutcome o = new PlanOutcome("the largest relative σ of the targets", List.of("film.k_through_w_mk"),
                List.of("measurement.modulation_hz", "geometry.pump_radius_m", "layers.film.thickness_m"), List.of(),
                List.of(), plan(values(1e6, 1e-5, 6e-8), 0.02, PlannedResult.Status.BASELINE), plans, List.of());
        assertEquals(List.of(0, 1, 2), PlanGrid.mappable(o));
        PlanGrid g = PlanGrid.of(o, 0, 1);
        assertEquals(6e-8, (Double) g.best().values().get(2), "held at the best plan with single values");
        assertEquals(List.of("layers.film.thickness_m = 60 nm"), g.held());
        for (int i = 0; i < F.length; i++) {
            for (int j = 0; j < R.length; j++) {
                assertNotNull(g.at(i, j));
                assertEquals(objective(F[i], R[j]), g.at(i, j).objective(), 1e-15);
            }
        }
        assertThrows(IllegalArgumentException.class, () -> PlanGrid.of(o, 0, 0));
    }

    @Test
    void sensitivityCurvesDrawEveryInputThatMatters() throws Exception {
        double[] x = {1e-10, 3e-10, 1e-9, 3e-9};
        SensitivityTable t = new SensitivityTable("delay_s", x, "ratio", false,
                List.of(ParameterRef.layer("film", "k_through_w_mk"), ParameterRef.geometry("pump_radius_m"),
                        ParameterRef.layer("substrate", "heat_capacity_j_m3k")), List.of("", "", ""),
                new double[][] {{-0.4, -0.5, -0.6, -0.5}, {0.1, 0.2, 0.3, 0.4}, {0.001, 0.002, 0.001, 0.0}});
        JFreeChart chart = PlanCharts.sensitivity("Sensitivities of the best plan",
                List.of(new PlannedSensitivity("dataset 0", t)));
        XYPlot plot = chart.getXYPlot();
        assertEquals(2, plot.getDataset().getSeriesCount(), "the substrate's heat capacity is below 5 % of the largest");
        assertEquals("delay_s (ns)", plot.getDomainAxis().getLabel());
        assertInstanceOf(LogAxis.class, plot.getDomainAxis());
        assertEquals(0.3, plot.getDataset().getXValue(0, 1), 1e-12, "ns");
        DocumentBuilderFactory.newInstance().newDocumentBuilder()
                .parse(new InputSource(new StringReader(PlanCharts.svg(chart, 900, 600))));
    }
}
