package lamella.ui.api;

import org.osgi.annotation.versioning.ProviderType;

/** Background work under way. */
@ProviderType
public interface Task {

    /** Asks the work to stop at its next progress check. */
    void cancel();

    boolean done();
}
