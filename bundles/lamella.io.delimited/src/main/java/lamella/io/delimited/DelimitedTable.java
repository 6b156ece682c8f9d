package lamella.io.delimited;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import lamella.api.InputException;
import lamella.api.data.Dataset;
import lamella.api.data.Decimals;
import lamella.api.data.Scan;
import lamella.api.data.ScanBuilder;
import lamella.api.data.SignalNames;
import lamella.api.data.TextLines;

/**
 * Reads one delimited table, streaming. Layout: optional preamble lines ({@code key: value} or {@code key = value}
 * become metadata, other text is kept as {@code note.N}), then a header line naming the columns, then data rows.
 * Comment lines start with {@code #}, {@code %} or {@code //} and may appear anywhere. A blank line or a repeated
 * header after data rows starts the next scan.
 */
final class DelimitedTable {

    static final String FORMAT = "delimited";
    private static final int MAX_PREAMBLE_LINES = 1000;

    private record Line(int number, String text) {
    }

    private final TextLines in;
    private final Path file;
    private final List<Line> preamble = new ArrayList<>();
    private final List<Scan> scans = new ArrayList<>();
    private Dialect dialect;
    private List<String> headerCells;
    private int headerLine;
    private String xColumn;
    private int xIndex;
    private int[] signalIndex;
    private int[] sigmaIndex;
    private double[] factors;
    private List<String> signals;
    private List<String> sigmas;
    private ScanBuilder scan;

    private DelimitedTable(TextLines in) {
        this.in = in;
        this.file = in.file();
    }

    static Dataset read(Path file) throws InputException {
        try (TextLines in = TextLines.open(file)) {
            return new DelimitedTable(in).read();
        }
    }

    static boolean isComment(String stripped) {
        return stripped.startsWith("#") || stripped.startsWith("%") || stripped.startsWith("//");
    }

    private Dataset read() throws InputException {
        String text;
        while ((text = in.next()) != null) {
            String t = text.strip();
            if (t.isEmpty()) {
                endScan();
                continue;
            }
            if (isComment(t)) {
                continue;
            }
            if (dialect == null) {
                beforeData(t);
            } else if (dialect.splitHeader(t).equals(headerCells)) {
                endScan();
            } else {
                row(t);
            }
        }
        endScan();
        if (dialect == null) {
            throw in.error(Math.max(in.line(), 1), "no data rows: expected a header line naming the columns and"
                    + " rows of numbers below it");
        }
        if (scans.isEmpty()) {
            throw in.error(headerLine, "a header but no data rows below it");
        }
        return new Dataset(file, FORMAT, xColumn, scans, metadata());
    }

    private void beforeData(String t) throws InputException {
        if (!preamble.isEmpty()) {
            Line header = preamble.get(preamble.size() - 1);
            Optional<Dialect> damaged = Dialect.detect(t, null).isEmpty()
                    ? Dialect.detectDamaged(t, header.text()) : Optional.empty();
            if (damaged.isPresent()) {
                preamble.remove(preamble.size() - 1);
                start(header, damaged.get());
                row(t);
                return;
            }
        }
        if (Dialect.detect(t, null).isEmpty()) {
            if (preamble.size() == MAX_PREAMBLE_LINES) {
                throw in.error("more than " + MAX_PREAMBLE_LINES + " lines and still no data row");
            }
            preamble.add(new Line(in.line(), t));
            return;
        }
        if (preamble.isEmpty()) {
            throw in.error("data without a header line naming its columns; put one such as"
                    + " 'delay (ps), X (V), Y (V)' above the first row");
        }
        Line header = preamble.remove(preamble.size() - 1);
        Optional<Dialect> d = Dialect.detect(t, header.text());
        if (d.isEmpty()) {
            int dataCells = Dialect.detect(t, null).orElseThrow().split(t).size();
            throw in.error(header.number(), "the header '" + Decimals.abbreviate(header.text()) + "' does not have "
                    + dataCells + " cells like the first data row (line " + in.line() + ") in any of the"
                    + " separators Lamella reads (tab, semicolon, comma, whitespace)");
        }
        start(header, d.get());
        row(t);
    }

    private void start(Line header, Dialect d) throws InputException {
        dialect = d;
        headerLine = header.number();
        headerCells = dialect.splitHeader(header.text());
        columns();
    }

    private void columns() throws InputException {
        List<HeaderColumn> columns = new ArrayList<>();
        Map<String, Integer> seen = new HashMap<>();
        for (int i = 0; i < headerCells.size(); i++) {
            HeaderColumn c;
            try {
                c = HeaderColumn.parse(headerCells.get(i));
            } catch (IllegalArgumentException e) {
                throw in.error(headerLine, "column " + (i + 1) + ": " + e.getMessage());
            }
            String key = (c.sigma() ? SignalNames.sigma(c.name()) : c.name());
            Integer before = seen.put(key, i);
            if (before != null) {
                throw in.error(headerLine, "columns " + (before + 1) + " and " + (i + 1) + " both hold " + key);
            }
            columns.add(c);
        }
        List<Integer> xs = new ArrayList<>();
        for (int i = 0; i < columns.size(); i++) {
            if (SignalNames.X_COLUMNS.contains(columns.get(i).name())) {
                xs.add(i);
            }
        }
        if (xs.size() != 1) {
            throw in.error(headerLine, xs.isEmpty() ? "no x column: expected one frequency, delay or pump power column"
                    : "two x columns (" + (xs.get(0) + 1) + " and " + (xs.get(1) + 1) + "); expected one");
        }
        xIndex = xs.get(0);
        xColumn = columns.get(xIndex).name();
        factors = new double[columns.size()];
        signals = new ArrayList<>();
        List<Integer> si = new ArrayList<>();
        for (int i = 0; i < columns.size(); i++) {
            factors[i] = columns.get(i).factor();
            if (i != xIndex && !columns.get(i).sigma()) {
                signals.add(columns.get(i).name());
                si.add(i);
            }
        }
        if (signals.isEmpty()) {
            throw in.error(headerLine, "no signal column besides " + xColumn);
        }
        sigmas = new ArrayList<>();
        List<Integer> di = new ArrayList<>();
        for (String s : signals) {
            Integer at = seen.get(SignalNames.sigma(s));
            if (at != null) {
                sigmas.add(s);
                di.add(at);
            }
        }
        for (HeaderColumn c : columns) {
            if (c.sigma() && !signals.contains(c.name())) {
                throw in.error(headerLine, "a standard deviation of " + c.name() + " but no " + c.name()
                        + " column");
            }
        }
        signalIndex = si.stream().mapToInt(Integer::intValue).toArray();
        sigmaIndex = di.stream().mapToInt(Integer::intValue).toArray();
    }

    private void row(String t) throws InputException {
        List<String> cells = dialect.split(t);
        if (cells.size() != headerCells.size()) {
            throw in.error("has " + cells.size() + " cells, but the header (line " + headerLine + ") names "
                    + headerCells.size() + " (" + dialect.describe() + ")"
                    + (in.lastLineTerminated() ? "" : "; the file ends in this line, so it may be cut short"));
        }
        double[] v = new double[cells.size()];
        for (int i = 0; i < v.length; i++) {
            try {
                v[i] = Decimals.parse(cells.get(i), dialect.decimalMark()) * factors[i];
            } catch (NumberFormatException e) {
                throw in.error("column " + (i + 1) + " (" + headerCells.get(i) + "): " + e.getMessage());
            }
        }
        if (scan == null) {
            scan = new ScanBuilder(file, xColumn, signals, sigmas);
        }
        double[] s = new double[signalIndex.length];
        for (int i = 0; i < s.length; i++) {
            s[i] = v[signalIndex[i]];
        }
        double[] d = new double[sigmaIndex.length];
        for (int i = 0; i < d.length; i++) {
            d[i] = v[sigmaIndex[i]];
        }
        scan.add(in.line(), v[xIndex], s, d);
    }

    private void endScan() throws InputException {
        if (scan != null) {
            scans.add(scan.build(in.line()));
            scan = null;
        }
    }

    private Map<String, String> metadata() throws InputException {
        Map<String, String> m = new LinkedHashMap<>();
        Map<String, Integer> lines = new HashMap<>();
        int notes = 0;
        for (Line l : preamble) {
            int cut = firstOf(l.text(), ':', '=');
            String key;
            String value;
            if (cut > 0) {
                key = l.text().substring(0, cut).strip().toLowerCase(Locale.ROOT).replaceAll("\\s+", "_");
                value = l.text().substring(cut + 1).strip();
            } else {
                key = "note." + (++notes);
                value = l.text();
            }
            Integer before = lines.put(key, l.number());
            if (before != null) {
                throw in.error(l.number(), "metadata '" + key + "' is stated twice (also on line " + before + ")");
            }
            m.put(key, value);
        }
        m.put(TextLines.ENCODING_KEY, in.encoding());
        return m;
    }

    private static int firstOf(String s, char a, char b) {
        int i = s.indexOf(a);
        int j = s.indexOf(b);
        return i < 0 ? j : j < 0 ? i : Math.min(i, j);
    }
}
