package lamella.fit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.SplittableRandom;
import java.util.concurrent.ExecutorService;
import lamella.api.SelfHeating;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.MonteCarloSummary;
import lamella.api.fit.Progress;

/**
 * One fit from start to uncertainty budget.
 *
 * <p>Weights: a dataset with a σ column uses it; one without is first weighted by its own RMS signal (so that a ratio
 * and a phase in degrees count alike), then by the σ its residuals show, σ_d² = SSR_d / (n_d − p·n_d/N), refitting
 * until σ_d settles. Uncertainty: the linearised propagation of Yang, Ziade & Schmidt (Rev. Sci. Instrum. 87, 014901,
 * 2016) — noise covariance (JᵀJ)⁻¹ plus, for every uncertain input k, (∂u/∂p_k) σ_k² (∂u/∂p_k)ᵀ with
 * ∂u/∂p_k = −(JᵀJ)⁻¹Jᵀ ∂(m/σ)/∂p_k.
 */
final class FitRunner {

    /** A relative 1σ beyond this (in ln p) means the data do not determine the input. */
    static final double IDENTIFIABLE_LIMIT = 0.5;
    /** Correlations beyond this are reported: the data see only a combination of the two inputs. */
    static final double CORRELATION_WARNING = 0.98;
    private static final int MAX_REWEIGHTS = 5;

    private final FitProblem problem;
    private final ExecutorService pool;
    private final int threads;
    private final Progress progress;
    private final Solver solver;

    /** @param threads how many threads the fit may occupy at once, the calling thread included */
    FitRunner(FitProblem problem, ExecutorService pool, int threads, Progress progress) {
        this.problem = problem;
        this.pool = pool;
        this.threads = threads;
        this.progress = progress;
        this.solver = new Solver(problem, pool, threads, progress);
    }

    FitOutcome run(int monteCarloSamples, long seed) {
        List<String> warnings = new ArrayList<>();
        double[] y = problem.data();
        double[] unc = problem.nominalUncertain();
        double[] sigma = initialSigma();
        progress.update("fitting", 0, 1);
        Solver.Result best = bestStart(unc, y, sigma, seed);
        boolean estimated = problem.datasets.stream().anyMatch(d -> d.dataSigma == null);
        for (int pass = 0; estimated && pass < MAX_REWEIGHTS; pass++) {
            double[] next = residualSigma(best.u(), unc, y, sigma);
            boolean settled = relativeChange(sigma, next) < 0.01;
            boolean rescaled = proportional(sigma, next);
            sigma = next;
            // σ multiplied by one factor everywhere scales χ² and leaves its minimum where it is
            if (!rescaled) {
                best = solver.solve(best.u(), unc, y, sigma, true);
            }
            if (settled || rescaled) {
                break;
            }
        }
        progress.update("fitting", 1, 1);
        if (!best.converged()) {
            warnings.add("the fit did not converge within its iteration limit; the values are where it stopped");
        }
        double[] u = best.u();
        double[][] j = solver.finalJacobian(u, unc, sigma);
        double[][] ju = problem.uncertain.isEmpty() ? new double[j.length][0]
                : solver.uncertainJacobian(u, unc, sigma);
        Linearised lin = Linearised.of(j, ju, problem.free, problem.uncertain, u);
        Covariance cov = lin.covariance;
        int p = u.length;
        List<FittedParameter> fitted = new ArrayList<>();
        List<BudgetLine> budget = new ArrayList<>();
        budget.add(new BudgetLine(null, "", 0, lin.noise.clone()));
        for (int k = 0; k < problem.uncertain.size(); k++) {
            UncertainInput in = problem.uncertain.get(k);
            budget.add(new BudgetLine(in.ref(), problem.quantity(in.ref()), in.sigma(), lin.contributions[k]));
        }
        for (int a = 0; a < p; a++) {
            FreeInput f = problem.free.get(a);
            boolean atBound = Math.abs(u[a] - f.uMin()) < 1e-9 * Math.max(1, Math.abs(u[a]))
                    || Math.abs(u[a] - f.uMax()) < 1e-9 * Math.max(1, Math.abs(u[a]));
            boolean singular = lin.singular[a];
            double relative = lin.relativeNoise(a, f, u[a]);
            boolean identifiable = lin.identifiable(a, f, u[a]);
            double value = f.toP(u[a]);
            FittedParameter fp = new FittedParameter(f.ref(), problem.quantity(f.ref()), f.initial(), value,
                    lin.total[a], singular ? Double.POSITIVE_INFINITY : lin.noise[a], atBound, identifiable);
            fitted.add(fp);
            if (atBound) {
                warnings.add(fp.label() + " ended on a bound of its range; it is not a minimum there and its σ is not"
                        + " meaningful — widen the range or fix the input");
            }
            if (!identifiable) {
                warnings.add(fp.label() + " is not identifiable from these data"
                        + (singular ? " (the data cannot tell it apart from the other free inputs)"
                        : String.format(Locale.ROOT, ": ±%.0f %% (1σ)", 100 * relative))
                        + "; fix it at a known value, or add data sensitive to it (see `lamella sensitivity`)");
            }
        }
        double[][] correlation = correlation(cov.matrix);
        for (int a = 0; a < p; a++) {
            for (int b = a + 1; b < p; b++) {
                if (Math.abs(correlation[a][b]) > CORRELATION_WARNING) {
                    warnings.add(String.format(Locale.ROOT, "%s and %s are correlated by %.3f: the data determine"
                            + " mainly a combination of the two", fitted.get(a).label(), fitted.get(b).label(),
                            correlation[a][b]));
                }
            }
        }
        double[] model = solver.unweighted(u, unc).clone();
        List<DatasetFit> datasets = datasetFits(model, y, sigma, problem.values(u, unc), warnings);
        warnings.addAll(problem.cautions(problem.values(u, unc)));
        double chi2 = 0;
        for (int i = 0; i < y.length; i++) {
            double r = (y[i] - model[i]) / sigma[i];
            chi2 += r * r;
        }
        double reduced = chi2 / (y.length - p);
        Optional<MonteCarloSummary> mc = Optional.empty();
        if (monteCarloSamples > 0) {
            double[] linear = new double[p];
            for (int a = 0; a < p; a++) {
                linear[a] = fitted.get(a).sigma() / problem.free.get(a).dPdU(u[a]);
            }
            mc = Optional.of(new MonteCarlo(problem, solver, pool, threads, progress).run(monteCarloSamples, seed, u, unc,
                    model, sigma, linear));
        }
        return new FitOutcome(fitted, correlation, datasets, budget, mc, warnings, solver.evaluations(), reduced,
                best.converged());
    }

    /** The initial value and, if asked, random starts; the lowest χ² wins. */
    private Solver.Result bestStart(double[] unc, double[] y, double[] sigma, long seed) {
        int p = problem.free.size();
        double[] u0 = new double[p];
        for (int a = 0; a < p; a++) {
            u0[a] = problem.free.get(a).toU(problem.free.get(a).initial());
        }
        Solver.Result best = solver.solve(u0, unc, y, sigma, true);
        SplittableRandom rng = new SplittableRandom(seed ^ 0x5DEECE66DL);
        int starts = problem.spec.multiStart();
        for (int s = 0; s < starts; s++) {
            progress.update("multi-start", s + 1, starts);
            double[] start = new double[p];
            for (int a = 0; a < p; a++) {
                FreeInput f = problem.free.get(a);
                start[a] = f.bounded() ? f.uMin() + rng.nextDouble() * (f.uMax() - f.uMin())
                        : u0[a] + (f.logScale() ? Math.log(10) : 1.0) * (2 * rng.nextDouble() - 1);
            }
            Solver.Result r = solver.solve(start, unc, y, sigma, true);
            if (r.converged() && r.cost() < best.cost()) {
                best = r;
            }
        }
        return best;
    }

    private double[] initialSigma() {
        double[] s = new double[problem.points()];
        int at = 0;
        for (PreparedDataset d : problem.datasets) {
            double rms = 0;
            for (double v : d.y) {
                rms += v * v;
            }
            rms = Math.sqrt(rms / d.size());
            for (int i = 0; i < d.size(); i++) {
                s[at + i] = d.dataSigma != null ? d.dataSigma[i] : (rms > 0 ? rms : 1.0);
            }
            at += d.size();
        }
        return s;
    }

    private double[] residualSigma(double[] u, double[] unc, double[] y, double[] sigma) {
        double[] m = solver.unweighted(u, unc);
        double[] s = sigma.clone();
        int at = 0;
        int p = problem.free.size();
        int n = problem.points();
        for (PreparedDataset d : problem.datasets) {
            if (d.dataSigma == null) {
                double ssr = 0;
                for (int i = 0; i < d.size(); i++) {
                    double r = y[at + i] - m[at + i];
                    ssr += r * r;
                }
                double dof = d.size() - (double) p * d.size() / n;
                double est = Math.sqrt(ssr / dof);
                for (int i = 0; i < d.size(); i++) {
                    s[at + i] = est > 0 ? est : sigma[at + i] * 1e-9;
                }
            }
            at += d.size();
        }
        return s;
    }

    private List<DatasetFit> datasetFits(double[] model, double[] y, double[] sigma, double[] values,
                                         List<String> warnings) {
        List<DatasetFit> out = new ArrayList<>();
        int at = 0;
        int p = problem.free.size();
        int n = problem.points();
        for (PreparedDataset d : problem.datasets) {
            double[] m = new double[d.size()];
            double[] s = new double[d.size()];
            double chi2 = 0;
            for (int i = 0; i < d.size(); i++) {
                m[i] = model[at + i];
                s[i] = sigma[at + i];
                double r = (y[at + i] - m[i]) / s[i];
                chi2 += r * r;
            }
            double reduced = chi2 / (d.size() - (double) p * d.size() / n);
            if (d.dataSigma != null && reduced > 2) {
                warnings.add(String.format(Locale.ROOT, "dataset %d (%s): reduced χ² = %.2f with the data's own σ —"
                        + " the model does not describe these data within their noise, or σ is underestimated",
                        d.spec.index(), d.spec.given(), reduced));
            }
            Optional<SelfHeating.Outcome> heating = problem.heating(d, values);
            heating.ifPresent(h -> h.warnings().forEach(w -> warnings.add(String.format(Locale.ROOT,
                    "dataset %d (%s), self-heating at the best fit: %s", d.spec.index(), d.spec.given(), w))));
            out.add(new DatasetFit(d.spec.index(), d.spec.given(), d.technique, d.signal, d.xColumn, d.x.clone(),
                    d.y.clone(), s, m, d.dataSigma != null, reduced, heating));
            at += d.size();
        }
        return out;
    }

    static double[][] correlation(double[][] c) {
        int p = c.length;
        double[][] r = new double[p][p];
        for (int a = 0; a < p; a++) {
            for (int b = 0; b < p; b++) {
                double d = Math.sqrt(c[a][a] * c[b][b]);
                r[a][b] = a == b ? 1.0 : (d > 0 && Double.isFinite(d) ? c[a][b] / d : 0.0);
            }
        }
        return r;
    }

    /** Whether b is a times one factor, to rounding (a single dataset weighted by its residuals). */
    static boolean proportional(double[] a, double[] b) {
        double factor = b[0] / a[0];
        for (int i = 1; i < a.length; i++) {
            if (Math.abs(b[i] / a[i] - factor) > 1e-12 * Math.abs(factor)) {
                return false;
            }
        }
        return true;
    }

    private static double relativeChange(double[] a, double[] b) {
        double worst = 0;
        for (int i = 0; i < a.length; i++) {
            worst = Math.max(worst, Math.abs(b[i] / a[i] - 1));
        }
        return worst;
    }
}
