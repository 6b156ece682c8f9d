package lamella.api.data;

import java.util.List;

/**
 * The column names of measured data, the same as those {@code simulate} writes where the quantity is the same.
 * Lock-in channels ({@link #IN_PHASE}, {@link #OUT_OF_PHASE}, {@link #AMPLITUDE}) are in volts: an importer converts
 * a file's mV, µV or nV, and takes a channel whose file states no unit as volts. Phase is in degrees, negative when
 * lagging; the TDTR ratio is −in_phase/out_of_phase (no unit); x is in s, Hz or (SSTR's absorbed pump power) W; an
 * SSTR rise is in K, or in the probe's own units where a fitted gain stands for its coefficient.
 */
public final class SignalNames {

    public static final String FREQUENCY_HZ = "frequency_hz";
    public static final String DELAY_S = "delay_s";
    public static final String IN_PHASE = "in_phase";
    public static final String OUT_OF_PHASE = "out_of_phase";
    public static final String AMPLITUDE = "amplitude";
    public static final String PHASE_DEG = "phase_deg";
    public static final String RATIO = "ratio";
    /** SSTR's x axis: the absorbed pump power, W. */
    public static final String PUMP_POWER_W = "pump_power_w";
    /** SSTR: the steady temperature rise at a pump power, K. */
    public static final String TEMPERATURE_RISE_K = "temperature_rise_k";
    /** SSTR: the steady temperature rise per watt absorbed, K/W. */
    public static final String K_PER_W = "k_per_w";

    /** The x columns a dataset may have. */
    public static final List<String> X_COLUMNS = List.of(FREQUENCY_HZ, DELAY_S, PUMP_POWER_W);

    /** The signal columns a dataset may have. */
    public static final List<String> SIGNALS = List.of(IN_PHASE, OUT_OF_PHASE, AMPLITUDE, PHASE_DEG, RATIO,
            TEMPERATURE_RISE_K, K_PER_W);

    private static final String SIGMA_PREFIX = "sigma_";

    private SignalNames() {
    }

    /** The column holding the standard deviation of a signal, such as {@code sigma_phase_deg}. */
    public static String sigma(String signal) {
        return SIGMA_PREFIX + signal;
    }
}
