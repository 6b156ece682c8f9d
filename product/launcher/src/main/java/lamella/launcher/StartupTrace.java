package lamella.launcher;

import java.util.ArrayList;
import java.util.List;

/**
 * With {@code -Dlamella.startup.trace=true}, the launcher prints on standard error, at exit, how long each step of its
 * start-up took: one line per step, in milliseconds since the launcher's main method began. Off by default; a
 * developer's tool for the start-up figures in DEVELOPERS.md.
 */
final class StartupTrace {

    static final String PROPERTY = "lamella.startup.trace";

    private static final boolean ON = Boolean.getBoolean(PROPERTY);
    private static final long ORIGIN = System.nanoTime();
    private static final List<String> STEPS = new ArrayList<>();
    private static long last = ORIGIN;

    private StartupTrace() {
    }

    static boolean on() {
        return ON;
    }

    /** Marks the end of a step. */
    static synchronized void step(String name) {
        if (!ON) {
            return;
        }
        long now = System.nanoTime();
        STEPS.add(String.format("%7.1f ms  %6.1f  %s", (now - ORIGIN) / 1e6, (now - last) / 1e6, name));
        last = now;
    }

    /** Prints the steps so far, once. */
    static synchronized void print() {
        if (!ON || STEPS.isEmpty()) {
            return;
        }
        System.err.println("lamella start-up (since main, this step, what ended); printed at "
                + System.currentTimeMillis() + " ms since the epoch, for the process's end:");
        long mainEpochMs = System.currentTimeMillis() - (System.nanoTime() - ORIGIN) / 1_000_000;
        ProcessHandle.current().info().startInstant().ifPresent(start -> System.err.println(
                "  process start to main: " + (mainEpochMs - start.toEpochMilli()) + " ms (the clock counts in 10 ms)"));
        STEPS.forEach(s -> System.err.println("  " + s));
        STEPS.clear();
    }
}
