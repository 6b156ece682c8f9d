package lamella.api.data;

import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import lamella.api.Units;

/**
 * What a data file states about how it was measured, in the case file's own words: the technique, and numbers under
 * case-file keys that carry their SI unit in their name ({@code modulation_hz}, {@code repetition_hz},
 * {@code pump_radius_m}, {@code pump_power_w}, …). Importers put them in their dataset's metadata under those keys;
 * an importer that knows an instrument's own header names translates them into these keys and SI values and adds
 * them with {@link #builder()}. {@link DatasetSettings} decides which of them become the dataset's model inputs.
 */
public final class StatedSettings {

    /** The metadata key that names the technique. */
    public static final String TECHNIQUE = "technique";

    /**
     * One number the file states.
     *
     * @param key     the case-file key, with its SI unit in its name
     * @param value   the value in SI units
     * @param written how the file wrote it, for the reader to compare (such as {@code 9e6}, or
     *                {@code Modulation (MHz) = 9}); never empty
     */
    public record Stated(String key, double value, String written) {

        public Stated {
            if (!Double.isFinite(value)) {
                throw new IllegalArgumentException(key + ": a stated value is finite, got " + value);
            }
            written = written == null || written.isBlank() ? Double.toString(value) : written;
        }

        /** The unit, from the key. */
        public String unit() {
            return Units.ofKey(key);
        }
    }

    private final String technique;
    private final String techniqueWritten;
    private final List<Stated> numbers;
    private final Map<String, String> other;
    private final List<String> unreadable;

    private StatedSettings(Builder b) {
        technique = b.technique;
        techniqueWritten = b.techniqueWritten;
        numbers = List.copyOf(b.numbers.values());
        other = Collections.unmodifiableMap(new LinkedHashMap<>(b.other));
        unreadable = List.copyOf(b.unreadable);
    }

    /**
     * What a dataset's metadata states: {@value #TECHNIQUE}, every key with a unit suffix whose value is a number,
     * and the rest as text. A key with a unit whose value is not a plain number is listed in {@link #unreadable()}
     * rather than guessed at. Keys of a lab's own ({@code lab.…}) stay text.
     */
    public static StatedSettings of(Dataset dataset) {
        Builder b = builder();
        for (Map.Entry<String, String> e : dataset.metadata().entrySet()) {
            String key = e.getKey().strip();
            String value = e.getValue().strip();
            if (key.equals(TextLines.ENCODING_KEY)) {
                continue;
            }
            if (key.equalsIgnoreCase(TECHNIQUE)) {
                b.technique(value, value);
            } else if (!key.startsWith("lab.") && !key.startsWith("note.") && !Units.ofKey(key).isEmpty()) {
                try {
                    b.number(key, Decimals.parse(value, '.'), value);
                } catch (NumberFormatException ex) {
                    b.unreadable("header '" + key + "': " + ex.getMessage() + "; a key ending in its unit takes a"
                            + " number in that unit (" + Units.ofKey(key) + "), such as " + key + ": 9e6");
                }
            } else {
                b.text(key, value);
            }
        }
        return b.build();
    }

    public static Builder builder() {
        return new Builder();
    }

    /** Nothing stated. */
    public static StatedSettings none() {
        return builder().build();
    }

    /** The technique's type as stated, in lower case. */
    public Optional<String> technique() {
        return Optional.ofNullable(technique);
    }

    /** The technique as the file wrote it. */
    public Optional<String> techniqueWritten() {
        return Optional.ofNullable(techniqueWritten);
    }

    /** The numbers, in the order they were stated. */
    public List<Stated> numbers() {
        return numbers;
    }

    public Optional<Stated> number(String key) {
        return numbers.stream().filter(s -> s.key().equals(key)).findFirst();
    }

    /** Everything else the file says (sample, date, operator, notes), as text, in file order. */
    public Map<String, String> other() {
        return other;
    }

    /** Header values that look like settings but could not be read, each as a sentence. */
    public List<String> unreadable() {
        return unreadable;
    }

    /** Collects what a file states; a key stated twice keeps its first value and the second is unreadable. */
    public static final class Builder {

        private String technique;
        private String techniqueWritten;
        private final Map<String, Stated> numbers = new LinkedHashMap<>();
        private final Map<String, String> other = new LinkedHashMap<>();
        private final List<String> unreadable = new ArrayList<>();

        private Builder() {
        }

        public Builder technique(String type, String written) {
            if (technique != null) {
                unreadable.add("the technique is stated twice ('" + techniqueWritten + "' and '" + written + "')");
                return this;
            }
            technique = type.strip().toLowerCase(Locale.ROOT);
            techniqueWritten = written;
            return this;
        }

        /** A number under its case-file key, already in SI units. */
        public Builder number(String key, double valueSi, String written) {
            if (Units.ofKey(key).isEmpty()) {
                throw new IllegalArgumentException("'" + key + "' carries no unit in its name");
            }
            if (numbers.containsKey(key)) {
                unreadable.add("header '" + key + "' is stated twice ('" + numbers.get(key).written() + "' and '"
                        + written + "'); the first is used");
                return this;
            }
            numbers.put(key, new Stated(key, valueSi, written));
            return this;
        }

        public Builder text(String key, String value) {
            other.putIfAbsent(key, value);
            return this;
        }

        /** A header value that could not be used, said as a sentence naming it. */
        public Builder unreadable(String sentence) {
            unreadable.add(sentence);
            return this;
        }

        public StatedSettings build() {
            return new StatedSettings(this);
        }
    }
}
