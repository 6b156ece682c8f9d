package lamella.ui.charts;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.RGB;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ChartBridgeTest {

    @Test
    void pixelsKeepTheirColourAcrossTheBridge() {
        BufferedImage img = new BufferedImage(3, 2, BufferedImage.TYPE_INT_RGB);
        img.setRGB(0, 0, 0xC45A12);
        img.setRGB(2, 1, 0x1F5FA8);
        ImageData d = SwtImages.of(img);
        assertEquals(new RGB(0xC4, 0x5A, 0x12), d.palette.getRGB(d.getPixel(0, 0)));
        assertEquals(new RGB(0x1F, 0x5F, 0xA8), d.palette.getRGB(d.getPixel(2, 1)));
        assertEquals(new RGB(0, 0, 0), d.palette.getRGB(d.getPixel(1, 0)));
    }

    @Test
    void theReadoutTakesTheUnitFromTheAxisLabel() {
        assertEquals("Hz", AxisReading.unitOf("modulation frequency (Hz)"));
        assertEquals("W/(m K)", AxisReading.unitOf("conductivity (W/(m K))"));
        assertEquals("", AxisReading.unitOf("ratio −V_in/V_out (dimensionless)"));
        assertEquals("phase = −12.35 °", AxisReading.reading("phase", -12.3456, "°"));
        assertEquals("f = 1.235×10⁶ Hz", AxisReading.reading("f", 1.2345e6, "Hz"));
        assertEquals("t = 2.000×10⁻⁹ s", AxisReading.reading("t", 2e-9, "s"));
    }

    /** The Sensitivity panel's y label in a plot as short as a third of a 1280 × 800 window gives it. */
    @Test
    void anAxisLabelLongerThanItsSideIsDrawnSmallerAndWholeAgainWithRoom() {
        XYSeries s = new XYSeries("model");
        s.add(1e-10, 0.3);
        s.add(4e-9, -0.6);
        String label = "S = ∂ln(signal)/∂ln p (dimensionless)";
        XYPlot plot = new XYPlot(new XYSeriesCollection(s), PlotLook.xAxis("pump-probe delay (s)", true,
                new double[] {1e-10, 4e-9}), PlotLook.linear(label), new XYLineAndShapeRenderer(true, false));
        JFreeChart chart = PlotLook.chart(null, plot, true);
        java.awt.Font own = plot.getRangeAxis().getLabelFont();
        AxisLabelFit fit = new AxisLabelFit();
        org.jfree.chart.ChartRenderingInfo info = new org.jfree.chart.ChartRenderingInfo();
        java.awt.Graphics2D g = new BufferedImage(440, 300, BufferedImage.TYPE_INT_RGB).createGraphics();
        fit.draw(chart, g, new java.awt.geom.Rectangle2D.Double(0, 0, 440, 300), info);
        double side = info.getPlotInfo().getDataArea().getHeight();
        java.awt.Font drawn = plot.getRangeAxis().getLabelFont();
        assertTrue(g.getFontMetrics(own).stringWidth(label) > side, "the label at its own size is cut at " + side);
        assertTrue(drawn.getSize() < own.getSize() && drawn.getSize() >= AxisLabelFit.LEAST_SIZE, drawn.toString());
        assertTrue(g.getFontMetrics(drawn).stringWidth(label) <= side, "the smaller label fits " + side + " px");
        assertEquals(own, plot.getDomainAxis().getLabelFont(), "a label that fits keeps its size");
        fit.draw(chart, g, new java.awt.geom.Rectangle2D.Double(0, 0, 900, 700), info);
        assertEquals(own, plot.getRangeAxis().getLabelFont(), "with room the label is drawn at its own size again");
        g.dispose();
    }

    @Test
    void exportsAreCompleteFilesAndLeaveNoPartsBehind(@TempDir Path dir) throws Exception {
        XYSeries s = new XYSeries("model");
        s.add(1e3, -2.0);
        s.add(1e6, -30.0);
        XYPlot plot = new XYPlot(new XYSeriesCollection(s), PlotLook.xAxis("modulation frequency (Hz)", true,
                new double[] {1e3, 1e6}), PlotLook.linear("phase (°)"), new XYLineAndShapeRenderer(true, false));
        JFreeChart chart = PlotLook.chart(null, plot, true);
        ChartFiles.png(chart, 400, 300, dir.resolve("p.png"));
        ChartFiles.svg(chart, 400, 300, dir.resolve("p.svg"));
        byte[] png = Files.readAllBytes(dir.resolve("p.png"));
        assertEquals((byte) 0x89, png[0]);
        assertEquals('P', png[1]);
        String svg = Files.readString(dir.resolve("p.svg"));
        assertTrue(svg.contains("<svg") && svg.trim().endsWith("</svg>"), "a whole SVG document");
        assertTrue(svg.contains("modulation frequency (Hz)"), "axis labels kept as text");
        try (var files = Files.list(dir)) {
            assertEquals(2, files.count(), "no temporary files left");
        }
    }
}
