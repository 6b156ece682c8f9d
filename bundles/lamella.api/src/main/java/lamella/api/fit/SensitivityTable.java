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
 * @param quantities what each parameter's path moved, in words (see {@link FittedParameter#quantity})
 * @param values     values[p][i]: the sensitivity to parameter p at x[i]
 */
public record SensitivityTable(String xColumn, double[] x, String signal, boolean phaseLike,
                               List<ParameterRef> parameters, List<String> quantities, double[][] values) {

    public SensitivityTable {
        parameters = List.copyOf(parameters);
        quantities = List.copyOf(quantities);
        if (quantities.size() != parameters.size() || values.length != parameters.size()) {
            throw new IllegalArgumentException("one quantity and one column of values per parameter");
        }
    }

    /** The label of parameter j in every output: its path, and what it moved where the key does not say. */
    public String label(int j) {
        return ParameterRef.label(parameters.get(j), quantities.get(j));
    }
}
