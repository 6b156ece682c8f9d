package lamella.conditioning;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.OptionalDouble;
import lamella.api.data.Decimals;

/**
 * What conditioning did, for the user to check and for the record.
 *
 * @param scansAveraged       how many scans were averaged
 * @param detectionPhaseDeg   the rotation applied to TDTR in-phase/out-of-phase, degrees, if any
 * @param detectionPhaseHow   how it was found, or why none was applied
 * @param reference           the FDTR reference file, if one was subtracted
 * @param referencePhaseMinDeg the smallest reference phase subtracted, degrees (NaN without reference)
 * @param referencePhaseMaxDeg the largest reference phase subtracted, degrees (NaN without reference)
 * @param outliers            rows marked as outliers
 * @param excluded            rows inside excluded ranges
 * @param notes               anything else the user should know (columns recomputed, rule settings)
 */
public record ConditioningReport(int scansAveraged, OptionalDouble detectionPhaseDeg, String detectionPhaseHow,
                                 Optional<Path> reference, double referencePhaseMinDeg, double referencePhaseMaxDeg,
                                 int outliers, int excluded, List<String> notes) {

    public ConditioningReport {
        notes = List.copyOf(notes);
    }

    /** The report as short lines for a terminal. */
    public List<String> lines() {
        List<String> l = new ArrayList<>();
        l.add("scans averaged: " + scansAveraged);
        l.add("detection phase: " + (detectionPhaseDeg.isPresent()
                ? "rotated by " + Decimals.show(detectionPhaseDeg.getAsDouble()) + " deg (" + detectionPhaseHow + ")"
                : detectionPhaseHow));
        reference.ifPresent(r -> l.add("reference phase: subtracted, from " + r + ", "
                + Decimals.show(referencePhaseMinDeg) + " to " + Decimals.show(referencePhaseMaxDeg) + " deg"));
        l.add("outliers marked: " + outliers);
        l.add("rows excluded: " + excluded);
        l.addAll(notes);
        return l;
    }
}
