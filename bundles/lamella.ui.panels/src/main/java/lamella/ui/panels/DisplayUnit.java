package lamella.ui.panels;

import java.util.List;
import java.util.Locale;
import java.util.Optional;
import lamella.api.ParameterRef;
import lamella.api.Units;

/**
 * How a value is shown: SI inside, and at the edge a unit a reader of thin-film work expects — nm for layer
 * thickness, µm for beam radii and offsets, MHz for modulation and repetition, ns for delays, MJ/(m³ K) for heat
 * capacity, MW/(m² K) for boundary conductance — among the other units of the same quantity the user may choose.
 *
 * @param unit   the label
 * @param factor SI value = shown value × factor
 */
record DisplayUnit(String unit, double factor) {

    private static final List<DisplayUnit> LENGTHS = List.of(new DisplayUnit("nm", 1e-9),
            new DisplayUnit("µm", 1e-6), new DisplayUnit("mm", 1e-3), new DisplayUnit("m", 1));
    private static final List<DisplayUnit> FREQUENCIES = List.of(new DisplayUnit("Hz", 1),
            new DisplayUnit("kHz", 1e3), new DisplayUnit("MHz", 1e6), new DisplayUnit("GHz", 1e9));
    private static final List<DisplayUnit> TIMES = List.of(new DisplayUnit("ps", 1e-12),
            new DisplayUnit("ns", 1e-9), new DisplayUnit("µs", 1e-6), new DisplayUnit("ms", 1e-3),
            new DisplayUnit("s", 1));
    private static final List<DisplayUnit> CONDUCTANCES = List.of(new DisplayUnit("W/(m² K)", 1),
            new DisplayUnit("MW/(m² K)", 1e6), new DisplayUnit("GW/(m² K)", 1e9));
    private static final List<DisplayUnit> CAPACITIES = List.of(new DisplayUnit("J/(m³ K)", 1),
            new DisplayUnit("MJ/(m³ K)", 1e6));

    /** A heater's boundary resistance is of order 1e-8 m² K/W: 10 m² K/GW. */
    private static final List<DisplayUnit> RESISTANCES = List.of(new DisplayUnit("m² K/GW", 1e-9),
            new DisplayUnit("m² K/W", 1));
    private static final List<DisplayUnit> OHMS = List.of(new DisplayUnit("mΩ", 1e-3), new DisplayUnit("Ω", 1),
            new DisplayUnit("kΩ", 1e3));
    /** A metal heater's dR/dT is of order 0.1 Ω/K: 100 mΩ/K. */
    private static final List<DisplayUnit> OHMS_PER_K = List.of(new DisplayUnit("mΩ/K", 1e-3),
            new DisplayUnit("Ω/K", 1));

    static DisplayUnit of(ParameterRef ref) {
        return of(ref.key(), ref.scope() == ParameterRef.Scope.LAYER);
    }

    /** The unit a key is shown in unless the user chose another. */
    static DisplayUnit of(String key, boolean layer) {
        String si = Units.ofKey(key);
        return switch (si) {
            case "m" -> key.equals("thickness_m") && layer || key.equals("heater_thickness_m") || depth(key)
                    ? LENGTHS.get(0) : LENGTHS.get(1);
            case "Hz" -> key.contains("frequencies") ? FREQUENCIES.get(1) : FREQUENCIES.get(2);
            case "s" -> TIMES.get(1);
            case "W/(m² K)" -> CONDUCTANCES.get(1);
            case "J/(m³ K)" -> CAPACITIES.get(1);
            case "m² K/W" -> RESISTANCES.get(0);
            case "Ω" -> OHMS.get(1);
            case "Ω/K" -> OHMS_PER_K.get(0);
            default -> new DisplayUnit(si, 1);
        };
    }

    /** The depths over which the top layer absorbs or is read are tens of nanometres. */
    private static boolean depth(String key) {
        return key.equals("absorption_depth_m") || key.equals("sensing_depth_m");
    }

    /** Every unit the key's quantity may be shown in, smallest first; one entry for quantities with one unit. */
    static List<DisplayUnit> choices(String key) {
        return switch (Units.ofKey(key)) {
            case "m" -> LENGTHS;
            case "Hz" -> FREQUENCIES;
            case "s" -> TIMES;
            case "W/(m² K)" -> CONDUCTANCES;
            case "J/(m³ K)" -> CAPACITIES;
            case "m² K/W" -> RESISTANCES;
            case "Ω" -> OHMS;
            case "Ω/K" -> OHMS_PER_K;
            default -> List.of(of(key, false));
        };
    }

    /** The unit of the key's quantity that a written unit names, allowing the usual ways of typing it. */
    static Optional<DisplayUnit> named(String key, String written) {
        String w = normal(written);
        for (DisplayUnit u : choices(key)) {
            if (normal(u.unit()).equals(w)) {
                return Optional.of(u);
            }
        }
        return Optional.empty();
    }

    /**
     * "µm" and "um", "MW/(m² K)" and "MW/m2K", "mΩ/K" and "mohm/K" are the same unit; letter case matters (mHz is not
     * MHz).
     */
    private static String normal(String unit) {
        String u = unit.replace("μ", "µ").replace("ohm", "Ω").replace("Ohm", "Ω").replace("²", "2").replace("³", "3").replace("^", "")
                .replaceAll("[\\s()·*]", "");
        if (u.startsWith("u") && u.length() > 1) {
            u = "µ" + u.substring(1);
        }
        if (u.toLowerCase(Locale.ROOT).endsWith("hz")) {
            u = u.substring(0, u.length() - 2) + "Hz";
        }
        return u;
    }

    /** What the unit names, in words, for messages: "nm, µm, mm or m". */
    static String wording(String key) {
        List<String> names = choices(key).stream().map(DisplayUnit::unit).toList();
        if (names.size() == 1) {
            return names.get(0).isEmpty() ? "no unit" : names.get(0);
        }
        return String.join(", ", names.subList(0, names.size() - 1)) + " or " + names.get(names.size() - 1);
    }

    /** Divided by an exact power of ten where the factor is a small one, so that 85 nm is 8.5e-8 m exactly. */
    double shown(double si) {
        return factor < 1 ? si * Math.rint(1 / factor) : si / factor;
    }

    double si(double shown) {
        return factor < 1 ? shown / Math.rint(1 / factor) : shown * factor;
    }
}
