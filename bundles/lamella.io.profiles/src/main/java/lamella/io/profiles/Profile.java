package lamella.io.profiles;

import java.util.List;
import java.util.Map;

/**
 * One importer profile as read and checked: how to recognise a family of instrument files and how to read them.
 * The file format is described in the README ("Importer profiles").
 *
 * @param id               the importer id users name ({@code lamella import --format ID})
 * @param version          the profile's own version, as its author writes it (may be empty)
 * @param summary          one line saying which files it reads
 * @param extensions       file name endings it recognises, lower case, without the dot (may be empty)
 * @param contains         texts that all appear in the head of every file it reads (may be empty)
 * @param encoding         how the bytes are text
 * @param delimiter        the cell separator; {@code ' '} for runs of whitespace
 * @param decimalMark      {@code '.'} or {@code ','}
 * @param commentPrefixes  lines starting with one of these (after spaces) are skipped
 * @param namesLine        the 1-based line of the column names, or 0 when {@link #namesStart} finds it
 * @param namesStart       text the column-names line starts with (case-insensitive), or null
 * @param skipAfterNames   lines after the column names that are not data (a units line)
 * @param headerSeparator  what separates a header line's name from its value
 * @param headerValues     header names (folded) and what they become
 * @param technique        the technique of every file, or null when the header says it
 * @param columns          column names (folded) and their meaning
 * @param ignoreOtherColumns whether columns the profile does not name are left out (else an error)
 * @param averageRepeatedX whether consecutive rows at the same x are records to average (else an error)
 * @param origin           where the profile was read from, for messages and listings
 * @param tier             its tier label
 */
record Profile(String id, String version, String summary, List<String> extensions, List<String> contains,
               Encoding encoding, char delimiter, char decimalMark, List<String> commentPrefixes, int namesLine,
               String namesStart, int skipAfterNames, String headerSeparator, Map<String, HeaderValue> headerValues,
               String technique, Map<String, ColumnRule> columns, boolean ignoreOtherColumns,
               boolean averageRepeatedX, String origin, String tier) {

    /** How the bytes of a file are text. */
    enum Encoding {
        /** A byte-order mark decides (UTF-8, UTF-16 LE or BE); else UTF-8, or Latin-1 where the bytes are not UTF-8. */
        AUTO("auto"),
        UTF_8("utf-8"),
        UTF_16("utf-16"),
        LATIN_1("latin-1");

        final String word;

        Encoding(String word) {
            this.word = word;
        }
    }

    /**
     * What one header line becomes.
     *
     * @param key   the case-file key ({@code modulation_hz}, {@code pump_radius_m}, {@code technique}, {@code sample}, …)
     * @param unit  the unit the file writes the value in, for keys with a unit; null for text
     * @param map   for text values: the file's words and what they mean (such as {@code FD} → {@code fdtr}); may be
     *              empty
     */
    record HeaderValue(String key, String unit, double factor, Map<String, String> map) {
    }

    /**
     * What one column holds.
     *
     * @param meaning the dataset column ({@code frequency_hz}, {@code in_phase}, {@code sigma_phase_deg}, …) or
     *                null for a column left out
     * @param factor  from the file's unit to Lamella's, with the sign convention
     * @param scan    which scan of a row the column belongs to (1 when a row holds one)
     */
    record ColumnRule(String meaning, double factor, int scan) {
    }

    /** Folds a name as written for matching: lower case, runs of spaces and underscores as one space. */
    static String fold(String name) {
        return name.strip().toLowerCase(java.util.Locale.ROOT).replaceAll("[\\s_]+", " ");
    }
}
