package lamella.api.plan;

import java.util.List;
import lamella.api.ParameterRef;

/**
 * One value a plan writes into the case.
 *
 * @param ref   the varied key (with its dataset when a dataset's own block holds it)
 * @param value a number, or a list of numbers for a list key (frequencies, delays) whose end the plan moves; SI
 */
public record PlanSetting(ParameterRef ref, Object value) {

    public PlanSetting {
        if (value instanceof List<?> l) {
            value = List.copyOf(l);
        } else if (!(value instanceof Double)) {
            throw new IllegalArgumentException("a plan's setting is a number or a list of numbers, got " + value);
        }
    }
}
