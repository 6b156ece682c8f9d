package lamella.api;

import java.util.List;

/**
 * The four columns of a complex response sampled over frequency — real part, imaginary part, amplitude and phase
 * in degrees (negative when lagging) — shared by the frequency-domain techniques.
 */
public final class ComplexColumns {

    private ComplexColumns() {
    }

    /** Column names for a response in the unit with this suffix, such as {@code k_per_w}. */
    public static List<String> names(ResponseUnit unit) {
        String s = unit.columnSuffix();
        return List.of("re_" + s, "im_" + s, "amplitude_" + s, "phase_deg");
    }

    /** Samples h at factor·x for every x, stopping between frequencies when the thread is interrupted. */
    public static double[][] sample(double[] x, double factor, FrequencyResponse h) {
        double[][] v = new double[4][x.length];
        double[] z = new double[2];
        for (int i = 0; i < x.length; i++) {
            EvaluationCancelledException.checkpoint();
            h.at(factor * x[i], z);
            v[0][i] = z[0];
            v[1][i] = z[1];
            v[2][i] = Math.hypot(z[0], z[1]);
            v[3][i] = Math.toDegrees(Math.atan2(z[1], z[0]));
        }
        return v;
    }
}
