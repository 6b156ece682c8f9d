package lamella.launcher;

import java.util.List;

/**
 * Start-up work done ahead, on a second thread, while the main one reads the settings and starts the framework: the
 * one-time set-up of facilities the run needs some tens of milliseconds later — the framework's own defaults (read
 * from its jar, with a map of every platform module's packages), {@code java.util.logging}, {@link
 * java.util.Formatter}, and the process handle the outputs' temporary names use. On two cores the second one is
 * mostly idle then. Measured on 2 cores, Java 17, ten runs each way: help 0.55 → 0.52 s median; a small simulate
 * about 10 ms sooner. (Warming the JSON library as well made a small simulate 0.1 s slower: it competed with the
 * framework's own threads and the compiler for the second core.)
 *
 * <p>Nothing here changes what a run does: each step only sets up, earlier, what the run would set up anyway when it
 * first uses it. The JVM initialises a class once, and a thread that needs a class another thread is initialising
 * waits for it, so a step still under way when the main thread arrives costs no more than doing it there. A step
 * that fails is skipped without a word; the run then meets the same failure where it would have, and reports it there.
 * {@code -Dlamella.warm-up=false} turns this off, to measure with and without it.
 */
final class WarmUp {

    /** Set to {@code false} to start without the warm-up thread. */
    static final String PROPERTY = "lamella.warm-up";

    /** The framework's utility class, whose initialiser reads the framework's defaults. */
    static final String FRAMEWORK_DEFAULTS = "org.apache.felix.framework.util.Util";

    private WarmUp() {
    }

    /**
     * Starts the warm-up thread (a daemon: it never holds the process) and returns it, or returns null when {@value
     * #PROPERTY} is {@code false}.
     */
    static Thread begin() {
        if ("false".equalsIgnoreCase(System.getProperty(PROPERTY, "").trim())) {
            return null;
        }
        Thread thread = new Thread(() -> run(steps()), "lamella-warm-up");
        thread.setDaemon(true);
        thread.start();
        return thread;
    }

    /** Runs {@code steps} in turn; one that fails, however, is skipped. */
    static void run(List<Runnable> steps) {
        for (Runnable step : steps) {
            try {
                step.run();
            } catch (Throwable skipped) {
                // Only an earlier start of what the run does anyway: the run meets any failure itself.
            }
        }
    }

    /** The steps, in the order the run needs what they set up. */
    static List<Runnable> steps() {
        return List.of(
                // Read once per process, when the framework is constructed.
                () -> initialise(FRAMEWORK_DEFAULTS),
                // java.util.logging reads its configuration at first use; the plugins folder's messages go there.
                () -> initialise(PluginFolderLog.class.getName()),
                // The framework formats the Java version once while it starts.
                () -> String.format("%03d", 1),
                // Outputs are written through temporary files named after the process.
                () -> ProcessHandle.current().pid());
    }

    private static void initialise(String className) {
        try {
            Class.forName(className, true, WarmUp.class.getClassLoader());
        } catch (ClassNotFoundException absent) {
            // Not on this class path: nothing to warm.
        }
    }
}
