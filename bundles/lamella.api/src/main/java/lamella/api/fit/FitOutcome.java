package lamella.api.fit;

import java.util.List;
import java.util.Optional;

/**
 * Everything a fit found: values with uncertainties, their correlations, the residuals of every dataset, the
 * uncertainty budget, Monte Carlo statistics when asked for, and warnings a user must read.
 */
public record FitOutcome(List<FittedParameter> parameters, double[][] correlation, List<DatasetFit> datasets,
                         List<BudgetLine> budget, Optional<MonteCarloSummary> monteCarlo, List<String> warnings,
                         int evaluations, double reducedChiSquare, boolean converged) {

    public FitOutcome {
        parameters = List.copyOf(parameters);
        datasets = List.copyOf(datasets);
        budget = List.copyOf(budget);
        warnings = List.copyOf(warnings);
    }
}
