package lamella.api;

import java.util.concurrent.CancellationException;

/**
 * A model evaluation stopped because its thread was interrupted: the caller asked the work to stop. This is the
 * cancellation contract of every evaluation — the engine's quadrature, the techniques' sums, the fitter and Monte
 * Carlo look at the evaluating thread's interrupt flag at least every few milliseconds of work and end with this
 * exception, leaving the flag set so that the caller sees it too. Not a {@link ModelEvaluationException}: nothing
 * is wrong with the model, and nothing may report it as a failure.
 */
public class EvaluationCancelledException extends CancellationException {

    private static final long serialVersionUID = 1L;

    public EvaluationCancelledException() {
        super("the model evaluation was cancelled");
    }

    /** Ends the work in hand when this thread has been interrupted; cheap enough to call every few microseconds. */
    public static void checkpoint() {
        if (Thread.currentThread().isInterrupted()) {
            throw new EvaluationCancelledException();
        }
    }
}
