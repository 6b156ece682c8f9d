package lamella.api;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * A complex response of one heating geometry on one stack as a function of the heating frequency.
 * Must be thread-safe; {@code H(−f)} is the complex conjugate of {@code H(f)}, so callers ask for f ≥ 0 only.
 */
@ConsumerType
@FunctionalInterface
public interface FrequencyResponse {
    /**
     * @param frequencyHz heating frequency f ≥ 0 in Hz (ω = 2πf)
     * @param out         receives (re, im) at out[0], out[1]
     */
    void at(double frequencyHz, double[] out);
}
