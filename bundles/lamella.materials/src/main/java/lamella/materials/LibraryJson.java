package lamella.materials;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadFeature;
import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lamella.api.Block;

/**
 * Reads one library file into {@link Block}s and keeps the line of every key (or list element), as the case format
 * does, so that each finding names its line. Duplicate keys, nulls, non-finite numbers and trailing content are
 * errors.
 */
final class LibraryJson {

    /** A library file larger than this is not a hand-curated one. */
    static final int MAX_BYTES = 16 * 1024 * 1024;

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(StreamReadFeature.STRICT_DUPLICATE_DETECTION).build();

    private final String file;
    private final Map<String, Integer> lines = new HashMap<>();

    LibraryJson(String file) {
        this.file = file;
    }

    /** The line of a JSON path, or of its nearest enclosing path that has one. */
    int lineOf(String path) {
        String p = path;
        while (p != null) {
            Integer line = lines.get(p);
            if (line != null) {
                return line;
            }
            if (p.isEmpty()) {
                return -1;
            }
            int cut = Math.max(p.lastIndexOf('.'), p.lastIndexOf('['));
            p = cut > 0 ? p.substring(0, cut) : "";
        }
        return -1;
    }

    Block read(InputStream in) throws FindingException, IOException {
        byte[] bytes = in.readNBytes(MAX_BYTES + 1);
        if (bytes.length > MAX_BYTES) {
            throw new FindingException(file, -1, "", "the file is larger than " + MAX_BYTES + " bytes");
        }
        try (JsonParser p = FACTORY.createParser(bytes)) {
            JsonToken t = p.nextToken();
            if (t == null) {
                throw new FindingException(file, 1, "", "the file is empty; expected a JSON object");
            }
            if (t != JsonToken.START_OBJECT) {
                throw new FindingException(file, line(p), "", "expected a JSON object at the top level");
            }
            lines.put("", line(p));
            Block root = object(p, "");
            if (p.nextToken() != null) {
                throw new FindingException(file, line(p), "", "unexpected content after the end of the JSON object");
            }
            return root;
        } catch (JsonProcessingException e) {
            throw new FindingException(file, e.getLocation() == null ? -1 : e.getLocation().getLineNr(), "",
                    "not valid JSON: " + e.getOriginalMessage());
        }
    }

    private Block object(JsonParser p, String path) throws IOException, FindingException {
        Map<String, Object> values = new LinkedHashMap<>();
        JsonToken t;
        while ((t = p.nextToken()) == JsonToken.FIELD_NAME) {
            String key = p.currentName();
            String at = path.isEmpty() ? key : path + "." + key;
            int keyLine = line(p);
            p.nextToken();
            values.put(key, value(p, at, keyLine));
        }
        if (t != JsonToken.END_OBJECT) {
            throw new FindingException(file, line(p), path, "the object is not closed");
        }
        return new Block(path, values);
    }

    private Object value(JsonParser p, String at, int line) throws IOException, FindingException {
        lines.put(at, line);
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT:
                return object(p, at);
            case START_ARRAY: {
                List<Object> list = new ArrayList<>();
                int i = 0;
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    list.add(value(p, at + "[" + i++ + "]", line(p)));
                }
                return list;
            }
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT: {
                double d = p.getDoubleValue();
                if (!Double.isFinite(d)) {
                    throw new FindingException(file, line, at, "the number " + p.getText()
                            + " is outside the range of double precision");
                }
                return d;
            }
            case VALUE_STRING:
                return p.getText();
            case VALUE_TRUE:
                return Boolean.TRUE;
            case VALUE_FALSE:
                return Boolean.FALSE;
            case VALUE_NULL:
                throw new FindingException(file, line, at, "null is not a value; leave the key out instead");
            default:
                throw new FindingException(file, line, at, "unexpected JSON token " + t);
        }
    }

    private static int line(JsonParser p) {
        return p.currentTokenLocation().getLineNr();
    }
}
