package lamella.materials;

import java.io.IOException;
import java.io.InputStream;
import lamella.api.Block;
import lamella.api.json.JsonProblem;
import lamella.api.json.StrictJson;

/**
 * Reads one library file into {@link Block}s with the shared strict reader ({@link StrictJson}, the one the case
 * format uses) and keeps the line of every key (or list element), so that each finding names its line.
 */
final class LibraryJson {

    /** A library file larger than this is not a hand-curated one. */
    static final int MAX_BYTES = 16 * 1024 * 1024;

    private final String file;
    private StrictJson.Document document;

    LibraryJson(String file) {
        this.file = file;
    }

    /** The line of a JSON path, or of its nearest enclosing path that has one. */
    int lineOf(String path) {
        return document == null ? -1 : document.lineOf(path);
    }

    Block read(InputStream in) throws FindingException, IOException {
        byte[] bytes = in.readNBytes(MAX_BYTES + 1);
        if (bytes.length > MAX_BYTES) {
            throw new FindingException(file, -1, "", "the file is larger than " + MAX_BYTES + " bytes");
        }
        try {
            document = StrictJson.read(bytes);
            return document.root();
        } catch (JsonProblem e) {
            throw new FindingException(file, e.line(), e.path(), e.problem());
        }
    }
}
