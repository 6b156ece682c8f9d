package lamella.ui.api;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.json.JsonProblem;
import lamella.api.json.StrictJson;

/**
 * JSON trees for the workbench's documents and own files, read only after the shared strict reader
 * ({@link StrictJson}) has accepted the text, so that a problem is said in Lamella's words with its line and JSON
 * path (null is allowed here: the workbench's own files may write it).
 */
public final class JsonFiles {

    private static final ObjectMapper JSON = new ObjectMapper();

    private JsonFiles() {
    }

    /**
     * Reads a file; the IOException's message is "FILE:3: recent[0]: …", or "FILE: cannot read the file: REASON"
     * with the operating system's reason.
     */
    public static JsonNode read(Path file) throws IOException {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new IOException(file + ": " + FileProblems.cannotRead(e), e);
        }
        try {
            String text = StrictJson.decode(bytes);
            StrictJson.check(text);
            return JSON.readTree(text.startsWith("\uFEFF") ? text.substring(1) : text);
        } catch (JsonProblem e) {
            throw new IOException(new InputException(file, e.path(), e.line(), e.problem()).getMessage(), e);
        }
    }

    /** Reads a text that must be one JSON object; the message is "line 3: stack: …". */
    public static JsonNode parse(String text) throws IOException {
        try {
            StrictJson.check(text);
        } catch (JsonProblem e) {
            throw new IOException(e.getMessage(), e);
        }
        return JSON.readTree(text.startsWith("\uFEFF") ? text.substring(1) : text);
    }
}
