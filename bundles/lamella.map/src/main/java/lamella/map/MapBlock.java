package lamella.map;

import java.nio.file.Path;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.Names;

/**
 * The {@code map} block of a case: {@code {"data": "wafer-map.csv", "signal": "phase_deg"}}. The data path is relative
 * to the case file; the signal defaults to the technique's usual one. Free and uncertain inputs, bounds and weights
 * come from the case's {@code fit} block; the stack, geometry and measurement are the case's.
 *
 * @param data   the map data file
 * @param given  the path as written
 * @param signal the signal column, or null for the technique's usual one
 */
public record MapBlock(Path data, String given, String signal) {

    static final Set<String> KEYS = Set.of("data", "signal");

    /** Whether the map data are Parquet (a {@code .parquet} file or a folder of Parquet parts). */
    public static boolean isParquet(Path data) {
        return data.getFileName().toString().toLowerCase(java.util.Locale.ROOT).endsWith(".parquet");
    }

    public static MapBlock read(CaseDocument doc) throws InputException {
        Object raw = doc.root().get("map");
        if (raw == null) {
            throw doc.locate(InputException.at("map", "the case has no map block; add \"map\": {\"data\": FILE}"
                    + " beside its fit block of free inputs"));
        }
        if (!(raw instanceof Block b)) {
            throw doc.locate(InputException.at("map", "expected an object, got " + Block.describe(raw)));
        }
        try {
            for (String key : b.values().keySet()) {
                if (!KEYS.contains(key)) {
                    Optional<String> hint = Names.closest(key, KEYS);
                    throw InputException.at(b.pathOf(key), "unknown key in the map block"
                            + hint.map(h -> " (did you mean '" + h + "'?)").orElse("") + "; expected one of: "
                            + String.join(", ", new TreeSet<>(KEYS)));
                }
            }
            String data = b.requireString("data");
            String signal = b.has("signal") ? b.requireString("signal") : null;
            Path folder = doc.file().toAbsolutePath().getParent();
            return new MapBlock(folder.resolve(data).normalize(), data, signal);
        } catch (InputException e) {
            throw doc.locate(e);
        }
    }
}
