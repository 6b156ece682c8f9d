package lamella.api;

/**
 * How deep the pump heats and the probe reads in the layer under the heated plane ({@code layers[0]}): heating
 * spread as exp(−z/δ) over the layer's depth z from the plane, normalised over the layer so that all the absorbed
 * power stays in it, and the probe's reading weighted by exp(−z/δₛ) the same way. A depth of 0 is the plane itself
 * (surface heating, surface reading).
 *
 * @param absorption     absorption depth δ in m; 0 for heating at the plane
 * @param sensing        sensing depth δₛ in m; 0 for reading at the plane
 * @param sensingFollows the sensing depth is the absorption depth, one quantity (no sensing depth was stated), so
 *                       that changing δ moves δₛ too
 */
public record OpticalDepths(double absorption, double sensing, boolean sensingFollows) {

    /** Heated and read at the plane itself. */
    public static final OpticalDepths SURFACE = new OpticalDepths(0.0, 0.0, true);

    public OpticalDepths {
        for (double d : new double[] {absorption, sensing}) {
            if (!(d >= 0) || Double.isInfinite(d)) {
                throw new IllegalArgumentException("an optical depth must be zero or a positive finite number, got "
                        + d);
            }
        }
        if (sensingFollows && sensing != absorption) {
            throw new IllegalArgumentException("a sensing depth that follows the absorption depth must equal it");
        }
    }

    /** Heating over δ, read the same way. */
    public static OpticalDepths absorbing(double absorption) {
        return new OpticalDepths(absorption, absorption, true);
    }

    /** True when heating or reading reaches below the plane. */
    public boolean inDepth() {
        return absorption > 0 || sensing > 0;
    }

    /** Another absorption depth; a sensing depth that follows it moves with it. */
    public OpticalDepths withAbsorption(double d) {
        return new OpticalDepths(d, sensingFollows ? d : sensing, sensingFollows);
    }

    /** Another sensing depth, stated for itself. */
    public OpticalDepths withSensing(double d) {
        return new OpticalDepths(absorption, d, false);
    }
}
