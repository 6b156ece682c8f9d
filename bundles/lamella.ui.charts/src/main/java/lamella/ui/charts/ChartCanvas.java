package lamella.ui.charts;

import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.util.function.BiConsumer;
import java.util.function.BiFunction;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Path;
import lamella.api.FileProblems;
import org.eclipse.swt.SWT;
import org.eclipse.swt.events.MouseEvent;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.MessageBox;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.event.ChartChangeListener;
import org.jfree.chart.plot.Pannable;
import org.jfree.chart.plot.PlotRenderingInfo;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.plot.Zoomable;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleEdge;

/**
 * A JFreeChart drawn into an SWT canvas, redrawn when the chart changes or the canvas is resized. The wheel or a
 * dragged rectangle zooms, a right- or shift-drag pans, a double-click restores the automatic ranges; the line
 * below reads x and y under the cursor in the axes' units; the right-click menu exports PNG or SVG.
 */
public final class ChartCanvas extends Composite {

    private static final int MIN_EXPORT_WIDTH = 800;
    private static final int MIN_EXPORT_HEIGHT = 500;
    private static final double WHEEL_ZOOM = 0.8;
    private static final int DRAG_THRESHOLD = 4;
    /** Below this many pixels in either direction nothing is drawn but the background. */
    static final int SMALLEST = 60;
    private static final String HINT = "wheel or drag: zoom · right- or shift-drag: pan · double-click: reset ·"
            + " right-click: export";

    private final Canvas canvas;
    private final Label readout;
    private final ChartChangeListener changes = e -> stale();
    private final ChartRenderingInfo info = new ChartRenderingInfo();
    private final AxisLabelFit labels = new AxisLabelFit();
    private JFreeChart chart;
    private Image image;
    private boolean stale = true;
    private Point dragStart;
    private Point dragNow;
    private boolean panning;
    private boolean dragged;
    private BiFunction<Double, Double, String> reading;
    private BiConsumer<Double, Double> click;

    public ChartCanvas(Composite parent, int style) {
        super(parent, style);
        GridLayout layout = new GridLayout(1, false);
        layout.marginWidth = 0;
        layout.marginHeight = 0;
        layout.verticalSpacing = 2;
        setLayout(layout);
        canvas = new Canvas(this, SWT.NO_BACKGROUND | SWT.DOUBLE_BUFFERED);
        canvas.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        // Wrapped, so that a narrow plot shows the whole hint and reading on more lines instead of cutting them.
        readout = new Label(this, SWT.WRAP);
        GridData rd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        rd.widthHint = SMALLEST;
        readout.setLayoutData(rd);
        readout.setText(HINT);
        canvas.addPaintListener(e -> paint(e.gc));
        canvas.addListener(SWT.Resize, e -> stale());
        canvas.addMouseListener(new org.eclipse.swt.events.MouseAdapter() {
            @Override
            public void mouseDown(MouseEvent e) {
                pressed(e);
            }

            @Override
            public void mouseUp(MouseEvent e) {
                released(e);
            }

            @Override
            public void mouseDoubleClick(MouseEvent e) {
                restoreRanges(e);
            }
        });
        canvas.addMouseMoveListener(this::moved);
        canvas.addMouseWheelListener(this::wheel);
        canvas.addListener(SWT.MouseExit, e -> read(HINT));
        addDisposeListener(e -> {
            if (chart != null) {
                chart.removeChangeListener(changes);
            }
            if (image != null) {
                image.dispose();
            }
        });
    }

    /**
     * More words for the read-out line at the point under the cursor, given its x and y in the axes' values (the
     * Map panel names the position and its value there); null or an empty answer adds nothing.
     */
    public void setReading(BiFunction<Double, Double, String> more) {
        reading = more;
    }

    /** Hears a left click (pressed and released without a drag) inside the data area, at x and y in axes' values. */
    public void onClick(BiConsumer<Double, Double> listener) {
        click = listener;
    }

    /** Shows a chart (null: an empty canvas); the canvas follows its changes until another replaces it. */
    public void setChart(JFreeChart next) {
        if (chart != null) {
            chart.removeChangeListener(changes);
        }
        chart = next;
        labels.clear();
        if (chart != null) {
            chart.addChangeListener(changes);
        }
        stale();
    }

    public JFreeChart chart() {
        return chart;
    }

    /** The chart as drawn now, at the canvas's size, for tests and screenshots of the plot alone. */
    public BufferedImage render() {
        Rectangle r = canvas.getClientArea();
        return draw(Math.max(r.width, 1), Math.max(r.height, 1));
    }

    private void stale() {
        stale = true;
        if (!canvas.isDisposed()) {
            canvas.redraw();
        }
    }

    private void paint(GC gc) {
        Rectangle r = canvas.getClientArea();
        if (r.width <= 0 || r.height <= 0) {
            return;
        }
        if (chart == null) {
            gc.setBackground(getDisplay().getSystemColor(SWT.COLOR_WHITE));
            gc.fillRectangle(r);
            return;
        }
        if (stale || image == null || image.getBounds().width != r.width || image.getBounds().height != r.height) {
            if (image != null) {
                image.dispose();
            }
            image = new Image(getDisplay(), SwtImages.of(draw(r.width, r.height)));
            stale = false;
        }
        gc.drawImage(image, 0, 0);
        if (dragStart != null && dragNow != null && !panning) {
            gc.setForeground(getDisplay().getSystemColor(SWT.COLOR_DARK_BLUE));
            gc.setLineStyle(SWT.LINE_DASH);
            gc.drawRectangle(Math.min(dragStart.x, dragNow.x), Math.min(dragStart.y, dragNow.y),
                    Math.abs(dragNow.x - dragStart.x), Math.abs(dragNow.y - dragStart.y));
        }
    }

    private BufferedImage draw(int width, int height) {
        BufferedImage img = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        try {
            if (width < SMALLEST || height < SMALLEST) {
                // Too small for axes and a plot: JFreeChart would lay out negative sizes. Leave it blank.
                g.setColor(java.awt.Color.WHITE);
                g.fillRect(0, 0, width, height);
                return img;
            }
            placeLegend(width, height);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            labels.draw(chart, g, new Rectangle2D.Double(0, 0, width, height), info);
        } finally {
            g.dispose();
        }
        return img;
    }

    /** A long legend goes beside a wide plot, so that it does not squeeze the plot's height; else below it. */
    private void placeLegend(int width, int height) {
        LegendTitle legend = chart.getLegend();
        if (legend == null) {
            return;
        }
        int items = chart.getPlot().getLegendItems() == null ? 0 : chart.getPlot().getLegendItems().getItemCount();
        RectangleEdge edge = items > 4 && width > 1.6 * height && width > 700 ? RectangleEdge.RIGHT
                : RectangleEdge.BOTTOM;
        if (legend.getPosition() != edge) {
            legend.setNotify(false);
            legend.setPosition(edge);
            legend.setNotify(true);
        }
    }

    private Rectangle2D dataArea() {
        return info.getPlotInfo().getDataArea();
    }

    private PlotRenderingInfo plotInfo() {
        return info.getPlotInfo();
    }

    private void pressed(MouseEvent e) {
        if (chart == null || !dataArea().contains(e.x, e.y)) {
            return;
        }
        boolean pan = e.button == 3 || (e.button == 1 && (e.stateMask & SWT.SHIFT) != 0);
        if (e.button == 1 || pan) {
            dragStart = new Point(e.x, e.y);
            dragNow = dragStart;
            panning = pan;
            dragged = false;
        }
    }

    private void moved(MouseEvent e) {
        showReading(e.x, e.y);
        if (dragStart == null) {
            return;
        }
        if (Math.abs(e.x - dragStart.x) + Math.abs(e.y - dragStart.y) > DRAG_THRESHOLD) {
            dragged = true;
        }
        if (panning && dragged && chart.getPlot() instanceof Pannable p) {
            Rectangle2D area = dataArea();
            Point2D at = new Point2D.Double(e.x, e.y);
            if (p.isDomainPannable()) {
                p.panDomainAxes(-(e.x - dragNow.x) / area.getWidth(), plotInfo(), at);
            }
            if (p.isRangePannable()) {
                p.panRangeAxes((e.y - dragNow.y) / area.getHeight(), plotInfo(), at);
            }
        }
        dragNow = new Point(e.x, e.y);
        if (!panning) {
            canvas.redraw();
        }
    }

    private void released(MouseEvent e) {
        Point start = dragStart;
        boolean wasPan = panning;
        boolean moved = dragged;
        dragStart = null;
        dragNow = null;
        panning = false;
        dragged = false;
        if (e.button == 3 && !moved) {
            exportMenu(e);
            return;
        }
        if (e.button == 1 && start != null && !wasPan && !moved && click != null
                && chart.getPlot() instanceof XYPlot plot) {
            Rectangle2D area = dataArea();
            click.accept(plot.getDomainAxis().java2DToValue(e.x, area, plot.getDomainAxisEdge()),
                    plot.getRangeAxis().java2DToValue(e.y, area, plot.getRangeAxisEdge()));
        }
        if (start == null || wasPan || !moved || !(chart.getPlot() instanceof Zoomable z)) {
            canvas.redraw();
            return;
        }
        Rectangle2D area = dataArea();
        double x0 = clamp((Math.min(start.x, e.x) - area.getX()) / area.getWidth());
        double x1 = clamp((Math.max(start.x, e.x) - area.getX()) / area.getWidth());
        double y0 = clamp((area.getMaxY() - Math.max(start.y, e.y)) / area.getHeight());
        double y1 = clamp((area.getMaxY() - Math.min(start.y, e.y)) / area.getHeight());
        Point2D at = new Point2D.Double(e.x, e.y);
        if (x1 > x0 && z.isDomainZoomable()) {
            z.zoomDomainAxes(x0, x1, plotInfo(), at);
        }
        if (y1 > y0 && z.isRangeZoomable()) {
            z.zoomRangeAxes(y0, y1, plotInfo(), at);
        }
    }

    /** A fraction of the data area, kept inside it: a drag that leaves the plot zooms to its edge. */
    private static double clamp(double f) {
        return Math.max(0, Math.min(1, f));
    }

    private void wheel(MouseEvent e) {
        if (chart == null || !(chart.getPlot() instanceof Zoomable z) || !dataArea().contains(e.x, e.y)) {
            return;
        }
        double factor = e.count > 0 ? WHEEL_ZOOM : 1 / WHEEL_ZOOM;
        Point2D at = new Point2D.Double(e.x, e.y);
        if (z.isDomainZoomable()) {
            z.zoomDomainAxes(factor, plotInfo(), at, true);
        }
        if (z.isRangeZoomable()) {
            z.zoomRangeAxes(factor, plotInfo(), at, true);
        }
    }

    /** A factor of 0 makes JFreeChart's axes return to their automatic ranges. */
    private void restoreRanges(MouseEvent e) {
        if (chart != null && e.button == 1 && chart.getPlot() instanceof Zoomable z) {
            Point2D at = new Point2D.Double(e.x, e.y);
            z.zoomDomainAxes(0, plotInfo(), at);
            z.zoomRangeAxes(0, plotInfo(), at);
        }
    }

    private void showReading(int px, int py) {
        if (chart == null || !(chart.getPlot() instanceof XYPlot plot) || !dataArea().contains(px, py)) {
            read(HINT);
            return;
        }
        Rectangle2D area = dataArea();
        double x = plot.getDomainAxis().java2DToValue(px, area, plot.getDomainAxisEdge());
        double y = plot.getRangeAxis().java2DToValue(py, area, plot.getRangeAxisEdge());
        String xl = plot.getDomainAxis().getLabel();
        String yl = plot.getRangeAxis().getLabel();
        String more = reading == null ? null : reading.apply(x, y);
        read(AxisReading.reading(nameOf(xl), x, AxisReading.unitOf(xl)) + "     "
                + AxisReading.reading(nameOf(yl), y, AxisReading.unitOf(yl))
                + (more == null || more.isEmpty() ? "" : "     " + more));
    }

    /** Shows a reading, laying the plot out again only when it needs another number of lines. */
    private void read(String text) {
        if (text.equals(readout.getText())) {
            return;
        }
        readout.setText(text);
        Point size = readout.getSize();
        if (size.x > 0 && readout.computeSize(size.x, SWT.DEFAULT).y != size.y) {
            layout(true);
        }
    }

    private static String nameOf(String label) {
        if (label == null) {
            return "value";
        }
        int open = label.lastIndexOf(" (");
        return open > 0 ? label.substring(0, open) : label;
    }

    private void exportMenu(MouseEvent e) {
        if (chart == null) {
            return;
        }
        Menu menu = new Menu(canvas);
        MenuItem png = new MenuItem(menu, SWT.PUSH);
        png.setText("Export as PNG image…");
        png.addListener(SWT.Selection, ev -> export("png"));
        MenuItem svg = new MenuItem(menu, SWT.PUSH);
        svg.setText("Export as SVG drawing…");
        svg.addListener(SWT.Selection, ev -> export("svg"));
        menu.addListener(SWT.Hide, ev -> getDisplay().asyncExec(menu::dispose));
        menu.setLocation(canvas.toDisplay(e.x, e.y));
        menu.setVisible(true);
    }

    private void export(String kind) {
        FileDialog d = new FileDialog(getShell(), SWT.SAVE);
        d.setFilterExtensions(new String[] {"*." + kind});
        d.setFilterNames(new String[] {kind.toUpperCase() + " (*." + kind + ")"});
        d.setFileName("plot." + kind);
        d.setOverwrite(true);
        String chosen = d.open();
        if (chosen == null) {
            return;
        }
        Path target = Path.of(chosen.endsWith("." + kind) ? chosen : chosen + "." + kind);
        Rectangle r = canvas.getClientArea();
        int w = Math.max(r.width, MIN_EXPORT_WIDTH);
        int h = Math.max(r.height, MIN_EXPORT_HEIGHT);
        // An export is at least as large as the fonts were made for; the canvas fits its labels again when painted.
        labels.restore();
        try {
            if (kind.equals("png")) {
                ChartFiles.png(chart, w, h, target);
            } else {
                ChartFiles.svg(chart, w, h, target);
            }
        } catch (IOException | RuntimeException ex) {
            MessageBox box = new MessageBox(getShell(), SWT.ICON_ERROR | SWT.OK);
            box.setText("Export failed");
            box.setMessage("Could not write " + target + ": " + (ex instanceof IOException io ? FileProblems.reason(io)
                    : ex.getMessage()));
            box.open();
        }
    }
}
