package lamella.fit;

import java.util.List;
import java.util.concurrent.AbstractExecutorService;
import java.util.concurrent.TimeUnit;

/**
 * Runs every task in the thread that submits it: for fits whose caller spreads the work over its own threads (a map's
 * positions), so that one fit never waits for or competes with another's pool. Shared and stateless; it is never shut
 * down.
 */
final class InlineExecutor extends AbstractExecutorService {

    static final InlineExecutor INSTANCE = new InlineExecutor();

    private InlineExecutor() {
    }

    @Override
    public void execute(Runnable task) {
        task.run();
    }

    @Override
    public void shutdown() {
        throw new UnsupportedOperationException("the shared inline executor is never shut down");
    }

    @Override
    public List<Runnable> shutdownNow() {
        throw new UnsupportedOperationException("the shared inline executor is never shut down");
    }

    @Override
    public boolean isShutdown() {
        return false;
    }

    @Override
    public boolean isTerminated() {
        return false;
    }

    @Override
    public boolean awaitTermination(long timeout, TimeUnit unit) {
        return false;
    }
}
