package lamella.ui.charts;

import java.awt.Rectangle;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import lamella.api.AtomicText;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.svg.SVGGraphics2D;

/** Writes a chart as PNG or SVG; the file appears only once it is complete (temporary file, then move). */
public final class ChartFiles {

    private ChartFiles() {
    }

    public static void png(JFreeChart chart, int width, int height, Path target) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ChartUtils.writeChartAsPNG(out, chart, width, height);
        write(target, out.toByteArray());
    }

    /** Without the SVG 1.0 document type, which names a DTD on the web that careful XML readers refuse to fetch. */
    public static void svg(JFreeChart chart, int width, int height, Path target) throws IOException {
        SVGGraphics2D g = new SVGGraphics2D(width, height);
        chart.draw(g, new Rectangle(0, 0, width, height));
        String text = "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + g.getSVGElement() + "\n";
        write(target, text.getBytes(StandardCharsets.UTF_8));
    }

    private static void write(Path target, byte[] bytes) throws IOException {
        AtomicText.writeBytes(target, bytes);
    }
}
