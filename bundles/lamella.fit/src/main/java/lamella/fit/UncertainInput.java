package lamella.fit;

import lamella.api.ParameterRef;

/**
 * An input held fixed at its value whose 1σ is propagated into the free parameters.
 *
 * @param ref   which input
 * @param value its value in the case
 * @param sigma its 1σ, absolute
 * @param relative its 1σ as a fraction of its value where the case gives it so ({@code sigma_relative}); else NaN
 * @param path  JSON path of its entry
 */
record UncertainInput(ParameterRef ref, double value, double sigma, double relative, String path) {

    /** The same input at another value (a plan's), its σ relative to that value where the case gives it so. */
    UncertainInput at(ParameterRef as, double v) {
        return new UncertainInput(as, v, Double.isNaN(relative) ? sigma : relative * Math.abs(v), relative, path);
    }
}
