package lamella.casefile;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonParseException;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lamella.api.Block;
import lamella.api.InputException;

/**
 * Reads a JSON document into {@link Block}s, remembering the line of every value — for an object member the line of
 * its key, where the value may start later — so that later checks can name it. Duplicate keys, nulls, trailing
 * content and non-finite numbers are errors, never silently resolved.
 */
final class JsonTree {

    /** Case files are small; anything larger is not one. */
    static final long MAX_BYTES = 16L * 1024 * 1024;

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(com.fasterxml.jackson.core.StreamReadFeature.STRICT_DUPLICATE_DETECTION)
            .build();

    private final Map<String, Integer> lines = new HashMap<>();

    Map<String, Integer> lines() {
        return lines;
    }

    Block read(Path file) throws InputException {
        try {
            long size = Files.size(file);
            if (size > MAX_BYTES) {
                throw new InputException(file, null, -1, "the file is " + size + " bytes; a case file may have at"
                        + " most " + MAX_BYTES);
            }
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read the file: " + e.getMessage());
        }
        try (InputStream in = Files.newInputStream(file); JsonParser p = FACTORY.createParser(in)) {
            JsonToken t = p.nextToken();
            if (t == null) {
                throw new InputException(file, null, 1, "the file is empty; expected a JSON object");
            }
            if (t != JsonToken.START_OBJECT) {
                throw new InputException(file, "", line(p), "expected a JSON object at the top level");
            }
            lines.put("", line(p));
            Block root = object(p, "", file);
            if (p.nextToken() != null) {
                throw new InputException(file, null, line(p), "unexpected content after the end of the JSON object");
            }
            return root;
        } catch (JsonParseException e) {
            throw new InputException(file, null, e.getLocation() == null ? -1 : e.getLocation().getLineNr(),
                    "not valid JSON: " + e.getOriginalMessage());
        } catch (JsonProcessingException e) {
            throw new InputException(file, null, e.getLocation() == null ? -1 : e.getLocation().getLineNr(),
                    "not valid JSON: " + e.getOriginalMessage());
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read the file: " + e.getMessage());
        }
    }

    private Block object(JsonParser p, String path, Path file) throws IOException, InputException {
        Map<String, Object> values = new LinkedHashMap<>();
        JsonToken t;
        while ((t = p.nextToken()) == JsonToken.FIELD_NAME) {
            String key = p.currentName();
            String at = path.isEmpty() ? key : path + "." + key;
            int keyLine = line(p);
            p.nextToken();
            values.put(key, value(p, at, keyLine, file));
        }
        if (t != JsonToken.END_OBJECT) {
            throw new InputException(file, path, line(p), "the object is not closed");
        }
        return new Block(path, values);
    }

    private Object value(JsonParser p, String at, int line, Path file) throws IOException, InputException {
        lines.put(at, line);
        JsonToken t = p.currentToken();
        switch (t) {
            case START_OBJECT:
                return object(p, at, file);
            case START_ARRAY: {
                List<Object> list = new ArrayList<>();
                int i = 0;
                while (p.nextToken() != JsonToken.END_ARRAY) {
                    list.add(value(p, at + "[" + i++ + "]", line(p), file));
                }
                return list;
            }
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT: {
                double d = p.getDoubleValue();
                if (!Double.isFinite(d)) {
                    throw new InputException(file, at, line, "the number " + p.getText()
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
                throw new InputException(file, at, line, "null is not a value; leave the key out instead");
            default:
                throw new InputException(file, at, line, "unexpected JSON token " + t);
        }
    }

    private static int line(JsonParser p) {
        return p.currentTokenLocation().getLineNr();
    }
}
