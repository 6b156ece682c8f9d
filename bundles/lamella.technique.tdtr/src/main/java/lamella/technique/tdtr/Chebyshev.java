package lamella.technique.tdtr;

import java.util.concurrent.ConcurrentHashMap;
import lamella.api.EvaluationCancelledException;
import lamella.api.FrequencyResponse;
import lamella.api.ModelEvaluationException;

/**
 * A Chebyshev interpolant of g(s) = H(eˢ)·e^(s/2) on [a, b] through Chebyshev points of the first kind, held as its
 * Chebyshev coefficients and evaluated by Clenshaw's recurrence, which is stable and needs no division (Press et
 * al., Numerical Recipes, 3rd ed., 2007, §5.8). {@link #atAll} runs the same recurrence for many points at once, point
 * by point the same arithmetic in the same order as {@link #at}, so the results are identical.
 */
final class Chebyshev {

    /** Tables are kept for node counts up to this (the doubling from 48 reaches it after two steps). */
    private static final int CACHED_NODES = 192;
    private static final ConcurrentHashMap<Integer, double[]> COSINES = new ConcurrentHashMap<>();

    private final double a;
    private final double b;
    private final double[] cr;
    private final double[] ci;

    private Chebyshev(double a, double b, double[] re, double[] im) {
        this.a = a;
        this.b = b;
        int n = re.length;
        cr = new double[n];
        ci = new double[n];
        double[] cos = cosines(n);
        for (int k = 0; k < n; k++) {
            double sr = 0;
            double si = 0;
            for (int j = 0; j < n; j++) {
                double c = cos[k * n + j];
                sr += re[j] * c;
                si += im[j] * c;
            }
            cr[k] = 2.0 * sr / n;
            ci[k] = 2.0 * si / n;
        }
    }

    /** cos(π k (j + ½) / n) for k, j < n, row by row: the same for every fit of n nodes. */
    private static double[] cosines(int n) {
        if (n <= CACHED_NODES) {
            double[] known = COSINES.get(n);
            if (known != null) {
                return known;
            }
        }
        double[] cos = new double[n * n];
        for (int k = 0; k < n; k++) {
            for (int j = 0; j < n; j++) {
                cos[k * n + j] = Math.cos(Math.PI * k * (j + 0.5) / n);
            }
        }
        if (n <= CACHED_NODES) {
            COSINES.putIfAbsent(n, cos);
        }
        return cos;
    }

    /**
     * Fits with n nodes, doubling n until the interpolant matches exact values at check points between nodes to
     * the relative tolerance (relative to the largest |g|).
     */
    static Chebyshev fit(FrequencyResponse h, double a, double b, int firstDegree, int maxDegree, double tol) {
        double[] z = new double[2];
        for (int n = firstDegree; n <= maxDegree; n *= 2) {
            double[] x = new double[n];
            double[] gr = new double[n];
            double[] gi = new double[n];
            double scale = 0;
            for (int j = 0; j < n; j++) {
                double angle = Math.PI * (j + 0.5) / n;
                x[j] = 0.5 * (a + b) + 0.5 * (b - a) * Math.cos(angle);
                g(h, x[j], z);
                gr[j] = z[0];
                gi[j] = z[1];
                scale = Math.max(scale, Math.hypot(z[0], z[1]));
            }
            Chebyshev c = new Chebyshev(a, b, gr, gi);
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
        throw new ModelEvaluationException("the high-frequency response could not be interpolated to a relative "
                + String.format(java.util.Locale.ROOT, "%.0e", tol) + " with " + maxDegree
                + " Chebyshev nodes; it is not smooth between " + frequency(Math.exp(a)) + " and "
                + frequency(Math.exp(b)));
    }

    /** A frequency in words for a message: three significant digits in Hz, kHz, MHz, GHz or THz. */
    static String frequency(double hz) {
        String[] units = {"Hz", "kHz", "MHz", "GHz", "THz"};
        int k = 0;
        double v = hz;
        while (k < units.length - 1 && Math.abs(v) >= 999.5) {
            v /= 1000;
            k++;
        }
        return new java.math.BigDecimal(v).round(new java.math.MathContext(3)).stripTrailingZeros().toPlainString()
                + " " + units[k];
    }

    private static void g(FrequencyResponse h, double s, double[] out) {
        EvaluationCancelledException.checkpoint();
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
        double t = (2 * s - a - b) / (b - a);
        double twoT = 2 * t;
        double r1 = 0;
        double r2 = 0;
        double i1 = 0;
        double i2 = 0;
        for (int k = cr.length - 1; k >= 1; k--) {
            double r0 = cr[k] + twoT * r1 - r2;
            double i0 = ci[k] + twoT * i1 - i2;
            r2 = r1;
            r1 = r0;
            i2 = i1;
            i1 = i0;
        }
        out[0] = 0.5 * cr[0] + t * r1 - r2;
        out[1] = 0.5 * ci[0] + t * i1 - i2;
    }

    /** Nodes of the fit: the polynomial's degree plus one. */
    int nodes() {
        return cr.length;
    }

    /** The left end a of the interval [a, b] the interpolant is fitted on. */
    double from() {
        return a;
    }

    /** The right end b. */
    double to() {
        return b;
    }

    /**
     * The interpolant at many points, as {@link #at} gives each: {@code t} and {@code twoT} hold each point's
     * t = (2s − a − b)/(b − a) and 2t. The recurrence runs over all points per coefficient, which the JIT compiles
     * to vector instructions.
     */
    void atAll(double[] t, double[] twoT, double[] outRe, double[] outIm) {
        int count = t.length;
        double[] r1 = new double[count];
        double[] r2 = new double[count];
        double[] r0 = new double[count];
        double[] i1 = new double[count];
        double[] i2 = new double[count];
        double[] i0 = new double[count];
        for (int k = cr.length - 1; k >= 1; k--) {
            double ck = cr[k];
            double cik = ci[k];
            for (int j = 0; j < count; j++) {
                r0[j] = ck + twoT[j] * r1[j] - r2[j];
                i0[j] = cik + twoT[j] * i1[j] - i2[j];
            }
            double[] r = r2;
            r2 = r1;
            r1 = r0;
            r0 = r;
            double[] i = i2;
            i2 = i1;
            i1 = i0;
            i0 = i;
        }
        double half = 0.5 * cr[0];
        double halfI = 0.5 * ci[0];
        for (int j = 0; j < count; j++) {
            outRe[j] = half + t[j] * r1[j] - r2[j];
            outIm[j] = halfI + t[j] * i1[j] - i2[j];
        }
    }
}
