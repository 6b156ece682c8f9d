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

    FREQUENCY("a frequency", units("Hz", 1.0, "kHz", 1e3, "KHz", 1e3, "MHz", 1e6, "GHz", 1e9, "mHz", 1e-3,
            "hz", 1.0, "khz", 1e3, "ghz", 1e9, "HZ", 1.0, "KHZ", 1e3, "GHZ", 1e9)),
    TIME("a time", units("s", 1.0, "ms", 1e-3, "us", 1e-6, "µs", 1e-6, "μs", 1e-6, "ns", 1e-9, "ps", 1e-12,
            "fs", 1e-15, "sec", 1.0, "msec", 1e-3, "usec", 1e-6, "µsec", 1e-6, "μsec", 1e-6, "nsec", 1e-9,
            "psec", 1e-12)),
    // The degree sign and the two characters typed for it (masculine ordinal º, ring above ˚).
    PHASE("a phase", units("deg", 1.0, "degree", 1.0, "degrees", 1.0, "°", 1.0, "º", 1.0, "˚", 1.0, "Deg", 1.0,
            "DEG", 1.0, "Degree", 1.0, "Degrees", 1.0, "rad", 180 / Math.PI, "Rad", 180 / Math.PI, "RAD",
            180 / Math.PI, "radian", 180 / Math.PI, "radians", 180 / Math.PI, "mrad", 0.18 / Math.PI)),
    // µ as the micro sign (U+00B5) or the Greek letter mu (U+03BC), or u; lock-in signals are never megavolts, so
    // lower-case v spellings are taken as they are meant.
    VOLTAGE("a lock-in signal", units("V", 1.0, "mV", 1e-3, "uV", 1e-6, "µV", 1e-6, "μV", 1e-6, "nV", 1e-9,
            "v", 1.0, "mv", 1e-3, "uv", 1e-6, "µv", 1e-6, "μv", 1e-6, "nv", 1e-9, "Vrms", 1.0, "mVrms", 1e-3,
            "uVrms", 1e-6, "µVrms", 1e-6, "μVrms", 1e-6)),
    RATIO("a ratio", units("1", 1.0, "-", 1.0)),
    POWER("a power", units("W", 1.0, "mW", 1e-3, "uW", 1e-6, "µW", 1e-6, "μW", 1e-6, "w", 1.0, "mw", 1e-3)),
    TEMPERATURE("a temperature rise", units("K", 1.0, "mK", 1e-3)),
    RISE_PER_POWER("a temperature rise per watt", units("K/W", 1.0, "K W-1", 1.0, "K/mW", 1e3, "mK/mW", 1.0));

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
