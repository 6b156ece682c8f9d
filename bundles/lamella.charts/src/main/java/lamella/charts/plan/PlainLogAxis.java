package lamella.charts.plan;

import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import lamella.charts.DecadeAxis;
import org.jfree.chart.axis.AxisState;
import org.jfree.chart.axis.LogAxis;
import org.jfree.chart.axis.NumberTick;
import org.jfree.chart.axis.Tick;
import org.jfree.chart.ui.RectangleEdge;

/**
 * A log axis ticked as {@link DecadeAxis} ticks (which it asks), labelled with plain numbers (1, 2, 5, 10, 20)
 * where they read better than powers of ten: on an axis of values between 0.001 and 10 000, such as MHz, µm or per
 * cent.
 */
final class PlainLogAxis extends LogAxis {

    private final DecadeAxis decades = new DecadeAxis("");

    PlainLogAxis(String label) {
        super(label);
        setMinorTickMarksVisible(true);
    }

    @Override
    @SuppressWarnings({"rawtypes", "unchecked"})
    public List refreshTicks(Graphics2D g2, AxisState state, Rectangle2D dataArea, RectangleEdge edge) {
        decades.setRange(getRange(), false, false);
        List ticks = decades.refreshTicks(g2, state, dataArea, edge);
        if (!(getLowerBound() >= 1e-3 && getUpperBound() <= 1e4)) {
            return ticks;
        }
        List<Tick> out = new ArrayList<>();
        for (Object o : ticks) {
            NumberTick t = (NumberTick) o;
            String text = t.getText().isEmpty() ? "" : PlanGrid.number(t.getValue());
            out.add(new NumberTick(t.getTickType(), t.getValue(), text, t.getTextAnchor(), t.getRotationAnchor(),
                    t.getAngle()));
        }
        return out;
    }
}
