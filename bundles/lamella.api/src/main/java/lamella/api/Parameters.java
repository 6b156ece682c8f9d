package lamella.api;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;

/**
 * Validated parameters of one geometry or technique: numbers and number lists by key, with the JSON path of the
 * block they came from. Built by {@link #bind}, which rejects unknown keys, wrong types and values outside a
 * parameter's constraint or outside the {@link PhysicalRange} of the unit its key ends in.
 */
public final class Parameters {

    private final String path;
    private final Map<String, Double> numbers;
    private final Map<String, double[]> lists;

    private Parameters(String path, Map<String, Double> numbers, Map<String, double[]> lists) {
        this.path = path;
        this.numbers = Collections.unmodifiableMap(numbers);
        this.lists = Collections.unmodifiableMap(lists);
    }

    /** Parameters set directly, for tests and programs (no validation against specs). */
    public static Parameters of(String path, Map<String, Double> numbers, Map<String, double[]> lists) {
        return new Parameters(path, new LinkedHashMap<>(numbers), new LinkedHashMap<>(lists));
    }

    /**
     * Checks a block against specs.
     *
     * @param ignored keys that belong to the caller (such as {@code type}) and are not parameters
     */
    public static Parameters bind(Block block, List<ParameterSpec> specs, Set<String> ignored, String owner)
            throws InputException {
        Map<String, ParameterSpec> byKey = new LinkedHashMap<>();
        for (ParameterSpec s : specs) {
            byKey.put(s.key(), s);
        }
        for (String key : block.values().keySet()) {
            if (!byKey.containsKey(key) && !ignored.contains(key)) {
                List<String> known = new ArrayList<>(byKey.keySet());
                String hint = Names.closest(key, known).map(k -> " (did you mean '" + k + "'?)").orElse("");
                throw InputException.at(block.pathOf(key), "unknown key for " + owner + hint + "; expected "
                        + (known.isEmpty() ? "no further keys" : "one of: " + String.join(", ", known)));
            }
        }
        Map<String, Double> numbers = new LinkedHashMap<>();
        Map<String, double[]> lists = new LinkedHashMap<>();
        for (ParameterSpec s : specs) {
            Object v = block.get(s.key());
            String at = block.pathOf(s.key());
            if (v == null) {
                if (s.required()) {
                    throw InputException.at(at, "missing; " + owner + " needs " + s.description() + " ("
                            + expectation(s) + ")");
                }
                if (s.kind() == ParameterSpec.Kind.NUMBER && !Double.isNaN(s.defaultValue())) {
                    numbers.put(s.key(), s.defaultValue());
                }
                continue;
            }
            if (s.kind() == ParameterSpec.Kind.NUMBER) {
                numbers.put(s.key(), number(v, at, s));
            } else {
                if (!(v instanceof List<?> list)) {
                    throw InputException.at(at, "expected a list of numbers, got " + Block.describe(v));
                }
                if (list.isEmpty()) {
                    throw InputException.at(at, "the list is empty; expected at least one number");
                }
                double[] a = new double[list.size()];
                for (int i = 0; i < a.length; i++) {
                    a[i] = number(list.get(i), at + "[" + i + "]", s);
                }
                lists.put(s.key(), a);
            }
        }
        return new Parameters(block.path(), numbers, lists);
    }

    private static double number(Object v, String at, ParameterSpec s) throws InputException {
        if (!(v instanceof Double d)) {
            throw InputException.at(at, "expected " + s.constraint().wording() + ", got " + Block.describe(v));
        }
        if (!s.constraint().admits(d)) {
            throw InputException.at(at, "expected " + s.constraint().wording() + ", got " + d);
        }
        PhysicalRange.checkKey(s.key(), d, at);
        return d;
    }

    private static String expectation(ParameterSpec s) {
        return s.kind() == ParameterSpec.Kind.NUMBER ? s.constraint().wording()
                : "a list of " + s.constraint().wording().replaceFirst("^a ", "") + "s";
    }

    /** JSON path of the block these parameters came from. */
    public String path() {
        return path;
    }

    public String pathOf(String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    public boolean has(String key) {
        return numbers.containsKey(key) || lists.containsKey(key);
    }

    public double number(String key) {
        Double d = numbers.get(key);
        if (d == null) {
            throw new IllegalStateException("no number '" + key + "' in " + path);
        }
        return d;
    }

    public double number(String key, double fallback) {
        return numbers.getOrDefault(key, fallback);
    }

    public double[] list(String key) {
        double[] a = lists.get(key);
        if (a == null) {
            throw new IllegalStateException("no list '" + key + "' in " + path);
        }
        return a.clone();
    }

    public Map<String, Double> numbers() {
        return numbers;
    }

    /** A copy with one number replaced, for fitting and sensitivity (which address parameters by key). */
    public Parameters withNumber(String key, double value) {
        Map<String, Double> n = new LinkedHashMap<>(numbers);
        n.put(key, value);
        return new Parameters(path, n, new LinkedHashMap<>(lists));
    }

    @Override
    public String toString() {
        return numbers.entrySet().stream().map(e -> e.getKey() + "=" + e.getValue())
                .collect(Collectors.joining(", ", path + "{", lists.isEmpty() ? "}" : ", +lists}"));
    }
}
