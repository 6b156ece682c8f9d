package lamella.geometry.line;

import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.StackKernel;
import lamella.engine.Geometries;
import lamella.engine.SpectralQuadrature;
import lamella.engine.TopLayer;

/**
 * The bound line-heater response; see {@link LineHeater}. The integral runs numerically up to a wavenumber K with
 * K·b a whole number of half-periods of sin²(kb), beyond which the stack acts as the top layer's half-space,
 * Z∞ = 1/√(Λz(Λx k² + iωC)); that tail is summed from its asymptotic expansion
 * ∫_X^∞ sin²u/u³ du = 1/(4X²) − 3/(8X⁴) + O(X⁻⁶) at X = Kb = mπ, with the first correction in iωC/(Λx k²).
 */
final class LineModel implements GeometryModel {

    /** At least this many half-periods of sin²(kb) are integrated numerically. */
    private static final int MIN_HALF_PERIODS = 100;
    /** K is at least this multiple of |a| = √(ωC/Λx), so the tail's expansion in a²/k² holds. */
    private static final double TAIL_OVER_THERMAL = 30.0;

    private final StackKernel stack;
    private final double b;
    private final double kz;
    private final double kx;
    private final double c;
    private final double kHalfSpace;

    LineModel(StackKernel stack, double halfWidth) {
        this.stack = stack;
        this.b = halfWidth;
        Layer top = stack.stack().layers().get(0);
        this.kz = top.kThrough();
        this.kx = top.kInPlaneX();
        this.c = top.heatCapacity();
        this.kHalfSpace = TopLayer.halfSpaceWavenumber(stack.stack());
    }

    @Override
    public void at(double frequencyHz, double[] out) {
        double omega = 2 * Math.PI * frequencyHz;
        if (omega == 0 && stack.stack().bottom() != BottomBoundary.ISOTHERMAL) {
            throw new ModelEvaluationException("geometry 'line': a line heater has no steady temperature unless the"
                    + " bottom of the stack is isothermal (heat flow in two dimensions); use a frequency above zero");
        }
        double aMag = Math.sqrt(omega * c / kx);
        double k = Math.max(MIN_HALF_PERIODS * Math.PI / b, Math.max(kHalfSpace, TAIL_OVER_THERMAL * aMag));
        long halfPeriods = (long) Math.ceil(k * b / Math.PI);
        double x = halfPeriods * Math.PI;
        double kTail = x / b;
        SpectralQuadrature q = Geometries.workspace();
        double[] z = new double[2];
        q.integrate((kk, o) -> {
            stack.response(kk, 0.0, omega, z);
            double u = kk * b;
            double s = u < 1e-4 ? 1 - u * u / 6 : Math.sin(u) / u;
            double w = s * s;
            o[0] = z[0] * w;
            o[1] = z[1] * w;
        }, 0.0, kTail, stack.featureWavenumbers(omega), Math.PI / b,
                SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE, 0.0, out);
        double amplitude = 1.0 / Math.sqrt(kz * kx);
        double x2 = x * x;
        double x4 = x2 * x2;
        double thermal = omega * c * b * b / kx;
        double tailRe = amplitude * (1.0 / (4 * x2) - 3.0 / (8 * x4));
        double tailIm = -amplitude * thermal / (16 * x4);
        out[0] = (out[0] + tailRe) / Math.PI;
        out[1] = (out[1] + tailIm) / Math.PI;
        Geometries.requireFinite(out, "line", frequencyHz);
    }
}
