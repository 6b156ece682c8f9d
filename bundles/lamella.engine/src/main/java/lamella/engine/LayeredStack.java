package lamella.engine;

import java.util.Arrays;
import java.util.List;
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
 * <p>With layers above the heated plane (the top of {@code layers[0]}), the same reduction runs over them from the
 * top condition down to the plane, 1/G of each above layer's boundary toward the plane added on the way. The plane's
 * temperature is common to both sides and the heat divides between them, so their admittances add:
 * 1/Z = 1/Z_below + 1/Z_above (the two-sided form of Schmidt, Cheaito &amp; Chiesa, Rev. Sci. Instrum. 80, 094901,
 * 2009, written as impedances). With no layers above the result is the one-sided reduction, unchanged.
 *
 * <p>When the pump heats and the probe reads over a depth of the first layer ({@link lamella.api.OpticalDepths}),
 * both sides are reduced to that layer's faces and {@link DepthWeighting} integrates the layer's Green's function
 * over the two depth profiles.
 *
 * <p>Immutable; no allocation per evaluation.
 */
public final class LayeredStack implements StackKernel {

    /** Below exp(−40) ≈ 4e-18 the deep part of a layer no longer matters to double precision. */
    private static final double OPAQUE = 40.0;
    /** Feature wavenumbers closer than this ratio are reported once. */
    private static final double FEATURE_SEPARATION = 2.0;

    private final Stack stack;
    private final Side below;
    /** The layers above the heated plane, or null when heat flows only downward. */
    private final Side above;
    /** 1/G between the heated plane and the first layer above it, m² K/W (0 for perfect contact). */
    private final double resistanceAbove;
    /** Heating and reading over a depth of the first layer, or null when both are at the plane. */
    private final DepthWeighting depth;
    /** Why a radial (axisymmetric) response cannot be given, or null when every layer is in-plane isotropic. */
    private final String notAxisymmetric;

    /**
     * One side of the heated plane, layers from it outward; {@code resistanceOutward[i]} is 1/G between layer i and
     * layer i + 1 (0 for perfect contact), and {@code end} the condition beyond the outermost layer.
     */
    private record Side(int n, double[] thickness, double[] kz, double[] xOverZ, double[] yOverZ, double[] cOverZ,
                        double[] resistanceOutward, BottomBoundary end) {

        static Side of(List<Layer> layers, BottomBoundary end, boolean conductanceTowardPlane) {
            int n = layers.size();
            Side s = new Side(n, new double[n], new double[n], new double[n], new double[n], new double[n],
                    new double[n], end);
            for (int i = 0; i < n; i++) {
                Layer l = layers.get(i);
                s.thickness[i] = l.thickness();
                s.kz[i] = l.kThrough();
                s.xOverZ[i] = l.kInPlaneX() / l.kThrough();
                s.yOverZ[i] = l.kInPlaneY() / l.kThrough();
                s.cOverZ[i] = l.heatCapacity() / l.kThrough();
                // below the plane a layer's G faces the next layer out; above it, the one toward the plane
                Layer outer = conductanceTowardPlane ? (i + 1 < n ? layers.get(i + 1) : null) : l;
                s.resistanceOutward[i] = outer == null || outer.hasPerfectContactBelow() ? 0.0
                        : 1.0 / outer.conductanceBelow();
            }
            return s;
        }
    }

    public LayeredStack(Stack stack) {
        this.stack = stack;
        this.below = Side.of(stack.layers(), stack.bottom(), false);
        if (stack.heatsBothWays()) {
            this.above = Side.of(stack.above(), stack.top(), true);
            Layer first = stack.above().get(0);
            this.resistanceAbove = first.hasPerfectContactBelow() ? 0.0 : 1.0 / first.conductanceBelow();
        } else {
            this.above = null;
            this.resistanceAbove = 0.0;
        }
        this.depth = stack.optics().inDepth() ? new DepthWeighting(stack.optics(), below.thickness[0]) : null;
        this.notAxisymmetric = stack.allLayers().stream().filter(l -> !l.isInPlaneIsotropic()).findFirst()
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

    /**
     * The half-space of the top layer's material; with layers above the heated plane, in parallel with the
     * half-space of the first of them behind its boundary resistance — the limit that both sides' responses reach
     * once the deeper layers no longer show.
     */
    @Override
    public void topHalfSpaceRadialResponse(double k, double omega, double[] out) {
        requireAxisymmetric();
        if (depth != null) {
            throw new ModelEvaluationException("a stack heated or read over a depth of its first layer has no"
                    + " half-space limit in closed form; a geometry refuses such a stack in bind or integrates"
                    + " the response itself");
        }
        halfSpace(below, 0, k * k, omega, out);
        if (above == null) {
            return;
        }
        double dr = out[0];
        double di = out[1];
        halfSpace(above, 0, k * k, omega, out);
        parallel(dr, di, out[0] + resistanceAbove, out[1], out);
    }

    private static void halfSpace(Side s, int i, double k2, double omega, double[] out) {
        double a = s.xOverZ[i] * k2;
        double b = omega * s.cOverZ[i];
        double r = Math.sqrt(a * a + b * b);
        double qr = Math.sqrt(0.5 * (r + a));
        double qi = qr > 0 ? 0.5 * b / qr : 0.0;
        double gr = s.kz[i] * qr;
        double gi = s.kz[i] * qi;
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
        if (depth != null) {
            evaluateInDepth(sx2, sy2, omega, out);
            return;
        }
        reduce(below, 0, sx2, sy2, omega, out);
        if (above == null) {
            return;
        }
        double dr = out[0];
        double di = out[1];
        reduce(above, 0, sx2, sy2, omega, out);
        parallel(dr, di, out[0] + resistanceAbove, out[1], out);
    }

    /**
     * The first layer heated and read over depths: the layers below it and those above the plane enter through
     * the reflection factors of its two faces (see {@link DepthWeighting}).
     */
    private void evaluateInDepth(double sx2, double sy2, double omega, double[] out) {
        double a = below.xOverZ[0] * sx2 + below.yOverZ[0] * sy2;
        double b = omega * below.cOverZ[0];
        double r = Math.sqrt(a * a + b * b);
        double qr = Math.sqrt(0.5 * (r + a));
        double qi = qr > 0 ? 0.5 * b / qr : 0.0;
        double gr = below.kz[0] * qr;
        double gi = below.kz[0] * qi;
        double rbr;
        double rbi;
        if (below.n > 1) {
            reduce(below, 1, sx2, sy2, omega, out);
            reflection(gr, gi, out[0] + below.resistanceOutward[0], out[1], out);
            rbr = out[0];
            rbi = out[1];
        } else {
            // one layer: its own bottom condition (unused when it is semi-infinite)
            rbr = below.end == BottomBoundary.ISOTHERMAL ? -1.0 : below.end == BottomBoundary.ADIABATIC ? 1.0 : 0.0;
            rbi = 0.0;
        }
        double rar = 1.0;
        double rai = 0.0;
        if (above != null) {
            reduce(above, 0, sx2, sy2, omega, out);
            reflection(gr, gi, out[0] + resistanceAbove, out[1], out);
            rar = out[0];
            rai = out[1];
        }
        depth.response(qr, qi, gr, gi, rar, rai, rbr, rbi, out);
    }

    /** ρ = (γZ − 1)/(γZ + 1) of a face that sees impedance Z; 1 (adiabatic) where Z is infinite. */
    private static void reflection(double gr, double gi, double zr, double zi, double[] out) {
        if (!Double.isFinite(zr) || !Double.isFinite(zi)) {
            out[0] = 1.0;
            out[1] = 0.0;
            return;
        }
        double ur = gr * zr - gi * zi;
        double ui = gr * zi + gi * zr;
        double nr = ur - 1;
        double dr = ur + 1;
        double m = dr * dr + ui * ui;
        out[0] = (nr * dr + ui * ui) / m;
        out[1] = (ui * dr - nr * ui) / m;
    }

    /**
     * Two impedances seen from one plane: their admittances add, 1/Z = 1/Z₁ + 1/Z₂. An infinite impedance (an
     * adiabatic side at zero wavenumber and frequency) takes no heat and leaves the other.
     */
    static void parallel(double ar, double ai, double br, double bi, double[] out) {
        boolean aOpen = !Double.isFinite(ar) || !Double.isFinite(ai);
        boolean bOpen = !Double.isFinite(br) || !Double.isFinite(bi);
        if (aOpen || bOpen) {
            out[0] = aOpen ? br : ar;
            out[1] = aOpen ? bi : ai;
            return;
        }
        // Z₁ Z₂ / (Z₁ + Z₂)
        double pr = ar * br - ai * bi;
        double pi = ar * bi + ai * br;
        double sr = ar + br;
        double si = ai + bi;
        double m = sr * sr + si * si;
        out[0] = (pr * sr + pi * si) / m;
        out[1] = (pi * sr - pr * si) / m;
    }

    /** The impedance of one side at the top face of its layer {@code first}, from its outermost layer inward. */
    private static void reduce(Side s, int first, double sx2, double sy2, double omega, double[] out) {
        int i = s.n - 1;
        double[] thickness = s.thickness;
        double[] kz = s.kz;
        // outermost layer
        double a = s.xOverZ[i] * sx2 + s.yOverZ[i] * sy2;
        double b = omega * s.cOverZ[i];
        double r = Math.sqrt(a * a + b * b);
        double qr = Math.sqrt(0.5 * (r + a));
        double qi = qr > 0 ? 0.5 * b / qr : 0.0;
        double gr = kz[i] * qr;
        double gi = kz[i] * qi;
        double zr;
        double zi;
        if (s.end == BottomBoundary.SEMI_INFINITE) {
            double inverse = 1 / (gr * gr + gi * gi);
            zr = gr * inverse;
            zi = -gi * inverse;
        } else {
            tanh(qr * thickness[i], qi * thickness[i], out);
            double tr = out[0];
            double ti = out[1];
            if (s.end == BottomBoundary.ISOTHERMAL) {
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
        for (i = s.n - 2; i >= first; i--) {
            zr += s.resistanceOutward[i];
            a = s.xOverZ[i] * sx2 + s.yOverZ[i] * sy2;
            b = omega * s.cOverZ[i];
            r = Math.sqrt(a * a + b * b);
            qr = Math.sqrt(0.5 * (r + a));
            qi = qr > 0 ? 0.5 * b / qr : 0.0;
            gr = kz[i] * qr;
            gi = kz[i] * qi;
            // u = γ Z_below
            double ur = gr * zr - gi * zi;
            double ui = gr * zi + gi * zr;
            // with t = (1 − e)/(1 + e), e = exp(−2qd): Z = (1 + u − e(1 − u)) / (γ (1 + u + e(1 − u))), one division
            double er = 0.0;
            double ei = 0.0;
            double x2 = 2 * qr * thickness[i];
            if (x2 <= OPAQUE) {
                double mag = Math.exp(-x2);
                // cos 2y and sin 2y from one tangent, t = tan y: (1 − t²)/(1 + t²) and 2t/(1 + t²); the tangent of
                // a finite double stays below 2e16, so t² cannot overflow
                double t = Math.tan(qi * thickness[i]);
                double over = mag / (1 + t * t);
                double cr = (1 - t * t) * over;
                double ci = -2 * t * over;
                // e (1 − u)
                er = cr * (1 - ur) + ci * ui;
                ei = ci * (1 - ur) - cr * ui;
            }
            double nr = 1 + ur - er;
            double ni = ui - ei;
            double wr = 1 + ur + er;
            double wi = ui + ei;
            double dr = gr * wr - gi * wi;
            double di = gr * wi + gi * wr;
            double inverse = 1 / (dr * dr + di * di);
            zr = (nr * dr + ni * di) * inverse;
            zi = (ni * dr - nr * di) * inverse;
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
        int total = below.n + (above == null ? 0 : above.n);
        double[] w = new double[4 * total];
        int c = features(below, omega, w, 0);
        if (above != null) {
            c = features(above, omega, w, c);
            if (resistanceAbove > 0) {
                w[c++] = 1.0 / (resistanceAbove * above.kz[0] * Math.sqrt(above.xOverZ[0]));
            }
        }
        if (depth != null) {
            double[] optical = depth.wavenumbers();
            w = Arrays.copyOf(w, c + optical.length);
            for (double o : optical) {
                w[c++] = o;
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

    private static int features(Side s, double omega, double[] w, int c) {
        for (int i = 0; i < s.n; i++) {
            // where the in-plane term Λx k² meets ωC: the thermal penetration depth, in-plane
            if (omega > 0) {
                w[c++] = Math.sqrt(omega * s.cOverZ[i] / s.xOverZ[i]);
            }
            // where q d ≈ 1 from the in-plane term: the layer's thickness, scaled for anisotropy
            if (Double.isFinite(s.thickness[i])) {
                w[c++] = 1.0 / (s.thickness[i] * Math.sqrt(s.xOverZ[i]));
            }
            // where the interface resistance matches the spreading resistance of the next layer out
            if (s.resistanceOutward[i] > 0 && i + 1 < s.n) {
                w[c++] = 1.0 / (s.resistanceOutward[i] * s.kz[i + 1] * Math.sqrt(s.xOverZ[i + 1]));
            }
        }
        return c;
    }
}
