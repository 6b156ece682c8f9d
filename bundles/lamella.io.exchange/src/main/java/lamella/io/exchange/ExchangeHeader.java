package lamella.io.exchange;

import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.OffsetDateTime;
import java.time.format.DateTimeParseException;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import lamella.api.Names;
import lamella.api.data.Decimals;

/** The keys of an exchange file's metadata block and the check of each value. */
final class ExchangeHeader {

    static final String TECHNIQUE = "technique";
    static final String X = "x";
    static final String CHANNELS = "channels";
    static final String SIGNAL_UNIT = "signal_unit";
    static final String MODULATION = "modulation_hz";
    static final String REPETITION = "repetition_hz";
    static final String LAB_PREFIX = "lab.";

    private enum Kind { TEXT, POSITIVE, DATE }

    private static final Map<String, Kind> KEYS = new LinkedHashMap<>();

    static {
        KEYS.put(TECHNIQUE, Kind.TEXT);
        KEYS.put(X, Kind.TEXT);
        KEYS.put(CHANNELS, Kind.TEXT);
        KEYS.put(SIGNAL_UNIT, Kind.TEXT);
        KEYS.put(MODULATION, Kind.POSITIVE);
        KEYS.put(REPETITION, Kind.POSITIVE);
        KEYS.put("pump_radius_m", Kind.POSITIVE);
        KEYS.put("probe_radius_m", Kind.POSITIVE);
        KEYS.put("pump_wavelength_m", Kind.POSITIVE);
        KEYS.put("probe_wavelength_m", Kind.POSITIVE);
        KEYS.put("temperature_k", Kind.POSITIVE);
        KEYS.put("sample", Kind.TEXT);
        KEYS.put("date", Kind.DATE);
        KEYS.put("operator", Kind.TEXT);
        KEYS.put("instrument", Kind.TEXT);
        KEYS.put("note", Kind.TEXT);
    }

    static final Set<String> TECHNIQUES = Set.of("tdtr", "fdtr");

    private ExchangeHeader() {
    }

    /**
     * Checks one key and its value.
     *
     * @throws IllegalArgumentException saying what is wrong, for the caller to locate
     */
    static void check(String key, String value) {
        if (key.startsWith(LAB_PREFIX) && key.length() > LAB_PREFIX.length()) {
            return;
        }
        Kind kind = KEYS.get(key);
        if (kind == null) {
            String hint = Names.closest(key, KEYS.keySet()).map(k -> " (did you mean '" + k + "'?)").orElse("");
            throw new IllegalArgumentException("unknown key '" + Decimals.abbreviate(key) + "'" + hint
                    + "; expected one of: " + String.join(", ", KEYS.keySet()) + ", or a key of your lab's own"
                    + " starting with '" + LAB_PREFIX + "'");
        }
        if (value.isEmpty()) {
            throw new IllegalArgumentException(key + " has no value");
        }
        switch (kind) {
            case POSITIVE -> {
                double v;
                try {
                    v = Decimals.parse(value, '.');
                } catch (NumberFormatException e) {
                    throw new IllegalArgumentException(key + ": " + e.getMessage(), e);
                }
                if (!(v > 0)) {
                    throw new IllegalArgumentException(key + " is " + value + "; expected a positive number");
                }
            }
            case DATE -> date(value);
            case TEXT -> {
                if (key.equals(TECHNIQUE) && !TECHNIQUES.contains(value)) {
                    throw new IllegalArgumentException("technique '" + Decimals.abbreviate(value)
                            + "'; expected tdtr or fdtr");
                }
            }
        }
    }

    /** The keys every file needs, given its technique. */
    static List<String> required(String technique) {
        return technique.equals("tdtr") ? List.of(TECHNIQUE, X, CHANNELS, MODULATION, REPETITION)
                : List.of(TECHNIQUE, X, CHANNELS);
    }

    private static void date(String value) {
        try {
            OffsetDateTime.parse(value);
            return;
        } catch (DateTimeParseException e) {
            // Not with an offset; the two forms below remain.
        }
        try {
            LocalDateTime.parse(value);
            return;
        } catch (DateTimeParseException e) {
            // Not a local date-time; a plain date remains.
        }
        try {
            LocalDate.parse(value);
        } catch (DateTimeParseException e) {
            throw new IllegalArgumentException("date '" + Decimals.abbreviate(value) + "'; expected ISO 8601, such"
                    + " as 2024-05-12 or 2024-05-12T14:03:00Z", e);
        }
    }
}
