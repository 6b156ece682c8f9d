package lamella.api.plan;

import java.util.List;
import lamella.api.fit.BudgetLine;

/**
 * One plan and what it predicts.
 *
 * @param rank        1 for the best plan within the limits; 0 for a plan not ranked (beyond a limit, not evaluable,
 *                    the baseline)
 * @param values      the value of every varied key, in the order of the outcome's {@code varied}: a number, or for a
 *                    key chosen several times together the list of values measured jointly; for the baseline the
 *                    case's own value of each key (NaN where the case states none)
 * @param status      ranked, beyond a limit, or not evaluable
 * @param reason      why a plan is beyond a limit or cannot be evaluated; empty otherwise
 * @param objective   the combined σ the plans are ranked by (+∞ when a target is unidentifiable); NaN when not
 *                    evaluated
 * @param predicted   per target, in the order of the outcome's {@code targets}; empty when not evaluated
 * @param budget      each source's 1σ contribution to each target (noise first), as the fit's budget
 * @param risePerWatt the steady temperature rise per watt absorbed, K/W (largest over the plan's measurements); NaN
 *                    where the geometry has no such estimate
 * @param rise        the steady temperature rise at the limits' absorbed power, K; NaN when no power is stated
 * @param measurements how many measurements the plan fits jointly
 */
public record PlannedResult(int rank, List<Object> values, Status status, String reason, double objective,
                            List<PredictedSigma> predicted, List<BudgetLine> budget, double risePerWatt,
                            double rise, int measurements) {

    public enum Status {
        RANKED("ranked"), BEYOND_LIMIT("beyond a limit"), NOT_EVALUABLE("cannot be evaluated"),
        BASELINE("the case as written");

        private final String words;

        Status(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    public PlannedResult {
        values = List.copyOf(values);
        predicted = List.copyOf(predicted);
        budget = List.copyOf(budget);
        reason = reason == null ? "" : reason;
    }

    public PlannedResult ranked(int r) {
        return new PlannedResult(r, values, Status.RANKED, reason, objective, predicted, budget, risePerWatt, rise,
                measurements);
    }

    /** Whether every target is identifiable in this plan. */
    public boolean identifiable() {
        return !predicted.isEmpty() && predicted.stream().allMatch(PredictedSigma::identifiable);
    }
}
