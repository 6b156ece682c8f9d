package lamella.api.fit;

import lamella.api.ParameterRef;

/**
 * What one source of uncertainty contributes to each free parameter's σ (the budget of Yang, Ziade & Schmidt,
 * Rev. Sci. Instrum. 87, 014901, 2016).
 *
 * @param source        the uncertain input, or null for the noise of the data
 * @param quantity      what the uncertain input's path moved, in words (see {@link FittedParameter#quantity})
 * @param inputSigma    the input's 1σ (0 for the noise line)
 * @param contributions 1σ contributed to each free parameter, in the order of the outcome's parameters
 */
public record BudgetLine(ParameterRef source, String quantity, double inputSigma, double[] contributions) {

    public BudgetLine {
        quantity = quantity == null ? "" : quantity;
    }

    public String label() {
        return source == null ? "noise of the data" : ParameterRef.label(source, quantity);
    }
}
