package lamella.cli;

import java.util.List;
import java.util.Optional;

import org.osgi.framework.BundleContext;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;

import lamella.api.command.Command;
import lamella.api.command.CommandIO;

/** {@code lamella help [COMMAND]}: the list of live commands, or how to use one of them. */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + HelpCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + HelpCommand.SUMMARY})
public final class HelpCommand implements Command {

    static final String NAME = "help";
    static final String SUMMARY = "Lists the commands, or shows how to use one.";

    private BundleContext context;

    @Activate
    void activate(BundleContext bundleContext) {
        this.context = bundleContext;
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
                usage: lamella help [COMMAND]

                Without a command, lists every live command with what it does.
                With one, shows how to use that command (the same as lamella COMMAND --help).
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        return LiveCommands.use(context, commands -> answer(args, commands, io));
    }

    static int answer(List<String> args, List<Command> commands, CommandIO io) {
        if (args.isEmpty()) {
            io.out().print(HelpText.overview(commands));
            return OK;
        }
        if (args.size() > 1) {
            io.err().println("lamella help: expected at most one command name, got " + args.size() + ": "
                    + String.join(" ", args));
            return BAD_INPUT;
        }
        String name = args.get(0);
        Optional<Command> command = commands.stream().filter(c -> c.name().equals(name)).findFirst();
        if (command.isEmpty()) {
            io.err().print(HelpText.unknownCommand(name, commands));
            return BAD_INPUT;
        }
        io.out().print(HelpText.usage(command.get()));
        return OK;
    }
}
