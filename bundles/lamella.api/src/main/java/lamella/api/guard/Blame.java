package lamella.api.guard;

import java.util.concurrent.CancellationException;
import java.util.function.Supplier;
import lamella.api.ModelEvaluationException;

/**
 * Turns what a plug-in does wrong into a {@link PluginFault} that names it, such as
 * {@code geometry 'line-pair' from bundle lab.example.linepair 1.0.0}.
 *
 * @param subject what the plug-in is, such as {@code geometry 'line-pair'}
 * @param origin  the bundle that registered it
 */
public record Blame(String subject, PluginOrigin origin) {

    /**
     * A {@link ModelEvaluationException} is a plug-in saying that its model cannot be evaluated: its message is kept
     * and the plug-in named after it. Anything else it throws is a fault in it. Linkage errors count: a plug-in built
     * against another Lamella version fails with NoSuchMethodError or AbstractMethodError. A
     * {@link CancellationException} is no fault: the caller asked the work to stop, and it passes unchanged.
     */
    public RuntimeException fault(Throwable thrown) {
        if (thrown instanceof PluginFault already) {
            return already;
        }
        if (thrown instanceof CancellationException stop) {
            return stop;
        }
        if (thrown instanceof ModelEvaluationException e) {
            return new PluginFault(e.getMessage() + " (" + this + ")", e);
        }
        return failed(thrown.toString(), thrown);
    }

    public PluginFault failed(String problem, Throwable cause) {
        return new PluginFault(this + " failed: " + problem, cause);
    }

    /** Calls the plug-in; a result of null is a fault too, since callers would only fail later and elsewhere. */
    public <T> T call(String method, Supplier<T> body) {
        T value;
        try {
            value = body.get();
        } catch (RuntimeException | LinkageError e) {
            throw fault(e);
        }
        if (value == null) {
            throw failed(method + " returned null", null);
        }
        return value;
    }

    @Override
    public String toString() {
        return subject + " from " + origin;
    }
}
