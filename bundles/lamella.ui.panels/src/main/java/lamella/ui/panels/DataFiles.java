package lamella.ui.panels;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.ImportLimits;

/**
 * Data files read by the live importer most confident about each, kept while the file is unchanged so that a live
 * model update never waits on the disk. Thread-safe: read from background work.
 */
final class DataFiles {

    private record Read(FileTime modified, Dataset dataset) {
    }

    private final Map<Path, Read> cache = new ConcurrentHashMap<>();

    Dataset read(Path file, List<DataImporter> importers) throws InputException {
        FileTime modified;
        byte[] head;
        try {
            modified = Files.getLastModifiedTime(file);
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read the data file: " + FileProblems.reason(e));
        }
        Read known = cache.get(file);
        if (known != null && known.modified().equals(modified)) {
            return known.dataset();
        }
        head = lamella.api.data.TextLines.head(file);
        DataImporter best = null;
        double confidence = 0;
        for (DataImporter i : importers) {
            double c = i.confidence(file, head);
            if (c > confidence) {
                confidence = c;
                best = i;
            }
        }
        if (best == null) {
            throw new InputException(file, null, -1, "no live importer reads this file (importers: "
                    + String.join(", ", importers.stream().map(DataImporter::id).toList()) + ")");
        }
        Dataset d = best.read(file);
        cache.put(file, new Read(modified, d));
        return d;
    }
}
