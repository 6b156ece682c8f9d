package lamella.cli;

import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.function.Function;

import org.osgi.framework.BundleContext;
import org.osgi.framework.InvalidSyntaxException;
import org.osgi.framework.ServiceReference;

import lamella.api.command.Command;

/**
 * The live commands, looked up in the service registry for the moment of one use. A command that lists commands
 * asks the registry rather than referencing {@link Command} itself, which would make it depend on its own service.
 * Listing them activates none ({@link ListedCommand}); only a command whose usage is shown is got, and given back.
 */
final class LiveCommands {

    private LiveCommands() {
    }

    static <T> T use(BundleContext context, Function<List<Command>, T> work) {
        Collection<ServiceReference<Command>> references;
        try {
            references = context.getServiceReferences(Command.class, null);
        } catch (InvalidSyntaxException e) {
            throw new IllegalStateException("a null filter cannot be invalid", e);
        }
        List<ListedCommand> commands = new ArrayList<>();
        for (ServiceReference<Command> reference : references) {
            commands.add(new ListedCommand(reference, context::getService));
        }
        try {
            return work.apply(List.copyOf(commands));
        } finally {
            for (ListedCommand c : commands) {
                if (c.wasGot()) {
                    context.ungetService(c.reference());
                }
            }
        }
    }
}
