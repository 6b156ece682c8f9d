package lamella.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CancellationException;
import lamella.api.CaseDocument;
import lamella.api.CaseFormat;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.ModelEvaluationException;
import lamella.api.OwnInputs;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitService;
import lamella.api.fit.FitSettings;
import lamella.api.fit.ReportWriter;
import lamella.api.fit.SensitivityTable;

/** Fit a case, compute the sensitivities of every dataset, print the summary and write the report folder. */
final class FitReportRun {

    private FitReportRun() {
    }

    static int run(String command, Path casePath, Path folder, FitSettings settings, CaseFormat format,
                   FitService fitter, ReportWriter writer, CommandIO io) {
        if (refused(command, casePath, folder, writer, io)) {
            return Command.BAD_INPUT;
        }
        try {
            CaseDocument doc = format.read(casePath);
            FitOutcome outcome = fitter.fit(doc, settings, new ProgressLine(io.err()));
            io.out().print(FitSummary.format(outcome));
            List<SensitivityTable> sensitivities = new ArrayList<>();
            for (int d = 0; d < outcome.datasets().size(); d++) {
                sensitivities.add(fitter.sensitivity(doc, d, null));
            }
            Path page = writer.write(doc, outcome, sensitivities, folder);
            io.out().println("\nreport: " + page);
            return Command.OK;
        } catch (InputException e) {
            io.err().println("lamella " + command + ": " + e.getMessage());
            return Command.BAD_INPUT;
        } catch (ModelEvaluationException e) {
            io.err().println("lamella " + command + ": " + casePath + ": the model cannot be evaluated: "
                    + e.getMessage());
            return Command.BAD_INPUT;
        } catch (CancellationException e) {
            io.err().println("lamella " + command + ": cancelled");
            return Command.FAILED;
        } catch (IOException e) {
            io.err().println("lamella " + command + ": cannot write the report into " + folder + ": "
                    + FileProblems.reason(e));
            return Command.FAILED;
        }
    }

    /**
     * Whether the report folder would replace one of the run's inputs (the case, its data, a configured library
     * file); if so the refusal is printed. Checked before anything is computed or written.
     */
    static boolean refused(String command, Path casePath, Path folder, ReportWriter writer, CommandIO io) {
        List<Path> inputs = new ArrayList<>(OwnInputs.ofCase(casePath));
        inputs.addAll(io.runtimeInputs());
        String refusal = OwnInputs.folderRefusal(command, folder, inputs, writer::writes);
        if (refusal != null) {
            io.err().println(refusal);
        }
        return refusal != null;
    }

    /** The fit settings the command line asks for. */
    static FitSettings settings(Options o) {
        FitSettings s = FitSettings.defaults();
        if (o.has("--monte-carlo")) {
            s = s.withMonteCarlo(o.count("--monte-carlo", 1));
        }
        if (o.has("--seed")) {
            s = s.withSeed(o.count("--seed", 1));
        }
        if (o.has("--threads")) {
            s = s.withThreads(o.count("--threads", 1));
        }
        return s;
    }
}
