package lamella.api.data;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.Map;

/**
 * One sweep of x (delay or frequency) as recorded, x ascending.
 *
 * @param x       x values in SI units, strictly ascending
 * @param lines   the 1-based source line of every row, for messages
 * @param signals signal columns by name (see {@link SignalNames}), in file order
 * @param sigmas  standard deviations by signal name, for the signals the file gives them
 */
public record Scan(double[] x, int[] lines, Map<String, double[]> signals, Map<String, double[]> sigmas) {

    public Scan {
        if (lines.length != x.length) {
            throw new IllegalArgumentException(x.length + " x values but " + lines.length + " line numbers");
        }
        signals = Collections.unmodifiableMap(new LinkedHashMap<>(signals));
        sigmas = Collections.unmodifiableMap(new LinkedHashMap<>(sigmas));
        for (Map.Entry<String, double[]> e : signals.entrySet()) {
            requireRows(e.getKey(), e.getValue(), x.length);
        }
        for (Map.Entry<String, double[]> e : sigmas.entrySet()) {
            if (!signals.containsKey(e.getKey())) {
                throw new IllegalArgumentException("a standard deviation for " + e.getKey() + ", which is no signal");
            }
            requireRows(SignalNames.sigma(e.getKey()), e.getValue(), x.length);
        }
    }

    public int rows() {
        return x.length;
    }

    private static void requireRows(String name, double[] v, int rows) {
        if (v.length != rows) {
            throw new IllegalArgumentException(name + " has " + v.length + " rows, x has " + rows);
        }
    }
}
