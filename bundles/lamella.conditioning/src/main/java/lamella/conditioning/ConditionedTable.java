package lamella.conditioning;

import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A dataset ready for fitting: one row per x (scans averaged), signal columns with standard deviations where they
 * are known, and per-row marks. Marked rows are kept, not dropped; a fit leaves them out.
 *
 * @param source   the data file
 * @param xColumn  the x column's name
 * @param x        x values, ascending, SI
 * @param signals  signal columns by name, in output order
 * @param sigmas   standard deviations by signal name, for the signals that have them
 * @param outlier  rows the outlier rule marks
 * @param excluded rows inside a range the user excluded
 * @param report   what was done
 */
public record ConditionedTable(Path source, String xColumn, double[] x, Map<String, double[]> signals,
                               Map<String, double[]> sigmas, boolean[] outlier, boolean[] excluded,
                               ConditioningReport report) {

    public ConditionedTable {
        signals = Collections.unmodifiableMap(new LinkedHashMap<>(signals));
        sigmas = Collections.unmodifiableMap(new LinkedHashMap<>(sigmas));
        if (outlier.length != x.length || excluded.length != x.length) {
            throw new IllegalArgumentException("marks for " + outlier.length + " rows, x has " + x.length);
        }
    }

    public int rows() {
        return x.length;
    }

    public List<String> signalColumns() {
        return List.copyOf(signals.keySet());
    }
}
