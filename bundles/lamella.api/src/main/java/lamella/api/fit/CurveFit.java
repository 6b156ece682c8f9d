package lamella.api.fit;

import java.util.List;
import lamella.api.InputException;
import lamella.api.ParameterRef;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * The fit rules of one case — its {@code fit} block's free and uncertain inputs, bounds, weights and starts — applied
 * to many short curves measured under the case's own geometry and measurement: the positions of a map. One instance
 * serves every worker thread; each {@link #fit} runs in the thread that calls it and uses no other.
 */
@ConsumerType
public interface CurveFit {

    /** The free inputs, in the order of every value array. */
    List<ParameterRef> free();

    /** What each free path moves, in words (see {@link FittedParameter#quantity}). */
    List<String> quantities();

    /** The technique's x column ({@code frequency_hz}, {@code delay_s}). */
    String xColumn();

    /** The signal column fitted. */
    String signal();

    /** The starting values the case gives (natural units). */
    double[] initial();

    /**
     * Checks, before many curves are fitted, that curves of these x values (with or without σ) can be fitted and that
     * the model can be evaluated there at the starting values; the problem is an InputException at {@code path}.
     */
    void check(double[] x, boolean withSigma, String path) throws InputException;

    /**
     * Fits one curve.
     *
     * @param x     its x values, in the technique's unit (Hz, s)
     * @param y     the signal at x
     * @param sigma its 1σ per point, or null to estimate it from the residuals
     * @param start starting values in natural units, inside the bounds; null for {@link #initial()}
     * @throws lamella.api.ModelEvaluationException when the model cannot be evaluated on the way
     * @throws java.util.concurrent.CancellationException when the calling thread is interrupted
     */
    FitOutcome fit(double[] x, double[] y, double[] sigma, double[] start);
}
