package lamella.api.data;

import java.nio.file.Path;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A measurement as read from an instrument file: one or more scans over the same kind of x, with the same signal
 * columns, and the file's metadata.
 *
 * @param source   the file it was read from
 * @param format   the {@link DataImporter#id()} that read it
 * @param xColumn  {@link SignalNames#DELAY_S} or {@link SignalNames#FREQUENCY_HZ}
 * @param scans    the scans in file order, each with the same signal (and standard-deviation) columns
 * @param metadata key–value pairs the file states (technique, modulation_hz, sample, …), in file order
 */
public record Dataset(Path source, String format, String xColumn, List<Scan> scans, Map<String, String> metadata) {

    public Dataset {
        scans = List.copyOf(scans);
        metadata = Collections.unmodifiableMap(new LinkedHashMap<>(metadata));
        if (!SignalNames.X_COLUMNS.contains(xColumn)) {
            throw new IllegalArgumentException("x column " + xColumn + "; expected one of " + SignalNames.X_COLUMNS);
        }
        if (scans.isEmpty()) {
            throw new IllegalArgumentException("a dataset needs at least one scan");
        }
        Set<String> signals = scans.get(0).signals().keySet();
        Set<String> sigmas = scans.get(0).sigmas().keySet();
        for (Scan s : scans) {
            if (!s.signals().keySet().equals(signals) || !s.sigmas().keySet().equals(sigmas)) {
                throw new IllegalArgumentException("scans with different columns: " + signals + " and "
                        + s.signals().keySet());
            }
        }
    }

    /** The signal columns, in file order. */
    public List<String> signalColumns() {
        return List.copyOf(scans.get(0).signals().keySet());
    }

    /** Whether the file gives standard deviations of this signal. */
    public boolean hasSigma(String signal) {
        return scans.get(0).sigmas().containsKey(signal);
    }
}
