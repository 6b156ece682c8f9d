package lamella.engine;

import lamella.api.BottomBoundary;
import lamella.api.Layer;
import lamella.api.Stack;

/** Facts about a stack's top layer that spectral integrals use to handle their high-wavenumber tails exactly. */
public final class TopLayer {

    /** exp(−2·20) ≈ 4e-18: beyond this the layers below no longer show at the surface in double precision. */
    private static final double OPAQUE_HALF = 20.0;

    private TopLayer() {
    }

    /**
     * The wavenumber beyond which the stack's response equals that of a half-space of the top layer's material to
     * double precision (their difference decays like exp(−2 k d₁ √(Λx/Λz))). Zero for a one-layer semi-infinite
     * stack, which is that half-space.
     */
    public static double halfSpaceWavenumber(Stack stack) {
        Layer top = stack.layers().get(0);
        if (stack.layers().size() == 1 && stack.bottom() == BottomBoundary.SEMI_INFINITE) {
            return 0.0;
        }
        return OPAQUE_HALF / (top.thickness() * Math.sqrt(top.kInPlaneX() / top.kThrough()));
    }
}
