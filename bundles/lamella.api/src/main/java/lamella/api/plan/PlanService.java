package lamella.api.plan;

import java.util.List;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.fit.Progress;
import org.osgi.annotation.versioning.ProviderType;

/**
 * Ranks the plans of a case's {@code plan} block by the σ their fit would give: the linearised covariance of the
 * case's {@code fit} block (free inputs fitted, uncertain inputs propagated), evaluated without data at each plan's
 * settings with the block's expected noise.
 *
 * <p>Offered by Lamella's fitting bundle and called by commands, reports and the workbench; a plug-in uses it and
 * never implements it, so methods may be added in a minor version.
 */
@ProviderType
public interface PlanService {

    /**
     * @param threads worker threads over the plans (≥ 1)
     * @throws InputException for a bad plan or fit block, naming the JSON path
     */
    PlanOutcome plan(CaseDocument doc, int threads, Progress progress) throws InputException;

    /**
     * What one plan writes into the case: each varied key with the value it takes there (a number, or for a key
     * whose end a plan moves the whole list), in the order of the outcome's {@code varied}.
     *
     * @param plan a plan of {@link #plan}'s outcome for the same document
     * @throws InputException when the plan measures several values of a key together (a case holds one value of
     *                        it per dataset) or when its values do not fit the document's plan block
     */
    List<PlanSetting> settings(CaseDocument doc, PlannedResult plan) throws InputException;

    /**
     * The sensitivities of every measurement of one plan (the outcome's baseline: the case as written) at its x
     * values to every numeric input, as {@code lamella sensitivity} computes them for the case.
     *
     * @throws InputException when the plan's values do not fit the document's plan block
     */
    List<PlannedSensitivity> sensitivity(CaseDocument doc, PlannedResult plan) throws InputException;
}
