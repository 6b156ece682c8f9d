package lamella.conditioning;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * Signal columns over one x, with standard deviations where known; the working form of conditioning. Mutable and
 * private to this package.
 */
final class Channels {

    final double[] x;
    final int[] lines;
    final Map<String, double[]> values = new LinkedHashMap<>();
    final Map<String, double[]> sigmas = new LinkedHashMap<>();
    /**
     * The covariance of in-phase and out-of-phase per row where they are correlated (both made from one amplitude and
     * phase, or rotated), or null where they are independent.
     */
    double[] covariance;

    Channels(double[] x, int[] lines) {
        this.x = x;
        this.lines = lines;
    }

    int rows() {
        return x.length;
    }

    boolean has(String name) {
        return values.containsKey(name);
    }

    void put(String name, double[] v, double[] sigma) {
        values.put(name, v);
        if (sigma != null) {
            sigmas.put(name, sigma);
        }
    }
}
