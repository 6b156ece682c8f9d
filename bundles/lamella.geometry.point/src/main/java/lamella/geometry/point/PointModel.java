package lamella.geometry.point;

import lamella.api.GeometryModel;
import lamella.api.Layer;
import lamella.api.StackKernel;
import lamella.engine.Bessel;
import lamella.engine.Geometries;
import lamella.engine.SpectralQuadrature;
import lamella.engine.TopLayer;

/** The bound point-source response; see {@link PointSource}. */
final class PointModel implements GeometryModel {

    /** Absolute tolerance of the remainder relative to the closed-form part's scale. */
    private static final double REMAINDER_TOLERANCE = 1e-10;

    private final StackKernel stack;
    private final double r;
    private final double kz;
    private final double kr;
    private final double c;
    private final double kHalfSpace;

    PointModel(StackKernel stack, double distance) {
        this.stack = stack;
        this.r = distance;
        Layer top = stack.stack().layers().get(0);
        this.kz = top.kThrough();
        this.kr = top.kInPlaneX();
        this.c = top.heatCapacity();
        this.kHalfSpace = TopLayer.halfSpaceWavenumber(stack.stack());
    }

    @Override
    public void at(double frequencyHz, double[] out) {
        double omega = 2 * Math.PI * frequencyHz;
        Geometries.requireSteadyStateExists(stack.stack(), omega, "point");
        // closed form of the top half-space: e^(−a r) / (2π r √(Λz Λr)), a = √(iωC/Λr) = |a| e^(iπ/4)
        double aMag = Math.sqrt(omega * c / kr);
        double ar = aMag * Math.sqrt(0.5) * r;
        double scale = 1.0 / (2 * Math.PI * r * Math.sqrt(kz * kr));
        double hr = scale * Math.exp(-ar) * Math.cos(ar);
        double hi = -scale * Math.exp(-ar) * Math.sin(ar);
        if (kHalfSpace > 0) {
            SpectralQuadrature q = Geometries.workspace();
            double[] z = new double[2];
            double[] zInf = new double[2];
            q.integrate((k, o) -> {
                stack.radialResponse(k, omega, z);
                stack.topHalfSpaceRadialResponse(k, omega, zInf);
                double w = k * Bessel.j0(k * r);
                o[0] = (z[0] - zInf[0]) * w;
                o[1] = (z[1] - zInf[1]) * w;
            }, 0.0, kHalfSpace, stack.featureWavenumbers(omega), 2 * Math.PI / r,
                    SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE, REMAINDER_TOLERANCE * scale * 2 * Math.PI, out);
            hr += out[0] / (2 * Math.PI);
            hi += out[1] / (2 * Math.PI);
        }
        out[0] = hr;
        out[1] = hi;
        Geometries.requireFinite(out, "point", frequencyHz);
    }
}
