package lab.example.linepair;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import lamella.api.BottomBoundary;
import lamella.api.GeometryModel;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.Parameters;
import lamella.api.Stack;
import lamella.engine.LayeredStack;
import org.junit.jupiter.api.Test;

/** Physics checks of the line pair on a half-space, each against a published closed form. */
class LinePairTest {

    /** Conductivity and volumetric heat capacity of a glass (inputs only; the checks hold for any values). */
    static final double LAMBDA = 1.36;
    static final double C = 1.63e6;
    static final double DIFFUSIVITY = LAMBDA / C;
    static final double EULER_GAMMA = 0.5772156649015329;
    static final Stack GLASS = new Stack(List.of(Layer.isotropicInPlane("glass", Double.POSITIVE_INFINITY, LAMBDA,
            LAMBDA, C)), BottomBoundary.SEMI_INFINITE);

    static GeometryModel pair(Stack stack, double heater, double sensor, double spacing) throws InputException {
        return new LinePair().bind(Parameters.of("geometry", Map.of(LinePair.HEATER_HALF_WIDTH, heater,
                LinePair.SENSOR_HALF_WIDTH, sensor, LinePair.SPACING, spacing), Map.of()), new LayeredStack(stack));
    }

    static double[] at(GeometryModel m, double frequencyHz) {
        double[] out = new double[2];
        m.at(frequencyHz, out);
        return out;
    }

    /**
     * Cahill, Rev. Sci. Instrum. 61, 802 (1990), eq. 2, for a heater much narrower than the thermal wavelength
     * (b|q| ≪ 1): πΛ ΔT/(P/l) ≈ ½ ln(D/b²) + 0.923 − ½ ln(2ω) − iπ/4, heating at 2ω. It is the small-argument
     * line-source temperature K₀(qr) ≈ −ln(qr/2) − γ (Carslaw & Jaeger, §10.4) averaged over heater and reader:
     * πΛ H ≈ −ln(q/2) − γ − ⟨ln|x − x'|⟩. For one strip read by itself ⟨ln|x − x'|⟩ = ln(2b) − 3/2, which gives
     * Cahill's constant 3/2 − γ = 0.9228. For two strips the mean logarithm is larger, and it falls back to the
     * single strip's as the spacing closes; the spacing here goes down to nearly touching strips.
     */
    @Test
    void narrowStripsCloseTogetherFollowCahillsHeaterFormulaShiftedByTheirMeanDistance() throws InputException {
        double b = 1e-6;
        assertEquals(Math.log(2 * b) - 1.5, meanLogDistance(b, b, 0.0), 1e-12,
                "the mean logarithm of one strip with itself, which gives Cahill's 0.923");
        assertEquals(0.923, 1.5 - EULER_GAMMA, 5e-4, "Cahill's constant");
        // {sensor half-width, spacing} beside a heater of half-width b; the narrower sensor tells the widths apart.
        double[][] sensors = {{b, 2.05 * b}, {b, 3 * b}, {b, 6 * b}, {0.4 * b, 1.5 * b}};
        for (double[] sensor : sensors) {
            GeometryModel m = pair(GLASS, b, sensor[0], sensor[1]);
            double shift = meanLogDistance(b, sensor[0], sensor[1]) - meanLogDistance(b, b, 0.0);
            for (double f : new double[] {0.0625, 0.25, 1}) {
                double omega = 2 * Math.PI * f;
                double cahill = 0.5 * Math.log(DIFFUSIVITY / (b * b)) + 0.923 - 0.5 * Math.log(omega);
                double re = (cahill - shift) / (Math.PI * LAMBDA);
                double im = -0.25 / LAMBDA;
                double[] h = at(m, f);
                String where = "b_s=" + sensor[0] + ", s=" + sensor[1] + ", f=" + f;
                // The expansion leaves out terms of order (|q|(s + 2b))², here below 5e-4.
                assertEquals(re, h[0], 2e-3 * re, "in-phase at " + where);
                assertEquals(im, h[1], 2e-3 * Math.abs(im), "out-of-phase at " + where);
            }
        }
    }

    /**
     * Carslaw & Jaeger, Conduction of Heat in Solids, 2nd ed. (1959), §10.4: a continuous line source of power
     * P e^{iωt} per unit length in an infinite solid gives θ = P/(2πΛ) K₀(qr), q = √(iω/D); on the surface of a
     * half-space the temperature is doubled, H = K₀(qs)/(πΛ). Narrow strips far apart (b/s ≤ 1/80) are such lines.
     */
    @Test
    void stripsFarApartActAsLineSourceAndReaderAndTheInPhasePartFallsWithSpacing() throws InputException {
        double b = 0.5e-6;
        for (double f : new double[] {1, 10}) {
            double q = Math.sqrt(2 * Math.PI * f / DIFFUSIVITY);
            double previous = Double.POSITIVE_INFINITY;
            for (double spacing : new double[] {40e-6, 80e-6, 160e-6}) {
                double[] k0 = besselK0(q * spacing * Math.sqrt(0.5), q * spacing * Math.sqrt(0.5));
                double[] h = at(pair(GLASS, b, b, spacing), f);
                double magnitude = Math.hypot(k0[0], k0[1]) / (Math.PI * LAMBDA);
                String where = "s=" + spacing + ", f=" + f + ", |q|s=" + q * spacing;
                // The strips' widths shift the result by about (b/s)²/3 relative.
                assertEquals(k0[0] / (Math.PI * LAMBDA), h[0], 2e-4 * magnitude, "in-phase at " + where);
                assertEquals(k0[1] / (Math.PI * LAMBDA), h[1], 2e-4 * magnitude, "out-of-phase at " + where);
                assertTrue(h[0] < previous, "the in-phase temperature must fall with spacing at " + where);
                previous = h[0];
            }
        }
    }

    /** The oracle of the test above against Abramowitz & Stegun, Tables 9.8 and 9.12 (K₀(1), ker 1, kei 1; from memory). */
    @Test
    void theBesselOracleReproducesTabulatedValues() {
        double[] real = besselK0(1, 0);
        assertEquals(0.421024438240708, real[0], 1e-12);
        assertEquals(0.0, real[1], 1e-15);
        double[] kelvin = besselK0(Math.sqrt(0.5), Math.sqrt(0.5));
        assertEquals(0.286706208728316, kelvin[0], 1e-12, "ker 1");
        assertEquals(-0.494994636518720, kelvin[1], 1e-12, "kei 1");
    }

    /** A film of the substrate's own material changes nothing (common practice, no source): the layered path. */
    @Test
    void aFilmOfTheSubstratesOwnMaterialChangesNothing() throws InputException {
        Stack twoOfOne = new Stack(List.of(Layer.isotropicInPlane("film", 2e-7, LAMBDA, LAMBDA, C),
                Layer.isotropicInPlane("glass", Double.POSITIVE_INFINITY, LAMBDA, LAMBDA, C)),
                BottomBoundary.SEMI_INFINITE);
        for (double f : new double[] {10, 1e4}) {
            double[] one = at(pair(GLASS, 5e-6, 2e-6, 2e-5), f);
            double[] two = at(pair(twoOfOne, 5e-6, 2e-6, 2e-5), f);
            assertEquals(0, Math.hypot(one[0] - two[0], one[1] - two[1]) / Math.hypot(one[0], one[1]), 1e-7);
        }
    }

    @Test
    void touchingStripsAreRejectedAtTheSpacing() {
        InputException e = assertThrows(InputException.class, () -> pair(GLASS, 5e-6, 2e-6, 7e-6));
        assertEquals("geometry.spacing_m", e.path());
        assertTrue(e.getMessage().contains("7.0E-6 m apart"), e.getMessage());
    }

    @Test
    void noSteadyStateWithoutAnIsothermalBottom() throws InputException {
        GeometryModel m = pair(GLASS, 5e-6, 2e-6, 2e-5);
        ModelEvaluationException e = assertThrows(ModelEvaluationException.class, () -> at(m, 0.0));
        assertTrue(e.getMessage().contains("isothermal"), e.getMessage());
    }

    /**
     * ⟨ln|x' − x|⟩ for x uniform over the heater [−b_h, b_h] and x' over the sensor [s − b_s, s + b_s], from the
     * second antiderivative G(u) = u² ln|u|/2 − 3u²/4 of ln|u|.
     */
    static double meanLogDistance(double heater, double sensor, double spacing) {
        double sum = g(spacing + sensor + heater) - g(spacing + sensor - heater) - g(spacing - sensor + heater)
                + g(spacing - sensor - heater);
        return sum / (4 * heater * sensor);
    }

    private static double g(double u) {
        return u == 0 ? 0 : u * u * Math.log(Math.abs(u)) / 2 - 0.75 * u * u;
    }

    /**
     * K₀(z) for Re z > 0 from K₀(z) = ∫₀^∞ exp(−z cosh t) dt (Abramowitz & Stegun, Handbook of Mathematical
     * Functions, 1964, 9.6.24; from memory), by the trapezoidal rule, which converges geometrically for this analytic, doubly
     * exponentially decaying integrand; cut where exp(−Re z cosh t) < e^{−60}.
     */
    static double[] besselK0(double re, double im) {
        double h = 1e-3;
        double end = acosh(60 / re);
        double sr = 0.5 * Math.exp(-re) * Math.cos(im);
        double si = -0.5 * Math.exp(-re) * Math.sin(im);
        for (double t = h; t < end; t += h) {
            double c = Math.cosh(t);
            double decay = Math.exp(-re * c);
            sr += decay * Math.cos(im * c);
            si -= decay * Math.sin(im * c);
        }
        return new double[] {sr * h, si * h};
    }

    private static double acosh(double x) {
        return Math.log(x + Math.sqrt(x * x - 1));
    }
}
