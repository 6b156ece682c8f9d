package lamella.api.fit;

/**
 * Refits with resampled noise and uncertain inputs.
 *
 * @param samples     refits attempted
 * @param failed      refits that did not converge (left out of the statistics, never silently)
 * @param mean        per free parameter
 * @param std         per free parameter
 * @param percentiles per free parameter: 2.5, 16, 50, 84 and 97.5 %
 * @param stdOverLinearised per free parameter: the Monte Carlo σ — half the 16–84 % interval, robust to long tails —
 *                    over the linearised σ, both in the variable the fit works in (ln p for positive inputs, whose
 *                    distributions are skewed when their uncertainty is large)
 */
public record MonteCarloSummary(int samples, int failed, double[] mean, double[] std, double[][] percentiles,
                                double[] stdOverLinearised) {

    public static final double[] LEVELS = {2.5, 16, 50, 84, 97.5};
}
