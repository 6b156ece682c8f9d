package lamella.ui.panels;

import java.util.Map;
import lamella.api.ParameterRef;
import lamella.api.Units;
import lamella.ui.api.InputNames;

/** Axis labels, column headings and parameter names in the trade's words, each with its unit. */
final class Words {

    private static final Map<String, String> SIGNALS = Map.of(
            "ratio", "ratio −V_in/V_out (dimensionless)",
            "phase_deg", "phase (°)",
            "in_phase", "in-phase signal V_in (K/W)",
            "out_of_phase", "out-of-phase signal V_out (K/W)",
            "k_per_w", "steady temperature rise per absorbed power (K/W)",
            "temperature_rise_k", "steady temperature rise (K)",
            "v3_in_phase_v", "in-phase third-harmonic voltage V3ω (V)",
            "v3_out_of_phase_v", "out-of-phase third-harmonic voltage V3ω (V)",
            "v3_amplitude_v", "third-harmonic voltage amplitude |V3ω| (V)");

    private Words() {
    }

    static String x(String column, String technique) {
        if (column.equals("frequency_hz")) {
            return technique != null && technique.startsWith("3omega") ? "heater drive frequency (Hz)"
                    : "modulation frequency (Hz)";
        }
        if (column.equals("delay_s")) {
            return "pump–probe delay (s)";
        }
        if (column.equals("pump_power_w")) {
            return "absorbed pump power (W)";
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

    /** "film · Λ through", "geometry · pump radius", "dataset 2 · geometry · pump radius". */
    static String parameter(ParameterRef ref) {
        return InputNames.of(ref);
    }

    /**
     * The same, with what the path moves where its key alone does not say: "film · Λ through (isotropic Λ)" for a
     * conductivity stated once.
     *
     * @param quantity from {@link lamella.api.CaseModel#quantity}, or empty
     */
    static String parameter(ParameterRef ref, String quantity) {
        String name = parameter(ref);
        boolean said = quantity.isEmpty() || ref.key().equals("k_w_mk");
        return said ? name : name + " (" + quantity + ")";
    }

    /** A case-file key in words, without its unit suffix: {@code pump_radius_m} → "pump radius". */
    static String key(String key) {
        return InputNames.key(key);
    }

    /** A case problem as the panels say it: where in the case (its JSON path), then what is wrong. */
    static String problem(lamella.api.InputException e) {
        String where = e.path() == null || e.path().isEmpty() ? "" : e.path() + ": ";
        return where + e.problem();
    }

    private static String withUnit(String column) {
        return column + " (" + unitOrNone(column) + ")";
    }

    private static String unitOrNone(String key) {
        String u = Units.ofKey(key);
        return u.isEmpty() ? "dimensionless" : u;
    }
}
