package lamella.ui.charts;

import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.IdentityHashMap;
import java.util.Map;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.plot.XYPlot;

/**
 * Axis labels that are read in full: a label longer than its side of the data area is drawn in a smaller font, down
 * to {@link #LEAST_SIZE}, and at the chart's own size again when the plot has room. JFreeChart itself cuts such a
 * label at the plot's edge (a y label of a short plot loses its unit).
 */
final class AxisLabelFit {

    /** Points; smaller than this a label is hard to read, and it is cut instead. */
    static final int LEAST_SIZE = 9;

    /** Each axis's label font as the chart came, by identity (axes are mutable and compare by value). */
    private final Map<Axis, Font> whole = new IdentityHashMap<>();

    /** Draws the chart, and draws it again when a label had to change its size to fit. */
    void draw(JFreeChart chart, Graphics2D g, Rectangle2D area, ChartRenderingInfo info) {
        chart.draw(g, area, info);
        if (fit(chart, g, info.getPlotInfo().getDataArea())) {
            chart.draw(g, area, info);
        }
    }

    /** Gives every axis its own label font back, for an export drawn at another size. */
    void restore() {
        whole.forEach((axis, font) -> {
            if (!font.equals(axis.getLabelFont())) {
                axis.setLabelFont(font);
            }
        });
    }

    /** Forgets the axes of a chart no longer shown. */
    void clear() {
        whole.clear();
    }

    /** True when a label's font changed. */
    boolean fit(JFreeChart chart, Graphics2D g, Rectangle2D data) {
        if (!(chart.getPlot() instanceof XYPlot plot) || data.getWidth() <= 0 || data.getHeight() <= 0) {
            return false;
        }
        boolean changed = false;
        for (int i = 0; i < plot.getRangeAxisCount(); i++) {
            changed |= fit(plot.getRangeAxis(i), data.getHeight(), g);
        }
        for (int i = 0; i < plot.getDomainAxisCount(); i++) {
            changed |= fit(plot.getDomainAxis(i), data.getWidth(), g);
        }
        return changed;
    }

    private boolean fit(Axis axis, double room, Graphics2D g) {
        if (axis == null || !axis.isVisible() || axis.getLabel() == null || axis.getLabel().isEmpty()) {
            return false;
        }
        Font own = whole.computeIfAbsent(axis, Axis::getLabelFont);
        int size = own.getSize();
        while (size > LEAST_SIZE && g.getFontMetrics(own.deriveFont((float) size)).stringWidth(axis.getLabel())
                > room) {
            size--;
        }
        Font fitting = size == own.getSize() ? own : own.deriveFont((float) size);
        if (fitting.equals(axis.getLabelFont())) {
            return false;
        }
        axis.setLabelFont(fitting);
        return true;
    }
}
