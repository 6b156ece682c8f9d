package lamella.fit;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.linear.SingularValueDecomposition;

/**
 * The linearised covariance of fitted variables, C = (JᵀJ)⁻¹ for J = ∂((m)/σ)/∂u at the best fit, by singular-value
 * decomposition so that a Jacobian with nearly dependent columns is recognised instead of inverted into noise.
 */
final class Covariance {

    /** Condition numbers of J beyond this mean the data cannot separate some inputs at all. */
    static final double SINGULAR_CONDITION = 1e8;

    final double[][] matrix;
    final double condition;
    /** Per variable: its weight in the direction the data see least, when J is singular; else zeros. */
    final double[] weakestDirection;

    private Covariance(double[][] matrix, double condition, double[] weakestDirection) {
        this.matrix = matrix;
        this.condition = condition;
        this.weakestDirection = weakestDirection;
    }

    static Covariance of(double[][] jacobian) {
        RealMatrix j = new Array2DRowRealMatrix(jacobian, false);
        SingularValueDecomposition svd = new SingularValueDecomposition(j);
        double[] s = svd.getSingularValues();
        int p = s.length;
        double condition = s[p - 1] > 0 ? s[0] / s[p - 1] : Double.POSITIVE_INFINITY;
        RealMatrix v = svd.getV();
        double[][] c = new double[p][p];
        for (int a = 0; a < p; a++) {
            for (int b = 0; b < p; b++) {
                double sum = 0;
                for (int k = 0; k < p; k++) {
                    sum += v.getEntry(a, k) * v.getEntry(b, k) / (s[k] * s[k]);
                }
                c[a][b] = sum;
            }
        }
        double[] weakest = new double[p];
        if (condition > SINGULAR_CONDITION) {
            for (int a = 0; a < p; a++) {
                weakest[a] = v.getEntry(a, p - 1);
            }
        }
        return new Covariance(c, condition, weakest);
    }

    /** (JᵀJ)⁻¹Jᵀ, the map from weighted-residual changes to fitted-variable changes. */
    double[][] solveMap(double[][] jacobian) {
        int p = matrix.length;
        int n = jacobian.length;
        double[][] m = new double[p][n];
        for (int a = 0; a < p; a++) {
            for (int i = 0; i < n; i++) {
                double sum = 0;
                for (int b = 0; b < p; b++) {
                    sum += matrix[a][b] * jacobian[i][b];
                }
                m[a][i] = sum;
            }
        }
        return m;
    }
}
