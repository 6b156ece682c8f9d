package lamella.fit;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import lamella.api.InputException;

/**
 * A dataset in Lamella's normalised CSV — what {@code simulate} and {@code import} write: a header of column names
 * ({@code delay_s,ratio,sigma_ratio,…}), then one row of numbers per x value; lines starting with {@code #} are
 * comments. Strict: every cell a finite number, every row as long as the header.
 */
final class DataTable {

    /** A normalised dataset is small; a file beyond this is not one. */
    static final long MAX_BYTES = 64L * 1024 * 1024;

    private final Path file;
    private final Map<String, double[]> columns;

    private DataTable(Path file, Map<String, double[]> columns) {
        this.file = file;
        this.columns = columns;
    }

    static DataTable read(Path file) throws InputException {
        try {
            if (!Files.isRegularFile(file)) {
                throw new InputException(file, null, -1, "no such data file");
            }
            long size = Files.size(file);
            if (size > MAX_BYTES) {
                throw new InputException(file, null, -1, "the file is " + size + " bytes; a normalised dataset may"
                        + " have at most " + MAX_BYTES + " (import large raw files with `lamella import` first)");
            }
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read the file: " + e.getMessage());
        }
        List<String> header = null;
        List<double[]> rows = new ArrayList<>();
        int headerLine = 0;
        try (BufferedReader r = new BufferedReader(new InputStreamReader(Files.newInputStream(file),
                StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                        .onUnmappableCharacter(CodingErrorAction.REPORT)))) {
            String line;
            int n = 0;
            while ((line = r.readLine()) != null) {
                n++;
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
                            throw new InputException(file, null, n, "the header " + (name.isEmpty()
                                    ? "has an empty column name" : "names '" + name + "' twice"));
                        }
                        header.add(name);
                    }
                    headerLine = n;
                    continue;
                }
                if (cells.length != header.size()) {
                    throw new InputException(file, null, n, "the row has " + cells.length + " cells; the header"
                            + " (line " + headerLine + ") has " + header.size());
                }
                double[] row = new double[cells.length];
                for (int i = 0; i < cells.length; i++) {
                    row[i] = number(cells[i].strip(), file, n, header.get(i));
                }
                rows.add(row);
            }
        } catch (CharacterCodingException e) {
            throw new InputException(file, null, -1, "not a text file (invalid UTF-8)");
        } catch (IOException e) {
            throw new InputException(file, null, -1, "cannot read the file: " + e.getMessage());
        }
        if (header == null) {
            throw new InputException(file, null, 1, "the file is empty; expected a header of column names");
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
        return new DataTable(file, columns);
    }

    private static double number(String cell, Path file, int line, String column) throws InputException {
        double v;
        try {
            v = Double.parseDouble(cell);
        } catch (NumberFormatException e) {
            v = Double.NaN;
        }
        if (!Double.isFinite(v)) {
            throw new InputException(file, null, line, "column '" + column + "': '" + cell
                    + "' is not a finite number");
        }
        return v;
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
