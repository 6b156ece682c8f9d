package lamella.api.plan;

import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.fit.Progress;
import org.osgi.annotation.versioning.ConsumerType;

/**
 * Ranks the plans of a case's {@code plan} block by the σ their fit would give: the linearised covariance of the
 * case's {@code fit} block (free inputs fitted, uncertain inputs propagated), evaluated without data at each plan's
 * settings with the block's expected noise.
 */
@ConsumerType
public interface PlanService {

    /**
     * @param threads worker threads over the plans (≥ 1)
     * @throws InputException for a bad plan or fit block, naming the JSON path
     */
    PlanOutcome plan(CaseDocument doc, int threads, Progress progress) throws InputException;
}
