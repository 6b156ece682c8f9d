package lamella.conditioning;

import java.util.Arrays;

/**
 * Marks outliers along x with a variant of the Hampel identifier (F. R. Hampel, J. Am. Stat. Assoc. 69, 383 (1974);
 * the running-median form as in R. K. Pearson, IEEE Trans. Control Syst. Technol. 10, 55 (2002) — citations from
 * memory). A row is marked when its value stands out, by more than the limit times the scale below, both from
 * the median of the 7 rows centred on it (which follows steps such as the jump at zero delay) and from the median of
 * the midpoints of its symmetric neighbour pairs (i−k, i+k), k = 1…3 (which follows slopes, and which one spike
 * nearby does not move). The scale is the larger of the column's noise and the curvature around the row — the
 * second differences centred two rows before and two rows after it, which do not involve the row itself — so that a
 * coarsely sampled bend (an FDTR sweep at 1-2-5 steps) is not taken for an outlier. Taking the smaller residual and
 * the larger scale is Lamella's choice, no source. Near the ends the windows narrow, still centred, so the first and
 * last rows are never marked. The noise is estimated from second differences,
 * σ = 1.4826 · median|v[i−1] − 2v[i] + v[i+1]| / √6 (a second difference of independent noise has variance 6σ²;
 * 1.4826 makes a median absolute value a Gaussian standard deviation), which a trend does not inflate and a few
 * spikes or steps do not move.
 */
final class OutlierRule {

    static final int HALF_WINDOW = 3;
    /** Consistency factor of the median absolute deviation for Gaussian noise. */
    static final double MAD_TO_SIGMA = 1.4826;
    /** Below this many rows there are no neighbours to judge by. */
    static final int MIN_ROWS = 2 * HALF_WINDOW + 1;

    private OutlierRule() {
    }

    /** Adds to {@code marks} the rows whose value in this column is an outlier. */
    static void mark(double[] v, double limit, boolean[] marks) {
        int n = v.length;
        if (n < MIN_ROWS || limit == 0) {
            return;
        }
        double[] second = new double[n - 2];
        for (int i = 1; i < n - 1; i++) {
            second[i - 1] = Math.abs(v[i - 1] - 2 * v[i] + v[i + 1]);
        }
        double sigma = MAD_TO_SIGMA * median(second, second.length) / Math.sqrt(6);
        if (sigma == 0) {
            return;
        }
        double[] window = new double[2 * HALF_WINDOW + 1];
        double[] midpoints = new double[HALF_WINDOW];
        for (int i = 1; i < n - 1; i++) {
            int half = Math.min(HALF_WINDOW, Math.min(i, n - 1 - i));
            int m = 2 * half + 1;
            System.arraycopy(v, i - half, window, 0, m);
            for (int k = 1; k <= half; k++) {
                midpoints[k - 1] = 0.5 * (v[i - k] + v[i + k]);
            }
            double fromMedian = Math.abs(v[i] - median(window, m));
            double fromSlope = Math.abs(v[i] - median(midpoints, half));
            double bend = Math.max(i >= 3 ? Math.abs(v[i - 3] - 2 * v[i - 2] + v[i - 1]) : 0,
                    i + 3 < n ? Math.abs(v[i + 1] - 2 * v[i + 2] + v[i + 3]) : 0);
            if (Math.min(fromMedian, fromSlope) > limit * Math.max(sigma, bend)) {
                marks[i] = true;
            }
        }
    }

    /** The median of the first m values; reorders them. */
    static double median(double[] a, int m) {
        Arrays.sort(a, 0, m);
        return m % 2 == 1 ? a[m / 2] : 0.5 * (a[m / 2 - 1] + a[m / 2]);
    }
}
