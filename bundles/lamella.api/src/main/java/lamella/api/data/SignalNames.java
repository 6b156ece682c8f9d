package lamella.api.data;

import java.util.List;

/**
 * The column names of measured data, the same as those {@code simulate} writes where the quantity is the same.
 * Lock-in channels ({@link #IN_PHASE}, {@link #OUT_OF_PHASE}, {@link #AMPLITUDE}) are in volts: an importer converts
 * a file's mV, µV or nV, and takes a channel whose file states no unit as volts. Phase is in degrees, negative when
 * lagging; the TDTR ratio is −in_phase/out_of_phase (no unit); x is in s or Hz.
 */
public final class SignalNames {

    public static final String FREQUENCY_HZ = "frequency_hz";
    public static final String DELAY_S = "delay_s";
    public static final String IN_PHASE = "in_phase";
    public static final String OUT_OF_PHASE = "out_of_phase";
    public static final String AMPLITUDE = "amplitude";
    public static final String PHASE_DEG = "phase_deg";
    public static final String RATIO = "ratio";

    /** The x columns a dataset may have. */
    public static final List<String> X_COLUMNS = List.of(FREQUENCY_HZ, DELAY_S);

    /** The signal columns a dataset may have. */
    public static final List<String> SIGNALS = List.of(IN_PHASE, OUT_OF_PHASE, AMPLITUDE, PHASE_DEG, RATIO);

    private static final String SIGMA_PREFIX = "sigma_";

    private SignalNames() {
    }

    /** The column holding the standard deviation of a signal, such as {@code sigma_phase_deg}. */
    public static String sigma(String signal) {
        return SIGMA_PREFIX + signal;
    }
}
