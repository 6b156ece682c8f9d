package lamella.fit;

import lamella.api.ParameterRef;

/**
 * An input held fixed at its value whose 1σ is propagated into the free parameters.
 *
 * @param ref   which input
 * @param value its value in the case
 * @param sigma its 1σ, absolute
 * @param path  JSON path of its entry
 */
record UncertainInput(ParameterRef ref, double value, double sigma, String path) {
}
