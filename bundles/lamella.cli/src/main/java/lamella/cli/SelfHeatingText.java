package lamella.cli;

import java.math.BigDecimal;
import java.math.MathContext;
import lamella.api.SelfHeating;
import lamella.api.Units;

/** The self-heating state as text: the model in words and every library value with the temperature it was taken at. */
final class SelfHeatingText {

    private SelfHeatingText() {
    }

    static String render(SelfHeating.Outcome h) {
        StringBuilder sb = new StringBuilder(h.inWords()).append('\n');
        if (!h.values().isEmpty()) {
            TextTable t = new TextTable("layer", "key", "temperature (K)", "value as read", "value used", "unit");
            for (SelfHeating.ShiftedValue v : h.values()) {
                t.add(v.layer(), v.key(), number(v.temperatureK()), number(v.baseValue()), number(v.value()),
                        Units.ofKey(v.key()));
            }
            sb.append(t.render("  "));
        }
        return sb.toString();
    }

    private static String number(double v) {
        BigDecimal d = new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros();
        return d.scale() <= 0 && d.precision() - d.scale() <= 8 ? d.toPlainString() : d.toString();
    }
}
