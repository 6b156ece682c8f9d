package lamella.geometry.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
 * The usual 3ω band (Cahill, Rev. Sci. Instrum. 61, 802, 1990; the factors are common practice, no source):
 * λ = √(D/(2π·2f)) from about the heater's half-width up to a fifth of the substrate (and of the heater's length).
 * Glass, D = 1.36/1.63e6 m²/s: λ = 81.5 µm at f = 10 Hz, 258 µm at 1 Hz, 5.76 µm at 2 kHz, 2.58 µm at 10 kHz.
 */
class ValidBandTest {

    static final Stack SLIDE = new Stack(List.of(Layer.isotropicInPlane("glass", 1e-3, LineHeaterTest.LAMBDA,
            LineHeaterTest.LAMBDA, LineHeaterTest.C)), BottomBoundary.ISOTHERMAL);

    static GeometryModel heater(Stack s, Map<String, Double> keys) throws InputException {
        return new LineHeater().bind(Parameters.of("geometry", keys, Map.of()), new LayeredStack(s));
    }

    /** The response is read at 2f: the drive frequencies times two. */
    static double[] twice(double... drive) {
        double[] h = new double[drive.length];
        for (int i = 0; i < drive.length; i++) {
            h[i] = 2 * drive[i];
        }
        return h;
    }

    @Test
    void aRangeInsideTheBandHasNoCaution() throws InputException {
        GeometryModel m = heater(SLIDE, Map.of(LineHeater.HALF_WIDTH, 5e-6, LineHeater.LENGTH, 2e-3));
        assertEquals(List.of(), m.cautions(twice(10, 100, 2000)));
    }

    @Test
    void tooLowADriveFrequencyReachesTheBottomAndIsToldWithItsNumbers() throws InputException {
        List<String> c = heater(SLIDE, Map.of(LineHeater.HALF_WIDTH, 5e-6)).cautions(twice(1, 100, 2000));
        assertEquals(1, c.size(), c.toString());
        assertTrue(c.get(0).startsWith("at the lowest drive frequency, 1.00 Hz, the thermal penetration depth"
                + " λ = √(D/(2π·2f)) in the bottom layer 'glass' is 0.000258 m, more than a fifth of its thickness"
                + " 0.00100 m: outside the usual slope-method band"), c.get(0));
    }

    @Test
    void tooHighADriveFrequencyStaysUnderTheHeaterAndIsToldWithItsNumbers() throws InputException {
        List<String> c = heater(SLIDE, Map.of(LineHeater.HALF_WIDTH, 5e-6)).cautions(twice(10, 1e4));
        assertEquals(1, c.size(), c.toString());
        assertTrue(c.get(0).startsWith("at the highest drive frequency, 1.00e4 Hz, the thermal penetration depth"
                + " λ = √(D/(2π·2f)) across the heater in layer 'glass' is 2.58e-6 m, below the heater's half-width"
                + " 5.00e-6 m: outside the usual slope-method band (λ ≥ 5 half-widths"), c.get(0));
    }

    @Test
    void aSemiInfiniteBottomIsJudgedAgainstAUsualSubstrate() throws InputException {
        GeometryModel m = heater(LineHeaterTest.GLASS, Map.of(LineHeater.HALF_WIDTH, 5e-6));
        assertEquals(List.of(), m.cautions(twice(10)));
        List<String> c = m.cautions(twice(2));
        assertEquals(1, c.size(), c.toString());
        assertTrue(c.get(0).contains("in the semi-infinite bottom layer 'glass' is 0.000182 m, more than a fifth of"
                + " a 0.000500 m substrate"), c.get(0));
    }

    @Test
    void aShortHeaterIsToldWhenTheHeatSpreadsAlongIt() throws InputException {
        GeometryModel m = heater(LineHeaterTest.GLASS, Map.of(LineHeater.HALF_WIDTH, 2e-6, LineHeater.LENGTH,
                3e-4));
        List<String> c = m.cautions(twice(10));
        assertEquals(1, c.size(), c.toString());
        assertTrue(c.get(0).contains("is 8.15e-5 m, more than a fifth of the heater's length 0.000300 m: the heat"
                + " flow is no longer two-dimensional"), c.get(0));
    }
}
