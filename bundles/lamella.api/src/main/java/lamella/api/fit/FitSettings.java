package lamella.api.fit;

/**
 * How to run a fit beyond what the case file says.
 *
 * @param monteCarloSamples refits with resampled noise and uncertain inputs; 0: as many as the case's fit block
 *                          asks for (none if it does not)
 * @param seed              seed of the Monte Carlo and multi-start random numbers, for reproducible results;
 *                          0: the fit block's {@code seed} (1 if it has none)
 * @param threads           worker threads for Jacobians and Monte Carlo (≥ 1)
 */
public record FitSettings(int monteCarloSamples, long seed, int threads) {

    public FitSettings {
        if (monteCarloSamples < 0 || threads < 1) {
            throw new IllegalArgumentException("monteCarloSamples ≥ 0 and threads ≥ 1");
        }
    }

    public static FitSettings defaults() {
        return new FitSettings(0, 0L, Math.max(1, Runtime.getRuntime().availableProcessors()));
    }

    public FitSettings withMonteCarlo(int samples) {
        return new FitSettings(samples, seed, threads);
    }

    public FitSettings withSeed(long s) {
        return new FitSettings(monteCarloSamples, s, threads);
    }

    public FitSettings withThreads(int t) {
        return new FitSettings(monteCarloSamples, seed, t);
    }
}
