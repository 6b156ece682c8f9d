package lamella.fit;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lamella.api.InputException;
import lamella.api.data.Decimals;
import lamella.api.data.ScanBuilder;
import lamella.api.data.TextLines;

/**
 * A dataset in Lamella's normalised CSV — what {@code simulate} and {@code import} write: a header of column names
 * ({@code delay_s,ratio,sigma_ratio,…}), then one row of numbers per x value; lines starting with {@code #} are
 * comments. Read by the same rules as {@code import} reads instrument files ({@link TextLines}: size and line limits,
 * strict UTF-8, a byte-order mark skipped, LF, CRLF or CR line ends; {@link Decimals}: plain or scientific numbers
 * only), and its x column checked as {@link ScanBuilder} checks an imported scan (no repeated x, no change of
 * direction), so that a file gets the same message here as there. Strict: every cell a finite number, every row as
 * long as the header.
 */
final class DataTable {

    private final Path file;
    private final Map<String, double[]> columns;
    private final int[] lines;

    private DataTable(Path file, Map<String, double[]> columns, int[] lines) {
        this.file = file;
        this.columns = columns;
        this.lines = lines;
    }

    static DataTable read(Path file) throws InputException {
        List<String> header = null;
        List<double[]> rows = new ArrayList<>();
        List<Integer> rowLines = new ArrayList<>();
        int headerLine = 0;
        try (TextLines in = TextLines.open(file)) {
            String line;
            while ((line = in.next()) != null) {
                int n = in.line();
                String t = line.strip();
                if (t.isEmpty() || t.startsWith("#")) {
                    continue;
                }
                String[] cells = t.split(",", -1);
                if (header == null) {
                    header = new ArrayList<>();
                    for (String c : cells) {
                        String name = c.strip();
                        if (name.isEmpty() || header.contains(name)) {
                            throw in.error(n, "the header " + (name.isEmpty()
                                    ? "has an empty column name" : "names '" + name + "' twice"));
                        }
                        header.add(name);
                    }
                    headerLine = n;
                    continue;
                }
                if (cells.length != header.size()) {
                    throw in.error(n, "the row has " + cells.length + " cells; the header (line " + headerLine
                            + ") has " + header.size());
                }
                double[] row = new double[cells.length];
                for (int i = 0; i < cells.length; i++) {
                    try {
                        row[i] = Decimals.parse(cells[i], '.');
                    } catch (NumberFormatException e) {
                        throw in.error(n, "column '" + header.get(i) + "': " + e.getMessage());
                    }
                }
                rows.add(row);
                rowLines.add(n);
            }
        }
        if (header == null) {
            throw new InputException(file, null, 1, "the file holds no header; expected a header of column names");
        }
        if (rows.isEmpty()) {
            throw new InputException(file, null, headerLine, "the file has a header but no data rows");
        }
        Map<String, double[]> columns = new LinkedHashMap<>();
        for (int c = 0; c < header.size(); c++) {
            double[] v = new double[rows.size()];
            for (int i = 0; i < v.length; i++) {
                v[i] = rows.get(i)[c];
            }
            columns.put(header.get(c), v);
        }
        return new DataTable(file, columns, rowLines.stream().mapToInt(Integer::intValue).toArray());
    }

    /**
     * Checks the x column as an imported scan is checked: each x once, in one direction (up or down); the error
     * names the line where it is not.
     */
    void checkX(String xColumn) throws InputException {
        ScanBuilder scan = new ScanBuilder(file, xColumn, List.of(), List.of());
        double[] x = columns.get(xColumn);
        for (int i = 0; i < x.length; i++) {
            scan.add(lines[i], x[i], new double[0], new double[0]);
        }
    }

    /** The line of a data row (0-based row index). */
    int lineOf(int row) {
        return lines[row];
    }

    Path file() {
        return file;
    }

    boolean has(String column) {
        return columns.containsKey(column);
    }

    double[] column(String name) {
        return columns.get(name).clone();
    }

    List<String> names() {
        return List.copyOf(columns.keySet());
    }

    int rows() {
        return columns.values().iterator().next().length;
    }
}
