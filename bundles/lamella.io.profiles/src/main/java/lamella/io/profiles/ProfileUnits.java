package lamella.io.profiles;

import java.util.LinkedHashMap;
import java.util.Map;
import lamella.api.data.Quantity;

/**
 * Units as files write them, to the factor to Lamella's inside unit: SI for header values (by the unit the case-file
 * key carries), degrees for phases, volts for lock-in channels. The micro sign may be written µ, μ or u, and the degree
 * sign °, º or deg.
 */
final class ProfileUnits {

    private static final Map<String, Map<String, Double>> BY_SI = new LinkedHashMap<>();

    static {
        BY_SI.put("m", units("m", 1, "cm", 1e-2, "mm", 1e-3, "µm", 1e-6, "micron", 1e-6, "nm", 1e-9, "Å", 1e-10));
        BY_SI.put("Hz", units("Hz", 1, "kHz", 1e3, "KHz", 1e3, "MHz", 1e6, "GHz", 1e9, "mHz", 1e-3));
        BY_SI.put("s", units("s", 1, "ms", 1e-3, "µs", 1e-6, "ns", 1e-9, "ps", 1e-12, "fs", 1e-15));
        BY_SI.put("W", units("W", 1, "mW", 1e-3, "µW", 1e-6));
        BY_SI.put("K", units("K", 1));
        BY_SI.put("°", units("°", 1, "rad", 180 / Math.PI, "mrad", 0.18 / Math.PI));
    }

    private ProfileUnits() {
    }

    /** The common spellings of µ and ° made one. */
    static String normal(String unit) {
        String u = unit.strip();
        u = u.replace('μ', 'µ').replace('º', '°');
        if (u.length() > 1 && u.charAt(0) == 'u' && !u.equals("uncertainty")) {
            u = "µ" + u.substring(1);
        }
        if (u.equalsIgnoreCase("deg") || u.equalsIgnoreCase("degree") || u.equalsIgnoreCase("degrees")) {
            u = "°";
        }
        return u;
    }

    /** The factor from a unit to the SI unit of a case-file key ({@code m}, {@code Hz}, …). */
    static double toSi(String si, String unit) {
        Map<String, Double> known = BY_SI.get(si);
        if (known == null) {
            throw new IllegalArgumentException("values in " + si + " take no unit conversion");
        }
        Double f = known.get(normal(unit));
        if (f == null) {
            throw new IllegalArgumentException("unit '" + unit + "' is not a unit of " + si + "; expected one of: "
                    + String.join(", ", known.keySet()));
        }
        return f;
    }

    /** The factor from a unit to Lamella's unit of a signal or x quantity. */
    static double of(Quantity q, String unit) {
        String u = normal(unit);
        if (q == Quantity.PHASE && u.equals("°")) {
            return 1.0;
        }
        return q.factor(u);
    }

    private static Map<String, Double> units(Object... pairs) {
        Map<String, Double> m = new LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) {
            m.put((String) pairs[i], ((Number) pairs[i + 1]).doubleValue());
        }
        return m;
    }
}
