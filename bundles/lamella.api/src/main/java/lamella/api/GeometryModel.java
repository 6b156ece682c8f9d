package lamella.api;

import java.util.List;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * A geometry bound to its parameters and a stack: the complex response per unit absorbed power (or per unit power
 * per unit length) at a heating frequency. Thread-safe.
 */
@ConsumerType
public interface GeometryModel extends FrequencyResponse {

    /**
     * What a user should know before trusting a reading of this geometry at these heating frequencies, each as one
     * sentence naming the frequency and the limit it passes (a 3ω heater's penetration depth outside the usual
     * band); fits and simulations report them as warnings. None by default.
     *
     * @param heatingFrequenciesHz the frequencies at which the response is read, Hz
     */
    default List<String> cautions(double[] heatingFrequenciesHz) {
        return List.of();
    }
}
