package lamella.cli;

import java.util.List;
import java.util.Objects;
import java.util.function.Function;

import org.osgi.framework.ServiceReference;

import lamella.api.command.Command;
import lamella.api.command.CommandIO;

/**
 * A live command as the registry lists it: its name and summary from the service's properties
 * ({@link Command#NAME_PROPERTY}, {@link Command#SUMMARY_PROPERTY}), so that listing the commands or finding one by
 * name activates none of them; the command itself is got the first time its usage is shown or it runs. A command
 * registered without the properties is got at once, to ask its name.
 */
final class ListedCommand implements Command {

    private final ServiceReference<Command> reference;
    private final Function<ServiceReference<Command>, Command> registry;
    private Command service;

    /** @param registry gets the service of a reference (null when it is gone) */
    ListedCommand(ServiceReference<Command> reference, Function<ServiceReference<Command>, Command> registry) {
        this.reference = reference;
        this.registry = registry;
    }

    ServiceReference<Command> reference() {
        return reference;
    }

    /** Whether the command itself was got, so that its holder gives it back. */
    synchronized boolean wasGot() {
        return service != null;
    }

    @Override
    public String name() {
        Object name = reference.getProperty(NAME_PROPERTY);
        return name instanceof String s && !s.isBlank() ? s : command().name();
    }

    @Override
    public String summary() {
        Object summary = reference.getProperty(SUMMARY_PROPERTY);
        return summary instanceof String s ? s : command().summary();
    }

    @Override
    public String usage() {
        return command().usage();
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        return command().run(args, io);
    }

    private synchronized Command command() {
        if (service == null) {
            service = registry.apply(reference);
            if (service == null) {
                throw new IllegalStateException("the command of bundle " + bundleName() + " has gone");
            }
        }
        return service;
    }

    private String bundleName() {
        return reference.getBundle() == null ? "(unregistered)" : reference.getBundle().getSymbolicName();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof ListedCommand other && other.reference.equals(reference);
    }

    @Override
    public int hashCode() {
        return Objects.hash(reference);
    }
}
