package lamella.report;

import java.util.Map;
import lamella.api.Units;

/**
 * Axis labels and table headings in words, each with its unit in parentheses, for the column names that data
 * files and techniques use ({@code frequency_hz}, {@code delay_s}, {@code ratio}, {@code phase_deg}, …). A name
 * not known here is shown as it is, with the unit its suffix declares.
 */
final class ColumnWords {

    static final String DIMENSIONLESS = "dimensionless";

    private static final Map<String, String> SIGNALS = Map.of(
            "ratio", "ratio −V_in/V_out (" + DIMENSIONLESS + ")",
            "phase_deg", "phase (°)",
            "in_phase", "in-phase signal V_in (K/W)",
            "out_of_phase", "out-of-phase signal V_out (K/W)",
            "k_per_w", "steady temperature rise per absorbed power (K/W)",
            "temperature_rise_k", "steady temperature rise (K)",
            "v3_in_phase_v", "in-phase third-harmonic voltage V3ω (V)",
            "v3_out_of_phase_v", "out-of-phase third-harmonic voltage V3ω (V)",
            "v3_amplitude_v", "third-harmonic voltage amplitude |V3ω| (V)");

    /** The complex-response columns: a part's name, then the response unit's suffix. */
    private static final Map<String, String> PARTS = Map.of(
            "re_", "in-phase (real) part",
            "im_", "out-of-phase (imaginary) part",
            "amplitude_", "amplitude");

    private ColumnWords() {
    }

    /** The x axis; a 3ω heater is driven at the frequency, a thermoreflectance pump modulated. */
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
        return asGiven(column);
    }

    static String signal(String signal) {
        String known = SIGNALS.get(signal);
        if (known != null) {
            return known;
        }
        for (Map.Entry<String, String> part : PARTS.entrySet()) {
            if (signal.startsWith(part.getKey())) {
                return part.getValue() + " (" + unitOf(signal) + ")";
            }
        }
        return asGiven(signal);
    }

    /** The signal's words without the unit, for titles: {@code phase}, {@code ratio −V_in/V_out}. */
    static String signalName(String signal) {
        String words = signal(signal);
        return words.substring(0, words.lastIndexOf(" ("));
    }

    /** The y axis of a sensitivity plot. */
    static String sensitivity(boolean phaseLike) {
        return phaseLike ? "∂φ/∂ln p (°)" : "S = ∂ln(signal)/∂ln p (" + DIMENSIONLESS + ")";
    }

    static String unitOf(String key) {
        String unit = Units.ofKey(key);
        return unit.isEmpty() ? DIMENSIONLESS : unit;
    }

    private static String asGiven(String column) {
        return column + " (" + unitOf(column) + ")";
    }
}
