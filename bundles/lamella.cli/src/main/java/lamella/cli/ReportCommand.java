package lamella.cli;

import java.util.List;
import lamella.api.CaseFormat;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.fit.FitService;
import lamella.api.fit.ReportWriter;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;

/** {@code lamella report CASE.json --out DIR [--monte-carlo N] [--seed S] [--threads N]}. */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + ReportCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + ReportCommand.SUMMARY})
public final class ReportCommand implements Command {

    static final String NAME = "report";
    static final String SUMMARY = "Fits a case and writes an HTML report with plots, the uncertainty budget and the numbers.";

    @Reference
    private CaseFormat caseFormat;

    @Reference
    private FitService fitter;

    @Reference
    private ReportWriter writer;

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
                usage: lamella report CASE.json --out DIR [--monte-carlo N] [--seed S] [--threads N]

                Fits the case as `lamella fit` does, computes the sensitivities of every dataset, and writes into DIR
                an HTML page (data and fit, residuals, sensitivities, uncertainty budget as PNG and SVG plots; every
                input with its source) and the numbers as CSV and JSON.
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        try {
            Options o = Options.parse(args, "report", List.of("--out", "--monte-carlo", "--seed", "--threads"));
            if (!o.has("--out")) {
                throw new IllegalArgumentException("lamella report: --out DIR is needed (the report folder)");
            }
            return FitReportRun.run("report", io.resolve(o.positional()), io.resolve(o.value("--out")),
                    FitReportRun.settings(o), caseFormat, fitter, writer, io);
        } catch (IllegalArgumentException e) {
            io.err().println(e.getMessage() + "\n" + usage());
            return BAD_INPUT;
        }
    }
}
