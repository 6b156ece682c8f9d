package lamella.api;

/**
 * A model that cannot be evaluated for the inputs it was given — a steady state that does not exist, a spectral
 * integral that does not converge — or a plug-in that failed while evaluating. Unchecked, because it arises inside
 * evaluation loops; commands report it with its message and exit status 2.
 */
public class ModelEvaluationException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    public ModelEvaluationException(String message) {
        super(message);
    }

    public ModelEvaluationException(String message, Throwable cause) {
        super(message, cause);
    }
}
