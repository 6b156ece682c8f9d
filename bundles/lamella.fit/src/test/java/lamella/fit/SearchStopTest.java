package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import lamella.api.CaseDocument;
import lamella.api.fit.Progress;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealMatrix;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Where the search stops: the Gauss–Newton step still left from there, (JᵀJ)⁻¹Jᵀr, is below 0.02 of each input's
 * linearised σ — the stop lies inside the noise of the minimum, although the search no longer polishes it to 1e-8
 * (common practice, no source).
 */
class SearchStopTest {

    @TempDir
    Path dir;

    /**
     * The FDTR fit of the film's conductivity and the cap's conductance, with no bounds, to phase data at these
     * frequencies made from the truth of {@link FitTest} with 0.1° of noise of this seed.
     */
    static FitProblem filmAndCapFree(Path dir, double[] f, long seed) throws Exception {
        String beams = FitTest.BEAMS + "," + FitTest.FDTR;
        double[] clean = Synthetic.model(dir, "{" + Synthetic.STACK.formatted(FitTest.G_CAP, FitTest.K_FILM) + ","
                + beams + "}", f, "phase_deg");
        Synthetic.data(dir.resolve("fdtr.csv"), "frequency_hz", f, "phase_deg", clean, 0.1, seed, false);
        CaseDocument doc = Synthetic.read(dir, "{" + Synthetic.STACK.formatted(5e7, 3.0) + "," + beams + ","
                + "\"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}],"
                + "\"free\": [{\"layer\": \"film\", \"property\": \"k_through_w_mk\"},"
                + "           {\"layer\": \"cap\", \"property\": \"conductance_below_w_m2k\"}]}}");
        return FitProblem.of(doc, FitBlockReader.read(doc), Synthetic.CATALOG);
    }

    @Test
    void theStepLeftWhereTheSearchStopsIsFarInsideSigma() throws Exception {
        double[] f = Synthetic.logSpaced(1e4, 2e7, 30);
        for (long seed : new long[] {3, 11, 29}) {
            FitProblem problem = filmAndCapFree(dir, f, seed);
            ExecutorService pool = Executors.newFixedThreadPool(1);
            try {
                Solver solver = new Solver(problem, pool, 1, Progress.NONE);
                double[] y = problem.data();
                double[] sigma = new double[y.length];
                Arrays.fill(sigma, 0.1);
                double[] unc = problem.nominalUncertain();
                double[] u0 = new double[problem.free.size()];
                for (int a = 0; a < u0.length; a++) {
                    u0[a] = problem.free.get(a).toU(problem.free.get(a).initial());
                }
                double[] u = solver.solve(u0, unc, y, sigma, false).u();
                double[][] j = solver.finalJacobian(u, unc, sigma);
                double[] m = solver.weighted(u, unc, sigma);
                int p = u.length;
                double[] gradient = new double[p];
                double[][] normal = new double[p][p];
                double chi2 = 0;
                for (int i = 0; i < y.length; i++) {
                    double r = y[i] / sigma[i] - m[i];
                    chi2 += r * r;
                    for (int a = 0; a < p; a++) {
                        gradient[a] += j[i][a] * r;
                        for (int b = 0; b < p; b++) {
                            normal[a][b] += j[i][a] * j[i][b];
                        }
                    }
                }
                RealMatrix c = new LUDecomposition(new Array2DRowRealMatrix(normal)).getSolver().getInverse();
                double s2 = chi2 / (y.length - p);
                for (int a = 0; a < p; a++) {
                    double step = 0;
                    for (int b = 0; b < p; b++) {
                        step += c.getEntry(a, b) * gradient[b];
                    }
                    double sigmaU = Math.sqrt(s2 * c.getEntry(a, a));
                    assertTrue(Math.abs(step) < 0.02 * sigmaU, "seed " + seed + ", input " + a + ": step left "
                            + step + " against σ " + sigmaU);
                }
            } finally {
                pool.shutdownNow();
            }
        }
    }
}
