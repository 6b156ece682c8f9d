package lamella.engine;

/**
 * The Bessel functions J₀ and J₁ for the Hankel transforms of axisymmetric heating, allocation-free. Power series
 * below x = 12 (at most about four digits lost to cancellation) and Hankel's asymptotic expansion above it, summed to
 * its smallest term (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, 9.1.10, 9.2.5 and 9.2.9–9.2.10);
 * absolute error below about 1e-11.
 *
 * <p>J₀(k r) is the transform of a thin ring of radius r (and of a point seen from r); J₁ enters the transforms of
 * a disc, 2 J₁(k a)/(k a) for a uniform disc of radius a, and of an annulus, the difference of two discs.
 */
public final class Bessel {

    private static final double SWITCH = 12.0;

    private Bessel() {
    }

    public static double j0(double x) {
        double ax = Math.abs(x);
        if (ax < SWITCH) {
            double y = -0.25 * ax * ax;
            double term = 1.0;
            double sum = 1.0;
            for (int k = 1; k < 60; k++) {
                term *= y / ((double) k * k);
                sum += term;
                if (Math.abs(term) < 1e-17 * Math.abs(sum) + 1e-300) {
                    break;
                }
            }
            return sum;
        }
        // J0 = sqrt(2/(πx)) (P cos χ − Q sin χ), χ = x − π/4
        return hankelAsymptotic(0, ax);
    }

    /** J₁(x); odd in x. */
    public static double j1(double x) {
        double ax = Math.abs(x);
        double value;
        if (ax < SWITCH) {
            // Σ (−x²/4)ᵏ / (k! (k+1)!) · x/2
            double y = -0.25 * ax * ax;
            double term = 0.5 * ax;
            double sum = term;
            for (int k = 1; k < 60; k++) {
                term *= y / ((double) k * (k + 1));
                sum += term;
                if (Math.abs(term) < 1e-17 * Math.abs(sum) + 1e-300) {
                    break;
                }
            }
            value = sum;
        } else {
            // J1 = sqrt(2/(πx)) (P cos χ − Q sin χ), χ = x − 3π/4
            value = hankelAsymptotic(1, ax);
        }
        return x < 0 ? -value : value;
    }

    /**
     * Hankel's expansion of J_n(x) for x ≥ {@value #SWITCH} (A&S 9.2.5, 9.2.9, 9.2.10): with μ = 4n², the k-th
     * term is s_k = s_{k−1} (μ − (2k−1)²)/(8 k x), s₀ = 1; P = s₀ − s₂ + s₄ − …, Q = s₁ − s₃ + s₅ − ….
     * Summed until the terms stop shrinking.
     */
    private static double hankelAsymptotic(int n, double ax) {
        double mu = 4.0 * n * n;
        double z = 8.0 * ax;
        double p = 1.0;
        double q = 0.0;
        double term = 1.0;
        double last = Double.MAX_VALUE;
        for (int k = 1; k < 80; k++) {
            double odd = 2 * k - 1;
            double next = term * (mu - odd * odd) / (k * z);
            double mag = Math.abs(next);
            if (mag > last) {
                break;
            }
            term = next;
            last = mag;
            // k = 1, 2, 3, 4, … adds to Q, P, Q, P with signs +, −, −, +, +, −, …: (−1)^⌊k/2⌋
            int phase = k / 2;
            double signed = (phase % 2 == 0 ? 1.0 : -1.0) * term;
            if ((k & 1) == 1) {
                q += signed;
            } else {
                p += signed;
            }
            if (mag < 1e-17) {
                break;
            }
        }
        double chi = ax - (0.5 * n + 0.25) * Math.PI;
        return Math.sqrt(2.0 / (Math.PI * ax)) * (p * Math.cos(chi) - q * Math.sin(chi));
    }
}
