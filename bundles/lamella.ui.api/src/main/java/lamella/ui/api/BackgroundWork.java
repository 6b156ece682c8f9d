package lamella.ui.api;

import lamella.api.fit.Progress;

/** Work that runs off the UI thread; it reports progress and checks {@link Progress#cancelled()}. */
@FunctionalInterface
public interface BackgroundWork<T> {
    T run(Progress progress) throws Exception;
}
