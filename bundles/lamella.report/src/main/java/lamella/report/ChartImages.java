package lamella.report;

import java.awt.Rectangle;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import org.jfree.chart.ChartUtils;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.text.TextUtils;
import org.jfree.svg.SVGGraphics2D;

/** A chart drawn at the report's plot size, as PNG (for the page and slides) and as SVG (for print and papers). */
final class ChartImages {

    static final int WIDTH = 960;
    static final int HEIGHT = 600;

    static {
        // JFreeChart draws rotated text (every axis label) as glyph outlines by default, a workaround for JDKs
        // long gone; SVG then holds paths instead of searchable, selectable text. Java 17 needs no workaround.
        // The switch is JFreeChart-wide, which is what any other user of the charts bundle wants as well.
        TextUtils.setUseDrawRotatedStringWorkaround(false);
    }

    private ChartImages() {
    }

    static byte[] png(JFreeChart chart) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ChartUtils.writeChartAsPNG(out, chart, WIDTH, HEIGHT);
        } catch (IOException e) {
            throw new UncheckedIOException("a PNG encoder failed writing to memory", e);
        }
        return out.toByteArray();
    }

    /**
     * A standalone SVG document. Written without the SVG 1.0 document type that JFreeSVG's own document carries,
     * because that points to a DTD on the web, which a careful XML reader refuses to fetch and then fails on.
     */
    static String svg(JFreeChart chart) {
        SVGGraphics2D g = new SVGGraphics2D(WIDTH, HEIGHT);
        chart.draw(g, new Rectangle(0, 0, WIDTH, HEIGHT));
        return "<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n" + g.getSVGElement() + "\n";
    }
}
