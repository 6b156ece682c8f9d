package lamella.map;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.io.Serializable;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import lamella.api.InputException;

/**
 * A map data file: a long table in CSV with one row per position and x value — columns {@code x_m}, {@code y_m}, the
 * technique's x column ({@code frequency_hz}, {@code delay_s}), the signal and optionally {@code sigma_<signal>};
 * other columns are ignored; {@code #} lines are comments. Positions may lie on a grid or anywhere, rows in any order.
 *
 * <p>A broken file — no header, a column missing, a row of the wrong length, a position or x that is not a finite
 * number — is an InputException at its line. What concerns one position only — a signal or σ cell that is not a
 * finite number, an x value twice, too few points, x values other than the map's — makes that position's problem, and
 * the rest of the map goes on. The map's x values are those most positions share.
 */
public final class MapData {

    /** Far beyond a map of 10⁶ positions with a few points each; larger maps are split or read from Parquet. */
    static final long MAX_BYTES = 2L * 1024 * 1024 * 1024;
    static final int MAX_LINE_CHARS = 64 * 1024;
    /** Relative agreement of x values between positions: instruments repeat their settings to far better. */
    static final double X_TOLERANCE = 1e-9;

    /**
     * One position.
     *
     * @param xM      stage x, m
     * @param yM      stage y, m
     * @param y       the signal at the map's x values (null when the position has a problem)
     * @param sigma   its σ per point, or null
     * @param problem why the position cannot be fitted, or null
     * @param line    the first line of the position in the file
     */
    public record Position(double xM, double yM, double[] y, double[] sigma, String problem, int line)
            implements Serializable {
    }

    public final Path file;
    public final String xColumn;
    public final String signal;
    public final boolean hasSigma;
    public final double[] x;
    public final List<Position> positions;

    private MapData(Path file, String xColumn, String signal, boolean hasSigma, double[] x, List<Position> positions) {
        this.file = file;
        this.xColumn = xColumn;
        this.signal = signal;
        this.hasSigma = hasSigma;
        this.x = x;
        this.positions = positions;
    }

    /** The rows of one position as read, before they are checked. */
    private static final class Rows {
        final int firstLine;
        double[] x = new double[8];
        double[] y = new double[8];
        double[] s = new double[8];
        int[] lines = new int[8];
        int n;
        String problem;

        Rows(int firstLine) {
            this.firstLine = firstLine;
        }

        void add(double xv, double yv, double sv, int line) {
            if (n == x.length) {
                x = Arrays.copyOf(x, 2 * n);
                y = Arrays.copyOf(y, 2 * n);
                s = Arrays.copyOf(s, 2 * n);
                lines = Arrays.copyOf(lines, 2 * n);
            }
            x[n] = xv;
            y[n] = yv;
            s[n] = sv;
            lines[n] = line;
            n++;
        }
    }

    private record Key(double x, double y) {
    }

    public static MapData read(Path file, String xColumn, String signal) throws InputException {
        try {
            if (!Files.isRegularFile(file)) {
                throw new InputException(file, null, -1, "no such map data file");
            }
            long size = Files.size(file);
            if (size > MAX_BYTES) {
                throw new InputException(file, null, -1, "the file is " + size + " bytes; a map in CSV may have at"
                        + " most " + MAX_BYTES);
            }
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read the file: " + e.getMessage());
        }
        String sigmaColumn = "sigma_" + signal;
        Collector rows = null;
        int[] at = null;
        int cells = 0;
        int headerLine = 0;
        try (BufferedReader r = new BufferedReader(new InputStreamReader(Files.newInputStream(file),
                StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                        .onUnmappableCharacter(CodingErrorAction.REPORT)), 1 << 16)) {
            String line;
            int n = 0;
            while ((line = r.readLine()) != null) {
                n++;
                if (line.length() > MAX_LINE_CHARS) {
                    throw new InputException(file, null, n, "the line is longer than " + MAX_LINE_CHARS
                            + " characters");
                }
                String t = line.strip();
                if (t.isEmpty() || t.startsWith("#")) {
                    continue;
                }
                String[] c = t.split(",", -1);
                if (at == null) {
                    List<String> header = new ArrayList<>();
                    for (String name : c) {
                        String h = name.strip();
                        if (h.isEmpty() || header.contains(h)) {
                            throw new InputException(file, null, n, "the header " + (h.isEmpty()
                                    ? "has an empty column name" : "names '" + h + "' twice"));
                        }
                        header.add(h);
                    }
                    at = columns(file, n, header, xColumn, signal);
                    cells = header.size();
                    headerLine = n;
                    rows = new Collector(file, xColumn, signal, at[4] >= 0, "line", headerLine);
                    continue;
                }
                if (c.length != cells) {
                    throw new InputException(file, null, n, "the row has " + c.length + " cells; the header (line "
                            + headerLine + ") has " + cells);
                }
                double xm = coordinate(c[at[0]], "x_m", file, n);
                double ym = coordinate(c[at[1]], "y_m", file, n);
                double xv = coordinate(c[at[2]], xColumn, file, n);
                rows.add(xm, ym, xv, cell(c[at[3]]), c[at[3]].strip(), at[4] < 0 ? Double.NaN : cell(c[at[4]]),
                        at[4] < 0 ? "" : c[at[4]].strip(), n);
            }
        } catch (CharacterCodingException e) {
            throw new InputException(file, null, -1, "not a text file (invalid UTF-8)");
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read the file: " + e.getMessage());
        }
        if (at == null) {
            throw new InputException(file, null, 1, "the file is empty; expected a header: x_m,y_m," + xColumn + ","
                    + signal + "[," + sigmaColumn + "]");
        }
        return rows.finish();
    }

    /**
     * Where the columns a map needs are in a header: x_m, y_m, the x column, the signal, and its σ (−1 when absent).
     * The header is at {@code line} of the file (a Parquet file's schema is line 0).
     */
    public static int[] columns(Path file, int line, List<String> header, String xColumn, String signal)
            throws InputException {
        String sigmaColumn = "sigma_" + signal;
        List<String> need = List.of("x_m", "y_m", xColumn, signal);
        int[] at = new int[5];
        for (int i = 0; i < need.size(); i++) {
            at[i] = header.indexOf(need.get(i));
            if (at[i] < 0) {
                throw new InputException(file, null, line, "no column '" + need.get(i) + "'; a map needs "
                        + String.join(", ", need) + " (and optionally " + sigmaColumn + "); the file has "
                        + String.join(", ", header));
            }
        }
        at[4] = header.indexOf(sigmaColumn);
        return at;
    }

    /**
     * The rows of a map table, from any reader (CSV here, Parquet in the Spark job), grouped into positions and
     * checked as {@link #read} describes: {@link #add} row after row, then {@link #finish}.
     */
    public static final class Collector {
        private final Path file;
        private final String xColumn;
        private final String signal;
        private final boolean hasSigma;
        private final String where;
        private final int headerLine;
        private final Map<Key, Rows> byPosition = new LinkedHashMap<>();

        /**
         * @param where      what a row is called in messages ("line" of a CSV file, "row" of a Parquet file)
         * @param headerLine the line of the header, for the messages about the whole file
         */
        public Collector(Path file, String xColumn, String signal, boolean hasSigma, String where, int headerLine) {
            this.file = file;
            this.xColumn = xColumn;
            this.signal = signal;
            this.hasSigma = hasSigma;
            this.where = where;
            this.headerLine = headerLine;
        }

        /**
         * One row: finite stage position and x (the caller reports others at their line), the signal and σ as
         * numbers (NaN for a missing or unreadable cell) and as written, for the messages.
         */
        public void add(double xm, double ym, double xv, double yv, String yText, double sv, String sText, int n) {
            Rows rows = byPosition.computeIfAbsent(new Key(xm + 0.0, ym + 0.0), k -> new Rows(n));
            if (rows.problem == null) {
                if (!Double.isFinite(yv)) {
                    rows.problem = where + " " + n + ": " + signal + " '" + yText + "' is not a finite number";
                } else if (hasSigma && !(sv > 0 && Double.isFinite(sv))) {
                    rows.problem = where + " " + n + ": sigma_" + signal + " '" + sText
                            + "' is not a positive finite number";
                }
            }
            rows.add(xv, yv, sv, n);
        }

        /** The positions, in the order of their first rows. */
        public MapData finish() throws InputException {
            if (byPosition.isEmpty()) {
                throw new InputException(file, null, headerLine, "the file has a header but no data rows");
            }
            for (Rows rows : byPosition.values()) {
                sortAndCheckRepeats(rows, xColumn, where);
            }
            double[] x = commonX(byPosition.values());
            if (x == null) {
                throw new InputException(file, null, headerLine, "no position has a usable curve; every one has a"
                        + " problem (the first: " + byPosition.values().iterator().next().problem + ")");
            }
            List<Position> positions = new ArrayList<>(byPosition.size());
            for (Map.Entry<Key, Rows> e : byPosition.entrySet()) {
                positions.add(position(e.getKey(), e.getValue(), x, hasSigma, xColumn));
            }
            return new MapData(file, xColumn, signal, hasSigma, x, List.copyOf(positions));
        }
    }

    private static void sortAndCheckRepeats(Rows r, String xColumn, String where) {
        Integer[] order = new Integer[r.n];
        for (int i = 0; i < r.n; i++) {
            order[i] = i;
        }
        Arrays.sort(order, (a, b) -> Double.compare(r.x[a], r.x[b]));
        double[] x = new double[r.n];
        double[] y = new double[r.n];
        double[] s = new double[r.n];
        int[] lines = new int[r.n];
        for (int i = 0; i < r.n; i++) {
            x[i] = r.x[order[i]];
            y[i] = r.y[order[i]];
            s[i] = r.s[order[i]];
            lines[i] = r.lines[order[i]];
        }
        r.x = x;
        r.y = y;
        r.s = s;
        r.lines = lines;
        for (int i = 1; i < r.n && r.problem == null; i++) {
            if (x[i] == x[i - 1]) {
                r.problem = xColumn + " = " + x[i] + " appears twice (" + where + "s " + Math.min(lines[i], lines[i - 1])
                        + " and " + Math.max(lines[i], lines[i - 1]) + ")";
            }
        }
    }

    /** The x values most positions without a problem share. */
    private static double[] commonX(Iterable<Rows> all) {
        Map<List<Double>, Integer> counts = new HashMap<>();
        List<Double> best = null;
        int bestCount = 0;
        for (Rows r : all) {
            if (r.problem != null) {
                continue;
            }
            List<Double> key = new ArrayList<>(r.n);
            for (int i = 0; i < r.n; i++) {
                key.add(r.x[i]);
            }
            int c = counts.merge(key, 1, Integer::sum);
            if (c > bestCount) {
                bestCount = c;
                best = key;
            }
        }
        return best == null ? null : best.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static Position position(Key k, Rows r, double[] x, boolean sigma, String xColumn) {
        String problem = r.problem;
        if (problem == null && r.n < x.length && isSubset(r, x)) {
            problem = "too few points: " + r.n + " of the map's " + x.length + " " + xColumn + " values";
        } else if (problem == null && !sameX(r, x)) {
            problem = "its " + xColumn + " values differ from the map's (" + r.n + " values from " + fmt(r.x[0])
                    + " to " + fmt(r.x[r.n - 1]) + "; the map has " + x.length + " from " + fmt(x[0]) + " to "
                    + fmt(x[x.length - 1]) + ")";
        }
        if (problem != null) {
            return new Position(k.x(), k.y(), null, null, problem, r.firstLine);
        }
        return new Position(k.x(), k.y(), Arrays.copyOf(r.y, r.n), sigma ? Arrays.copyOf(r.s, r.n) : null, null,
                r.firstLine);
    }

    private static boolean sameX(Rows r, double[] x) {
        if (r.n != x.length) {
            return false;
        }
        for (int i = 0; i < x.length; i++) {
            if (!close(r.x[i], x[i])) {
                return false;
            }
        }
        return true;
    }

    private static boolean isSubset(Rows r, double[] x) {
        int j = 0;
        for (int i = 0; i < r.n; i++) {
            while (j < x.length && !close(x[j], r.x[i])) {
                j++;
            }
            if (j == x.length) {
                return false;
            }
            j++;
        }
        return true;
    }

    private static boolean close(double a, double b) {
        return Math.abs(a - b) <= X_TOLERANCE * Math.max(Math.abs(a), Math.abs(b));
    }

    private static String fmt(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }

    private static double coordinate(String cell, String column, Path file, int line) throws InputException {
        double v = cell(cell);
        if (!Double.isFinite(v)) {
            throw new InputException(file, null, line, "column '" + column + "': '" + cell.strip()
                    + "' is not a finite number");
        }
        return v;
    }

    private static double cell(String s) {
        try {
            return Double.parseDouble(s.strip());
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }
}
