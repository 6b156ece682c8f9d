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
 * <p>Cancellable: the thread's interrupt flag is checked before every response evaluated and every
 * {@value #RESEED} terms summed (microseconds), ending the sum with {@link EvaluationCancelledException}.
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
        int exact = interpolate ? Math.min(EXACT_TERMS, m) : m;
        Harmonics harmonics = Harmonics.of(fMod, fRep, cutoff, m, exact);
        double[] wr = new double[2 * m + 1];
        double[] wi = new double[2 * m + 1];
        fill(h, harmonics, wr, wi);
        double[] g = harmonics.weight;
        for (int j = 0; j < wr.length; j++) {
            wr[j] *= g[j];
            wi[j] *= g[j];
        }
        return sum(delays, wr, wi);
    }

    /**
     * Σ W_j e^{ijθ} at every delay, θ = 2π f_rep t. The delays advance together term by term, so that the inner loop
     * runs over delays and compiles to vector instructions; for each delay the arithmetic and its order are those of
     * a sum delay by delay.
     */
    private double[][] sum(double[] delays, double[] wr, double[] wi) {
        int m = terms;
        int n = delays.length;
        double[] theta = new double[n];
        double[] sr = new double[n];
        double[] si = new double[n];
        double[] cr = new double[n];
        double[] ci = new double[n];
        double[] stepR = new double[n];
        double[] stepI = new double[n];
        for (int d = 0; d < n; d++) {
            theta[d] = 2 * Math.PI * fRep * delays[d];
            sr[d] = wr[m];
            si[d] = wi[m];
            cr[d] = 1;
            stepR[d] = Math.cos(theta[d]);
            stepI[d] = Math.sin(theta[d]);
        }
        for (int j = 1; j <= m; j++) {
            if (j % RESEED == 0) {
                EvaluationCancelledException.checkpoint();
                for (int d = 0; d < n; d++) {
                    cr[d] = Math.cos(j * theta[d]);
                    ci[d] = Math.sin(j * theta[d]);
                }
            } else {
                for (int d = 0; d < n; d++) {
                    double t = cr[d] * stepR[d] - ci[d] * stepI[d];
                    ci[d] = cr[d] * stepI[d] + ci[d] * stepR[d];
                    cr[d] = t;
                }
            }
            // W₊ e^{ijθ} + W₋ e^{−ijθ}
            double pr = wr[m + j];
            double pi = wi[m + j];
            double nr = wr[m - j];
            double ni = wi[m - j];
            double evenR = pr + nr;
            double oddI = pi - ni;
            double evenI = pi + ni;
            double oddR = pr - nr;
            for (int d = 0; d < n; d++) {
                sr[d] += evenR * cr[d] - oddI * ci[d];
                si[d] += evenI * cr[d] + oddR * ci[d];
            }
        }
        return new double[][] {sr, si};
    }

    /** H at f_mod + j f_rep for j = −m…m, using H(−f) = conj H(f). */
    private void fill(FrequencyResponse h, Harmonics harmonics, double[] wr, double[] wi) {
        int m = terms;
        double[] z = new double[2];
        int exact = harmonics.exact;
        for (int j = -exact; j <= exact; j++) {
            value(h, fMod + j * fRep, z);
            wr[j + m] = z[0];
            wi[j + m] = z[1];
        }
        if (exact == m) {
            return;
        }
        Chebyshev c = Chebyshev.fit(h, harmonics.lnLo, harmonics.lnHi, FIRST_DEGREE, MAX_DEGREE,
                INTERPOLATION_TOLERANCE);
        int tail = m - exact;
        double[] re = new double[tail];
        double[] im = new double[tail];
        c.atAll(harmonics.tPlus, harmonics.twoTPlus, re, im);
        double[] root = harmonics.rootPlus;
        for (int i = 0; i < tail; i++) {
            wr[m + exact + 1 + i] = re[i] * root[i];
            wi[m + exact + 1 + i] = im[i] * root[i];
        }
        c.atAll(harmonics.tMinus, harmonics.twoTMinus, re, im);
        root = harmonics.rootMinus;
        for (int i = 0; i < tail; i++) {
            wr[m - exact - 1 - i] = re[i] * root[i];
            wi[m - exact - 1 - i] = -im[i] * root[i];
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
