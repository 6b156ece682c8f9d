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
        return failed(origin.shipped() ? inWords(thrown) : thrown.toString(), thrown);
    }

    /**
     * A plug-in's failure names it and what it threw, for its author. A shipped bundle's is Lamella's own fault:
     * never blamed on a plug-in, said without Java's class names, and with the way to see the details.
     */
    public PluginFault failed(String problem, Throwable cause) {
        if (origin.shipped()) {
            return new PluginFault("Lamella's own " + subject.replaceFirst("^an? ", "") + " (" + origin
                    + ") could not evaluate this case: " + problem + "; this is a fault in Lamella, not in the case"
                    + " or a plug-in: please report it with the case file (LAMELLA_JAVA_OPTS=-Dlamella.debug=true"
                    + " shows the details)", cause);
        }
        return new PluginFault(this + " failed: " + problem, cause);
    }

    /** What went wrong, without the class names a Java exception prints. */
    static String inWords(Throwable thrown) {
        String m = thrown.getMessage();
        String kind;
        if (thrown instanceof ArithmeticException) {
            kind = "an arithmetic error";
        } else if (thrown instanceof StackOverflowError) {
            kind = "the computation nested too deep";
        } else if (thrown instanceof IndexOutOfBoundsException) {
            kind = "an index out of range";
        } else if (thrown instanceof LinkageError) {
            kind = "a part of the runtime is missing or of another version";
        } else {
            kind = "an unexpected error";
        }
        boolean plain = m != null && !m.isBlank() && !m.matches("(?s).*\\b(java|javax|sun|jdk|org|com)\\.[a-z].*");
        return plain ? kind + " (" + m.strip() + ")" : kind;
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
