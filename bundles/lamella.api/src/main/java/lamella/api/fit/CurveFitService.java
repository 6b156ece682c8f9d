package lamella.api.fit;

import lamella.api.CaseDocument;
import lamella.api.InputException;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * Fits of a case's fit rules to many short curves, such as the positions of a map. Offered as a service by the
 * fitting bundle beside {@link FitService}.
 */
@ConsumerType
public interface CurveFitService {

    /**
     * The case's fit rules — the fit block's free and uncertain inputs, bounds, weights and starts; its datasets, if
     * any, are not read — for fitting many curves measured under the case's own geometry and measurement.
     *
     * @param signal a signal column of the technique, or null for the technique's usual fitted signal
     * @throws InputException for a bad fit block, naming the JSON path
     */
    CurveFit curves(CaseDocument doc, String signal) throws InputException;
}
