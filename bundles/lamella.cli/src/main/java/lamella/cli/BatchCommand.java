package lamella.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.concurrent.CancellationException;
import lamella.api.CaseFormat;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.OwnInputs;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.fit.FitService;
import lamella.api.fit.FitSettings;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

/** {@code lamella batch MANIFEST|FOLDER --out DIR [--threads N]}: fits many cases, resumably. */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + BatchCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + BatchCommand.SUMMARY})
public final class BatchCommand implements Command {

    static final String NAME = "batch";
    static final String SUMMARY = "Fits every case of a folder or manifest into one results table; resumes after an interruption.";

    @Reference
    private CaseFormat caseFormat;

    @Reference
    private FitService fitter;

    public BatchCommand() {
    }

    /** For tests and programs that assemble the services themselves. */
    BatchCommand(CaseFormat caseFormat, FitService fitter) {
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
                usage: lamella batch MANIFEST.json|FOLDER --out DIR [--threads N] [--engine local|spark]

                Fits every case file directly inside FOLDER (*.json, by name), or every case a manifest lists
                (with optional per-case names and overrides; see README, "Many cases: batch"). Writes each
                result as DIR/results/NAME.json (what `lamella fit --out` writes, plus the batch's record) and
                DIR/results.csv: one row per case and free input (case, parameter, value, sigma, unit,
                reduced_chi_square, status, message), updated after every case. A case that fails is reported
                and the rest go on. A second run into the same DIR skips every case whose result was made from
                the same inputs, so an interrupted run resumes; a changed or failed case is fitted again.
                Progress and the time left go to standard error. --threads: worker threads of each fit
                (default: all cores). --engine spark: the same batch as an Apache Spark application, one task
                per case (see the README), started by the lamella script. Exit status 0 when every case fitted, 1 when any failed, 2 for bad usage,
                a bad manifest or an output that would overwrite an input.
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        Options o;
        FitSettings settings;
        try {
            o = Options.parse(args, "batch", List.of("--out", "--threads", "--engine"));
            if (!o.has("--out")) {
                throw new IllegalArgumentException("lamella batch: --out DIR is needed (the results folder)");
            }
            String engine = o.has("--engine") ? o.value("--engine") : "local";
            if (engine.equals("spark")) {
                throw new IllegalArgumentException("lamella batch: --engine spark runs the batch as a Spark"
                        + " application outside this runtime; start it with the lamella script (./lamella batch"
                        + " MANIFEST.json --out DIR --engine spark), which builds and runs the Spark job");
            }
            if (!engine.equals("local")) {
                throw new IllegalArgumentException("lamella batch: --engine expects local or spark, got '" + engine
                        + "'");
            }
            settings = FitReportRun.settings(o);
        } catch (IllegalArgumentException e) {
            io.err().println(e.getMessage() + "\n" + usage());
            return BAD_INPUT;
        }
        Path input = io.resolve(o.positional());
        Path out = io.resolve(o.value("--out"));
        List<BatchManifest.Entry> entries;
        try {
            entries = BatchManifest.read(input);
        } catch (InputException e) {
            io.err().println("lamella batch: " + e.getMessage());
            return BAD_INPUT;
        }
        String refused = refusal(input, out, entries, io.runtimeInputs());
        if (refused != null) {
            io.err().println(refused);
            return BAD_INPUT;
        }
        try {
            BatchRun.Summary s = new BatchRun(caseFormat, fitter, settings, out, io.err()).run(entries);
            io.out().printf(Locale.ROOT, "%d cases: %d fitted, %d already done, %d failed (%s)%n", entries.size(),
                    s.fitted(), s.doneBefore(), s.failed(), BatchRun.duration(s.seconds()));
            io.out().println("results: " + out.resolve(BatchRun.TABLE));
            return s.failed() > 0 ? FAILED : OK;
        } catch (CancellationException e) {
            io.err().println("lamella batch: interrupted; the cases done so far are kept, run again to resume");
            return FAILED;
        } catch (IOException e) {
            io.err().println("lamella batch: cannot write into " + out + ": " + FileProblems.reason(e));
            return FAILED;
        }
    }

    /** Refuses an output folder that is the folder of cases, or a result file that is one of the inputs. */
    public static String refusal(Path input, Path out, List<BatchManifest.Entry> entries,
                                 List<Path> runtimeInputs) {
        try {
            if (Files.isDirectory(input) && Files.isDirectory(out) && Files.isSameFile(input, out)) {
                return "lamella batch: --out " + out + " is the folder of cases itself; nothing was written (choose"
                        + " another folder)";
            }
        } catch (IOException ignored) {
            // cannot compare: then they are not the same folder
        }
        Set<Path> inputs = new LinkedHashSet<>();
        if (Files.isRegularFile(input)) {
            inputs.add(input);
        }
        entries.forEach(e -> inputs.addAll(OwnInputs.ofCase(e.file())));
        inputs.addAll(runtimeInputs);
        List<Path> all = new ArrayList<>(inputs);
        for (Path f : BatchRun.outputs(out, entries)) {
            Path clash = OwnInputs.clash(f, all);
            if (clash != null) {
                return "lamella batch: --out " + out + " would overwrite its own input " + clash + " (as " + f
                        + "); nothing was written (choose another output folder)";
            }
        }
        return null;
    }
}
