package lamella.ui.api;

import lamella.api.fit.Progress;
import org.osgi.annotation.versioning.ConsumerType;

/** Work that runs off the UI thread; it reports progress and checks {@link Progress#cancelled()}. */
@ConsumerType
@FunctionalInterface
public interface BackgroundWork<T> {
    T run(Progress progress) throws Exception;
}
