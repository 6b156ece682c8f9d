package lamella.api.guard;

import lamella.api.ModelEvaluationException;

/**
 * A failure already blamed on one plug-in. Guards let it pass unchanged, so a geometry's failure seen through a
 * technique's guard stays the geometry's.
 */
public final class PluginFault extends ModelEvaluationException {

    private static final long serialVersionUID = 1L;

    public PluginFault(String message, Throwable cause) {
        super(message, cause);
    }
}
