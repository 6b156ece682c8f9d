package lamella.fit;

import java.util.List;
import java.util.Map;
import lamella.api.ParameterRef;

/**
 * The {@code plan} block of a case, read and checked.
 *
 * @param targets   the free inputs whose σ matters
 * @param weights   per target, its weight in a weighted sum (1 for the largest)
 * @param combine   how the targets' relative σ become one number to rank by
 * @param variables the design variables
 * @param noise     per signal, the expected noise of one point
 * @param limits    what a plan may not exceed
 */
record PlanSpec(List<ParameterRef> targets, double[] weights, Combine combine, List<Variable> variables,
                Map<String, Noise> noise, Limits limits) {

    enum Combine {
        /** The largest relative σ of the targets: the plan is as good as its worst target. */
        LARGEST("the largest relative σ of the targets"),
        /** Σ w_t σ_t/|p_t|. */
        WEIGHTED_SUM("the weighted sum of the targets' relative σ");

        final String words;

        Combine(String words) {
            this.words = words;
        }
    }

    /**
     * A design variable: a measurement, geometry or layer key and the values it may take.
     *
     * @param ref    the key (with the dataset whose own block holds it, or −1)
     * @param values the values, in the case's unit (SI)
     * @param choose how many of the values are measured together, each a count ≥ 1 (several: joint plans compete)
     * @param end    for a list key (frequencies, delays): which end the values move, "first" or "last"; else null
     * @param path   the JSON path of its entry
     */
    record Variable(ParameterRef ref, double[] values, int[] choose, String end, String path) {

        String label() {
            return ref + (end == null ? "" : "[" + end + "]");
        }

        boolean joint() {
            for (int c : choose) {
                if (c > 1) {
                    return true;
                }
            }
            return false;
        }
    }

    /**
     * The expected noise of one point of a signal.
     *
     * @param value    a fraction of the signal (relative) or an absolute σ in the signal's unit
     * @param relative which of the two
     * @param source   where it comes from, for the printed summary ("plan.noise" or the default's rule)
     */
    record Noise(double value, boolean relative, String source) {

        double sigma(double signal) {
            return relative ? value * Math.abs(signal) : value;
        }
    }

    /**
     * @param absorbedPowerW absorbed pump power for the steady rise, W (NaN: none stated, no rise limit)
     * @param maxRiseK       the largest steady rise allowed, K
     * @param minSpotM       smallest 1/e² radius of a pump or probe beam, m (0: none)
     * @param maxSpotM       largest, m (+∞: none)
     * @param bandLowHz      lowest modulation or measured frequency, Hz (0: none)
     * @param bandHighHz     highest, Hz (+∞: none)
     */
    record Limits(double absorbedPowerW, double maxRiseK, double minSpotM, double maxSpotM, double bandLowHz,
                  double bandHighHz) {
    }
}
