package lamella.api.command;

import java.util.List;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * A headless command, offered as a service and dispatched by {@link #name()}: {@code lamella NAME ARGS…}.
 * Exit status: {@link #OK}, {@link #FAILED} for a failure while working, {@link #BAD_INPUT} for bad input or usage.
 */
@ConsumerType
public interface Command {

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
