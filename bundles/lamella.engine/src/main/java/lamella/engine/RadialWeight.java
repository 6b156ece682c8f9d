package lamella.engine;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * The transform of what heats times the transform of what senses, for an axisymmetric geometry: a real function of
 * the radial wavenumber k (angular, rad/m). A source of unit power and a probe of unit weight each have transform 1
 * at k = 0, so w(0) = 1 (a Gaussian pump and probe of 1/e² radii w₀, w₁: exp(−k²(w₀² + w₁²)/8); a uniform disc of
 * radius a read at its centre: 2 J₁(ka)/(ka)). See {@link lamella.api.StackKernel} for the convention.
 */
@ConsumerType
@FunctionalInterface
public interface RadialWeight {

    /** w(k) for k ≥ 0; finite. Called from many threads at once: keep it free of shared mutable state. */
    double at(double k);
}
