package lamella.technique.tdtr;

import lamella.api.FrequencyResponse;
import lamella.api.ModelEvaluationException;

/**
 * A Chebyshev interpolant of g(s) = H(eˢ)·e^(s/2) on [a, b], in barycentric form on Chebyshev points of the first
 * kind (Berrut & Trefethen, SIAM Review 46, 501, 2004), which is stable at any degree.
 */
final class Chebyshev {

    private final double[] nodes;
    private final double[] weights;
    private final double[] re;
    private final double[] im;

    private Chebyshev(double[] nodes, double[] weights, double[] re, double[] im) {
        this.nodes = nodes;
        this.weights = weights;
        this.re = re;
        this.im = im;
    }

    /**
     * Fits with n nodes, doubling n until the interpolant matches exact values at check points between nodes to
     * the relative tolerance (relative to the largest |g|).
     */
    static Chebyshev fit(FrequencyResponse h, double a, double b, int firstDegree, int maxDegree, double tol) {
        double[] z = new double[2];
        for (int n = firstDegree; n <= maxDegree; n *= 2) {
            double[] x = new double[n];
            double[] w = new double[n];
            double[] gr = new double[n];
            double[] gi = new double[n];
            double scale = 0;
            for (int j = 0; j < n; j++) {
                double angle = Math.PI * (j + 0.5) / n;
                x[j] = 0.5 * (a + b) + 0.5 * (b - a) * Math.cos(angle);
                w[j] = ((j & 1) == 0 ? 1 : -1) * Math.sin(angle);
                g(h, x[j], z);
                gr[j] = z[0];
                gi[j] = z[1];
                scale = Math.max(scale, Math.hypot(z[0], z[1]));
            }
            Chebyshev c = new Chebyshev(x, w, gr, gi);
            double worst = 0;
            double[] e = new double[2];
            for (double t : new double[] {0.013, 0.137, 0.391, 0.644, 0.877, 0.991}) {
                double s = a + t * (b - a);
                g(h, s, z);
                c.at(s, e);
                worst = Math.max(worst, Math.hypot(e[0] - z[0], e[1] - z[1]));
            }
            if (worst <= tol * scale) {
                return c;
            }
        }
        throw new ModelEvaluationException("the high-frequency response could not be interpolated to " + tol
                + " with " + maxDegree + " Chebyshev nodes; it is not smooth between " + Math.exp(a) + " and "
                + Math.exp(b) + " Hz");
    }

    private static void g(FrequencyResponse h, double s, double[] out) {
        double f = Math.exp(s);
        h.at(f, out);
        double r = Math.sqrt(f);
        out[0] *= r;
        out[1] *= r;
        if (!Double.isFinite(out[0]) || !Double.isFinite(out[1])) {
            throw new ModelEvaluationException("the frequency response is not finite at " + f + " Hz");
        }
    }

    /** The interpolant at s, into out as (re, im). */
    void at(double s, double[] out) {
        double nr = 0;
        double ni = 0;
        double d = 0;
        for (int j = 0; j < nodes.length; j++) {
            double diff = s - nodes[j];
            if (diff == 0) {
                out[0] = re[j];
                out[1] = im[j];
                return;
            }
            double c = weights[j] / diff;
            nr += c * re[j];
            ni += c * im[j];
            d += c;
        }
        out[0] = nr / d;
        out[1] = ni / d;
    }
}
