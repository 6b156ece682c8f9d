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
    /** The steps' names and ends, kept raw: formatting them as they happen would itself take time (a cold
     * {@code String.format} costs some 25 ms), so they are formatted only when printed. */
    private static final List<String> NAMES = new ArrayList<>();
    private static final List<Long> ENDS = new ArrayList<>();
    /** Where the last printed step ended, so that a second print goes on from there. */
    private static long printedUpTo = ORIGIN;

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
        ENDS.add(System.nanoTime());
        NAMES.add(name);
    }

    /** Prints the steps so far, once. */
    static synchronized void print() {
        if (!ON || NAMES.isEmpty()) {
            return;
        }
        System.err.println("lamella start-up (since main, this step, what ended); printed at "
                + System.currentTimeMillis() + " ms since the epoch, for the process's end:");
        long mainEpochMs = System.currentTimeMillis() - (System.nanoTime() - ORIGIN) / 1_000_000;
        ProcessHandle.current().info().startInstant().ifPresent(start -> System.err.println(
                "  process start to main: " + (mainEpochMs - start.toEpochMilli()) + " ms (the clock counts in 10 ms)"));
        long last = printedUpTo;
        for (int i = 0; i < NAMES.size(); i++) {
            long end = ENDS.get(i);
            System.err.println(String.format("  %7.1f ms  %6.1f  %s", (end - ORIGIN) / 1e6, (end - last) / 1e6,
                    NAMES.get(i)));
            last = end;
        }
        printedUpTo = last;
        NAMES.clear();
        ENDS.clear();
    }
}
