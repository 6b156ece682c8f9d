package lamella.launcher;

import java.util.logging.Handler;
import java.util.logging.Level;
import java.util.logging.LogRecord;
import java.util.logging.Logger;

/**
 * What FileInstall says about the plugins folder, one line each on standard error without a stack trace, and
 * nothing once the runtime is shutting down: a jar dropped in while a command ends is no news to its user.
 */
final class PluginFolderLog extends Handler {

    /** The java.util.logging logger FileInstall writes to (felix.fileinstall.log.default=jul). */
    static final String LOGGER = "fileinstall";

    private static final PluginFolderLog HANDLER = new PluginFolderLog();
    /** Held here: java.util.logging keeps loggers only weakly, and a new one would have its default handlers. */
    private static final Logger FILEINSTALL = Logger.getLogger(LOGGER);

    private static volatile boolean quiet;

    static {
        FILEINSTALL.setUseParentHandlers(false);
        FILEINSTALL.addHandler(HANDLER);
    }

    private PluginFolderLog() {
    }

    /** Routes FileInstall's messages here (once per process) and lets them through. */
    static void install() {
        quiet = false;
    }

    /** From now on nothing is printed: the runtime is stopping. */
    static void silence() {
        quiet = true;
    }

    static boolean silenced() {
        return quiet;
    }

    @Override
    public void publish(LogRecord record) {
        if (quiet || record.getLevel().intValue() < Level.WARNING.intValue()) {
            return;
        }
        StringBuilder line = new StringBuilder("lamella: plugins folder: ").append(record.getMessage());
        Throwable thrown = record.getThrown();
        if (thrown != null && thrown.getMessage() != null) {
            line.append(": ").append(thrown.getMessage());
        }
        System.err.println(line);
    }

    @Override
    public void flush() {
        System.err.flush();
    }

    @Override
    public void close() {
        quiet = true;
    }
}
