package lamella.api.fit;

import lamella.api.CaseDocument;
import lamella.api.InputException;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * Fits the free inputs of a case to its datasets and propagates the uncertainty of every input held fixed; computes
 * sensitivities. Offered as a service by the fitting bundle; works on any case through {@link lamella.api.ParameterRef}s.
 */
@ConsumerType
public interface FitService {

    /**
     * Fits the case's {@code fit} block.
     *
     * @throws InputException for a bad fit block or data file, naming the file, line or JSON path
     */
    FitOutcome fit(CaseDocument doc, FitSettings settings, Progress progress) throws InputException;

    /**
     * Sensitivities S = ∂ln(signal)/∂ln(p) (for a phase, ∂φ/∂ln p in degrees) of every numeric input of the
     * case's measurement — or, when {@code dataset ≥ 0}, of that fit dataset at its data's x values.
     *
     * @param signal a signal column of the technique, or null for the technique's usual fitted signal
     */
    SensitivityTable sensitivity(CaseDocument doc, int dataset, String signal) throws InputException;
}
