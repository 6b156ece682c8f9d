package lamella.api.data;

import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;

/**
 * What a column measures, and the units a file may state for it, each with its factor to Lamella's inside unit (SI,
 * phase in degrees, lock-in signals in volts). Units are case-sensitive where case carries meaning (mHz is not MHz);
 * a lower-case spelling that could be either is refused rather than guessed.
 */
public enum Quantity {

    FREQUENCY("a frequency", units("Hz", 1.0, "kHz", 1e3, "KHz", 1e3, "MHz", 1e6, "GHz", 1e9, "mHz", 1e-3)),
    TIME("a time", units("s", 1.0, "ms", 1e-3, "us", 1e-6, "µs", 1e-6, "μs", 1e-6, "ns", 1e-9, "ps", 1e-12,
            "fs", 1e-15)),
    PHASE("a phase", units("deg", 1.0, "degree", 1.0, "degrees", 1.0, "°", 1.0, "rad", 180 / Math.PI,
            "mrad", 0.18 / Math.PI)),
    VOLTAGE("a lock-in signal", units("V", 1.0, "mV", 1e-3, "uV", 1e-6, "µV", 1e-6, "μV", 1e-6, "nV", 1e-9)),
    RATIO("a ratio", units("1", 1.0, "-", 1.0));

    private final String wording;
    private final Map<String, Double> factors;

    Quantity(String wording, Map<String, Double> factors) {
        this.wording = wording;
        this.factors = factors;
    }

    /** The factor from a stated unit to the inside unit. */
    public double factor(String unit) {
        Double f = factors.get(unit.strip());
        if (f != null) {
            return f;
        }
        String u = unit.strip();
        if (this == FREQUENCY && u.equalsIgnoreCase("mhz")) {
            throw new IllegalArgumentException("unit '" + u + "' could be mHz (millihertz) or MHz (megahertz);"
                    + " write it with the case that says which");
        }
        Optional<Quantity> other = ofUnit(u);
        String hint = other.map(q -> "'" + u + "' is a unit of " + q.wording + ", but this column is " + wording)
                .orElse("unknown unit '" + Decimals.abbreviate(u) + "' for " + wording);
        throw new IllegalArgumentException(hint + "; expected one of: " + String.join(", ", factors.keySet()));
    }

    /** How a message names the quantity, such as "a frequency". */
    public String wording() {
        return wording;
    }

    private static Optional<Quantity> ofUnit(String unit) {
        for (Quantity q : values()) {
            if (q.factors.containsKey(unit)) {
                return Optional.of(q);
            }
        }
        return Optional.empty();
    }

    private static Map<String, Double> units(Object... pairs) {
        Map<String, Double> m = new LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            m.put((String) pairs[i], ((Number) pairs[i + 1]).doubleValue());
        }
        return m;
    }
}
