package lamella.api;

import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A JSON object as read from a case file, before any service has interpreted it: keys in file order, each value a
 * {@link Double}, a {@link String}, a {@link Boolean}, a nested {@code Block}, or a {@link List} of those. Knows
 * its own JSON path so that every error can name where it is.
 */
public final class Block {

    private final String path;
    private final Map<String, Object> values;

    public Block(String path, Map<String, Object> values) {
        this.path = path;
        this.values = Collections.unmodifiableMap(new LinkedHashMap<>(values));
    }

    /** The JSON path of this object, such as {@code geometry} or {@code fit.datasets[0]}; empty for the root. */
    public String path() {
        return path;
    }

    public Map<String, Object> values() {
        return values;
    }

    public boolean has(String key) {
        return values.containsKey(key);
    }

    public Object get(String key) {
        return values.get(key);
    }

    /** The JSON path of a key in this object. */
    public String pathOf(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    /** The text value of a key that must be present and a string. */
    public String requireString(String key) throws InputException {
        Object v = values.get(key);
        if (v == null) {
            throw InputException.at(pathOf(key), "missing; expected a text value");
        }
        if (!(v instanceof String s)) {
            throw InputException.at(pathOf(key), "expected a text value, got " + describe(v));
        }
        return s;
    }

    /** How a value reads in an error message. */
    public static String describe(Object v) {
        if (v instanceof String s) {
            return "the text \"" + s + "\"";
        }
        if (v instanceof Block) {
            return "an object";
        }
        if (v instanceof List<?>) {
            return "a list";
        }
        if (v instanceof Boolean b) {
            return "the value " + b;
        }
        return "the number " + v;
    }
}
