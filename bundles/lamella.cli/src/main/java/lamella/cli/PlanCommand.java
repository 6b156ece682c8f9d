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
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlanService;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

/** {@code lamella plan CASE.json [--out PLAN.json] [--show N] [--threads N]}. */
@Component(service = Command.class)
public final class PlanCommand implements Command {

    @Reference
    private CaseFormat caseFormat;

    @Reference
    private PlanService planner;

    @Override
    public String name() {
        return "plan";
    }

    @Override
    public String summary() {
        return "Ranks experiment plans (frequencies, spots, layers, windows) by the σ their fit would give.";
    }

    @Override
    public String usage() {
        return """
                usage: lamella plan CASE.json [--out PLAN.json] [--show N] [--threads N]

                Before measuring: evaluates every plan of the case's plan block — each combination of the values
                of its design variables, with values chosen together measured jointly — by the linearised σ that
                fitting the case's free inputs would give, with the expected noise of the plan block and every
                uncertain input of the fit block propagated. Prints the best N plans (default 10) and the case as
                written, the budget of the best plan, and the plans beyond a limit or that the model cannot
                evaluate. --out writes every plan as JSON. --threads: worker threads (default: all cores).
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        Options o;
        int show;
        int threads;
        try {
            o = Options.parse(args, "plan", List.of("--out", "--show", "--threads"));
            show = o.has("--show") ? o.count("--show", 1) : 10;
            threads = o.has("--threads") ? o.count("--threads", 1)
                    : Math.max(1, Runtime.getRuntime().availableProcessors());
        } catch (IllegalArgumentException e) {
            io.err().println(e.getMessage() + "\n" + usage());
            return BAD_INPUT;
        }
        Path casePath = io.resolve(o.positional());
        Path out = o.has("--out") ? io.resolve(o.value("--out")) : null;
        String refused = OwnInputs.refusal("plan", out, casePath, io.runtimeInputs());
        if (refused != null) {
            io.err().println(refused);
            return BAD_INPUT;
        }
        try {
            CaseDocument doc = caseFormat.read(casePath);
            PlanOutcome outcome = planner.plan(doc, threads, new ProgressLine(io.err()));
            io.out().print(PlanSummary.format(outcome, show));
            if (out != null) {
                AtomicText.write(out, PlanJson.format(casePath, outcome));
                io.err().println("wrote " + out);
            }
            return OK;
        } catch (InputException e) {
            io.err().println("lamella plan: " + e.getMessage());
            return BAD_INPUT;
        } catch (ModelEvaluationException e) {
            io.err().println("lamella plan: " + casePath + ": the model cannot be evaluated: " + e.getMessage());
            return BAD_INPUT;
        } catch (CancellationException e) {
            io.err().println("lamella plan: cancelled");
            return FAILED;
        } catch (JsonProcessingException e) {
            io.err().println("lamella plan: cannot format the plans: " + e.getMessage());
            return FAILED;
        } catch (IOException e) {
            io.err().println("lamella plan: cannot write the plans: " + FileProblems.reason(e));
            return FAILED;
        }
    }
}
