package lamella.map;

import java.io.IOException;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.CancellationException;
import lamella.api.CaseDocument;
import lamella.api.CaseFormat;
import lamella.api.InputException;
import lamella.api.ModelEvaluationException;
import lamella.api.OwnInputs;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.fit.CurveFit;
import lamella.api.fit.CurveFitService;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

/**
 * {@code lamella map CASE.json --out DIR [--threads N]}: a property map, one small fit per position, on this machine's
 * cores. The Spark engine ({@code --engine spark}) runs outside this runtime: the {@code lamella} script starts the
 * job module for it.
 */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + MapCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + MapCommand.SUMMARY})
public final class MapCommand implements Command {

    static final String NAME = "map";
    static final String SUMMARY = "Fits every position of a map's data and draws each fitted value, its σ and χ² as an image.";

    @Reference
    private CaseFormat caseFormat;

    @Reference
    private CurveFitService fitter;

    public MapCommand() {
    }

    /** For tests and programs that assemble the services themselves. */
    MapCommand(CaseFormat caseFormat, CurveFitService fitter) {
        this.caseFormat = caseFormat;
        this.fitter = fitter;
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public String summary() {
        return SUMMARY;
    }

    @Override
    public String usage() {
        return """
                usage: lamella map CASE.json --out DIR [--engine local|spark] [--threads N]

                Fits the free inputs of the case's fit block at every position of the data file its map block
                names (a long CSV table: x_m, y_m, the technique's x column, the signal, optionally its sigma_
                column), each position starting from a neighbour's result where that helps. Writes DIR/map.csv
                (x_m, y_m, per free input its value and sigma_ column, reduced_chi_square, status, message), an
                image of each free input, of its σ and of the reduced χ² (PNG and SVG, colour bar with unit,
                scale bar in µm, positions without a value marked ×) and DIR/summary.txt (counts, time, the
                spread of each value), which is also printed. A position whose data are unusable is reported in
                its row and the rest go on. A run that was stopped (killed, Ctrl-C) keeps the tiles it finished in
                DIR/map.journal/; the same command again fits only the rest. --threads: worker threads (default:
                all cores). --engine spark: the same map as an Apache Spark application (Parquet map data and
                DIR/map.parquet too; see the README), started by the lamella script. Exit status 0 when
                at least one position was fitted, 1 when none was, 2 for bad usage, a bad case or a broken file
                (named with its line), or an output that would overwrite an input.
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        Map<String, String> options = new HashMap<>();
        String casePath = null;
        for (int i = 0; i < args.size(); i++) {
            String a = args.get(i);
            if (a.equals("--out") || a.equals("--threads") || a.equals("--engine")) {
                if (i + 1 >= args.size()) {
                    return refuse(io, a + " needs a value");
                }
                options.put(a, args.get(++i));
            } else if (a.startsWith("--")) {
                return refuse(io, "unknown option " + a);
            } else if (casePath == null) {
                casePath = a;
            } else {
                return refuse(io, "one case file at a time; got also " + a);
            }
        }
        if (casePath == null) {
            return refuse(io, "which case file?");
        }
        if (!options.containsKey("--out")) {
            return refuse(io, "--out DIR is needed (the folder for map.csv and the images)");
        }
        String engine = options.getOrDefault("--engine", "local");
        if (engine.equals("spark")) {
            return refuse(io, "--engine spark runs the map as a Spark application outside this runtime; start it"
                    + " with the lamella script (./lamella map CASE.json --out DIR --engine spark), which builds"
                    + " and runs the Spark job");
        }
        if (!engine.equals("local")) {
            return refuse(io, "--engine expects local or spark, got '" + engine + "'");
        }
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        if (options.containsKey("--threads")) {
            try {
                threads = Integer.parseInt(options.get("--threads"));
            } catch (NumberFormatException e) {
                threads = 0;
            }
            if (threads < 1) {
                return refuse(io, "--threads expects a whole number ≥ 1, got '" + options.get("--threads") + "'");
            }
        }
        Path file = io.resolve(casePath);
        Path out = io.resolve(options.get("--out"));
        try {
            CaseDocument doc = caseFormat.read(file);
            MapBlock block = MapBlock.read(doc);
            CurveFit fit = fitter.curves(doc, block.signal());
            List<Path> inputs = new ArrayList<>(OwnInputs.ofCase(file));
            inputs.add(block.data());
            for (Path f : MapOutputs.files(out, fit)) {
                Path clash = OwnInputs.clash(f, inputs);
                if (clash != null) {
                    io.err().println(OwnInputs.message("map", out, clash));
                    return BAD_INPUT;
                }
            }
            if (MapBlock.isParquet(block.data())) {
                throw doc.locate(InputException.at("map.data", "'" + block.given() + "' is Parquet, which the"
                        + " Spark engine reads (--engine spark); the local engine reads CSV map data"));
            }
            MapData data = MapData.read(block.data(), fit.xColumn(), fit.signal());
            fit.check(data.x, data.hasSigma, "map.data");
            MapJournal journal = MapJournal.open(out, MapJournal.fingerprint(inputs));
            return map(doc, data, fit, threads, out, io, journal);
        } catch (InputException e) {
            io.err().println("lamella map: " + e.getMessage());
            return BAD_INPUT;
        } catch (ModelEvaluationException e) {
            io.err().println("lamella map: " + file + ": the model cannot be evaluated: " + e.getMessage());
            return BAD_INPUT;
        } catch (CancellationException e) {
            io.err().println("lamella map: interrupted; the tiles done are kept in " + out.resolve(MapJournal.FOLDER)
                    + " and the same command again fits only the rest");
            return FAILED;
        } catch (IOException e) {
            io.err().println("lamella map: cannot write into " + out + ": " + e.getMessage());
            return FAILED;
        }
    }

    private static int map(CaseDocument doc, MapData data, CurveFit fit, int threads, Path out, CommandIO io,
                           MapJournal journal) throws IOException {
        long t0 = System.nanoTime();
        int total = data.positions.size();
        Reporter reporter = new Reporter(io.err(), total, t0);
        MapEngine.Result[] results;
        try {
            results = new MapEngine(fit, data.x, threads).run(data.positions, reporter::done, journal);
        } catch (UncheckedIOException e) {
            throw e.getCause();
        }
        double seconds = (System.nanoTime() - t0) * 1e-9;
        String engine = threads + " thread" + (threads == 1 ? "" : "s");
        String summary = MapOutputs.write(out, doc.file(), data, results, fit, seconds, engine,
                journal.positionsReadBack());
        journal.remove();
        io.out().print(summary);
        io.out().println("results: " + out.resolve(MapOutputs.TABLE));
        return MapOutputs.anyFitted(results) ? OK : FAILED;
    }

    private int refuse(CommandIO io, String problem) {
        io.err().println("lamella map: " + problem + "\n" + usage());
        return BAD_INPUT;
    }

    /** Progress on standard error about every two seconds: positions done, rate and time left. */
    private static final class Reporter {
        private final PrintStream err;
        private final int total;
        private final long start;
        private long last;

        Reporter(PrintStream err, int total, long start) {
            this.err = err;
            this.total = total;
            this.start = start;
            this.last = start;
        }

        synchronized void done(int count) {
            long now = System.nanoTime();
            if (now - last < 2_000_000_000L && count < total) {
                return;
            }
            last = now;
            double seconds = (now - start) * 1e-9;
            double rate = count / Math.max(seconds, 1e-9);
            String left = count < total ? String.format(Locale.ROOT, ", about %.0f s left", (total - count) / rate)
                    : "";
            err.printf(Locale.ROOT, "map: %d/%d positions, %.0f positions/s%s%n", count, total, rate, left);
        }
    }
}
