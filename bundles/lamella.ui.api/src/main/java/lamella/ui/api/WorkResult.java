package lamella.ui.api;

import org.osgi.annotation.versioning.ConsumerType;

/**
 * What becomes of background work, told on the UI thread: its result, its failure (already in Messages, in words),
 * or that it stopped because it was cancelled (by the user, or by a newer request).
 */
@ConsumerType
@FunctionalInterface
public interface WorkResult<T> {

    void done(T result);

    /** The work failed: problem says why in words (never a Java name), cause keeps the details. */
    default void failed(String problem, Throwable cause) {
    }

    /** The work was cancelled before it finished. */
    default void stopped() {
    }
}
