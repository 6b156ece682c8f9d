package lamella.cli.data;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.data.DataImporter;
import lamella.io.delimited.DelimitedImporter;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.geometry.line.LineHeater;
import lamella.io.exchange.ExchangeImporter;
import lamella.technique.fdtr.FrequencyDomain;
import lamella.technique.tdtr.TimeDomain;
import lamella.technique.threeomega.ThreeOmega;

/** Runs the data commands as Declarative Services would wire them, with the shipped importers, in memory. */
final class Runs {

    /** The outcome of one run. */
    record Run(int status, String out, String err) {
    }

    private Runs() {
    }

    static List<DataImporter> shipped() {
        return List.of(new DelimitedImporter(), new ExchangeImporter());
    }

    static ImportCommand importCommand() {
        ImportCommand c = new ImportCommand();
        shipped().forEach(c::addImporter);
        List.of(new TimeDomain(), new FrequencyDomain(), new ThreeOmega()).forEach(c::addTechnique);
        List.of(new GaussianBeams(), new LineHeater()).forEach(c::addGeometry);
        return c;
    }

    static FormatsCommand formatsCommand() {
        FormatsCommand c = new FormatsCommand();
        shipped().forEach(c::addBuiltIn);
        return c;
    }

    static Run run(Command command, Path dir, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        CommandIO io = new CommandIO(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir);
        int status = command.run(List.of(args), io);
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }
}
