package lamella.casefile;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import lamella.api.Block;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.json.JsonProblem;
import lamella.api.json.StrictJson;

/**
 * Reads a case file into {@link Block}s with the shared strict reader ({@link StrictJson}), remembering the line of
 * every value — for an object member the line of its key — so that later checks can name it.
 */
final class JsonTree {

    /** Case files are small; anything larger is not one. */
    static final long MAX_BYTES = 16L * 1024 * 1024;

    private Map<String, Integer> lines = Map.of();

    Map<String, Integer> lines() {
        return lines;
    }

    Block read(Path file) throws InputException {
        byte[] bytes;
        try (InputStream in = Files.newInputStream(file)) {
            bytes = in.readNBytes((int) MAX_BYTES + 1);
        } catch (IOException e) {
            throw new InputException(file, null, -1, FileProblems.cannotRead(e));
        }
        if (bytes.length > MAX_BYTES) {
            throw new InputException(file, null, -1, "the file is larger than " + MAX_BYTES + " bytes; a case"
                    + " file is a few kilobytes");
        }
        try {
            StrictJson.Document d = StrictJson.read(bytes);
            lines = d.lines();
            return d.root();
        } catch (JsonProblem e) {
            throw new InputException(file, e.path(), e.line(), e.problem());
        }
    }
}
