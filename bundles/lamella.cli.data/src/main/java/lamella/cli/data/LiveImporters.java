package lamella.cli.data;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.TreeSet;
import java.util.concurrent.CopyOnWriteArrayList;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.Names;
import lamella.api.data.DataImporter;
import lamella.api.data.ImportLimits;
import lamella.api.data.TextLines;

/**
 * The importers live at this moment, kept up to date by dynamic references so that a bundle dropped into plugins/
 * is used by the next command, and the choice of one for a file.
 */
final class LiveImporters {

    private final List<DataImporter> importers = new CopyOnWriteArrayList<>();

    void add(DataImporter i) {
        importers.add(i);
    }

    void remove(DataImporter i) {
        importers.remove(i);
    }

    /** The live importers ordered by id. */
    List<DataImporter> all() {
        List<DataImporter> sorted = new ArrayList<>(importers);
        sorted.sort(Comparator.comparing(DataImporter::id));
        return sorted;
    }

    /**
     * The importer for a file: the one named, or the most confident. A file no importer recognises, or a tie between
     * two, is an error rather than a guess.
     */
    DataImporter choose(Path file, String named) throws InputException {
        List<DataImporter> live = all();
        if (named != null) {
            for (DataImporter i : live) {
                if (i.id().equals(named)) {
                    return i;
                }
            }
            TreeSet<String> ids = new TreeSet<>(live.stream().map(DataImporter::id).toList());
            String hint = Names.closest(named, ids).map(k -> " (did you mean '" + k + "'?)").orElse("");
            throw InputException.at("--format", "no live importer '" + named + "'" + hint + "; live: "
                    + (ids.isEmpty() ? "none" : String.join(", ", ids)));
        }
        byte[] head = head(file);
        DataImporter best = null;
        double bestConfidence = 0;
        DataImporter tied = null;
        for (DataImporter i : live) {
            double c = confidence(i, file, head);
            if (c > bestConfidence) {
                best = i;
                bestConfidence = c;
                tied = null;
            } else if (c == bestConfidence && c > 0) {
                tied = i;
            }
        }
        if (best == null) {
            throw new InputException(file, null, -1, "no live importer recognises this file; live: "
                    + String.join(", ", live.stream().map(DataImporter::id).toList())
                    + " (see lamella formats)");
        }
        if (tied != null) {
            throw new InputException(file, null, -1, "importers '" + best.id() + "' and '" + tied.id() + "' are"
                    + " equally sure they can read this file; choose one with --format");
        }
        return best;
    }

    /** A plug-in's confidence; one that fails or answers outside 0..1 is named, so its defect is seen. */
    private static double confidence(DataImporter i, Path file, byte[] head) throws InputException {
        double c;
        try {
            c = i.confidence(file, head.clone());
        } catch (RuntimeException e) {
            throw new InputException(file, null, -1, "importer '" + i.id() + "' failed while judging the file ("
                    + e + "); choose an importer with --format");
        }
        if (!(c >= 0 && c <= 1)) {
            throw new InputException(file, null, -1, "importer '" + i.id() + "' answers confidence " + c
                    + ", outside 0 to 1; choose an importer with --format");
        }
        return c;
    }

    /** The first bytes of a file, after the checks every data file must pass; NUL bytes are refused at once. */
    static byte[] head(Path file) throws InputException {
        return TextLines.head(file);
    }
}
