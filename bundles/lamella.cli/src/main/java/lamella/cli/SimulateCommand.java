package lamella.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import lamella.api.AtomicText;
import lamella.api.CaseDocument;
import lamella.api.CaseFormat;
import lamella.api.FileProblems;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.ModelEvaluationException;
import lamella.api.OwnInputs;
import lamella.api.SignalTable;
import lamella.api.SelfHeating;
import lamella.api.Simulation;
import lamella.api.StackKernels;
import lamella.api.Technique;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.guard.LiveModels;
import org.osgi.framework.ServiceReference;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;

/** {@code lamella simulate CASE.json [--out FILE.csv]}: the model signal a case describes, as CSV. */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + SimulateCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + SimulateCommand.SUMMARY})
public final class SimulateCommand implements Command {

    static final String NAME = "simulate";
    static final String SUMMARY = "Computes the model signal of a case file and writes it as CSV.";

    private final LiveModels models = new LiveModels();

    @Reference
    private CaseFormat caseFormat;

    @Reference
    private StackKernels kernels;

    /** With the service's reference, so that a failure can name the bundle that registered it. */
    @Reference(service = HeatingGeometry.class, cardinality = ReferenceCardinality.MULTIPLE,
            policy = ReferencePolicy.DYNAMIC, unbind = "removeGeometry")
    void addGeometry(ServiceReference<HeatingGeometry> reference, HeatingGeometry g) {
        models.add(g, Origins.of(reference));
    }

    void removeGeometry(HeatingGeometry g) {
        models.remove(g);
    }

    @Reference(service = Technique.class, cardinality = ReferenceCardinality.MULTIPLE,
            policy = ReferencePolicy.DYNAMIC, unbind = "removeTechnique")
    void addTechnique(ServiceReference<Technique> reference, Technique t) {
        models.add(t, Origins.of(reference));
    }

    void removeTechnique(Technique t) {
        models.remove(t);
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
                usage: lamella simulate CASE.json [--sample NAME] [--out FILE.csv] [--explain]

                Reads the case (stack, geometry, measurement), evaluates the model at the measurement's x values
                and writes one CSV row per x value: the x column (frequency_hz, delay_s; none for sstr) and the
                technique's signal columns, 13 significant digits, SI units. Without --out the CSV goes to
                standard output. A warning on standard error tells of x values outside the geometry's usual
                range (a 3ω penetration depth outside the slope-method band). Bad input is reported with the
                file, line and JSON path; exit status 2.
                --explain also writes to standard error every layer value used and where it came from: the case
                file (with its line), a material library (entry, version, source, temperature) or a default;
                every number of the geometry and measurement blocks with its unit and line; and with a
                self_heating block, also the steady rise and the temperature every library value was taken at.
                A library value whose temperature under self-heating leaves its entry's range is warned about on
                standard error, with or without --explain.
                A case of several samples simulates the one --sample names (with its own geometry, if it has
                one); --explain lists the values of every sample.
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        String caseArg = null;
        String outArg = null;
        boolean explain = false;
        String sampleArg = null;
        for (int i = 0; i < args.size(); i++) {
            String a = args.get(i);
            if (a.equals("--out")) {
                if (i + 1 >= args.size()) {
                    io.err().println("lamella simulate: --out needs a file name");
                    return BAD_INPUT;
                }
                outArg = args.get(++i);
            } else if (a.equals("--sample")) {
                if (i + 1 >= args.size()) {
                    io.err().println("lamella simulate: --sample needs a sample's name");
                    return BAD_INPUT;
                }
                sampleArg = args.get(++i);
            } else if (a.equals("--explain")) {
                explain = true;
            } else if (a.startsWith("-")) {
                io.err().println("lamella simulate: unknown option " + a + "\n" + usage());
                return BAD_INPUT;
            } else if (caseArg == null) {
                caseArg = a;
            } else {
                io.err().println("lamella simulate: one case file at a time; got also " + a);
                return BAD_INPUT;
            }
        }
        if (caseArg == null) {
            io.err().println("lamella simulate: which case file?\n" + usage());
            return BAD_INPUT;
        }
        Path casePath = io.resolve(caseArg);
        String refused = OwnInputs.refusal("simulate", outArg == null ? null : io.resolve(outArg), casePath,
                io.runtimeInputs());
        if (refused != null) {
            io.err().println(refused);
            return BAD_INPUT;
        }
        SignalTable table;
        List<String> cautions;
        try {
            CaseDocument doc = explain ? ValueOrigins.readExplaining(caseFormat, casePath, io.err())
                    : caseFormat.read(casePath);
            if (sampleArg != null) {
                doc = doc.only(sampleArg, "--sample");
            }
            Simulation simulation = models.catalog(kernels).simulation(doc);
            if (simulation.heating().isPresent()) {
                SelfHeating.Outcome h = simulation.heating().get();
                if (explain) {
                    io.err().print(SelfHeatingText.render(h));
                }
                h.warnings().forEach(w -> io.err().println("lamella simulate: warning: " + w));
            }
            if (simulation.measurement().xValues().length == 0) {
                String key = simulation.technique().xParameter().orElse("x values");
                throw doc.locate(InputException.at(doc.measurement().pathOf(key), "missing; a simulation needs the"
                        + " list of " + simulation.technique().xColumn().orElse("x") + " values to compute"));
            }
            table = simulation.run();
            cautions = simulation.cautions(table.x());
        } catch (InputException e) {
            io.err().println("lamella simulate: " + e.getMessage());
            return BAD_INPUT;
        } catch (ModelEvaluationException e) {
            io.err().println("lamella simulate: " + casePath + ": cannot evaluate the model: " + e.getMessage());
            return BAD_INPUT;
        }
        for (String c : cautions) {
            io.err().println("lamella simulate: warning: " + casePath + ": " + c);
        }
        String csv = SignalCsv.format(table);
        if (outArg == null) {
            io.out().print(csv);
            io.out().flush();
            return OK;
        }
        Path out = io.resolve(outArg);
        try {
            AtomicText.write(out, csv);
        } catch (IOException e) {
            io.err().println("lamella simulate: cannot write " + out + ": " + FileProblems.reason(e));
            return FAILED;
        }
        io.err().println("wrote " + table.rows() + " rows to " + out);
        return OK;
    }
}
