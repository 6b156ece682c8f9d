package lamella.api.plan;

import lamella.api.ParameterRef;

/**
 * The σ a plan predicts for one target.
 *
 * @param ref            the free input
 * @param quantity       what its path moves, in words (see {@link lamella.api.fit.FittedParameter#quantity})
 * @param value          its expected value (the case's)
 * @param sigma          total 1σ: noise and every uncertain input (+∞ when the plan cannot separate it)
 * @param sigmaNoise     1σ from the expected noise alone
 * @param sigmaRelative  sigma / |value|
 * @param identifiable   false when the relative σ exceeds the fit's identifiability limit or the plan cannot tell
 *                       the input apart from another free input
 */
public record PredictedSigma(ParameterRef ref, String quantity, double value, double sigma, double sigmaNoise,
                             double sigmaRelative, boolean identifiable) {

    public PredictedSigma {
        quantity = quantity == null ? "" : quantity;
    }

    public String label() {
        return ParameterRef.label(ref, quantity);
    }
}
