package lamella.engine;

import java.util.List;
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
     * The wavenumber beyond which the stack's response equals its high-wavenumber limit
     * ({@code StackKernel.topHalfSpaceRadialResponse}: the top layer's half-space, in parallel with the first
     * layer above's when heat flows both ways) to double precision; their difference decays like
     * exp(−2 k d √(Λx/Λz)) for the thickness d of the layer next to the heated plane on each side. Zero when each
     * side is a single semi-infinite layer, which is that limit.
     */
    public static double halfSpaceWavenumber(Stack stack) {
        double k = side(stack.layers(), stack.bottom());
        if (stack.heatsBothWays()) {
            k = Math.max(k, side(stack.above(), stack.top()));
        }
        return k;
    }

    private static double side(List<Layer> layers, BottomBoundary end) {
        Layer first = layers.get(0);
        if (layers.size() == 1 && end == BottomBoundary.SEMI_INFINITE) {
            return 0.0;
        }
        return OPAQUE_HALF / (first.thickness() * Math.sqrt(first.kInPlaneX() / first.kThrough()));
    }
}
