package lamella.api.material;

import lamella.api.InputException;

/** A library value asked for at a temperature outside the range its entry states; values are never extrapolated. */
public final class OutOfRangeException extends InputException {

    private static final long serialVersionUID = 1L;

    public OutOfRangeException(String problem) {
        super(null, null, -1, problem);
    }
}
