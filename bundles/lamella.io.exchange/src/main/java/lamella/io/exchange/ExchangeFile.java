package lamella.io.exchange;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import lamella.api.InputException;
import lamella.api.data.Dataset;
import lamella.api.data.Decimals;
import lamella.api.data.Quantity;
import lamella.api.data.Scan;
import lamella.api.data.ScanBuilder;
import lamella.api.data.SignalNames;
import lamella.api.data.TextLines;

/**
 * Reads the Lamella exchange format, version 1 (specified in the README): a version line, a metadata block of
 * {@code key: value} lines, one or more {@code scan N} sections of whitespace-separated rows, and a closing
 * {@code end} line, so that a file cut short is always noticed.
 */
final class ExchangeFile {

    static final String FORMAT = "lamella-exchange";
    static final String MAGIC = "lamella-exchange";
    static final int VERSION = 1;
    private static final String END = "end";
    private static final Set<String> LOCK_IN_CHANNELS = Set.of(SignalNames.IN_PHASE, SignalNames.OUT_OF_PHASE,
            SignalNames.AMPLITUDE);
    private static final List<List<String>> PAIRS = List.of(
            List.of(SignalNames.IN_PHASE, SignalNames.OUT_OF_PHASE),
            List.of(SignalNames.AMPLITUDE, SignalNames.PHASE_DEG));

    private final TextLines in;
    private final Path file;
    private final Map<String, String> metadata = new LinkedHashMap<>();
    private final Map<String, Integer> keyLines = new HashMap<>();
    private final List<Scan> scans = new ArrayList<>();
    private String xColumn;
    private List<String> signals;
    private List<String> sigmas;
    private int[] signalColumn;
    private int[] sigmaColumn;
    private double[] factor;
    private int columns;

    private ExchangeFile(TextLines in) {
        this.in = in;
        this.file = in.file();
    }

    static Dataset read(Path file) throws InputException {
        try (TextLines in = TextLines.open(file)) {
            return new ExchangeFile(in).read();
        }
    }

    private Dataset read() throws InputException {
        versionLine();
        String t = header();
        checkHeader();
        ScanBuilder scan = null;
        int expected = 1;
        while (true) {
            if (t == null) {
                throw in.error(Math.max(in.line(), 1), "the file ends without its closing '" + END + "' line; it"
                        + " may be cut short");
            }
            if (t.equals(END)) {
                break;
            }
            if (isScanLine(t)) {
                if (scan != null) {
                    scans.add(scan.build(in.line()));
                }
                scanLine(t, expected++);
                scan = new ScanBuilder(file, xColumn, signals, sigmas);
            } else if (scan == null) {
                throw in.error("'" + Decimals.abbreviate(t) + "': expected 'scan 1' to start the data");
            } else {
                row(t, scan);
            }
            t = significant();
        }
        if (scan == null) {
            throw in.error("'" + END + "' before any scan; expected at least one 'scan N' section");
        }
        scans.add(scan.build(in.line()));
        String after = significant();
        if (after != null) {
            throw in.error("'" + Decimals.abbreviate(after) + "' after the closing '" + END + "' line");
        }
        metadata.put(TextLines.ENCODING_KEY, in.encoding());
        return new Dataset(file, FORMAT, xColumn, scans, metadata);
    }

    /** The next line that is neither blank nor a comment, stripped; null at the end. */
    private String significant() throws InputException {
        String line;
        while ((line = in.next()) != null) {
            String t = line.strip();
            if (!t.isEmpty() && !t.startsWith("#")) {
                return t;
            }
        }
        return null;
    }

    private void versionLine() throws InputException {
        String first = in.next();
        String[] parts = first == null ? new String[0] : first.strip().split("\\s+");
        if (parts.length != 2 || !parts[0].equals(MAGIC)) {
            throw in.error(1, "expected the version line '" + MAGIC + " " + VERSION + "' first");
        }
        if (!parts[1].equals(Integer.toString(VERSION))) {
            throw in.error(1, "version '" + Decimals.abbreviate(parts[1]) + "'; this Lamella reads version "
                    + VERSION);
        }
    }

    /** Reads the metadata block; returns the first line after it. */
    private String header() throws InputException {
        String t;
        while ((t = significant()) != null && !isScanLine(t) && !t.equals(END)) {
            int colon = t.indexOf(':');
            if (colon <= 0) {
                throw in.error("'" + Decimals.abbreviate(t) + "': expected 'key: value' in the metadata block");
            }
            String key = t.substring(0, colon).strip();
            String value = t.substring(colon + 1).strip();
            try {
                ExchangeHeader.check(key, value);
            } catch (IllegalArgumentException e) {
                throw in.error(e.getMessage());
            }
            Integer before = keyLines.put(key, in.line());
            if (before != null) {
                throw in.error(key + " is stated twice (also on line " + before + ")");
            }
            metadata.put(key, value);
        }
        return t;
    }

    private void checkHeader() throws InputException {
        String technique = metadata.get(ExchangeHeader.TECHNIQUE);
        int at = in.line();
        if (technique == null) {
            throw in.error(at, "the metadata block has no 'technique' (tdtr or fdtr)");
        }
        for (String key : ExchangeHeader.required(technique)) {
            if (!metadata.containsKey(key)) {
                throw in.error(at, "the metadata block of a " + technique + " file needs '" + key + "'");
            }
        }
        String expectedX = technique.equals("tdtr") ? SignalNames.DELAY_S : SignalNames.FREQUENCY_HZ;
        xColumn = metadata.get(ExchangeHeader.X);
        if (!xColumn.equals(expectedX)) {
            throw in.error(keyLines.get(ExchangeHeader.X), "x is '" + Decimals.abbreviate(xColumn) + "'; a "
                    + technique + " file has x: " + expectedX);
        }
        double unit = 1.0;
        if (metadata.containsKey(ExchangeHeader.SIGNAL_UNIT)) {
            try {
                unit = Quantity.VOLTAGE.factor(metadata.get(ExchangeHeader.SIGNAL_UNIT));
            } catch (IllegalArgumentException e) {
                throw in.error(keyLines.get(ExchangeHeader.SIGNAL_UNIT), "signal_unit: " + e.getMessage());
            }
        }
        channels(keyLines.get(ExchangeHeader.CHANNELS), unit);
    }

    private void channels(int line, double unit) throws InputException {
        List<String> names = Arrays.asList(metadata.get(ExchangeHeader.CHANNELS).split("\\s+"));
        signals = new ArrayList<>();
        sigmas = new ArrayList<>();
        List<Integer> sc = new ArrayList<>();
        Map<String, Integer> sigmaAt = new HashMap<>();
        factor = new double[names.size() + 1];
        factor[0] = 1.0;
        for (int i = 0; i < names.size(); i++) {
            String n = names.get(i);
            String base = n.startsWith("sigma_") ? n.substring("sigma_".length()) : n;
            if (!List.of(SignalNames.IN_PHASE, SignalNames.OUT_OF_PHASE, SignalNames.AMPLITUDE,
                    SignalNames.PHASE_DEG).contains(base)) {
                throw in.error(line, "channel '" + Decimals.abbreviate(n) + "'; expected in_phase, out_of_phase,"
                        + " amplitude, phase_deg or sigma_ of one of them");
            }
            if (signals.contains(n) || sigmaAt.containsKey(base) && !n.equals(base)) {
                throw in.error(line, "channel " + n + " is listed twice");
            }
            factor[i + 1] = LOCK_IN_CHANNELS.contains(base) ? unit : 1.0;
            if (n.equals(base)) {
                signals.add(n);
                sc.add(i + 1);
            } else {
                sigmaAt.put(base, i + 1);
            }
        }
        if (PAIRS.stream().noneMatch(p -> Set.copyOf(p).equals(Set.copyOf(signals)))) {
            throw in.error(line, "channels " + signals + "; expected one pair: in_phase and out_of_phase, or"
                    + " amplitude and phase_deg (each optionally with its sigma_ channel)");
        }
        List<Integer> dc = new ArrayList<>();
        for (String s : signals) {
            if (sigmaAt.containsKey(s)) {
                sigmas.add(s);
                dc.add(sigmaAt.remove(s));
            }
        }
        if (!sigmaAt.isEmpty()) {
            throw in.error(line, "sigma_" + sigmaAt.keySet().iterator().next() + " without its channel");
        }
        columns = names.size() + 1;
        signalColumn = sc.stream().mapToInt(Integer::intValue).toArray();
        sigmaColumn = dc.stream().mapToInt(Integer::intValue).toArray();
    }

    private static boolean isScanLine(String t) {
        return t.split("\\s+", 2)[0].equals("scan");
    }

    private void scanLine(String t, int expected) throws InputException {
        String[] parts = t.split("\\s+");
        if (parts.length != 2 || !parts[0].equals("scan")) {
            throw in.error("'" + Decimals.abbreviate(t) + "': expected 'scan " + expected + "'");
        }
        if (!parts[1].equals(Integer.toString(expected))) {
            throw in.error("'" + Decimals.abbreviate(t) + "': scans are numbered 1, 2, … in order; expected 'scan "
                    + expected + "'");
        }
    }

    private void row(String t, ScanBuilder scan) throws InputException {
        String[] cells = t.split("\\s+");
        if (cells.length != columns) {
            throw in.error("has " + cells.length + " numbers; expected " + columns + " (" + xColumn + " and the"
                    + " channels " + metadata.get(ExchangeHeader.CHANNELS) + ")"
                    + (in.lastLineTerminated() ? "" : "; the file ends in this line, so it may be cut short"));
        }
        double[] v = new double[columns];
        for (int i = 0; i < columns; i++) {
            try {
                v[i] = Decimals.parse(cells[i], '.') * factor[i];
            } catch (NumberFormatException e) {
                throw in.error("number " + (i + 1) + ": " + e.getMessage());
            }
        }
        double[] s = new double[signalColumn.length];
        for (int i = 0; i < s.length; i++) {
            s[i] = v[signalColumn[i]];
        }
        double[] d = new double[sigmaColumn.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = v[sigmaColumn[i]];
        }
        scan.add(in.line(), v[0], s, d);
    }
}
