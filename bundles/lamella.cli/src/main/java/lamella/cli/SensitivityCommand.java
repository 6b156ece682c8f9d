package lamella.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import lamella.api.AtomicText;
import lamella.api.CaseDocument;
import lamella.api.CaseFormat;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.ModelEvaluationException;
import lamella.api.ValueOrigin;
import lamella.api.OwnInputs;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.fit.FitService;
import lamella.api.fit.SensitivityTable;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

/** {@code lamella sensitivity CASE.json [--dataset N] [--signal NAME] [--out FILE.csv]}. */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + SensitivityCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + SensitivityCommand.SUMMARY})
public final class SensitivityCommand implements Command {

    static final String NAME = "sensitivity";
    static final String SUMMARY = "Shows how strongly the signal responds to every input, over the measurement's x values.";

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
                usage: lamella sensitivity CASE.json [--dataset N | --sample NAME] [--signal NAME] [--out FILE.csv]

                For every numeric input p of the case (layer thicknesses, conductivities, heat capacities, boundary
                conductances, beam radii) computes S = d ln(signal) / d ln(p) over x — for a phase, d(phase) / d ln(p)
                in degrees — so that a measurement can be designed before it is made: inputs with large |S| are
                resolved, inputs with small |S| are not, and inputs whose curves have the same shape cannot be told
                apart. Without --dataset the case's measurement is used; with it, that fit dataset at its data's x
                values. The signal defaults to the one usually fitted (tdtr: ratio, fdtr: phase_deg). Writes CSV (x
                column, then one column per input, named by its path such as film.thickness_m; a conductivity also
                says what it moves, such as "film.k_w_mk (isotropic Λ)" or "film.k_through_w_mk (through-plane Λz)")
                to --out or standard output, and to standard error a ranking by the largest |S| with where each
                value came from (a library value with its library, tier, entry version and source). A conductivity
                stated once (one value, or one isotropic library value) is one input, perturbed in every direction.
                A case of several samples needs --dataset (whose sample it is; its inputs are then named
                samples[NAME].…) or --sample NAME (that sample under the case's measurement).
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        Options o;
        try {
            o = Options.parse(args, "sensitivity", List.of("--dataset", "--sample", "--signal", "--out"));
        } catch (IllegalArgumentException e) {
            io.err().println(e.getMessage() + "\n" + usage());
            return BAD_INPUT;
        }
        Path casePath = io.resolve(o.positional());
        String refused = OwnInputs.refusal("sensitivity", o.has("--out") ? io.resolve(o.value("--out")) : null,
                casePath, io.runtimeInputs());
        if (refused != null) {
            io.err().println(refused);
            return BAD_INPUT;
        }
        try {
            int dataset = o.has("--dataset") ? o.count("--dataset", 0) : -1;
            CaseDocument doc = caseFormat.read(casePath);
            if (o.has("--sample")) {
                if (dataset >= 0) {
                    throw new IllegalArgumentException("lamella sensitivity: --dataset already names its sample;"
                            + " give --dataset or --sample, not both");
                }
                doc = doc.only(o.value("--sample"), "--sample");
            }
            SensitivityTable t = fitter.sensitivity(doc, dataset, o.value("--signal"));
            String csv = csv(t);
            io.err().print(ranking(t, doc));
            if (o.has("--out")) {
                Path out = io.resolve(o.value("--out"));
                AtomicText.write(out, csv);
                io.err().println("wrote " + out);
            } else {
                io.out().print(csv);
                io.out().flush();
            }
            return OK;
        } catch (IllegalArgumentException | InputException e) {
            io.err().println("lamella sensitivity: " + e.getMessage());
            return BAD_INPUT;
        } catch (ModelEvaluationException e) {
            io.err().println("lamella sensitivity: " + casePath + ": the model cannot be evaluated: " + e.getMessage());
            return BAD_INPUT;
        } catch (IOException e) {
            io.err().println("lamella sensitivity: cannot write " + io.resolve(o.value("--out")) + ": "
                    + FileProblems.reason(e));
            return FAILED;
        }
    }

    static String csv(SensitivityTable t) {
        StringBuilder sb = new StringBuilder(t.xColumn());
        for (int j = 0; j < t.parameters().size(); j++) {
            sb.append(',').append(t.label(j));
        }
        sb.append('\n');
        for (int i = 0; i < t.x().length; i++) {
            sb.append(SignalCsv.number(t.x()[i]));
            for (double[] column : t.values()) {
                sb.append(',').append(SignalCsv.number(column[i]));
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    /**
     * The inputs by their largest |S|, and where each value came from (a library value with its library, tier, entry
     * version and source).
     */
    static String ranking(SensitivityTable t, CaseDocument doc) {
        List<Integer> order = new ArrayList<>();
        double[] peak = new double[t.parameters().size()];
        for (int j = 0; j < peak.length; j++) {
            order.add(j);
            for (double v : t.values()[j]) {
                peak[j] = Math.max(peak[j], Math.abs(v));
            }
        }
        order.sort(Comparator.comparingDouble(j -> -peak[j]));
        TextTable table = new TextTable("input", t.phaseLike() ? "largest |dφ/d ln p| (°)" : "largest |S|",
                "value from");
        for (int j : order) {
            String from = doc.origin(t.parameters().get(j)).map(ValueOrigin::describe).orElse("case file");
            table.add(t.label(j), String.format(Locale.ROOT, "%.3g", peak[j]), from);
        }
        return "Sensitivity of " + t.signal() + " over " + t.xColumn() + "\n" + table.render("  ");
    }
}
