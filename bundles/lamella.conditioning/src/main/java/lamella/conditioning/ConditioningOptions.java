package lamella.conditioning;

import java.util.List;
import java.util.Optional;
import lamella.api.data.Dataset;

/**
 * What conditioning does to a dataset.
 *
 * @param phase        the TDTR detection-phase correction (ignored for frequency data)
 * @param reference    FDTR: a measurement of the instrument's own phase at the same frequencies, subtracted
 * @param exclusions   x ranges whose rows are marked as excluded from fitting
 * @param outlierLimit the outlier threshold in robust standard deviations ({@link OutlierRule}); 0 turns marking off
 */
public record ConditioningOptions(PhaseCorrection phase, Optional<Dataset> reference, List<XRange> exclusions,
                                  double outlierLimit) {

    /** Common practice, no source: far enough out that Gaussian noise almost never reaches it. */
    public static final double DEFAULT_OUTLIER_LIMIT = 5.0;

    public ConditioningOptions {
        exclusions = List.copyOf(exclusions);
        if (!(outlierLimit >= 0) || Double.isInfinite(outlierLimit)) {
            throw new IllegalArgumentException("outlier limit " + outlierLimit);
        }
    }

    public static ConditioningOptions defaults() {
        return new ConditioningOptions(PhaseCorrection.fromStep(PhaseCorrection.DEFAULT_STEP_WINDOW_S),
                Optional.empty(), List.of(), DEFAULT_OUTLIER_LIMIT);
    }
}
