package lamella.geometry.elliptic;

/**
 * e^(−x) Iₘ(x) for m = 0 … M and x ≥ 0, the modified Bessel functions of integer order scaled so that they never
 * overflow (Abramowitz & Stegun, Handbook of Mathematical Functions, 1964, chapter 9):
 * <ul>
 * <li>x below {@value #SERIES_BELOW}: the power series 9.6.10, of which four terms are exact there;
 * <li>up to x = {@value #FORWARD_FROM}: Miller's backward recurrence I_{m−1} = I_{m+1} + (2m/x) Iₘ (9.6.26), which
 * computes the solution that decays with m, started at order M + 15 + x, far enough above M and x that the start's
 * error has died out (below 1e-15 of I₀ for M ≤ 64), and normalised by e^x = I₀ + 2 Σ_{m≥1} Iₘ (9.6.37 at θ = 0);
 * <li>beyond, where the orders wanted lie far below x and the recurrence is nearly neutral: forward from e^(−x) I₀
 * ({@link ScaledBesselI0}) and e^(−x) I₁, the latter from Hankel's asymptotic expansion (9.7.1).
 * </ul>
 * Allocation-free: the caller gives the array.
 */
final class ScaledBesselOrders {

    /** Below this x, the power series. */
    static final double SERIES_BELOW = 1e-3;
    /** Above this x, forward recurrence; below, backward from order M + 15 + x. */
    static final double FORWARD_FROM = 500.0;
    private static final double RESCALE_ABOVE = 1e200;

    private ScaledBesselOrders() {
    }

    /**
     * @param x   the argument, ≥ 0
     * @param max the highest order M wanted; {@code out} must hold M + 1 values
     * @param out receives e^(−x) Iₘ(x) for m = 0 … M
     */
    static void of(double x, int max, double[] out) {
        if (x < SERIES_BELOW) {
            series(x, max, out);
        } else if (x > FORWARD_FROM) {
            forward(x, max, out);
        } else {
            backward(x, max, out);
        }
    }

    private static void series(double x, int max, double[] out) {
        out[0] = ScaledBesselI0.of(x);
        double q = 0.25 * x * x;
        double leading = Math.exp(-x);
        for (int m = 1; m <= max; m++) {
            // e^(−x) (x/2)^m / m! Σ_k (x²/4)^k / (k! (m+1)…(m+k))
            leading *= 0.5 * x / m;
            double term = 1.0;
            double sum = 1.0;
            for (int k = 1; k <= 3; k++) {
                term *= q / (k * (double) (m + k));
                sum += term;
            }
            out[m] = leading * sum;
        }
    }

    private static void backward(double x, int max, double[] out) {
        int start = max + 15 + (int) Math.ceil(x);
        double twoOverX = 2 / x;
        double above = 0.0;
        double here = 1e-300;
        // y₁ + y₂ + … so far, for the normalisation
        double tail = 0.0;
        for (int m = start; m > 0; m--) {
            // here = y_m, above = y_{m+1}: y_{m−1} = y_{m+1} + (2m/x) y_m
            double below = above + m * twoOverX * here;
            above = here;
            here = below;
            tail += above;
            if (m - 1 <= max) {
                out[m - 1] = here;
            }
            if (here > RESCALE_ABOVE) {
                here /= RESCALE_ABOVE;
                above /= RESCALE_ABOVE;
                tail /= RESCALE_ABOVE;
                for (int j = Math.max(m - 1, 0); j <= max; j++) {
                    out[j] /= RESCALE_ABOVE;
                }
            }
        }
        double norm = 1 / (here + 2 * tail);
        for (int m = 0; m <= max; m++) {
            out[m] *= norm;
        }
    }

    private static void forward(double x, int max, double[] out) {
        out[0] = ScaledBesselI0.of(x);
        if (max == 0) {
            return;
        }
        out[1] = scaledI1Asymptotic(x);
        for (int m = 1; m < max; m++) {
            out[m + 1] = out[m - 1] - (2.0 * m / x) * out[m];
        }
    }

    /** e^(−x) I₁(x) ~ (2πx)^(−1/2) Σ (−1)^k Π_{j≤k} (4 − (2j−1)²) / (k! (8x)^k), for large x. */
    private static double scaledI1Asymptotic(double x) {
        double eightX = 8 * x;
        double term = 1.0;
        double sum = 1.0;
        for (int k = 1; k < 60; k++) {
            double odd = 2 * k - 1;
            term *= -(4 - odd * odd) / (k * eightX);
            sum += term;
            if (Math.abs(term) < 1e-17 * Math.abs(sum)) {
                break;
            }
        }
        return sum / Math.sqrt(2 * Math.PI * x);
    }
}
