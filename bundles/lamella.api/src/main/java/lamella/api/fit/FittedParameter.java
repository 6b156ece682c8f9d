package lamella.api.fit;

import lamella.api.ParameterRef;

/**
 * One free input after the fit.
 *
 * @param ref          which input
 * @param quantity     what the path moved in this case, in words ("isotropic Λ", "through-plane Λz"); empty where
 *                     the key alone says it (see {@link lamella.api.CaseModel#quantity})
 * @param initial      where the fit started
 * @param value        the best fit
 * @param sigma        total 1σ: the noise and the propagated uncertainty of every uncertain input
 * @param sigmaNoise   1σ from the noise of the data alone
 * @param atBound      the fit ended on a bound (then the value is not a minimum and σ is not meaningful)
 * @param identifiable false when the data cannot determine the value (see the outcome's warnings)
 */
public record FittedParameter(ParameterRef ref, String quantity, double initial, double value, double sigma,
                              double sigmaNoise, boolean atBound, boolean identifiable) {

    public FittedParameter {
        quantity = quantity == null ? "" : quantity;
    }

    /** The path and, where it needs saying, what it moved: {@code film.k_through_w_mk (isotropic Λ)}. */
    public String label() {
        return ParameterRef.label(ref, quantity);
    }
}
