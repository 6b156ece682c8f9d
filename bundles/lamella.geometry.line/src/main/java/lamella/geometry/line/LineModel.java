package lamella.geometry.line;

import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.Stack;
import lamella.api.StackKernel;
import lamella.engine.Geometries;
import lamella.engine.SpectralQuadrature;
import lamella.engine.TopLayer;

/**
 * The bound line-heater response; see {@link LineHeater}. The integral runs numerically up to a wavenumber K with
 * K·b a whole number of half-periods of sin²(kb), beyond which the stack acts as the top layer's half-space,
 * Z∞ = 1/√(Λz(Λx k² + iωC)); that tail is summed from its asymptotic expansion
 * ∫_X^∞ sin²u/u³ du = 1/(4X²) − 3/(8X⁴) + O(X⁻⁶) at X = Kb = mπ, with the first correction in iωC/(Λx k²). With
 * layers above the heated plane or heating over a depth the tail is integrated from the kernel instead
 * ({@link #numericTail}). A heater of its own heat capacity or behind a boundary resistance then turns that sample
 * response into the heater's own temperature ({@link #heaterTemperature}).
 */
final class LineModel implements GeometryModel {

    /** At least this many half-periods of sin²(kb) are integrated numerically. */
    private static final int MIN_HALF_PERIODS = 100;
    /** K is at least this multiple of |a| = √(ωC/Λx), so the tail's expansion in a²/k² holds. */
    private static final double TAIL_OVER_THERMAL = 30.0;
    /** The two-sided tail's integrand in t = K/k has no features inside (0, 1]. */
    private static final double[] NO_BREAKS = new double[0];

    private final StackKernel stack;
    private final double b;
    private final double kz;
    private final double kx;
    private final double c;
    private final double kHalfSpace;
    /** The heater's heat capacity per unit area (ρc d)_h, J/(m² K). */
    private final double heaterMass;
    /** The heater–sample boundary resistance, m² K/W. */
    private final double boundaryResistance;
    private final ValidBand band;

    LineModel(StackKernel stack, double halfWidth, double length, double heaterMass, double boundaryResistance) {
        this.stack = stack;
        this.b = halfWidth;
        this.band = new ValidBand(stack.stack(), halfWidth, length);
        this.heaterMass = heaterMass;
        this.boundaryResistance = boundaryResistance;
        Layer top = stack.stack().layers().get(0);
        this.kz = top.kThrough();
        this.kx = top.kInPlaneX();
        this.c = top.heatCapacity();
        this.kHalfSpace = TopLayer.halfSpaceWavenumber(stack.stack());
    }

    @Override
    public void at(double frequencyHz, double[] out) {
        double omega = 2 * Math.PI * frequencyHz;
        Stack st = stack.stack();
        if (omega == 0 && st.bottom() != BottomBoundary.ISOTHERMAL
                && !(st.heatsBothWays() && st.top() == BottomBoundary.ISOTHERMAL)) {
            throw new ModelEvaluationException("geometry 'line': a line heater has no steady temperature unless the"
                    + " bottom (or the top above the heated plane) of the stack is isothermal (heat flow in two"
                    + " dimensions); use a frequency above zero");
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
        double x2 = x * x;
        double x4 = x2 * x2;
        double tailRe;
        double tailIm;
        if (st.heatsBothWays() || st.optics().inDepth()) {
            double mainRe = out[0];
            double mainIm = out[1];
            numericTail(omega, kTail, x4, q, z, out);
            tailRe = out[0];
            tailIm = out[1];
            out[0] = mainRe;
            out[1] = mainIm;
        } else {
            double amplitude = 1.0 / Math.sqrt(kz * kx);
            double thermal = omega * c * b * b / kx;
            tailRe = amplitude * (1.0 / (4 * x2) - 3.0 / (8 * x4));
            tailIm = -amplitude * thermal / (16 * x4);
        }
        out[0] = (out[0] + tailRe) / Math.PI;
        out[1] = (out[1] + tailIm) / Math.PI;
        heaterTemperature(omega, out);
        Geometries.requireFinite(out, "line", frequencyHz);
    }

    @Override
    public List<String> cautions(double[] heatingFrequenciesHz) {
        return band.cautions(heatingFrequenciesHz);
    }

    /**
     * The lumped heater (Borca-Tasciuc, Kumar & Chen, Rev. Sci. Instrum. 72, 2139, 2001): from the sample's
     * width-averaged response H per W/m to the heater's, H_h = (H + R/(2b)) / (1 + iω (ρc d)_h (R + 2b H)); the
     * heater's admittance iω (ρc d)_h 2b in parallel with the series of R/(2b) and H. Without either, H itself.
     */
    private void heaterTemperature(double omega, double[] h) {
        if (heaterMass == 0 && boundaryResistance == 0) {
            return;
        }
        double nRe = h[0] + boundaryResistance / (2 * b);
        double nIm = h[1];
        double wm = omega * heaterMass;
        double dRe = 1 - wm * 2 * b * h[1];
        double dIm = wm * (boundaryResistance + 2 * b * h[0]);
        double d2 = dRe * dRe + dIm * dIm;
        h[0] = (nRe * dRe + nIm * dIm) / d2;
        h[1] = (nIm * dRe - nRe * dIm) / d2;
    }

    /**
     * ∫_K^∞ Z(k) sin²(kb)/(kb)² dk when heat flows both ways or the first layer is heated over a depth, where Z beyond
     * K (the two half-spaces' parallel response with the boundary between them; a response that falls as 1/k² for
     * heat spread over depth) has no one-term asymptote. sin² = (1 − cos 2kb)/2: the mean
     * part ∫_K^∞ Z/(2b²k²) dk is smooth and is integrated exactly with k = K/t over t in (0, 1]; the oscillating
     * part is −(3/(8X⁴))·K·Z(K) at X = Kb a whole number of half-periods (by parts, as for the one-sided tail).
     */
    private void numericTail(double omega, double kTail, double x4, SpectralQuadrature q, double[] z,
                              double[] out) {
        q.integrate((t, o) -> {
            if (t == 0) {
                o[0] = 0;
                o[1] = 0;
                return;
            }
            stack.response(kTail / t, 0.0, omega, z);
            o[0] = z[0];
            o[1] = z[1];
        }, 0.0, 1.0, NO_BREAKS, 0.0, SpectralQuadrature.DEFAULT_RELATIVE_TOLERANCE, 0.0, out);
        double meanRe = out[0] / (2 * b * b * kTail);
        double meanIm = out[1] / (2 * b * b * kTail);
        stack.response(kTail, 0.0, omega, z);
        out[0] = meanRe - 3.0 / (8 * x4) * kTail * z[0];
        out[1] = meanIm - 3.0 / (8 * x4) * kTail * z[1];
    }
}
