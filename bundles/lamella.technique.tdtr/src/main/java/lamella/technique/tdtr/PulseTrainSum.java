package lamella.technique.tdtr;

import lamella.api.EvaluationCancelledException;
import lamella.api.FrequencyResponse;
import lamella.api.ModelEvaluationException;

/**
 * The lock-in sum S(t) = Σₘ g(m) H(f_mod + m f_rep) exp(i2π m f_rep t).
 *
 * <p>Cut off plainly after a few thousand terms the sum rings (about 1 % at 100 ps), because H decays only like
 * f^(−1/2). The convergence factor g(m) = exp(−π (m f_rep / f_c)²) makes it converge; in time it convolves the
 * ideal signal with a Gaussian of standard deviation 1/(√(2π) f_c), two picoseconds for the default f_c = 2e11 Hz —
 * about the pump–probe cross-correlation of a typical instrument, and about 1.5e-4 of the signal at 100 ps.
 *
 * <p>The terms beyond a few repetition harmonics vary smoothly: H(f)·√f is interpolated there in ln f by a
 * Chebyshev polynomial whose degree is doubled until it reproduces exact values at check points to 1e-9, so a
 * converged curve costs some fifty spectral integrals instead of tens of thousands.
 *
 * <p>Cancellable: the thread's interrupt flag is checked before every response evaluated and every delay summed
 * (a few thousand terms, microseconds), ending the sum with {@link EvaluationCancelledException}.
 */
final class PulseTrainSum {

    /** Default convergence-factor frequency f_c (Hz). */
    static final double DEFAULT_CUTOFF = 2e11;
    /** Terms with weight below exp(−π x²) = 1e-10 are left out. */
    private static final double WEIGHT_FLOOR_X = Math.sqrt(Math.log(1e10) / Math.PI);
    /** Terms |m| ≤ this are always evaluated exactly. */
    private static final int EXACT_TERMS = 10;
    private static final int FIRST_DEGREE = 48;
    private static final int MAX_DEGREE = 768;
    private static final double INTERPOLATION_TOLERANCE = 1e-9;
    /** Re-seed the phase recurrence exactly this often to keep rounding from building up. */
    private static final int RESEED = 256;

    private final double fMod;
    private final double fRep;
    private final double cutoff;
    private final int terms;
    private final boolean interpolate;

    private PulseTrainSum(double fMod, double fRep, double cutoff, int terms, boolean interpolate) {
        this.fMod = fMod;
        this.fRep = fRep;
        this.cutoff = cutoff;
        this.terms = terms;
        this.interpolate = interpolate;
    }

    /** The converged sum with the default convergence factor and interpolated high-order terms. */
    static PulseTrainSum converged(double fMod, double fRep) {
        return withCutoff(fMod, fRep, DEFAULT_CUTOFF, true);
    }

    /** A converged sum with convergence-factor frequency f_c; {@code interpolate=false} evaluates every term. */
    static PulseTrainSum withCutoff(double fMod, double fRep, double cutoff, boolean interpolate) {
        int m = (int) Math.ceil(WEIGHT_FLOOR_X * cutoff / fRep);
        return new PulseTrainSum(fMod, fRep, cutoff, m, interpolate);
    }

    /** The plain sum over |m| ≤ terms without a convergence factor, every term exact (to show why it fails). */
    static PulseTrainSum plain(double fMod, double fRep, int terms) {
        return new PulseTrainSum(fMod, fRep, Double.POSITIVE_INFINITY, terms, false);
    }

    /** Number of terms on each side of m = 0. */
    int terms() {
        return terms;
    }

    /**
     * @return {re[], im[]} of S at each delay
     */
    double[][] evaluate(double[] delays, FrequencyResponse h) {
        int m = terms;
        double[] wr = new double[2 * m + 1];
        double[] wi = new double[2 * m + 1];
        fill(h, wr, wi);
        for (int j = -m; j <= m; j++) {
            double x = j * fRep / cutoff;
            double g = Double.isInfinite(cutoff) ? 1.0 : Math.exp(-Math.PI * x * x);
            wr[j + m] *= g;
            wi[j + m] *= g;
        }
        double[][] s = new double[2][delays.length];
        for (int d = 0; d < delays.length; d++) {
            EvaluationCancelledException.checkpoint();
            double theta = 2 * Math.PI * fRep * delays[d];
            double sr = wr[m];
            double si = wi[m];
            double cr = 1;
            double ci = 0;
            double stepR = Math.cos(theta);
            double stepI = Math.sin(theta);
            for (int j = 1; j <= m; j++) {
                if (j % RESEED == 0) {
                    cr = Math.cos(j * theta);
                    ci = Math.sin(j * theta);
                } else {
                    double t = cr * stepR - ci * stepI;
                    ci = cr * stepI + ci * stepR;
                    cr = t;
                }
                // W₊ e^{ijθ} + W₋ e^{−ijθ}
                double pr = wr[m + j];
                double pi = wi[m + j];
                double nr = wr[m - j];
                double ni = wi[m - j];
                sr += (pr + nr) * cr - (pi - ni) * ci;
                si += (pi + ni) * cr + (pr - nr) * ci;
            }
            s[0][d] = sr;
            s[1][d] = si;
        }
        return s;
    }

    /** H at f_mod + j f_rep for j = −m…m, using H(−f) = conj H(f). */
    private void fill(FrequencyResponse h, double[] wr, double[] wi) {
        int m = terms;
        double[] z = new double[2];
        int exact = interpolate ? Math.min(EXACT_TERMS, m) : m;
        for (int j = -exact; j <= exact; j++) {
            value(h, fMod + j * fRep, z);
            wr[j + m] = z[0];
            wi[j + m] = z[1];
        }
        if (exact == m) {
            return;
        }
        double fLo = (exact + 1) * fRep - fMod;
        double fHi = m * fRep + fMod;
        Chebyshev c = Chebyshev.fit(h, Math.log(fLo), Math.log(fHi), FIRST_DEGREE, MAX_DEGREE,
                INTERPOLATION_TOLERANCE);
        for (int j = exact + 1; j <= m; j++) {
            double fp = fMod + j * fRep;
            c.at(Math.log(fp), z);
            double s = 1 / Math.sqrt(fp);
            wr[m + j] = z[0] * s;
            wi[m + j] = z[1] * s;
            double fn = j * fRep - fMod;
            c.at(Math.log(fn), z);
            s = 1 / Math.sqrt(fn);
            wr[m - j] = z[0] * s;
            wi[m - j] = -z[1] * s;
        }
    }

    private static void value(FrequencyResponse h, double f, double[] out) {
        EvaluationCancelledException.checkpoint();
        h.at(Math.abs(f), out);
        if (f < 0) {
            out[1] = -out[1];
        }
        if (!Double.isFinite(out[0]) || !Double.isFinite(out[1])) {
            throw new ModelEvaluationException("the frequency response is not finite at " + Math.abs(f) + " Hz");
        }
    }
}
