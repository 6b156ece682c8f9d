package lamella.fit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicInteger;
import lamella.api.EvaluationCancelledException;
import lamella.api.ModelEvaluationException;
import lamella.api.fit.Progress;
import org.apache.commons.math3.exception.ConvergenceException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresProblem;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.ValueAndJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.DecompositionSolver;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * Levenberg–Marquardt (Apache Commons Math) on the weighted residuals (data − model)/σ in the fitting variables u,
 * bounds enforced by projecting each trial point onto them. Jacobians by finite differences, their columns computed
 * in parallel, and only where the search needs one: at the points it accepts, not at trial points it rejects or the
 * point it stops at. The search stops once an accepted step is far inside the inputs' σ ({@link #STEP_WITHIN_SIGMA}).
 * A point's model is computed once: the search asks for a value several times, and the
 * reweighting passes and the uncertainty start where the search ended ({@link ModelMemo}).
 */
final class Solver {

    /** Forward-difference step in u during the search (relative 1e-6 for log-scaled inputs). */
    private static final double SEARCH_STEP = 1e-6;
    /** Central-difference step for the Jacobian the uncertainty is computed from. */
    static final double FINAL_STEP = 1e-4;
    private static final int MAX_ITERATIONS = 200;
    /**
     * The search stops once an accepted step moved every free input by less than this fraction of its 1σ, the σ the
     * residuals and the Jacobian just used imply: what further steps could change is far below what the data tell.
     */
    static final double STEP_WITHIN_SIGMA = 0.01;

    private final FitProblem problem;
    private final ExecutorService pool;
    /** How many threads a Jacobian's columns may occupy at once, the calling thread included. */
    private final int threads;
    private final Progress progress;
    private final AtomicInteger evaluations = new AtomicInteger();
    private final ModelMemo memo = new ModelMemo();
    /**
     * The point and the weighted Jacobian one search last asked for. Each call of {@link #solve} has its own: Monte
     * Carlo refits run several searches on one solver at once, and a shared one let a search stop on another's
     * Jacobian (which made the Monte Carlo σ depend on the thread count in the sixth digit).
     */
    private static final class LastJacobian {
        double[] point;
        double[][] matrix;
    }

    Solver(FitProblem problem, ExecutorService pool, int threads, Progress progress) {
        this.problem = problem;
        this.pool = pool;
        this.threads = threads;
        this.progress = progress;
    }

    record Result(double[] u, double cost, int iterations, boolean converged) {
    }

    int evaluations() {
        return evaluations.get();
    }

    /**
     * Minimises Σ((y − m)/σ)².
     *
     * @param parallel whether to spread Jacobian columns over the pool (false inside a Monte Carlo worker)
     */
    Result solve(double[] u0, double[] uncertainValues, double[] y, double[] sigma, boolean parallel) {
        int n = y.length;
        double[] target = new double[n];
        for (int i = 0; i < n; i++) {
            target[i] = y[i] / sigma[i];
        }
        LastJacobian last = new LastJacobian();
        ValueAndJacobianFunction f = new ValueAndJacobianFunction() {
            @Override
            public RealVector computeValue(double[] u) {
                return new ArrayRealVector(weighted(u, uncertainValues, sigma), false);
            }

            @Override
            public RealMatrix computeJacobian(double[] u) {
                double[][] j = jacobian(u, uncertainValues, sigma, weighted(u, uncertainValues, sigma), parallel);
                last.point = u.clone();
                last.matrix = j;
                return new Array2DRowRealMatrix(j, false);
            }

            @Override
            public Pair<RealVector, RealMatrix> value(RealVector point) {
                double[] u = point.toArray();
                return new Pair<>(computeValue(u), computeJacobian(u));
            }
        };
        LeastSquaresBuilder b = new LeastSquaresBuilder()
                .start(clamp(u0.clone()))
                .model(f)
                .lazyEvaluation(true)
                .target(target)
                .parameterValidator(v -> new ArrayRealVector(clamp(v.toArray()), false))
                .checker((iteration, previous, current) -> stepWithinNoise(previous, current, n, last))
                .maxEvaluations(Integer.MAX_VALUE)
                .maxIterations(MAX_ITERATIONS);
        // a relative 1e-8 in the cost and the parameters is far inside any measurement's uncertainty
        LevenbergMarquardtOptimizer lm = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(1e-8)
                .withParameterRelativeTolerance(1e-8);
        try {
            LeastSquaresOptimizer.Optimum o = lm.optimize(b.build());
            double[] u = o.getPoint().toArray();
            return new Result(u, o.getCost() * o.getCost(), o.getIterations(), true);
        } catch (TooManyIterationsException | TooManyEvaluationsException | ConvergenceException e) {
            return new Result(u0.clone(), Double.POSITIVE_INFINITY, MAX_ITERATIONS, false);
        }
    }

    /**
     * Whether the accepted step from previous to current moved every u_a by less than {@link #STEP_WITHIN_SIGMA} of
     * σ_a = √(s² [(JᵀJ)⁻¹]_aa), J the Jacobian at previous and s² = χ²/(n − p) the residuals' own scale (so that the
     * test holds whatever the weights), the linearised σ of the fit (common practice, no source). Never when the
     * residuals vanish or JᵀJ is singular: the optimizer's own tolerances decide then.
     */
    private static boolean stepWithinNoise(LeastSquaresProblem.Evaluation previous,
                                           LeastSquaresProblem.Evaluation current, int n, LastJacobian last) {
        double[] from = previous.getPoint().toArray();
        double[] to = current.getPoint().toArray();
        int p = from.length;
        if (n <= p || last.matrix == null || !Arrays.equals(from, last.point)) {
            return false;
        }
        double[][] normal = new double[p][p];
        for (double[] row : last.matrix) {
            for (int a = 0; a < p; a++) {
                for (int b = 0; b < p; b++) {
                    normal[a][b] += row[a] * row[b];
                }
            }
        }
        DecompositionSolver inverse = new LUDecomposition(new Array2DRowRealMatrix(normal, false)).getSolver();
        if (!inverse.isNonSingular()) {
            return false;
        }
        RealMatrix covariance = inverse.getInverse();
        double s2 = current.getCost() * current.getCost() / (n - p);
        for (int a = 0; a < p; a++) {
            double sigma = Math.sqrt(s2 * covariance.getEntry(a, a));
            if (!(Math.abs(to[a] - from[a]) < STEP_WITHIN_SIGMA * sigma)) {
                return false;
            }
        }
        return true;
    }

    /** The weighted model m/σ of every dataset. */
    double[] weighted(double[] u, double[] uncertainValues, double[] sigma) {
        double[] m = unweighted(u, uncertainValues);
        double[] w = new double[m.length];
        for (int i = 0; i < m.length; i++) {
            w[i] = m[i] / sigma[i];
        }
        return w;
    }

    /** The model of every dataset at u, computed once per point (the array is shared: never change it). */
    double[] unweighted(double[] u, double[] uncertainValues) {
        if (progress.cancelled()) {
            throw new CancellationException("the fit was cancelled");
        }
        EvaluationCancelledException.checkpoint();
        double[] known = memo.get(u, uncertainValues);
        if (known != null) {
            return known;
        }
        evaluations.incrementAndGet();
        double[] m = problem.model(problem.values(u, uncertainValues));
        memo.put(u, uncertainValues, m);
        return m;
    }

    /** ∂(m/σ)/∂u by forward differences, as the search needs it. */
    private double[][] jacobian(double[] u, double[] unc, double[] sigma, double[] at, boolean parallel) {
        int p = u.length;
        double[][] columns = columns(p, parallel, j -> {
            double[] shifted = u.clone();
            shifted[j] += SEARCH_STEP;
            double[] up = weighted(shifted, unc, sigma);
            double[] c = new double[at.length];
            for (int i = 0; i < c.length; i++) {
                c[i] = (up[i] - at[i]) / SEARCH_STEP;
            }
            return c;
        });
        return transpose(columns, at.length);
    }

    /**
     * ∂(m/σ)/∂u for the covariance, by forward differences from the model at u, which the search has already computed:
     * p evaluations instead of the 2p of central ones; with the step {@link #FINAL_STEP} in u the truncation error is
     * about a 1e-4 part of each derivative, far below what moves a σ.
     */
    double[][] finalJacobian(double[] u, double[] unc, double[] sigma) {
        double[] at = weighted(u, unc, sigma);
        double[][] columns = columns(u.length, true, j -> {
            double[] plus = u.clone();
            plus[j] += FINAL_STEP;
            return difference(weighted(plus, unc, sigma), at, FINAL_STEP);
        });
        return transpose(columns, problem.points());
    }

    /** ∂(m/σ)/∂p_k for each uncertain input, in its natural unit, by central differences. */
    double[][] uncertainJacobian(double[] u, double[] unc, double[] sigma) {
        double[][] columns = columns(unc.length, true, k -> {
            double h = FINAL_STEP * Math.max(Math.abs(unc[k]), problem.uncertain.get(k).sigma());
            double[] plus = unc.clone();
            double[] minus = unc.clone();
            plus[k] += h;
            minus[k] -= h;
            return difference(weighted(u, plus, sigma), weighted(u, minus, sigma), 2 * h);
        });
        return transpose(columns, problem.points());
    }

    private interface Column {
        double[] compute(int j);
    }

    /**
     * The columns spread over at most {@link #threads} lanes, each taking every lanes-th column; the calling thread
     * runs the first lane itself instead of waiting idle, so two columns on two threads cost one hand-off.
     */
    private double[][] columns(int count, boolean parallel, Column c) {
        double[][] out = new double[count][];
        int lanes = parallel ? Math.min(count, threads) : 1;
        List<Future<?>> futures = new ArrayList<>();
        for (int lane = 1; lane < lanes; lane++) {
            final int first = lane;
            futures.add(pool.submit(() -> lane(out, first, lanes, c)));
        }
        try {
            lane(out, 0, lanes, c);
            for (Future<?> f : futures) {
                f.get();
            }
        } catch (InterruptedException e) {
            futures.forEach(f -> f.cancel(true));
            Thread.currentThread().interrupt();
            throw new CancellationException("interrupted");
        } catch (ExecutionException e) {
            futures.forEach(f -> f.cancel(true));
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            throw new ModelEvaluationException("a model evaluation failed: " + e.getCause(), e.getCause());
        } catch (RuntimeException e) {
            futures.forEach(f -> f.cancel(true));
            throw e;
        }
        return out;
    }

    private static void lane(double[][] out, int first, int lanes, Column c) {
        for (int j = first; j < out.length; j += lanes) {
            out[j] = c.compute(j);
        }
    }

    private static double[] difference(double[] a, double[] b, double h) {
        double[] c = new double[a.length];
        for (int i = 0; i < c.length; i++) {
            c[i] = (a[i] - b[i]) / h;
        }
        return c;
    }

    private static double[][] transpose(double[][] columns, int rows) {
        double[][] m = new double[rows][columns.length];
        for (int j = 0; j < columns.length; j++) {
            for (int i = 0; i < rows; i++) {
                m[i][j] = columns[j][i];
            }
        }
        return m;
    }

    double[] clamp(double[] u) {
        for (int i = 0; i < u.length; i++) {
            FreeInput f = problem.free.get(i);
            u[i] = Math.min(Math.max(u[i], f.uMin()), f.uMax());
        }
        return u;
    }
}
