package lamella.fit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import lamella.api.EvaluationCancelledException;
import lamella.api.ModelEvaluationException;
import lamella.api.fit.MonteCarloSummary;
import lamella.api.fit.Progress;

/**
 * Monte Carlo uncertainty: N synthetic measurements — the best-fit model plus Gaussian noise of each point's σ —
 * each fitted with every uncertain input drawn from its Gaussian (a parametric bootstrap, as in Yang, Ziade & Schmidt,
 * Rev. Sci. Instrum. 87, 014901, 2016). Refits run in parallel; sample s draws from its own generator seeded by
 * (seed, s), so the result does not depend on the number of threads. Interrupting the calling thread ends it with
 * EvaluationCancelledException; the workers stop at their next refit or model evaluation.
 */
final class MonteCarlo {

    private final FitProblem problem;
    private final Solver solver;
    private final ExecutorService pool;
    /**
     * Worker tasks that share the samples, one per thread the fit may occupy: each takes the next sample until none
     * is left, so the pool holds a few tasks however many samples are asked for, and an interrupt stops them between
     * refits.
     */
    private final int workers;
    private final Progress progress;

    MonteCarlo(FitProblem problem, Solver solver, ExecutorService pool, int threads, Progress progress) {
        this.problem = problem;
        this.solver = solver;
        this.pool = pool;
        this.workers = Math.max(1, threads);
        this.progress = progress;
    }

    /**
     * @param linearSigmaU the linearised total 1σ of each fitting variable u, to compare with
     */
    MonteCarloSummary run(int samples, long seed, double[] uBest, double[] unc, double[] model, double[] sigma,
                          double[] linearSigmaU) {
        int p = uBest.length;
        AtomicInteger next = new AtomicInteger();
        AtomicInteger done = new AtomicInteger();
        double[][] results = new double[samples][];
        List<Future<?>> workers = new ArrayList<>();
        for (int w = 0; w < Math.min(samples, this.workers); w++) {
            workers.add(pool.submit(() -> {
                for (int s = next.getAndIncrement(); s < samples; s = next.getAndIncrement()) {
                    EvaluationCancelledException.checkpoint();
                    results[s] = refit(s, seed, uBest, unc, model, sigma);
                    progress.update("Monte Carlo", done.incrementAndGet(), samples);
                }
            }));
        }
        for (Future<?> f : workers) {
            try {
                f.get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                workers.forEach(x -> x.cancel(true));
                throw new EvaluationCancelledException();
            } catch (ExecutionException e) {
                workers.forEach(x -> x.cancel(true));
                if (e.getCause() instanceof RuntimeException r) {
                    throw r;
                }
                throw new ModelEvaluationException("Monte Carlo: a refit failed: " + e.getCause(), e.getCause());
            }
        }
        List<double[]> ok = new ArrayList<>();
        int failed = 0;
        for (double[] r : results) {
            if (r == null) {
                failed++;
            } else {
                ok.add(r);
            }
        }
        if (ok.size() < 2) {
            throw new ModelEvaluationException("Monte Carlo: only " + ok.size() + " of " + samples
                    + " refits converged; the fit is too fragile for a Monte Carlo estimate");
        }
        double[] mean = new double[p];
        double[] std = new double[p];
        double[][] pct = new double[p][MonteCarloSummary.LEVELS.length];
        double[] ratio = new double[p];
        for (int a = 0; a < p; a++) {
            double[] v = new double[ok.size()];
            for (int i = 0; i < v.length; i++) {
                v[i] = ok.get(i)[a];
            }
            double m = Arrays.stream(v).average().orElse(Double.NaN);
            double ss = 0;
            for (double x : v) {
                ss += (x - m) * (x - m);
            }
            mean[a] = m;
            std[a] = Math.sqrt(ss / (v.length - 1));
            Arrays.sort(v);
            for (int l = 0; l < MonteCarloSummary.LEVELS.length; l++) {
                pct[a][l] = percentile(v, MonteCarloSummary.LEVELS[l]);
            }
            // half the central 68 % interval, in u: robust to the long tails of weakly determined inputs
            FreeInput f = problem.free.get(a);
            ratio[a] = 0.5 * (f.toU(pct[a][3]) - f.toU(pct[a][1])) / linearSigmaU[a];
        }
        return new MonteCarloSummary(samples, failed, mean, std, pct, ratio);
    }

    /** One synthetic measurement and its fit; null when the refit does not converge. */
    private double[] refit(int sample, long seed, double[] uBest, double[] unc, double[] model, double[] sigma) {
        SplittableRandom rng = new SplittableRandom(seed * 0x9E3779B97F4A7C15L + sample);
        double[] y = new double[model.length];
        for (int i = 0; i < y.length; i++) {
            y[i] = model[i] + sigma[i] * rng.nextGaussian();
        }
        double[] drawn = unc.clone();
        for (int k = 0; k < drawn.length; k++) {
            drawn[k] += problem.uncertain.get(k).sigma() * rng.nextGaussian();
        }
        try {
            Solver.Result r = solver.solve(uBest, drawn, y, sigma, false);
            if (!r.converged()) {
                return null;
            }
            double[] p = new double[uBest.length];
            for (int a = 0; a < p.length; a++) {
                p[a] = problem.free.get(a).toP(r.u()[a]);
            }
            return p;
        } catch (ModelEvaluationException e) {
            return null;
        }
    }

    /** Linear interpolation between order statistics (common practice, no source). */
    static double percentile(double[] sorted, double level) {
        double pos = level / 100 * (sorted.length - 1);
        int lo = (int) Math.floor(pos);
        int hi = Math.min(lo + 1, sorted.length - 1);
        return sorted[lo] + (pos - lo) * (sorted[hi] - sorted[lo]);
    }
}
