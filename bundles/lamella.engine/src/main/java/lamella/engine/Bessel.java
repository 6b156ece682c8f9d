package lamella.engine;

/**
 * The Bessel function J₀ for the Hankel transforms of axisymmetric heating, allocation-free. Power series below
 * x = 12 (at most about four digits lost to cancellation) and Hankel's asymptotic expansion above it, summed to its
 * smallest term (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, 9.1.10 and 9.2.5); absolute error
 * below about 1e-11.
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
        double z = 8.0 * ax;
        double p = 1.0;
        double q = 0.0;
        double term = 1.0;
        double last = Double.MAX_VALUE;
        for (int k = 1; k < 80; k++) {
            double odd = 2 * k - 1;
            term *= odd * odd / (k * z);
            double mag = Math.abs(term);
            if (mag > last) {
                break;
            }
            last = mag;
            // terms alternate between Q (k odd) and P (k even) with signs −,−,+,+,−,−,…
            int phase = (k + 1) / 2;
            double signed = (phase % 2 == 1 ? -1.0 : 1.0) * term;
            if ((k & 1) == 1) {
                q += signed;
            } else {
                p += signed;
            }
            if (mag < 1e-17) {
                break;
            }
        }
        double chi = ax - 0.25 * Math.PI;
        return Math.sqrt(2.0 / (Math.PI * ax)) * (p * Math.cos(chi) - q * Math.sin(chi));
    }
}
