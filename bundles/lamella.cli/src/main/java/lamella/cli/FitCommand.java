package lamella.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.CancellationException;
import lamella.api.AtomicText;
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
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

/** {@code lamella fit CASE.json [--out RESULT.json] [--monte-carlo N] [--seed S] [--threads N]}. */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + FitCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + FitCommand.SUMMARY})
public final class FitCommand implements Command {

    static final String NAME = "fit";
    static final String SUMMARY = "Fits the free inputs of a case to its datasets, with uncertainties and their budget.";

    @Reference
    private CaseFormat caseFormat;

    @Reference
    private FitService fitter;

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
                usage: lamella fit CASE.json [--out RESULT.json] [--monte-carlo N] [--seed S] [--threads N]

                Fits the case's fit block (datasets, free and uncertain inputs) by Levenberg-Marquardt and prints
                every free value with its total 1σ (noise plus every uncertain input), the noise-only σ, the
                reduced χ² of each dataset, the uncertainty budget and warnings (inputs the data cannot determine,
                values on a bound, strong correlations). --out writes all of it, with residuals and the correlation
                matrix, as JSON. --monte-carlo N adds N refits with resampled noise and uncertain inputs (in
                parallel over --threads, default: all cores) and reports percentiles; --seed makes them repeatable.
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        Options o;
        try {
            o = Options.parse(args, "fit", List.of("--out", "--monte-carlo", "--seed", "--threads"));
        } catch (IllegalArgumentException e) {
            io.err().println(e.getMessage() + "\n" + usage());
            return BAD_INPUT;
        }
        Path casePath = io.resolve(o.positional());
        String refused = OwnInputs.refusal("fit", o.has("--out") ? io.resolve(o.value("--out")) : null, casePath,
                io.runtimeInputs());
        if (refused != null) {
            io.err().println(refused);
            return BAD_INPUT;
        }
        try {
            FitSettings settings = FitReportRun.settings(o);
            CaseDocument doc = caseFormat.read(casePath);
            FitOutcome outcome = fitter.fit(doc, settings, new ProgressLine(io.err()));
            io.out().print(FitSummary.format(outcome));
            if (o.has("--out")) {
                Path out = io.resolve(o.value("--out"));
                AtomicText.write(out, FitResultJson.format(doc, outcome));
                io.err().println("wrote " + out);
            }
            return OK;
        } catch (IllegalArgumentException e) {
            io.err().println("lamella fit: " + e.getMessage());
            return BAD_INPUT;
        } catch (InputException e) {
            io.err().println("lamella fit: " + e.getMessage());
            return BAD_INPUT;
        } catch (ModelEvaluationException e) {
            io.err().println("lamella fit: " + casePath + ": the model cannot be evaluated: " + e.getMessage());
            return BAD_INPUT;
        } catch (CancellationException e) {
            io.err().println("lamella fit: cancelled");
            return FAILED;
        } catch (JsonProcessingException e) {
            io.err().println("lamella fit: cannot format the result: " + e.getMessage());
            return FAILED;
        } catch (IOException e) {
            io.err().println("lamella fit: cannot write " + io.resolve(o.value("--out")) + ": " + FileProblems.reason(e));
            return FAILED;
        }
    }
}
