package lab.example.sweeplog;

import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lamella.api.InputException;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.Decimals;
import lamella.api.data.ScanBuilder;
import lamella.api.data.SignalNames;
import lamella.api.data.StatedSettings;
import lamella.api.data.TextLines;
import org.osgi.service.component.annotations.Component;

/**
 * Reads the sweep log of an invented FDTR instrument: a first line {@code sweep-log 1}, then {@code key = value}
 * lines — the sample and operator as text, the beam radii in µm, and one {@code point = FREQUENCY_HZ PHASE_DEG} per
 * modulation frequency. Blank lines and lines starting with {@code #} are comments.
 *
 * <p>This class is a template for a lab's own importer. To make another one, change:
 * <ul>
 *   <li>{@link #id()} and {@link #summary()} — what {@code lamella import --format} takes and {@code lamella formats}
 *       prints;</li>
 *   <li>{@link #confidence} — how sure it is from the first bytes, 1 only for a file that declares the format;</li>
 *   <li>{@link #read} — the file's keys: text into the dataset's metadata, settings translated into case-file keys
 *       with their value in SI units ({@code pump_radius_m}), rows into a {@link ScanBuilder}.</li>
 * </ul>
 * Every problem is an {@link InputException} with the file and the line; nothing is guessed, clamped or skipped.
 */
@Component(service = DataImporter.class)
public final class SweepLogImporter implements DataImporter {

    static final String ID = "sweep-log";
    static final String MAGIC = "sweep-log 1";
    static final String POINT = "point";
    /** Text keys, kept in the metadata as written. */
    static final List<String> TEXT_KEYS = List.of("sample", "operator", "note");
    /** Keys of the file in µm and the case-file keys (SI) they become. */
    static final Map<String, String> MICROMETRE_KEYS = Map.of(
            "pump_radius_um", "pump_radius_m",
            "probe_radius_um", "probe_radius_m");

    private static final byte[] MAGIC_BYTES = MAGIC.getBytes(StandardCharsets.US_ASCII);

    @Override
    public String id() {
        return ID;
    }

    @Override
    public String summary() {
        return "Sweep log of an invented FDTR instrument: key = value lines, phase over modulation frequency.";
    }

    @Override
    public double confidence(Path file, byte[] head) {
        int start = head.length >= 3 && head[0] == (byte) 0xEF && head[1] == (byte) 0xBB && head[2] == (byte) 0xBF
                ? 3 : 0;
        if (head.length - start < MAGIC_BYTES.length) {
            return 0;
        }
        for (int i = 0; i < MAGIC_BYTES.length; i++) {
            if (head[start + i] != MAGIC_BYTES[i]) {
                return 0;
            }
        }
        int after = start + MAGIC_BYTES.length;
        boolean lineEnds = after == head.length || head[after] == '\n' || head[after] == '\r';
        return lineEnds ? 1 : 0;
    }

    @Override
    public Dataset read(Path file) throws InputException {
        Map<String, String> metadata = new LinkedHashMap<>();
        metadata.put(StatedSettings.TECHNIQUE, "fdtr");
        Map<String, Integer> seenAt = new HashMap<>();
        ScanBuilder scan = new ScanBuilder(file, SignalNames.FREQUENCY_HZ, List.of(SignalNames.PHASE_DEG), List.of());
        try (TextLines in = TextLines.open(file)) {
            String first = in.next();
            if (first == null || !first.strip().equals(MAGIC)) {
                throw in.error("expected the first line '" + MAGIC + "', found '"
                        + Decimals.abbreviate(first == null ? "" : first.strip()) + "'");
            }
            String line;
            while ((line = in.next()) != null) {
                String text = line.strip();
                if (text.isEmpty() || text.startsWith("#")) {
                    continue;
                }
                int eq = text.indexOf('=');
                if (eq < 0) {
                    throw in.error("expected 'key = value', found '" + Decimals.abbreviate(text) + "'");
                }
                String key = text.substring(0, eq).strip();
                String value = text.substring(eq + 1).strip();
                if (key.equals(POINT)) {
                    point(in, scan, value);
                    continue;
                }
                Integer before = seenAt.put(key, in.line());
                if (before != null) {
                    throw in.error("'" + key + "' is given again (first on line " + before + ")");
                }
                if (TEXT_KEYS.contains(key)) {
                    metadata.put(key, value);
                } else if (MICROMETRE_KEYS.containsKey(key)) {
                    double um = number(in, key, value);
                    if (!(um > 0)) {
                        throw in.error("'" + key + "' is " + value + "; expected a radius above zero, in µm");
                    }
                    // decimal arithmetic, so 3.2 µm is 3.2e-6 m exactly as written
                    metadata.put(MICROMETRE_KEYS.get(key), new BigDecimal(value).movePointLeft(6).toString());
                } else {
                    throw in.error("unknown key '" + Decimals.abbreviate(key) + "'; expected one of: " + POINT + ", "
                            + String.join(", ", TEXT_KEYS) + ", " + String.join(", ", MICROMETRE_KEYS.keySet()));
                }
            }
            if (scan.rows() == 0) {
                throw in.error("no '" + POINT + " = FREQUENCY_HZ PHASE_DEG' line; expected at least one");
            }
            return new Dataset(file, ID, SignalNames.FREQUENCY_HZ, List.of(scan.build(in.line())), metadata);
        }
    }

    /** One row: a modulation frequency in Hz and the phase in degrees, separated by blanks. */
    private static void point(TextLines in, ScanBuilder scan, String value) throws InputException {
        String[] cells = value.split("\\s+");
        if (cells.length != 2 || cells[0].isEmpty()) {
            throw in.error("'" + POINT + "' takes two numbers, the frequency in Hz and the phase in degrees; found '"
                    + Decimals.abbreviate(value) + "'");
        }
        double f = number(in, "frequency", cells[0]);
        if (!(f > 0)) {
            throw in.error("frequency " + cells[0] + " Hz; expected a modulation frequency above zero");
        }
        scan.add(in.line(), f, new double[] {number(in, "phase", cells[1])}, new double[0]);
    }

    private static double number(TextLines in, String what, String cell) throws InputException {
        try {
            return Decimals.parse(cell, '.');
        } catch (NumberFormatException e) {
            throw in.error(what + ": " + e.getMessage());
        }
    }
}
