package lamella.api.fit;

import org.osgi.annotation.versioning.ConsumerType;

/** Progress of long work, and the caller's way to cancel it. Called from worker threads. */
@ConsumerType
public interface Progress {

    Progress NONE = new Progress() {
        @Override
        public void update(String stage, int done, int total) {
        }

        @Override
        public boolean cancelled() {
            return false;
        }
    };

    void update(String stage, int done, int total);

    boolean cancelled();
}
