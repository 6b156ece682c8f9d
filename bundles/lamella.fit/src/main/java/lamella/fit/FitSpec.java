package lamella.fit;

import java.util.List;
import java.util.Map;

/**
 * The fit block of a case: datasets, free inputs, uncertain inputs and options.
 *
 * @param weighting  where the weights come from
 * @param multiStart extra random starts besides the initial values
 * @param monteCarlo refits asked for by the case file (the command line may ask for more)
 * @param seed       random seed for starts and Monte Carlo
 * @param gains      the value of every named gain of {@code fit.gains} (a factor on the signal of the datasets that
 *                   name it)
 */
record FitSpec(List<DatasetSpec> datasets, List<FreeInput> free, List<UncertainInput> uncertain,
               Weighting weighting, int multiStart, int monteCarlo, long seed, Map<String, Double> gains) {

    FitSpec {
        gains = Map.copyOf(gains);
    }

    /** A fit without gains. */
    FitSpec(List<DatasetSpec> datasets, List<FreeInput> free, List<UncertainInput> uncertain, Weighting weighting,
            int multiStart, int monteCarlo, long seed) {
        this(datasets, free, uncertain, weighting, multiStart, monteCarlo, seed, Map.of());
    }

    /** Where a fit's weights come from. */
    enum Weighting {
        /** σ columns of the data where present, else estimated from the residuals of each dataset. */
        AUTO,
        /** The σ columns of the data; a dataset without them is an error. */
        DATA,
        /** Estimated from the residuals of each dataset, ignoring σ columns. */
        RESIDUALS
    }
}
