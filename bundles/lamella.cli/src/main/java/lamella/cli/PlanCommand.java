package lamella.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
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
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PlannedSensitivity;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

/** {@code lamella plan CASE.json [--out PLAN.json] [--map KEY,KEY] [--show N] [--threads N]}. */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + PlanCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + PlanCommand.SUMMARY})
public final class PlanCommand implements Command {

    static final String NAME = "plan";
    static final String SUMMARY = "Ranks experiment plans (frequencies, spots, layers, windows) by the σ their fit would give.";

    @Reference
    private CaseFormat caseFormat;

    @Reference
    private PlanService planner;

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
                usage: lamella plan CASE.json [--out PLAN.json] [--map KEY,KEY] [--show N] [--threads N]

                Before measuring: evaluates every plan of the case's plan block — each combination of the values
                of its design variables, with values chosen together measured jointly — by the linearised σ that
                fitting the case's free inputs would give, with the expected noise of the plan block and every
                uncertain input of the fit block propagated. Prints the best N plans (default 10) and the case as
                written, the budget of the best plan, and the plans beyond a limit or that the model cannot
                evaluate. --out writes every plan as JSON and, beside it, PLAN-objective.png and .svg (the
                objective over two varied keys as a colour map with contours; --map names them, default the first
                two) and PLAN-sensitivity.png and .svg (the best plan's sensitivity curves).
                --threads: worker threads (default: all cores).
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        Options o;
        int show;
        int threads;
        try {
            o = Options.parse(args, "plan", List.of("--out", "--map", "--show", "--threads"));
            show = o.has("--show") ? o.count("--show", 1) : 10;
            threads = o.has("--threads") ? o.count("--threads", 1)
                    : Math.max(1, Runtime.getRuntime().availableProcessors());
        } catch (IllegalArgumentException e) {
            io.err().println(e.getMessage() + "\n" + usage());
            return BAD_INPUT;
        }
        if (o.has("--map") && !o.has("--out")) {
            io.err().println("lamella plan: --map chooses the keys of the map that --out writes beside the plan file;"
                    + " give --out PLAN.json too\n" + usage());
            return BAD_INPUT;
        }
        Path casePath = io.resolve(o.positional());
        Path out = o.has("--out") ? io.resolve(o.value("--out")) : null;
        List<Path> targets = new ArrayList<>();
        if (out != null) {
            targets.add(out);
            targets.addAll(PlanFigures.files(out));
        }
        for (Path target : targets) {
            String refused = OwnInputs.refusal("plan", target, casePath, io.runtimeInputs());
            if (refused != null) {
                io.err().println(refused);
                return BAD_INPUT;
            }
        }
        try {
            CaseDocument doc = caseFormat.read(casePath);
            PlanOutcome outcome = planner.plan(doc, threads, new ProgressLine(io.err()));
            if (out == null) {
                io.out().print(PlanSummary.format(outcome, show));
                return OK;
            }
            int[] keys = PlanFigures.mapKeys(outcome, o.has("--map") ? o.value("--map") : null);
            PlannedResult shown = outcome.best() != null ? outcome.best() : outcome.baseline();
            List<PlannedSensitivity> curves = planner.sensitivity(doc, shown);
            List<String> notes = new ArrayList<>();
            Map<Path, Object> pictures = PlanFigures.draw(out, outcome, keys, curves, notes);
            String json = PlanJson.format(casePath, outcome);
            io.out().print(PlanSummary.format(outcome, show));
            AtomicText.write(out, json);
            io.err().println("wrote " + out);
            for (Map.Entry<Path, Object> e : pictures.entrySet()) {
                if (e.getValue() instanceof byte[] png) {
                    AtomicText.writeBytes(e.getKey(), png);
                } else {
                    AtomicText.write(e.getKey(), (String) e.getValue());
                }
                io.err().println("wrote " + e.getKey());
            }
            notes.forEach(n -> io.err().println("lamella plan: " + n));
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
