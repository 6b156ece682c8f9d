package lamella.api;

/**
 * One layer of a sample stack, in SI units.
 *
 * @param name             the layer's name, unique within its stack
 * @param thickness        thickness in m; {@link Double#POSITIVE_INFINITY} for a semi-infinite last layer
 * @param kThrough         through-plane (z) thermal conductivity Λz in W m⁻¹ K⁻¹
 * @param kInPlaneX        in-plane thermal conductivity Λx in W m⁻¹ K⁻¹
 * @param kInPlaneY        in-plane thermal conductivity Λy in W m⁻¹ K⁻¹
 * @param heatCapacity     volumetric heat capacity C in J m⁻³ K⁻¹
 * @param conductanceBelow thermal boundary conductance G to the next layer in W m⁻² K⁻¹;
 *                         {@link Double#POSITIVE_INFINITY} for perfect contact
 */
public record Layer(String name, double thickness, double kThrough, double kInPlaneX, double kInPlaneY,
                    double heatCapacity, double conductanceBelow) {

    public Layer {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a layer needs a name");
        }
        requirePositive("thickness", thickness, true);
        requirePositive("kThrough", kThrough, false);
        requirePositive("kInPlaneX", kInPlaneX, false);
        requirePositive("kInPlaneY", kInPlaneY, false);
        requirePositive("heatCapacity", heatCapacity, false);
        requirePositive("conductanceBelow", conductanceBelow, true);
    }

    /** An in-plane isotropic layer in perfect contact with the next. */
    public static Layer isotropicInPlane(String name, double thickness, double kThrough, double kInPlane,
                                         double heatCapacity) {
        return new Layer(name, thickness, kThrough, kInPlane, kInPlane, heatCapacity, Double.POSITIVE_INFINITY);
    }

    /** The same layer with another boundary conductance to the next layer. */
    public Layer withConductanceBelow(double g) {
        return new Layer(name, thickness, kThrough, kInPlaneX, kInPlaneY, heatCapacity, g);
    }

    /** The same layer with another thickness. */
    public Layer withThickness(double d) {
        return new Layer(name, d, kThrough, kInPlaneX, kInPlaneY, heatCapacity, conductanceBelow);
    }

    public boolean isSemiInfinite() {
        return thickness == Double.POSITIVE_INFINITY;
    }

    public boolean isInPlaneIsotropic() {
        return kInPlaneX == kInPlaneY;
    }

    public boolean hasPerfectContactBelow() {
        return conductanceBelow == Double.POSITIVE_INFINITY;
    }

    private static void requirePositive(String what, double v, boolean infinityAllowed) {
        if (!(v > 0) || Double.isNaN(v) || (!infinityAllowed && Double.isInfinite(v))) {
            throw new IllegalArgumentException(what + " must be a positive finite number, got " + v);
        }
    }
}
