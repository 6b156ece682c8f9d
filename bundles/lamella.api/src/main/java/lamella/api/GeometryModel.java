package lamella.api;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * A geometry bound to its parameters and a stack: the complex response per unit absorbed power (or per unit power
 * per unit length) at a heating frequency. Thread-safe.
 */
@ConsumerType
public interface GeometryModel extends FrequencyResponse {
}
