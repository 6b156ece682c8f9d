package lamella.fit;

import java.util.Map;
import java.util.Optional;

/** The signal a technique's data are usually fitted by, and which signals are phases. */
final class Signals {

    /**
     * Common practice, no source: TDTR fits the ratio −V_in/V_out (it cancels unknown gains), FDTR the phase after
     * the reference phase is removed, 3ω the in-phase temperature (or the in-phase third-harmonic voltage that
     * reads it), SSTR the probe's rise over pump power (its slope is what the reference sample calibrates).
     */
    private static final Map<String, String> USUAL = Map.of(
            "tdtr", "ratio",
            "fdtr", "phase_deg",
            "3omega", "re_k_m_per_w",
            "3omega-voltage", "v3_in_phase_v",
            "sstr", "temperature_rise_k");

    private Signals() {
    }

    static Optional<String> usual(String technique) {
        return Optional.ofNullable(USUAL.get(technique));
    }

    /** Phases are compared and differentiated as they are, in degrees; other signals on a log scale. */
    static boolean phaseLike(String signal) {
        return signal.endsWith("_deg");
    }
}
