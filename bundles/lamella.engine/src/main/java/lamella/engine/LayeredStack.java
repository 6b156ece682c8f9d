package lamella.engine;

import java.util.Arrays;
import lamella.api.BottomBoundary;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.Stack;
import lamella.api.StackKernel;

/**
 * The surface response of a layered stack to harmonic heating, in transform space.
 *
 * <p>In each layer the heat equation with conductivities Λx, Λy, Λz and volumetric heat capacity C becomes
 * d²θ/dz² = q²θ with q² = (Λx sx² + Λy sy² + iωC)/Λz. Instead of multiplying the 2×2 transfer matrices of each layer
 * (cosh, sinh form; Feldman, High Temp.–High Press. 31, 293, 1999; Cahill, Rev. Sci. Instrum. 75, 5119, 2004) we carry
 * the equivalent thermal impedance Z = θ/flux upward from the bottom:
 * Z_top = (γ Z_below + t) / (γ (1 + γ Z_below t)), with γ = Λz q and t = tanh(q d); an interface adds 1/G.
 * tanh is formed from exp(−2qd), whose magnitude never exceeds one, so thick layers at high frequency cannot
 * overflow: the matrix form's cosh(qd) for 1 mm of a 400 W m⁻¹ K⁻¹ solid at 100 MHz is about exp(1800).
 * Time dependence is exp(+iωt), so a lagging temperature has a negative imaginary part.
 *
 * <p>Immutable; no allocation per evaluation.
 */
public final class LayeredStack implements StackKernel {

    /** Below exp(−40) ≈ 4e-18 the deep part of a layer no longer matters to double precision. */
    private static final double OPAQUE = 40.0;
    /** Feature wavenumbers closer than this ratio are reported once. */
    private static final double FEATURE_SEPARATION = 2.0;

    private final Stack stack;
    private final int n;
    private final double[] thickness;
    private final double[] kz;
    private final double[] xOverZ;
    private final double[] yOverZ;
    private final double[] cOverZ;
    private final double[] resistanceBelow;
    private final BottomBoundary bottom;
    /** Why a radial (axisymmetric) response cannot be given, or null when every layer is in-plane isotropic. */
    private final String notAxisymmetric;

    public LayeredStack(Stack stack) {
        this.stack = stack;
        this.n = stack.layers().size();
        this.thickness = new double[n];
        this.kz = new double[n];
        this.xOverZ = new double[n];
        this.yOverZ = new double[n];
        this.cOverZ = new double[n];
        this.resistanceBelow = new double[n];
        this.bottom = stack.bottom();
        for (int i = 0; i < n; i++) {
            Layer l = stack.layers().get(i);
            thickness[i] = l.thickness();
            kz[i] = l.kThrough();
            xOverZ[i] = l.kInPlaneX() / l.kThrough();
            yOverZ[i] = l.kInPlaneY() / l.kThrough();
            cOverZ[i] = l.heatCapacity() / l.kThrough();
            resistanceBelow[i] = l.hasPerfectContactBelow() ? 0.0 : 1.0 / l.conductanceBelow();
        }
        this.notAxisymmetric = stack.layers().stream().filter(l -> !l.isInPlaneIsotropic()).findFirst()
                .map(l -> "a radial (axisymmetric) response was asked of a stack whose layer '" + l.name()
                        + "' conducts differently along x (" + l.kInPlaneX() + " W/mK) and y (" + l.kInPlaneY()
                        + " W/mK); an axisymmetric geometry refuses such a stack in bind"
                        + " (Geometries.requireInPlaneIsotropy), others integrate response(sx, sy, ω)")
                .orElse(null);
    }

    @Override
    public Stack stack() {
        return stack;
    }

    @Override
    public void response(double sx, double sy, double omega, double[] out) {
        evaluate(sx * sx, sy * sy, omega, out);
    }

    @Override
    public void radialResponse(double k, double omega, double[] out) {
        requireAxisymmetric();
        evaluate(k * k, 0.0, omega, out);
    }

    @Override
    public void topHalfSpaceRadialResponse(double k, double omega, double[] out) {
        requireAxisymmetric();
        double a = xOverZ[0] * k * k;
        double b = omega * cOverZ[0];
        double r = Math.sqrt(a * a + b * b);
        double qr = Math.sqrt(0.5 * (r + a));
        double qi = qr > 0 ? 0.5 * b / qr : 0.0;
        double gr = kz[0] * qr;
        double gi = kz[0] * qi;
        double m = gr * gr + gi * gi;
        out[0] = gr / m;
        out[1] = -gi / m;
    }

    private void requireAxisymmetric() {
        if (notAxisymmetric != null) {
            throw new ModelEvaluationException(notAxisymmetric);
        }
    }

    private void evaluate(double sx2, double sy2, double omega, double[] out) {
        int i = n - 1;
        // bottom layer
        double a = xOverZ[i] * sx2 + yOverZ[i] * sy2;
        double b = omega * cOverZ[i];
        double r = Math.sqrt(a * a + b * b);
        double qr = Math.sqrt(0.5 * (r + a));
        double qi = qr > 0 ? 0.5 * b / qr : 0.0;
        double gr = kz[i] * qr;
        double gi = kz[i] * qi;
        double zr;
        double zi;
        if (bottom == BottomBoundary.SEMI_INFINITE) {
            double m = gr * gr + gi * gi;
            zr = gr / m;
            zi = -gi / m;
        } else {
            tanh(qr * thickness[i], qi * thickness[i], out);
            double tr = out[0];
            double ti = out[1];
            if (bottom == BottomBoundary.ISOTHERMAL) {
                // Z = t / γ
                double m = gr * gr + gi * gi;
                zr = (tr * gr + ti * gi) / m;
                zi = (ti * gr - tr * gi) / m;
            } else {
                // adiabatic: Z = 1 / (γ t)
                double pr = gr * tr - gi * ti;
                double pi = gr * ti + gi * tr;
                double m = pr * pr + pi * pi;
                zr = pr / m;
                zi = -pi / m;
            }
        }
        for (i = n - 2; i >= 0; i--) {
            zr += resistanceBelow[i];
            a = xOverZ[i] * sx2 + yOverZ[i] * sy2;
            b = omega * cOverZ[i];
            r = Math.sqrt(a * a + b * b);
            qr = Math.sqrt(0.5 * (r + a));
            qi = qr > 0 ? 0.5 * b / qr : 0.0;
            gr = kz[i] * qr;
            gi = kz[i] * qi;
            tanh(qr * thickness[i], qi * thickness[i], out);
            double tr = out[0];
            double ti = out[1];
            // u = γ Z_below
            double ur = gr * zr - gi * zi;
            double ui = gr * zi + gi * zr;
            // numerator u + t, denominator γ (1 + u t)
            double nr = ur + tr;
            double ni = ui + ti;
            double wr = 1.0 + ur * tr - ui * ti;
            double wi = ur * ti + ui * tr;
            double dr = gr * wr - gi * wi;
            double di = gr * wi + gi * wr;
            double m = dr * dr + di * di;
            zr = (nr * dr + ni * di) / m;
            zi = (ni * dr - nr * di) / m;
        }
        out[0] = zr;
        out[1] = zi;
    }

    /** tanh(x + iy) for x ≥ 0, from e = exp(−2(x+iy)): tanh = (1 − e)/(1 + e). */
    static void tanh(double x, double y, double[] out) {
        if (2 * x > OPAQUE) {
            out[0] = 1.0;
            out[1] = 0.0;
            return;
        }
        double mag = Math.exp(-2 * x);
        double er = mag * Math.cos(2 * y);
        double ei = -mag * Math.sin(2 * y);
        double nr = 1 - er;
        double ni = -ei;
        double dr = 1 + er;
        double di = ei;
        double m = dr * dr + di * di;
        out[0] = (nr * dr + ni * di) / m;
        out[1] = (ni * dr - nr * di) / m;
    }

    @Override
    public double[] featureWavenumbers(double omega) {
        double[] w = new double[4 * n];
        int c = 0;
        for (int i = 0; i < n; i++) {
            // where the in-plane term Λx k² meets ωC: the thermal penetration depth, in-plane
            if (omega > 0) {
                w[c++] = Math.sqrt(omega * cOverZ[i] / xOverZ[i]);
            }
            // where q d ≈ 1 from the in-plane term: the layer's thickness, scaled for anisotropy
            if (Double.isFinite(thickness[i])) {
                w[c++] = 1.0 / (thickness[i] * Math.sqrt(xOverZ[i]));
            }
            // where the interface resistance matches the spreading resistance of the layer below
            if (resistanceBelow[i] > 0 && i + 1 < n) {
                w[c++] = 1.0 / (resistanceBelow[i] * kz[i + 1] * Math.sqrt(xOverZ[i + 1]));
            }
        }
        double[] s = Arrays.copyOf(w, c);
        Arrays.sort(s);
        // features closer than a factor of two share a panel: a break between them only costs evaluations
        int kept = 0;
        for (int i = 0; i < s.length; i++) {
            if (kept == 0 || s[i] > FEATURE_SEPARATION * s[kept - 1]) {
                s[kept++] = s[i];
            }
        }
        return Arrays.copyOf(s, kept);
    }
}
