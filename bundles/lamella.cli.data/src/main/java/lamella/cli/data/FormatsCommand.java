package lamella.cli.data;

import java.util.List;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.data.DataImporter;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;

/** {@code lamella formats}: the live importers, each with its id and what it reads. */
@Component(service = Command.class)
public final class FormatsCommand implements Command {

    private final LiveImporters importers = new LiveImporters();

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeImporter")
    void addImporter(DataImporter i) {
        importers.add(i);
    }

    void removeImporter(DataImporter i) {
        importers.remove(i);
    }

    @Override
    public String name() {
        return "formats";
    }

    @Override
    public String summary() {
        return "Lists the live data importers: the file formats lamella import reads.";
    }

    @Override
    public String usage() {
        return """
                usage: lamella formats

                Lists every live importer with the id that lamella import --format takes and the files it reads.
                Importers are plug-ins: a bundle dropped into plugins/ adds one while Lamella runs.
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        if (!args.isEmpty()) {
            io.err().println("lamella formats: takes no arguments, got: " + String.join(" ", args));
            return BAD_INPUT;
        }
        List<DataImporter> all = importers.all();
        int width = "format".length();
        for (DataImporter i : all) {
            width = Math.max(width, i.id().length());
        }
        StringBuilder sb = new StringBuilder();
        sb.append(pad("format", width)).append("  reads\n");
        for (DataImporter i : all) {
            sb.append(pad(i.id(), width)).append("  ").append(i.summary()).append('\n');
        }
        if (all.isEmpty()) {
            sb.append("(no importer is live)\n");
        }
        io.out().print(sb);
        io.out().flush();
        return OK;
    }

    private static String pad(String s, int width) {
        return s + " ".repeat(width - s.length());
    }
}
