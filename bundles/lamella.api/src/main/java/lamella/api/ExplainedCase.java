package lamella.api;

import java.util.List;

/**
 * A case as read, with the origin of every value of its stack — written in the file, taken from a material library,
 * or a default — in layer order.
 */
public record ExplainedCase(CaseDocument document, List<ValueOrigin> origins) {

    public ExplainedCase {
        origins = List.copyOf(origins);
    }
}
