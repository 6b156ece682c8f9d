package lamella.ui.panels;

import java.util.Map;
import lamella.api.ParameterRef;
import lamella.api.Units;

/** Axis labels, column headings and parameter names in the trade's words, each with its unit. */
final class Words {

    private static final Map<String, String> LAYER_KEYS = Map.of(
            "thickness_m", "thickness",
            "k_through_w_mk", "Λ through",
            "k_in_plane_w_mk", "Λ in-plane",
            "k_in_plane_x_w_mk", "Λ in-plane x",
            "k_in_plane_y_w_mk", "Λ in-plane y",
            "heat_capacity_j_m3k", "C",
            "conductance_below_w_m2k", "G below");

    private static final Map<String, String> SIGNALS = Map.of(
            "ratio", "ratio −V_in/V_out (dimensionless)",
            "phase_deg", "phase (°)",
            "in_phase", "in-phase signal V_in (K/W)",
            "out_of_phase", "out-of-phase signal V_out (K/W)");

    private Words() {
    }

    static String x(String column, String technique) {
        if (column.equals("frequency_hz")) {
            return "3omega".equals(technique) ? "heater drive frequency (Hz)" : "modulation frequency (Hz)";
        }
        if (column.equals("delay_s")) {
            return "pump–probe delay (s)";
        }
        return withUnit(column);
    }

    static String signal(String column) {
        String known = SIGNALS.get(column);
        if (known != null) {
            return known;
        }
        if (column.startsWith("re_")) {
            return "in-phase (real) part (" + unitOrNone(column) + ")";
        }
        if (column.startsWith("im_")) {
            return "out-of-phase (imaginary) part (" + unitOrNone(column) + ")";
        }
        if (column.startsWith("amplitude_")) {
            return "amplitude (" + unitOrNone(column) + ")";
        }
        return withUnit(column);
    }

    static String sensitivity(boolean phaseLike) {
        return phaseLike ? "∂φ/∂ln p (°)" : "S = ∂ln(signal)/∂ln p (dimensionless)";
    }

    /** "film · Λ through", "geometry · pump radius", "dataset 3 · geometry · pump radius". */
    static String parameter(ParameterRef ref) {
        String prefix = ref.dataset() >= 0 ? "dataset " + (ref.dataset() + 1) + " · " : "";
        return switch (ref.scope()) {
            case LAYER -> ref.layer() + " · " + LAYER_KEYS.getOrDefault(ref.key(), ref.key());
            case GEOMETRY -> prefix + "geometry · " + key(ref.key());
            case MEASUREMENT -> prefix + "measurement · " + key(ref.key());
        };
    }

    /** A case-file key in words, without its unit suffix: {@code pump_radius_m} → "pump radius". */
    static String key(String key) {
        String unit = Units.ofKey(key);
        String stem = key;
        if (!unit.isEmpty()) {
            for (String suffix : new String[] {"_k_m_per_w", "_k_per_w", "_w_m2k", "_w_mk", "_j_m3k", "_j_kgk",
                    "_kg_m3", "_hz", "_deg", "_m", "_s", "_k"}) {
                if (key.endsWith(suffix)) {
                    stem = key.substring(0, key.length() - suffix.length());
                    break;
                }
            }
        }
        return stem.replace('_', ' ');
    }

    private static String withUnit(String column) {
        return column + " (" + unitOrNone(column) + ")";
    }

    private static String unitOrNone(String key) {
        String u = Units.ofKey(key);
        return u.isEmpty() ? "dimensionless" : u;
    }
}
