package lamella.ui.workbench;

import java.io.IOException;
import java.io.InterruptedIOException;
import java.nio.channels.ClosedByInterruptException;
import java.nio.file.AccessDeniedException;
import java.nio.file.NoSuchFileException;
import java.util.concurrent.CancellationException;
import lamella.api.InputException;
import lamella.api.ModelEvaluationException;

/** What a failure of background work says to a user: its own words where it has them, never a Java name. */
final class Failures {

    private Failures() {
    }

    /** True when the work ended because it was asked to stop, however the asking reached it. */
    static boolean isCancellation(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause() == t ? null : t.getCause()) {
            if (t instanceof CancellationException || t instanceof InterruptedException
                    || t instanceof InterruptedIOException || t instanceof ClosedByInterruptException) {
                return true;
            }
        }
        return false;
    }

    /**
     * The message of a failure written for people — an input problem, a model that cannot be evaluated, a file that
     * cannot be read — or, for anything else, a plain statement that Lamella itself failed.
     */
    static String words(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause() == t ? null : t.getCause()) {
            if (t instanceof NoSuchFileException f) {
                return "no file " + f.getFile();
            }
            if (t instanceof AccessDeniedException f) {
                return "not allowed to read or write " + f.getFile();
            }
            if ((t instanceof InputException || t instanceof ModelEvaluationException || t instanceof IOException)
                    && t.getMessage() != null && !t.getMessage().isBlank()) {
                return t.getMessage();
            }
        }
        return "an internal error in Lamella (the details below are for a bug report)";
    }
}
