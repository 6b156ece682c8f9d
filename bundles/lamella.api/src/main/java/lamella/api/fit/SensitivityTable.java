package lamella.api.fit;

import java.util.List;
import lamella.api.ParameterRef;

/**
 * Sensitivities of one signal over x.
 *
 * @param xColumn    x column name
 * @param x          x values
 * @param signal     the signal column
 * @param phaseLike  true when S = ∂φ/∂ln p (degrees) rather than ∂ln(signal)/∂ln p
 * @param parameters one per column of {@code values}
 * @param values     values[p][i]: the sensitivity to parameter p at x[i]
 */
public record SensitivityTable(String xColumn, double[] x, String signal, boolean phaseLike,
                               List<ParameterRef> parameters, double[][] values) {
}
