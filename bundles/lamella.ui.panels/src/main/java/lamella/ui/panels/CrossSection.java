package lamella.ui.panels;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import lamella.api.Layer;
import lamella.api.Stack;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Color;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.RGB;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Canvas;
import org.eclipse.swt.widgets.Composite;

/**
 * A drawing of the stack from the heated surface down: each layer's height grows with the logarithm of its
 * thickness, so a 10 nm interlayer and a 100 µm substrate both stay visible; boundary conductances are marked
 * at their interfaces.
 */
final class CrossSection {

    private static final RGB[] FILLS = {new RGB(0xD9, 0xE4, 0xF1), new RGB(0xF3, 0xE1, 0xD0),
            new RGB(0xDC, 0xEE, 0xE0), new RGB(0xEA, 0xDD, 0xEC), new RGB(0xF4, 0xEC, 0xC9)};
    private static final int SEMI_INFINITE_WEIGHT = 90;
    private static final int MARGIN = 12;

    private final Canvas canvas;
    private Stack stack;

    CrossSection(Composite parent) {
        canvas = new Canvas(parent, SWT.DOUBLE_BUFFERED);
        canvas.addPaintListener(e -> paint(e.gc));
        canvas.addListener(SWT.Resize, e -> canvas.redraw());
    }

    Canvas control() {
        return canvas;
    }

    void show(Stack s) {
        stack = s;
        canvas.redraw();
    }

    /** 1 nm weighs 14, every decade 16 more: heights on a log-ish thickness scale. */
    private static double weight(Layer l) {
        if (l.isSemiInfinite()) {
            return SEMI_INFINITE_WEIGHT;
        }
        double nm = l.thickness() / 1e-9;
        return Math.max(14, 14 + 16 * Math.log10(Math.max(nm, 1)));
    }

    private void paint(GC gc) {
        Rectangle r = canvas.getClientArea();
        gc.setBackground(canvas.getDisplay().getSystemColor(SWT.COLOR_WHITE));
        gc.fillRectangle(r);
        gc.setAntialias(SWT.ON);
        gc.setTextAntialias(SWT.ON);
        gc.setForeground(canvas.getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
        int lineHeight = gc.getFontMetrics().getHeight();
        boolean inside = stack != null && stack.heatsBothWays();
        String top = inside ? "heated and read at the marked plane inside the stack; top: " + stack.top().caseName()
                : "heating and probing from above ↓";
        gc.drawText(top, MARGIN, MARGIN, true);
        if (stack == null) {
            return;
        }
        // From the top of the drawing down: the layers above the plane outermost first, then those below it. Each
        // layer's conductance is at its lower edge, which for a layer above is its interface toward the plane.
        List<Layer> layers = new ArrayList<>(stack.above());
        Collections.reverse(layers);
        int plane = layers.size();
        layers.addAll(stack.layers());
        double total = layers.stream().mapToDouble(CrossSection::weight).sum();
        int y = MARGIN + lineHeight + 6;
        int available = r.height - y - lineHeight - 2 * MARGIN;
        int x = MARGIN;
        int width = Math.max(r.width - 2 * MARGIN, 40);
        int[] interfaces = new int[layers.size()];
        int planeY = y;
        for (int i = 0; i < layers.size(); i++) {
            Layer l = layers.get(i);
            if (i == plane) {
                planeY = y;
            }
            int h = (int) Math.max(lineHeight + 4, Math.round(available * weight(l) / total));
            Color fill = new Color(canvas.getDisplay(), FILLS[i % FILLS.length]);
            gc.setBackground(fill);
            gc.fillRectangle(x, y, width, h);
            fill.dispose();
            gc.setForeground(canvas.getDisplay().getSystemColor(SWT.COLOR_GRAY));
            gc.drawRectangle(x, y, width, h);
            gc.setForeground(canvas.getDisplay().getSystemColor(SWT.COLOR_BLACK));
            String text = l.name() + " — " + thickness(l) + ", Λ " + NumberText.format(l.kThrough()) + " W/(m K)";
            Point ext = gc.textExtent(text);
            gc.drawText(text, x + Math.max(6, (width - ext.x) / 2), y + (h - ext.y) / 2, true);
            y += h;
            interfaces[i] = y;
        }
        // The plane first, so that the conductance of the interface there keeps its label on top.
        if (inside) {
            gc.setForeground(canvas.getDisplay().getSystemColor(SWT.COLOR_DARK_YELLOW));
            gc.setLineWidth(3);
            gc.setLineStyle(SWT.LINE_DASH);
            gc.drawLine(x, planeY, x + width, planeY);
            gc.setLineStyle(SWT.LINE_SOLID);
            gc.setLineWidth(1);
            String mark = "heated and read plane";
            Point me = gc.textExtent(mark);
            gc.setBackground(canvas.getDisplay().getSystemColor(SWT.COLOR_WHITE));
            gc.fillRectangle(x + 4, planeY - me.y / 2 - 1, me.x + 8, me.y + 2);
            gc.drawRectangle(x + 4, planeY - me.y / 2 - 1, me.x + 8, me.y + 2);
            gc.drawText(mark, x + 8, planeY - me.y / 2, true);
        }
        // Conductance marks go on last, so that no layer below paints over its interface's label.
        for (int i = 0; i < layers.size(); i++) {
            Layer l = layers.get(i);
            if (l.hasPerfectContactBelow()) {
                continue;
            }
            int at = interfaces[i];
            gc.setForeground(canvas.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
            gc.setLineWidth(3);
            gc.drawLine(x, at, x + width, at);
            gc.setLineWidth(1);
            String g = "G " + NumberText.format(l.conductanceBelow() / 1e6) + " MW/(m² K)";
            Point ge = gc.textExtent(g);
            gc.setBackground(canvas.getDisplay().getSystemColor(SWT.COLOR_WHITE));
            gc.fillRectangle(x + width - ge.x - 12, at - ge.y / 2 - 1, ge.x + 8, ge.y + 2);
            gc.drawRectangle(x + width - ge.x - 12, at - ge.y / 2 - 1, ge.x + 8, ge.y + 2);
            gc.drawText(g, x + width - ge.x - 8, at - ge.y / 2, true);
        }
        gc.setForeground(canvas.getDisplay().getSystemColor(SWT.COLOR_DARK_GRAY));
        gc.drawText("heights on a logarithmic thickness scale", MARGIN, r.height - MARGIN - lineHeight, true);
    }

    private static String thickness(Layer l) {
        if (l.isSemiInfinite()) {
            return "semi-infinite";
        }
        double nm = l.thickness() / 1e-9;
        return nm >= 10_000 ? NumberText.format(nm / 1000) + " µm" : NumberText.format(nm) + " nm";
    }
}
