package lamella.geometry.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.Parameters;
import lamella.api.Stack;
import lamella.engine.LayeredStack;
import org.junit.jupiter.api.Test;

/**
 * The heater as a lumped body of its own: heat capacity (ρc d)_h and a boundary resistance R to the sample
 * (Borca-Tasciuc, Kumar & Chen, Rev. Sci. Instrum. 72, 2139, 2001).
 */
class HeaterMassTest {

    static final double B = 5e-6;
    /** A 400 nm gold strip, 2.5e6 J/(m³ K) (Incropera & DeWitt, Appendix A, gold at 300 K: ρ c ≈ 19300 × 129). */
    static final double GOLD_D = 4e-7;
    static final double GOLD_C = 2.49e6;
    static final double R = 2e-8;

    static GeometryModel line(Stack s, double b, Map<String, Double> heater) throws InputException {
        Map<String, Double> n = new HashMap<>(Map.of(LineHeater.HALF_WIDTH, b));
        n.putAll(heater);
        return new LineHeater().bind(Parameters.of("geometry", n, Map.of()), new LayeredStack(s));
    }

    static double[] at(GeometryModel m, double f) {
        double[] out = new double[2];
        m.at(f, out);
        return out;
    }

    /** With no heat capacity and no boundary resistance the heater reads the sample's response itself, bit for bit. */
    @Test
    void aMasslessHeaterInPerfectContactIsTodaysModel() throws InputException {
        GeometryModel plain = line(LineHeaterTest.GLASS, B, Map.of());
        GeometryModel zero = line(LineHeaterTest.GLASS, B, Map.of(LineHeater.HEATER_THICKNESS, 0.0,
                LineHeater.HEATER_HEAT_CAPACITY, GOLD_C, LineHeater.BOUNDARY_RESISTANCE, 0.0));
        for (double f : new double[] {20, 2e3, 2e5}) {
            double[] a = at(plain, f);
            double[] b = at(zero, f);
            assertEquals(a[0], b[0], 0.0);
            assertEquals(a[1], b[1], 0.0);
        }
    }

    /** A boundary resistance alone adds R/(2b) in series, exactly: the heat crosses the strip's width 2b. */
    @Test
    void aBoundaryResistanceAloneAddsItsShareInSeries() throws InputException {
        GeometryModel plain = line(LineHeaterTest.GLASS, B, Map.of());
        GeometryModel resisted = line(LineHeaterTest.GLASS, B, Map.of(LineHeater.BOUNDARY_RESISTANCE, R));
        for (double f : new double[] {20, 2e3, 2e5}) {
            double[] a = at(plain, f);
            double[] b = at(resisted, f);
            assertEquals(a[0] + R / (2 * B), b[0], 0.0);
            assertEquals(a[1], b[1], 0.0);
        }
    }

    /**
     * Borca-Tasciuc, Kumar & Chen (2001): the heater's admittance iω (ρc d)_h 2b per unit length in parallel with
     * the series of R/(2b) and the sample's H, 1/H_h = iω (ρc d)_h 2b + 1/(H + R/(2b)), to rounding.
     */
    @Test
    void theHeaterIsItsAdmittanceInParallelWithTheSample() throws InputException {
        GeometryModel plain = line(LineHeaterTest.GLASS, B, Map.of());
        GeometryModel heavy = line(LineHeaterTest.GLASS, B, Map.of(LineHeater.HEATER_THICKNESS, GOLD_D,
                LineHeater.HEATER_HEAT_CAPACITY, GOLD_C, LineHeater.BOUNDARY_RESISTANCE, R));
        for (double f : new double[] {20, 2e3, 2e5}) {
            double[] h = at(plain, f);
            double[] hh = at(heavy, f);
            double sRe = h[0] + R / (2 * B);
            double sIm = h[1];
            double s2 = sRe * sRe + sIm * sIm;
            double yRe = sRe / s2;
            double yIm = -sIm / s2 + 2 * Math.PI * f * GOLD_D * GOLD_C * 2 * B;
            double y2 = yRe * yRe + yIm * yIm;
            double scale = Math.hypot(hh[0], hh[1]);
            assertEquals(yRe / y2, hh[0], 1e-12 * scale, "in-phase at " + f + " Hz");
            assertEquals(-yIm / y2, hh[1], 1e-12 * scale, "out-of-phase at " + f + " Hz");
        }
    }

    /**
     * A heater 2 mm wide on a 200 nm film over glass at 100 kHz (penetration depth ≈ 1 µm ≪ b) is one-dimensional:
     * 2b H_h equals the lumped heater on the film's 1-D impedance, T_h/q = (Z + R)/(1 + iω (ρc d)_h (Z + R)), with
     * Z = (Z_s + tanh(q d)/(Λ q)) / (1 + Λ q Z_s tanh(q d)) and Z_s = 1/(Λ_s q_s) (Carslaw & Jaeger, 2nd ed.,
     * 1959, periodic heating of a slab on a half-space). The edges are worth ~λ/b.
     */
    @Test
    void aWideHeaterOnAThinFilmIsOneDimensional() throws InputException {
        double kf = 0.2;
        double cf = 2.0e6;
        double df = 2e-7;
        Stack film = new Stack(List.of(Layer.isotropicInPlane("film", df, kf, kf, cf),
                Layer.isotropicInPlane("glass", Double.POSITIVE_INFINITY, LineHeaterTest.LAMBDA, LineHeaterTest.LAMBDA,
                        LineHeaterTest.C)), BottomBoundary.SEMI_INFINITE);
        double b = 1e-3;
        double f = 1e5;
        double w = 2 * Math.PI * f;
        double[] hh = at(line(film, b, Map.of(LineHeater.HEATER_THICKNESS, GOLD_D, LineHeater.HEATER_HEAT_CAPACITY,
                GOLD_C, LineHeater.BOUNDARY_RESISTANCE, R)), f);
        double[] z = filmOnHalfSpace(kf, cf, df, LineHeaterTest.LAMBDA, LineHeaterTest.C, w);
        double nRe = z[0] + R;
        double nIm = z[1];
        double m = GOLD_D * GOLD_C;
        double dRe = 1 - w * m * nIm;
        double dIm = w * m * nRe;
        double d2 = dRe * dRe + dIm * dIm;
        double oneRe = (nRe * dRe + nIm * dIm) / d2;
        double oneIm = (nIm * dRe - nRe * dIm) / d2;
        double scale = Math.hypot(oneRe, oneIm);
        assertEquals(oneRe, 2 * b * hh[0], 1e-3 * scale, "in-phase");
        assertEquals(oneIm, 2 * b * hh[1], 1e-3 * scale, "out-of-phase");
        // The heater's mass matters here: the film's own impedance alone is far off.
        assertTrue(Math.hypot(z[0] + R - oneRe, z[1] - oneIm) > 0.3 * scale);
    }

    /** Z(k = 0) of a film on a half-space, per unit area; q = √(iωC/Λ). */
    private static double[] filmOnHalfSpace(double kf, double cf, double df, double ks, double cs, double w) {
        double[] qf = sqrtI(w * cf / kf);
        double[] qs = sqrtI(w * cs / ks);
        double[] zs = inverse(ks * qs[0], ks * qs[1]);
        double[] th = tanh(qf[0] * df, qf[1] * df);
        double[] lq = {kf * qf[0], kf * qf[1]};
        double[] thOverLq = divide(th, lq);
        double[] num = {zs[0] + thOverLq[0], zs[1] + thOverLq[1]};
        double[] lqzs = multiply(lq, zs);
        double[] lqzsth = multiply(lqzs, th);
        double[] den = {1 + lqzsth[0], lqzsth[1]};
        return divide(num, den);
    }

    /** √(i a) for a > 0. */
    private static double[] sqrtI(double a) {
        double r = Math.sqrt(a / 2);
        return new double[] {r, r};
    }

    private static double[] tanh(double re, double im) {
        double d = Math.cosh(2 * re) + Math.cos(2 * im);
        return new double[] {Math.sinh(2 * re) / d, Math.sin(2 * im) / d};
    }

    private static double[] multiply(double[] a, double[] b) {
        return new double[] {a[0] * b[0] - a[1] * b[1], a[0] * b[1] + a[1] * b[0]};
    }

    private static double[] inverse(double re, double im) {
        double d = re * re + im * im;
        return new double[] {re / d, -im / d};
    }

    private static double[] divide(double[] a, double[] b) {
        return multiply(a, inverse(b[0], b[1]));
    }

    /** The heat capacity needs both the thickness and the volumetric heat capacity: the missing one is named. */
    @Test
    void theHeatCapacityNeedsBothKeys() {
        InputException noC = assertThrows(InputException.class,
                () -> line(LineHeaterTest.GLASS, B, Map.of(LineHeater.HEATER_THICKNESS, GOLD_D)));
        assertEquals("geometry.heater_heat_capacity_j_m3k", noC.path());
        assertTrue(noC.problem().startsWith("missing; the heater's heat capacity needs both heater_thickness_m and"
                + " heater_heat_capacity_j_m3k"), noC.problem());
        InputException noD = assertThrows(InputException.class,
                () -> line(LineHeaterTest.GLASS, B, Map.of(LineHeater.HEATER_HEAT_CAPACITY, GOLD_C)));
        assertEquals("geometry.heater_thickness_m", noD.path());
    }
}
