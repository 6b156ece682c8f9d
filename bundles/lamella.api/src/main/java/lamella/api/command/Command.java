package lamella.api.command;

import java.util.List;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * A headless command, offered as a service and dispatched by {@link #name()}: {@code lamella NAME ARGS…}.
 * Exit status: {@link #OK}, {@link #FAILED} for a failure while working, {@link #BAD_INPUT} for bad input or usage.
 */
@ConsumerType
public interface Command {

    /**
     * The service property with the command's {@link #name()}. With it (and {@link #SUMMARY_PROPERTY}) the command
     * list and the lookup of a command by name read the registry and activate no command; without it the command is
     * activated to be asked. Both must say what the methods return, for example
     * {@code @Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + NAME,
     * Command.SUMMARY_PROPERTY + "=" + SUMMARY})} with {@code NAME} and {@code SUMMARY} the constants the methods
     * return.
     */
    String NAME_PROPERTY = "lamella.command.name";

    /** The service property with the command's {@link #summary()}; see {@link #NAME_PROPERTY}. */
    String SUMMARY_PROPERTY = "lamella.command.summary";

    int OK = 0;
    int FAILED = 1;
    int BAD_INPUT = 2;

    String name();

    /** One line for the command list. */
    String summary();

    /** Usage text: the synopsis and the options. */
    String usage();

    int run(List<String> args, CommandIO io);
}
