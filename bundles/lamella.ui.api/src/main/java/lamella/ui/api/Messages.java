package lamella.ui.api;

import java.time.Instant;
import java.util.List;
import java.util.function.Consumer;
import org.osgi.annotation.versioning.ProviderType;

/** What happened, for the Messages panel: information, warnings and errors with their cause. Thread-safe. */
@ProviderType
public interface Messages {

    enum Level { INFO, WARNING, ERROR }

    record Message(Instant time, Level level, String text, String cause) {
    }

    void info(String text);

    void warning(String text);

    /** An error; the cause's message (and chain) is kept for the reader. */
    void error(String text, Throwable cause);

    List<Message> all();

    /** Called (on the UI thread) for every new message. */
    void subscribe(Consumer<Message> listener);
}
