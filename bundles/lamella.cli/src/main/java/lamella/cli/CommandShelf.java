package lamella.cli;

import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

import lamella.api.command.Command;

/**
 * The live commands, as Declarative Services binds and unbinds them. Components register on their own schedule, so
 * a lookup may wait for a name to appear; it gives up early once no command has arrived for a quiet period.
 */
final class CommandShelf {

    private final List<Command> commands = new ArrayList<>();
    private long lastChange = System.nanoTime();

    synchronized void add(Command command) {
        commands.add(command);
        changed();
    }

    synchronized void remove(Command command) {
        commands.remove(command);
        changed();
    }

    synchronized List<Command> all() {
        return List.copyOf(commands);
    }

    /**
     * Waits until a command of this name is live, or no command has arrived for {@code quiet}, or {@code patience}
     * has passed.
     */
    synchronized Optional<Command> await(String name, Duration patience, Duration quiet) throws InterruptedException {
        long start = System.nanoTime();
        while (true) {
            Optional<Command> found = commands.stream().filter(c -> name.equals(c.name())).findFirst();
            if (found.isPresent()) {
                return found;
            }
            long now = System.nanoTime();
            long quietEnd = Math.max(start, lastChange) + quiet.toNanos();
            long end = Math.min(start + patience.toNanos(), quietEnd);
            if (now >= end) {
                return Optional.empty();
            }
            long waitNanos = end - now;
            wait(waitNanos / 1_000_000, (int) (waitNanos % 1_000_000));
        }
    }

    private void changed() {
        lastChange = System.nanoTime();
        notifyAll();
    }
}
