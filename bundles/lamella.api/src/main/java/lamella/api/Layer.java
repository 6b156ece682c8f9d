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
 * @param tie              which in-plane conductivities take their value from Λz (see {@link Tie})
 */
public record Layer(String name, double thickness, double kThrough, double kInPlaneX, double kInPlaneY,
                    double heatCapacity, double conductanceBelow, Tie tie) {

    /**
     * Which in-plane conductivities are one quantity with Λz, because one statement gave them all — a conductivity
     * written once, or one library value. Changing Λz changes the directions that follow it, so a layer stated as
     * isotropic stays isotropic when it is fitted, propagated or perturbed.
     */
    public enum Tie {
        /** Λx and Λy are stated for themselves, apart from Λz. */
        APART(false, false),
        /** One conductivity in every direction: Λx = Λy = Λz. */
        ISOTROPIC(true, true),
        /** Λx follows Λz; Λy is stated for itself. */
        X_FOLLOWS(true, false),
        /** Λy follows Λz; Λx is stated for itself. */
        Y_FOLLOWS(false, true);

        private final boolean x;
        private final boolean y;

        Tie(boolean x, boolean y) {
            this.x = x;
            this.y = y;
        }

        public boolean x() {
            return x;
        }

        public boolean y() {
            return y;
        }

        public static Tie of(boolean x, boolean y) {
            return x ? (y ? ISOTROPIC : X_FOLLOWS) : (y ? Y_FOLLOWS : APART);
        }
    }

    public Layer {
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a layer needs a name");
        }
        if (tie == null) {
            throw new IllegalArgumentException("a layer needs its conductivity tie");
        }
        requirePositive("thickness", thickness, true);
        requirePositive("kThrough", kThrough, false);
        requirePositive("kInPlaneX", kInPlaneX, false);
        requirePositive("kInPlaneY", kInPlaneY, false);
        requirePositive("heatCapacity", heatCapacity, false);
        requirePositive("conductanceBelow", conductanceBelow, true);
        if ((tie.x() && kInPlaneX != kThrough) || (tie.y() && kInPlaneY != kThrough)) {
            throw new IllegalArgumentException("an in-plane conductivity that follows Λz must equal it");
        }
    }

    /** A layer whose three conductivities are each stated for themselves. */
    public Layer(String name, double thickness, double kThrough, double kInPlaneX, double kInPlaneY,
                 double heatCapacity, double conductanceBelow) {
        this(name, thickness, kThrough, kInPlaneX, kInPlaneY, heatCapacity, conductanceBelow, Tie.APART);
    }

    /** An isotropic layer (one conductivity Λ in every direction) in perfect contact with the next. */
    public static Layer isotropic(String name, double thickness, double k, double heatCapacity) {
        return new Layer(name, thickness, k, k, k, heatCapacity, Double.POSITIVE_INFINITY, Tie.ISOTROPIC);
    }

    /** An in-plane isotropic layer, Λz and Λr stated apart, in perfect contact with the next. */
    public static Layer isotropicInPlane(String name, double thickness, double kThrough, double kInPlane,
                                         double heatCapacity) {
        return new Layer(name, thickness, kThrough, kInPlane, kInPlane, heatCapacity, Double.POSITIVE_INFINITY);
    }

    /** The same layer with another boundary conductance to the next layer. */
    public Layer withConductanceBelow(double g) {
        return new Layer(name, thickness, kThrough, kInPlaneX, kInPlaneY, heatCapacity, g, tie);
    }

    /** The same layer with another thickness. */
    public Layer withThickness(double d) {
        return new Layer(name, d, kThrough, kInPlaneX, kInPlaneY, heatCapacity, conductanceBelow, tie);
    }

    /** The same layer with another heat capacity. */
    public Layer withHeatCapacity(double c) {
        return new Layer(name, thickness, kThrough, kInPlaneX, kInPlaneY, c, conductanceBelow, tie);
    }

    /** Another Λz, and the in-plane conductivities that follow it. */
    public Layer withThroughPlane(double k) {
        return new Layer(name, thickness, k, tie.x() ? k : kInPlaneX, tie.y() ? k : kInPlaneY, heatCapacity,
                conductanceBelow, tie);
    }

    /** Another Λr = Λx = Λy, stated apart from Λz. */
    public Layer withInPlane(double k) {
        return new Layer(name, thickness, kThrough, k, k, heatCapacity, conductanceBelow, Tie.APART);
    }

    /** Another Λx, stated for itself. */
    public Layer withInPlaneX(double k) {
        return new Layer(name, thickness, kThrough, k, kInPlaneY, heatCapacity, conductanceBelow,
                Tie.of(false, tie.y()));
    }

    /** Another Λy, stated for itself. */
    public Layer withInPlaneY(double k) {
        return new Layer(name, thickness, kThrough, kInPlaneX, k, heatCapacity, conductanceBelow,
                Tie.of(tie.x(), false));
    }

    /** One conductivity Λ in every direction. */
    public Layer withIsotropic(double k) {
        return new Layer(name, thickness, k, k, k, heatCapacity, conductanceBelow, Tie.ISOTROPIC);
    }

    /** The same values, with the named in-plane directions stated for themselves (no longer following Λz). */
    public Layer apart(boolean x, boolean y) {
        return new Layer(name, thickness, kThrough, kInPlaneX, kInPlaneY, heatCapacity, conductanceBelow,
                Tie.of(tie.x() && !x, tie.y() && !y));
    }

    public boolean isSemiInfinite() {
        return thickness == Double.POSITIVE_INFINITY;
    }

    public boolean isInPlaneIsotropic() {
        return kInPlaneX == kInPlaneY;
    }

    /** Equal conductivities in every direction, however they were stated. */
    public boolean isIsotropic() {
        return kThrough == kInPlaneX && kThrough == kInPlaneY;
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
