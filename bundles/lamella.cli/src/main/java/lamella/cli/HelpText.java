package lamella.cli;

import java.util.Collection;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Collectors;

import lamella.api.Names;
import lamella.api.command.Command;

/** The wording of the command overview and of the answer to a mistyped command, in one place. */
final class HelpText {

    private HelpText() {
    }

    static String overview(Collection<Command> commands) {
        TextTable table = new TextTable("command", "what it does");
        sorted(commands).forEach(c -> table.add(c.name(), c.summary()));
        return "usage: lamella COMMAND [ARGUMENTS]\n\n"
                + table.render("  ")
                + "\nlamella help COMMAND, or lamella COMMAND --help, shows how to use a command.\n";
    }

    static String unknownCommand(String typed, Collection<Command> commands) {
        List<String> names = sorted(commands).stream().map(Command::name).toList();
        StringBuilder text = new StringBuilder("lamella: there is no command '").append(typed).append('\'');
        Names.closest(typed, names).ifPresent(n -> text.append("; did you mean '").append(n).append("'?"));
        text.append('\n').append("commands: ").append(names.isEmpty() ? "(none are live)" : String.join(", ", names))
                .append('\n');
        return text.toString();
    }

    /** Usage text as a command gives it, ending in exactly one line break. */
    static String usage(Command command) {
        return command.usage().stripTrailing() + "\n";
    }

    private static List<Command> sorted(Collection<Command> commands) {
        return commands.stream().sorted(Comparator.comparing(Command::name)).collect(Collectors.toList());
    }
}
