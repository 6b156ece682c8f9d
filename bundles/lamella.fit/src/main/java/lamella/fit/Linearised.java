package lamella.fit;

import java.util.List;

/**
 * The linearised uncertainty of the free inputs at one point, from the Jacobians of the weighted model: the noise
 * covariance (JᵀJ)⁻¹ and, for every uncertain input k, its σ_k carried through ∂u/∂p_k = −(JᵀJ)⁻¹Jᵀ ∂(m/σ)/∂p_k
 * (Yang, Ziade & Schmidt, Rev. Sci. Instrum. 87, 014901, 2016). A fit computes it at its best fit; a plan at the
 * case's values, with the expected noise as σ.
 */
final class Linearised {

    final Covariance covariance;
    /** Per free input: the noise-only 1σ in its fitting variable u. */
    final double[] sigmaU;
    /** Per free input: the noise-only 1σ in its natural unit. */
    final double[] noise;
    /** [k][a]: the 1σ that uncertain input k contributes to free input a, natural unit, ≥ 0. */
    final double[][] contributions;
    /** Per free input: noise and every uncertain input in quadrature, natural unit (+∞ when singular). */
    final double[] total;
    /** Per free input: whether the data cannot tell it apart from the other free inputs. */
    final boolean[] singular;

    private Linearised(Covariance covariance, double[] sigmaU, double[] noise, double[][] contributions,
                       double[] total, boolean[] singular) {
        this.covariance = covariance;
        this.sigmaU = sigmaU;
        this.noise = noise;
        this.contributions = contributions;
        this.total = total;
        this.singular = singular;
    }

    /**
     * @param j  ∂(m/σ)/∂u, one row per point, one column per free input
     * @param ju ∂(m/σ)/∂p_k, one row per point, one column per uncertain input (natural units)
     */
    static Linearised of(double[][] j, double[][] ju, List<FreeInput> free, List<UncertainInput> uncertain,
                         double[] u) {
        Covariance cov = Covariance.of(j);
        int p = u.length;
        double[] sigmaU = new double[p];
        double[] noise = new double[p];
        double[] totalVar = new double[p];
        for (int a = 0; a < p; a++) {
            sigmaU[a] = Math.sqrt(cov.matrix[a][a]);
            noise[a] = sigmaU[a] * free.get(a).dPdU(u[a]);
            totalVar[a] = noise[a] * noise[a];
        }
        int kCount = uncertain.size();
        double[][] contributions = new double[kCount][p];
        if (kCount > 0) {
            double[][] map = cov.solveMap(j);
            for (int k = 0; k < kCount; k++) {
                for (int a = 0; a < p; a++) {
                    double sum = 0;
                    for (int i = 0; i < ju.length; i++) {
                        sum += map[a][i] * ju[i][k];
                    }
                    double c = Math.abs(sum * uncertain.get(k).sigma()) * free.get(a).dPdU(u[a]);
                    contributions[k][a] = c;
                    totalVar[a] += c * c;
                }
            }
        }
        boolean[] singular = new boolean[p];
        double[] total = new double[p];
        for (int a = 0; a < p; a++) {
            singular[a] = cov.condition > Covariance.SINGULAR_CONDITION && Math.abs(cov.weakestDirection[a]) > 0.1;
            total[a] = singular[a] ? Double.POSITIVE_INFINITY : Math.sqrt(totalVar[a]);
        }
        return new Linearised(cov, sigmaU, noise, contributions, total, singular);
    }

    /** The noise-only relative 1σ the fit judges identifiability by (in ln p for log-scaled inputs). */
    double relativeNoise(int a, FreeInput f, double u) {
        return f.logScale() ? sigmaU[a] : noise[a] / Math.max(Math.abs(f.toP(u)), 1e-300);
    }

    boolean identifiable(int a, FreeInput f, double u) {
        return !singular[a] && relativeNoise(a, f, u) <= FitRunner.IDENTIFIABLE_LIMIT;
    }
}
