package lamella.api.plan;

import java.util.List;

/**
 * Every plan of a plan block, ranked.
 *
 * @param objective  how the targets' σ were combined, in words
 * @param targets    the targets' labels, in the order of every plan's {@code predicted}
 * @param varied     the labels of the varied keys, in the order of every plan's {@code values}
 * @param noise      the noise assumed per signal, in words ({@code ratio: 1 % of its value})
 * @param limits     the limits applied, in words
 * @param baseline   the case as written
 * @param plans      ranked plans first (best first), then plans beyond a limit (by objective), then plans the model
 *                   cannot evaluate
 * @param warnings   what the user should know (targets unidentifiable in every plan, …)
 */
public record PlanOutcome(String objective, List<String> targets, List<String> varied, List<String> noise,
                          List<String> limits, PlannedResult baseline, List<PlannedResult> plans,
                          List<String> warnings) {

    public PlanOutcome {
        targets = List.copyOf(targets);
        varied = List.copyOf(varied);
        noise = List.copyOf(noise);
        limits = List.copyOf(limits);
        plans = List.copyOf(plans);
        warnings = List.copyOf(warnings);
    }

    /** The best plan within the limits, or null when none is. */
    public PlannedResult best() {
        return plans.isEmpty() || plans.get(0).status() != PlannedResult.Status.RANKED ? null : plans.get(0);
    }

    public long count(PlannedResult.Status status) {
        return plans.stream().filter(p -> p.status() == status).count();
    }
}
