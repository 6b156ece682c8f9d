package lamella.launcher;

import org.apache.felix.framework.Logger;
import org.osgi.framework.Bundle;
import org.osgi.framework.ServiceReference;

/**
 * Sends the framework's own messages to standard error (standard output carries command results only), and none
 * once the runtime is stopping: bundles going away then say nothing a user needs.
 */
final class StandardErrorLog extends Logger {

    private volatile boolean quiet;

    /** From now on nothing is printed. */
    void silence() {
        quiet = true;
    }

    @Override
    protected void doLog(Bundle bundle, ServiceReference sr, int level, String message, Throwable failure) {
        if (quiet) {
            return;
        }
        StringBuilder line = new StringBuilder("lamella: framework ").append(levelName(level)).append(": ");
        if (bundle != null) {
            line.append('[').append(bundle.getSymbolicName()).append("] ");
        }
        line.append(message);
        if (failure != null) {
            line.append(": ").append(failure);
        }
        System.err.println(line);
    }

    private static String levelName(int level) {
        return switch (level) {
            case LOG_ERROR -> "error";
            case LOG_WARNING -> "warning";
            case LOG_INFO -> "info";
            default -> "debug";
        };
    }
}
