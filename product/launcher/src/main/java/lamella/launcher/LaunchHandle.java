package lamella.launcher;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.IntConsumer;

/**
 * The launcher's end of the dispatch protocol: registered as an {@link IntConsumer} service carrying the command
 * line, it receives the command's exit status. A JDK type on purpose: nothing but java.* crosses from the bundles
 * to the launcher's class loader.
 */
final class LaunchHandle implements IntConsumer {

    static final String ROLE = "lamella.role";
    static final String ROLE_LAUNCH = "launch";
    static final String ARGS = "lamella.args";
    static final String CWD = "lamella.cwd";

    private static final int UNSET = Integer.MIN_VALUE;

    private final AtomicInteger status = new AtomicInteger(UNSET);
    private final CountDownLatch done = new CountDownLatch(1);

    /** Only the first status counts: a command finishes once. */
    @Override
    public void accept(int exitStatus) {
        if (status.compareAndSet(UNSET, exitStatus)) {
            done.countDown();
        }
    }

    /** @return whether a status arrived within the time */
    boolean await(long timeout, TimeUnit unit) throws InterruptedException {
        return done.await(timeout, unit);
    }

    int status() {
        return status.get();
    }
}
