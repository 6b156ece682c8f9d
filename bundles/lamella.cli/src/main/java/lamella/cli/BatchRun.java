package lamella.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintStream;
import java.io.Serializable;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.ArrayList;
import java.util.HexFormat;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CancellationException;
import java.util.stream.Stream;
import lamella.api.AtomicText;
import lamella.api.CaseDocument;
import lamella.api.CaseFormat;
import lamella.api.InputException;
import lamella.api.ModelEvaluationException;
import lamella.api.OwnInputs;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitService;
import lamella.api.fit.FitSettings;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.Progress;

/**
 * One run of {@code lamella batch}: fits every case in turn into {@code DIR/results/NAME.json} and keeps
 * {@code DIR/results.csv} up to date after each. A case whose result is already there and was made from the same
 * inputs (its fingerprint: the case file, every file it names and the entry's overrides) is not fitted again, so a run
 * that was killed resumes where it stopped; files appear only complete (written beside, then moved). A failing case
 * is recorded and the rest go on; a failed case is tried again by the next run.
 */
public final class BatchRun {

    static final String RESULTS = "results";
    public static final String TABLE = "results.csv";
    static final String TABLE_HEADER = "case,parameter,value,sigma,unit,reduced_chi_square,status,message";

    /** What became of one case. */
    public enum Status { FITTED, DONE_BEFORE, FAILED }

    /** One line of the table. */
    public record Row(String caseName, String parameter, double value, double sigma, String unit,
                      double reducedChiSquare, String status, String message) implements Serializable {
    }

    /** One case done: what became of it, its rows of the table, and that in words for the progress line. */
    public record Case(Status status, List<Row> rows, String said) implements Serializable {
    }

    /** The counts of a finished run. */
    public record Summary(int fitted, int doneBefore, int failed, double seconds) {
    }

    private final CaseFormat format;
    private final FitService fitter;
    private final FitSettings settings;
    private final Path out;
    private final PrintStream err;

    public BatchRun(CaseFormat format, FitService fitter, FitSettings settings, Path out, PrintStream err) {
        this.format = format;
        this.fitter = fitter;
        this.settings = settings;
        this.out = out;
        this.err = err;
    }

    /** Where a case's result goes. */
    static Path resultFile(Path out, String name) {
        return out.resolve(RESULTS).resolve(name + ".json");
    }

    /** Every file the batch writes, for the refusal to overwrite an input. */
    static List<Path> outputs(Path out, List<BatchManifest.Entry> entries) {
        List<Path> files = new ArrayList<>();
        files.add(out.resolve(TABLE));
        entries.forEach(e -> files.add(resultFile(out, e.name())));
        return files;
    }

    /**
     * Runs every case. Throws CancellationException when interrupted (what is done stays done) and IOException when a
     * result cannot be written.
     */
    public Summary run(List<BatchManifest.Entry> entries) throws IOException {
        long start = System.nanoTime();
        clearPartials(out);
        List<List<Row>> rows = new ArrayList<>();
        int fitted = 0;
        int doneBefore = 0;
        int failed = 0;
        double workSeconds = 0;
        int worked = 0;
        for (int i = 0; i < entries.size(); i++) {
            if (Thread.currentThread().isInterrupted()) {
                throw new CancellationException("batch interrupted");
            }
            BatchManifest.Entry e = entries.get(i);
            long t0 = System.nanoTime();
            Case c = one(e, format, fitter, settings, out);
            rows.add(c.rows());
            switch (c.status()) {
                case DONE_BEFORE -> doneBefore++;
                case FITTED -> fitted++;
                case FAILED -> failed++;
            }
            if (c.status() != Status.DONE_BEFORE) {
                workSeconds += (System.nanoTime() - t0) * 1e-9;
                worked++;
            }
            String said = c.said();
            AtomicText.write(out.resolve(TABLE), table(rows));
            int remaining = entries.size() - i - 1;
            String left = remaining == 0 ? "" : worked == 0 ? "; time left not known yet"
                    : "; about " + duration(workSeconds / worked * remaining) + " left";
            err.printf(Locale.ROOT, "batch %d/%d %s: %s (%s)%s%n", i + 1, entries.size(), e.name(), said,
                    duration((System.nanoTime() - t0) * 1e-9), left);
        }
        return new Summary(fitted, doneBefore, failed, (System.nanoTime() - start) * 1e-9);
    }

    /**
     * One case of a batch: its result read back when one made from the same inputs is there, else fitted and written
     * (complete or not at all); a failure becomes the case's row. Depends on nothing but its arguments and the files,
     * so any engine (this run's loop, a Spark task) gives the same result. Throws CancellationException when
     * interrupted and IOException when the result cannot be written.
     */
    public static Case one(BatchManifest.Entry e, CaseFormat format, FitService fitter, FitSettings settings,
                           Path out) throws IOException {
        String fingerprint = fingerprint(e);
        Path result = resultFile(out, e.name());
        List<Row> previous = previous(result, e.name(), fingerprint);
        if (previous != null) {
            return new Case(Status.DONE_BEFORE, previous, "already done");
        }
        try {
            CaseDocument doc = read(format, e);
            FitOutcome outcome = fitter.fit(doc, settings, Progress.NONE);
            ObjectNode tree = FitResultJson.tree(doc, outcome);
            ObjectNode record = tree.putObject("batch");
            record.put("name", e.name());
            record.put("fingerprint", fingerprint);
            ObjectNode set = record.putObject("set");
            e.overrides().forEach(set::put);
            AtomicText.write(result, FitResultJson.text(tree));
            return new Case(Status.FITTED, rows(e.name(), outcome), "fitted");
        } catch (InputException | ModelEvaluationException | IllegalArgumentException x) {
            return failedCase(e, x);
        } catch (CancellationException x) {
            throw x;
        } catch (RuntimeException x) {
            return failedCase(e, x);
        }
    }

    private static Case failedCase(BatchManifest.Entry e, Exception x) {
        Row row = failure(e, x);
        return new Case(Status.FAILED, List.of(row), "FAILED: " + row.message());
    }

    /** Removes what a killed run into {@code out} left of the files it was writing. */
    public static void clearPartials(Path out) throws IOException {
        clearPartials(out.resolve(RESULTS), ".");
        clearPartials(out, "." + TABLE + ".");
    }

    /** Removes what a killed run left of the files it was writing (AtomicText's {@code .NAME.….part}). */
    private static void clearPartials(Path folder, String prefix) throws IOException {
        if (!Files.isDirectory(folder)) {
            return;
        }
        try (Stream<Path> s = Files.list(folder)) {
            for (Path p : s.toList()) {
                String n = p.getFileName().toString();
                if (n.startsWith(prefix) && n.endsWith(".part") && Files.isRegularFile(p)) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    private static CaseDocument read(CaseFormat format, BatchManifest.Entry e) throws InputException {
        CaseDocument doc = format.read(e.file());
        try {
            return CaseOverrides.apply(doc, e.overrides());
        } catch (InputException x) {
            throw e.problem(x.path(), x.problem());
        }
    }

    private static Row failure(BatchManifest.Entry e, Exception x) {
        String message = x instanceof InputException ie ? ie.getMessage()
                : x instanceof ModelEvaluationException ? e.file() + ": the model cannot be evaluated: " + x.getMessage()
                : x instanceof IllegalArgumentException ? e.file() + ": " + x.getMessage()
                : e.file() + ": internal error: " + x;
        return new Row(e.name(), "", Double.NaN, Double.NaN, "", Double.NaN, "failed", message);
    }

    static List<Row> rows(String name, FitOutcome o) {
        String status = o.warnings().isEmpty() ? "ok" : "warning";
        String message = String.join("; ", o.warnings());
        List<Row> rows = new ArrayList<>();
        for (FittedParameter p : o.parameters()) {
            rows.add(new Row(name, p.ref().toString(), p.value(), p.sigma(), p.ref().unit(), o.reducedChiSquare(),
                    status, message));
        }
        return rows;
    }

    /** The rows of a result already written from the same inputs, or null when the case must be fitted. */
    private static List<Row> previous(Path result, String name, String fingerprint) {
        if (!Files.isRegularFile(result)) {
            return null;
        }
        try {
            JsonNode root = new ObjectMapper().readTree(Files.readString(result, StandardCharsets.UTF_8));
            if (!fingerprint.equals(root.path("batch").path("fingerprint").asText(null))) {
                return null;
            }
            List<String> warnings = new ArrayList<>();
            root.path("warnings").forEach(w -> warnings.add(w.asText()));
            String status = warnings.isEmpty() ? "ok" : "warning";
            double chi2 = number(root.get("reduced_chi_square"));
            List<Row> rows = new ArrayList<>();
            for (JsonNode p : root.path("parameters")) {
                rows.add(new Row(name, p.path("parameter").asText(), number(p.get("value")), number(p.get("sigma")),
                        p.path("unit").asText(), chi2, status, String.join("; ", warnings)));
            }
            return rows;
        } catch (IOException | RuntimeException unreadable) {
            return null;
        }
    }

    private static double number(JsonNode n) {
        return n == null || !n.isNumber() ? Double.NaN : n.asDouble();
    }

    /** SHA-256 of the entry's overrides and of every file its case reads, each with its name. */
    static String fingerprint(BatchManifest.Entry e) throws IOException {
        MessageDigest d;
        try {
            d = MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException impossible) {
            throw new IllegalStateException(impossible);
        }
        d.update("lamella batch 1\n".getBytes(StandardCharsets.UTF_8));
        for (Map.Entry<String, Double> o : e.overrides().entrySet()) {
            d.update((o.getKey() + "=" + Double.toString(o.getValue()) + "\n").getBytes(StandardCharsets.UTF_8));
        }
        for (Path in : OwnInputs.ofCase(e.file())) {
            d.update(("\n" + in.getFileName() + "\n").getBytes(StandardCharsets.UTF_8));
            if (Files.isRegularFile(in)) {
                d.update(Files.readAllBytes(in));
            }
        }
        return HexFormat.of().formatHex(d.digest());
    }

    public static String table(List<List<Row>> rows) {
        StringBuilder sb = new StringBuilder(TABLE_HEADER).append('\n');
        for (List<Row> list : rows) {
            for (Row r : list) {
                sb.append(cell(r.caseName())).append(',').append(cell(r.parameter())).append(',')
                        .append(num(r.value())).append(',').append(num(r.sigma())).append(',').append(cell(r.unit()))
                        .append(',').append(num(r.reducedChiSquare())).append(',').append(r.status()).append(',')
                        .append(cell(r.message())).append('\n');
            }
        }
        return sb.toString();
    }

    private static String num(double v) {
        return Double.isFinite(v) ? AtomicText.number(v) : "";
    }

    /** A CSV cell, quoted when it holds a comma, a quote or a line break (RFC 4180). */
    static String cell(String s) {
        if (s.indexOf(',') < 0 && s.indexOf('"') < 0 && s.indexOf('\n') < 0 && s.indexOf('\r') < 0) {
            return s;
        }
        return '"' + s.replace("\"", "\"\"") + '"';
    }

    public static String duration(double seconds) {
        if (seconds < 60) {
            return String.format(Locale.ROOT, "%.1f s", seconds);
        }
        long s = Math.round(seconds);
        if (s < 3600) {
            return String.format(Locale.ROOT, "%d min %02d s", s / 60, s % 60);
        }
        return String.format(Locale.ROOT, "%d h %02d min", s / 3600, (s % 3600) / 60);
    }
}
