package lamella.cli;

import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.function.Supplier;

import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.command.RuntimeInputs;
import lamella.api.command.StartupNotice;

/** Runs one command line: finds the command by its first word and gives it the rest. */
final class Dispatch {

    static final Set<String> HELP_FLAGS = Set.of("--help", "-h");
    /** Arguments after this one are never read as a help flag. */
    static final String END_OF_OPTIONS = "--";

    private final CommandShelf shelf;
    private final Duration patience;
    private final Duration quiet;
    private final boolean debug;
    private final Supplier<List<StartupNotice>> notices;
    private final Supplier<List<RuntimeInputs>> inputs;

    /**
     * @param patience how long to wait at most for a named command to register
     * @param quiet    how long without a new command means that no more are coming
     * @param debug    print the stack trace of a command's internal error
     * @param notices  the live start-up notices, each line printed once before a command runs
     * @param inputs   the live runtime inputs, handed to the command as files its outputs must not replace
     */
    Dispatch(CommandShelf shelf, Duration patience, Duration quiet, boolean debug,
             Supplier<List<StartupNotice>> notices, Supplier<List<RuntimeInputs>> inputs) {
        this.shelf = shelf;
        this.patience = patience;
        this.quiet = quiet;
        this.debug = debug;
        this.notices = notices;
        this.inputs = inputs;
    }

    Dispatch(CommandShelf shelf, Duration patience, Duration quiet, boolean debug) {
        this(shelf, patience, quiet, debug, List::of, List::of);
    }

    int run(List<String> args, CommandIO io) {
        if (args.isEmpty() || HELP_FLAGS.contains(args.get(0))) {
            io.out().print(HelpText.overview(shelf.all()));
            return Command.OK;
        }
        String name = args.get(0);
        Optional<Command> command;
        try {
            command = shelf.await(name, patience, quiet);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            io.err().println("lamella: interrupted while waiting for command " + name);
            return Command.FAILED;
        }
        if (command.isEmpty()) {
            io.err().print(HelpText.unknownCommand(name, shelf.all()));
            return Command.BAD_INPUT;
        }
        List<String> rest = args.subList(1, args.size());
        if (asksForHelp(rest)) {
            io.out().print(HelpText.usage(command.get()));
            return Command.OK;
        }
        announce(io);
        return runGuarded(command.get(), rest, io.withRuntimeInputs(runtimeInputs(io)));
    }

    private List<Path> runtimeInputs(CommandIO io) {
        List<Path> files = new ArrayList<>(io.runtimeInputs());
        for (RuntimeInputs r : inputs.get()) {
            try {
                files.addAll(r.files());
            } catch (RuntimeException e) {
                io.err().println("lamella: a start-up check failed: " + e);
            }
        }
        return files;
    }

    /** The set-up's problems, one line each; a notice that fails is itself one line, never a stop. */
    private void announce(CommandIO io) {
        for (StartupNotice n : notices.get()) {
            try {
                n.notices().forEach(line -> io.err().println("lamella: " + line));
            } catch (RuntimeException e) {
                io.err().println("lamella: a start-up check failed: " + e);
            }
        }
    }

    static boolean asksForHelp(List<String> args) {
        for (String arg : args) {
            if (arg.equals(END_OF_OPTIONS)) {
                return false;
            }
            if (HELP_FLAGS.contains(arg)) {
                return true;
            }
        }
        return false;
    }

    /** A fault inside a command becomes one line and status 1, not a stack trace the user has to read. */
    private int runGuarded(Command command, List<String> args, CommandIO io) {
        try {
            return command.run(List.copyOf(args), io);
        } catch (Throwable t) {
            io.err().println("lamella: internal error in command " + command.name() + ": " + t);
            if (debug) {
                t.printStackTrace(io.err());
            } else {
                io.err().println("lamella: run with -Dlamella.debug=true to see where it happened");
            }
            return Command.FAILED;
        } finally {
            io.out().flush();
            io.err().flush();
        }
    }
}
