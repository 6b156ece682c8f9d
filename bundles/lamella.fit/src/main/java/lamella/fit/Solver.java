package lamella.fit;

import java.util.ArrayList;
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
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.ValueAndJacobianFunction;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.RealVector;
import org.apache.commons.math3.util.Pair;

/**
 * Levenberg–Marquardt (Apache Commons Math) on the weighted residuals (data − model)/σ in the fitting variables u,
 * bounds enforced by projecting each trial point onto them. Jacobians by finite differences, their columns computed
 * in parallel, and only where the search needs one: at the points it accepts, not at trial points it rejects or the
 * point it stops at. A point's model is computed once: the search asks for a value several times, and the
 * reweighting passes and the uncertainty start where the search ended ({@link ModelMemo}).
 */
final class Solver {

    /** Forward-difference step in u during the search (relative 1e-6 for log-scaled inputs). */
    private static final double SEARCH_STEP = 1e-6;
    /** Central-difference step for the Jacobian the uncertainty is computed from. */
    static final double FINAL_STEP = 1e-4;
    private static final int MAX_ITERATIONS = 200;

    private final FitProblem problem;
    private final ExecutorService pool;
    private final Progress progress;
    private final AtomicInteger evaluations = new AtomicInteger();
    private final ModelMemo memo = new ModelMemo();

    Solver(FitProblem problem, ExecutorService pool, Progress progress) {
        this.problem = problem;
        this.pool = pool;
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
        ValueAndJacobianFunction f = new ValueAndJacobianFunction() {
            @Override
            public RealVector computeValue(double[] u) {
                return new ArrayRealVector(weighted(u, uncertainValues, sigma), false);
            }

            @Override
            public RealMatrix computeJacobian(double[] u) {
                return new Array2DRowRealMatrix(jacobian(u, uncertainValues, sigma,
                        weighted(u, uncertainValues, sigma), parallel), false);
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

    /** ∂(m/σ)/∂u by central differences, for the covariance. */
    double[][] centralJacobian(double[] u, double[] unc, double[] sigma) {
        double[][] columns = columns(u.length, true, j -> {
            double[] plus = u.clone();
            double[] minus = u.clone();
            plus[j] += FINAL_STEP;
            minus[j] -= FINAL_STEP;
            return difference(weighted(plus, unc, sigma), weighted(minus, unc, sigma), 2 * FINAL_STEP);
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

    private double[][] columns(int count, boolean parallel, Column c) {
        double[][] out = new double[count][];
        if (!parallel || count < 2) {
            for (int j = 0; j < count; j++) {
                out[j] = c.compute(j);
            }
            return out;
        }
        List<Future<double[]>> futures = new ArrayList<>();
        for (int j = 0; j < count; j++) {
            final int col = j;
            futures.add(pool.submit(() -> c.compute(col)));
        }
        for (int j = 0; j < count; j++) {
            try {
                out[j] = futures.get(j).get();
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
                throw new CancellationException("interrupted");
            } catch (ExecutionException e) {
                if (e.getCause() instanceof RuntimeException r) {
                    throw r;
                }
                throw new ModelEvaluationException("a model evaluation failed: " + e.getCause(), e.getCause());
            }
        }
        return out;
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
