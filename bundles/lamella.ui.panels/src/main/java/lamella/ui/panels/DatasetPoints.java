package lamella.ui.panels;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.Technique;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.Scan;
import lamella.api.fit.DatasetFit;

/**
 * One dataset's points as the fit takes them: every row of its data file, which of them are fitted (inside
 * {@code x_range}, outside every {@code exclude} range, not marked {@code excluded} or {@code outlier} in the file)
 * and the σ the file gives. Read off the UI thread.
 *
 * @param request what was asked for
 * @param allX    x of every row, ascending per scan
 * @param x       the same (kept apart for the chart)
 * @param y       the signal
 * @param sigma   the file's σ of the signal, or null when it has none
 * @param fitted  whether each row is fitted
 * @param marked  rows the file marks as excluded or outliers
 */
record DatasetPoints(Request request, double[] allX, double[] x, double[] y, double[] sigma, boolean[] fitted,
                     int marked) {

    /**
     * What to read for one dataset, from the case document (equal requests read the same).
     *
     * @param range   [from, to] of {@code x_range}, or empty
     * @param exclude the {@code exclude} ranges
     * @param weights the {@code weights} in effect: the dataset's own, else the fit block's, else auto
     */
    record Request(int index, Path file, String technique, String signal, String xColumn, List<Double> range,
                   List<List<Double>> exclude, String weights) {

        String rangeWords() {
            return range.isEmpty() ? "all" : format(range.get(0), xColumn) + " to " + format(range.get(1), xColumn);
        }

        /** Where σ comes from, as the fit decides it (the dataset's own weights, else the fit block's, else auto). */
        String weightsWords() {
            return weights;
        }
    }

    int index() {
        return request.index();
    }

    static Request request(ObjectNode tree, int index, ModelCatalog catalog) {
        ObjectNode d = (ObjectNode) tree.path("fit").path("datasets").get(index);
        String technique = d.path("measurement").path("type").asText(tree.path("measurement").path("type")
                .asText("?"));
        List<String> signals = catalog.technique(technique).map(Technique::signalColumns).orElse(List.of());
        String signal = d.path("signal").asText("");
        if (signal.isEmpty()) {
            signal = signals.contains("ratio") ? "ratio" : signals.contains("phase_deg") ? "phase_deg"
                    : signals.isEmpty() ? "?" : signals.get(0);
        }
        List<Double> range = new ArrayList<>();
        if (d.path("x_range").isArray() && d.get("x_range").size() == 2) {
            range.add(d.get("x_range").get(0).asDouble());
            range.add(d.get("x_range").get(1).asDouble());
        }
        List<List<Double>> exclude = new ArrayList<>();
        for (JsonNode r : d.path("exclude")) {
            if (r.isArray() && r.size() == 2) {
                exclude.add(List.of(r.get(0).asDouble(), r.get(1).asDouble()));
            }
        }
        return new Request(index, Path.of(d.path("data").asText("?")), technique, signal,
                xColumn(tree, d, catalog), range, exclude, d.path("weights").asText(tree.path("fit").path("weights")
                .asText("auto")));
    }

    /** The x column of a dataset's technique (delay for techniques without one known). */
    static String xColumn(ObjectNode tree, ObjectNode d, ModelCatalog catalog) {
        String technique = d.path("measurement").path("type").asText(tree.path("measurement").path("type")
                .asText(""));
        return catalog.technique(technique).flatMap(Technique::xColumn).orElse("delay_s");
    }

    static Outcome<List<DatasetPoints>> readAll(List<Request> requests, List<DataImporter> importers,
                                                DataFiles files) {
        List<DatasetPoints> out = new ArrayList<>();
        for (Request r : requests) {
            try {
                out.add(read(r, importers, files));
            } catch (InputException e) {
                return Outcome.failed("dataset " + r.index() + ": " + e.getMessage());
            }
        }
        return Outcome.of(out);
    }

    private static DatasetPoints read(Request r, List<DataImporter> importers, DataFiles files)
            throws InputException {
        Dataset d = files.read(r.file(), importers);
        List<double[]> xs = new ArrayList<>();
        List<double[]> ys = new ArrayList<>();
        List<double[]> ss = new ArrayList<>();
        boolean hasSigma = d.hasSigma(r.signal());
        for (Scan s : d.scans()) {
            double[] y = s.signals().get(r.signal());
            if (y == null) {
                throw new InputException(r.file(), null, -1, "the file has no column " + r.signal() + " (it has "
                        + String.join(", ", d.signalColumns()) + ")");
            }
            xs.add(s.x());
            ys.add(y);
            if (hasSigma) {
                ss.add(s.sigmas().get(r.signal()));
            }
        }
        double[] x = concat(xs);
        double[] y = concat(ys);
        boolean[] marks = marks(r.file(), x.length);
        boolean[] fitted = new boolean[x.length];
        int marked = 0;
        for (int i = 0; i < x.length; i++) {
            boolean in = r.range().isEmpty() || (x[i] >= r.range().get(0) && x[i] <= r.range().get(1));
            for (List<Double> e : r.exclude()) {
                in &= !(x[i] >= e.get(0) && x[i] <= e.get(1));
            }
            if (marks[i]) {
                marked++;
            }
            fitted[i] = in && !marks[i];
        }
        return new DatasetPoints(r, x, x, y, hasSigma ? concat(ss) : null, fitted, marked);
    }

    /**
     * The rows Lamella's normalised CSV marks with 1 in its {@code excluded} or {@code outlier} column; none for a
     * file without those columns (or whose rows do not line up with the data read).
     */
    static boolean[] marks(Path file, int rows) {
        boolean[] out = new boolean[rows];
        List<String> lines;
        try {
            lines = Files.readAllLines(file, StandardCharsets.UTF_8);
        } catch (IOException | RuntimeException e) {
            return out;
        }
        int[] columns = null;
        int row = 0;
        boolean[] read = new boolean[rows];
        for (String line : lines) {
            String l = line.strip();
            if (l.isEmpty() || l.startsWith("#")) {
                continue;
            }
            String[] cells = l.split(",");
            if (columns == null) {
                List<String> names = Arrays.stream(cells).map(String::strip).toList();
                columns = new int[] {names.indexOf("excluded"), names.indexOf("outlier")};
                if (columns[0] < 0 && columns[1] < 0) {
                    return out;
                }
                continue;
            }
            if (row >= rows) {
                return new boolean[rows];
            }
            for (int c : columns) {
                if (c >= 0 && c < cells.length && cells[c].strip().equals("1")) {
                    read[row] = true;
                }
            }
            row++;
        }
        return row == rows ? read : out;
    }

    String fittedRangeWords() {
        if (!request.range().isEmpty()) {
            return request.rangeWords();
        }
        if (x.length == 0) {
            return "all";
        }
        double lo = Arrays.stream(x).min().orElse(0);
        double hi = Arrays.stream(x).max().orElse(0);
        return "all: " + format(lo, request.xColumn()) + " to " + format(hi, request.xColumn());
    }

    String leftOutWords() {
        int n = 0;
        for (boolean f : fitted) {
            n += f ? 0 : 1;
        }
        if (n == 0) {
            return "none";
        }
        return n + (marked > 0 ? " (" + marked + " marked in the file)" : "");
    }

    /**
     * Where the fit takes σ from, in few words so that the column stays readable: auto means the data's σ where
     * the file has them, else the residuals'.
     */
    String sigmaWords() {
        String w = request.weights();
        if (w.equals("auto")) {
            return sigma != null ? "auto: the data" : "auto: residuals";
        }
        if (w.equals("data") && sigma == null) {
            return "data: none in the file";
        }
        return w.equals("data") ? "the data" : w;
    }

    /** The σ a fit used at each of these points (matched by x), NaN where the fit had none. */
    double[] sigmaFromFit(DatasetFit fit) {
        Map<Double, Double> byX = new HashMap<>();
        for (int i = 0; i < fit.x().length; i++) {
            byX.put(fit.x()[i], fit.sigma()[i]);
        }
        double[] s = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            s[i] = byX.getOrDefault(x[i], Double.NaN);
        }
        return s;
    }

    static String format(double si, String xColumn) {
        DisplayUnit u = unit(si, xColumn);
        return QuantityText.format(si, u) + " " + u.unit();
    }

    /** ps below a nanosecond, ns above; kHz below a megahertz, MHz above. */
    private static DisplayUnit unit(double si, String xColumn) {
        List<DisplayUnit> choices = DisplayUnit.choices(xColumn);
        DisplayUnit chosen = choices.get(0);
        for (DisplayUnit u : choices) {
            if (Math.abs(si) >= u.factor() && u.factor() <= (xColumn.endsWith("_s") ? 1e-9 : 1e6)) {
                chosen = u;
            }
        }
        return chosen;
    }

    static double parse(String text, String xColumn) throws QuantityText.Refusal {
        return QuantityText.parse(text.strip(), xColumn, DisplayUnit.of(xColumn, false)).si();
    }

    private static double[] concat(List<double[]> parts) {
        int n = parts.stream().mapToInt(p -> p.length).sum();
        double[] out = new double[n];
        int at = 0;
        for (double[] p : parts) {
            System.arraycopy(p, 0, out, at, p.length);
            at += p.length;
        }
        return out;
    }
}
