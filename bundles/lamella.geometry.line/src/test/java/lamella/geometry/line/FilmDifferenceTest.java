package lamella.geometry.line;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
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

/** The differential method: the heater on a film sample minus the same heater on the reference without the film. */
class FilmDifferenceTest {

    static final double B = 1e-5;
    static final double D_FILM = 1e-7;
    static final double K_FILM = 1.0;
    static final Layer FILM = Layer.isotropicInPlane("oxide", D_FILM, K_FILM, K_FILM, 1.6e6);
    static final Layer SILICON = Layer.isotropicInPlane("silicon", Double.POSITIVE_INFINITY, 140, 140, 1.63e6);
    static final Stack SAMPLE = new Stack(List.of(FILM, SILICON), BottomBoundary.SEMI_INFINITE);

    static GeometryModel difference(Stack s, Map<String, Double> keys) throws InputException {
        return new FilmDifference().bind(Parameters.of("geometry", keys, Map.of()), new LayeredStack(s));
    }

    static double[] at(GeometryModel m, double f) {
        double[] out = new double[2];
        m.at(f, out);
        return out;
    }

    /**
     * Lee & Cahill, J. Appl. Phys. 81, 2590 (1997): a film thin against the heater's width and of low conductivity
     * against its substrate adds the 1-D rise ΔT_f = P d_f/(2b L Λ_f), in phase; per W/m, d_f/(2bΛ_f) = 5e-3 K m/W
     * for 100 nm of 1 W/(m K) under a 20 µm heater on silicon (140 W/(m K)). Checked to 1 % at 2f = 200 Hz–2 kHz,
     * where the film's heat capacity and the spreading in it are small.
     */
    @Test
    void aThinPoorlyConductingFilmAddsItsOneDimensionalResistance() throws InputException {
        GeometryModel m = difference(SAMPLE, Map.of(LineHeater.HALF_WIDTH, B));
        double expected = D_FILM / (2 * B * K_FILM);
        for (double f : new double[] {200, 2000}) {
            double[] h = at(m, f);
            assertEquals(expected, h[0], 0.01 * expected, "in-phase at " + f + " Hz");
            assertTrue(Math.abs(h[1]) < 0.05 * expected, "nearly in phase at " + f + " Hz: " + h[1]);
        }
    }

    /** The difference is exactly the line heater on the sample minus the line heater on the reference. */
    @Test
    void itIsTheSampleMinusTheReferenceWithTheSameHeater() throws InputException {
        Map<String, Double> keys = Map.of(LineHeater.HALF_WIDTH, B, LineHeater.HEATER_THICKNESS, 4e-7,
                LineHeater.HEATER_HEAT_CAPACITY, 2.49e6, LineHeater.BOUNDARY_RESISTANCE, 2e-8);
        GeometryModel diff = difference(SAMPLE, keys);
        GeometryModel onSample = HeaterMassTest.line(SAMPLE, B, Map.of(LineHeater.HEATER_THICKNESS, 4e-7,
                LineHeater.HEATER_HEAT_CAPACITY, 2.49e6, LineHeater.BOUNDARY_RESISTANCE, 2e-8));
        GeometryModel onReference = HeaterMassTest.line(new Stack(List.of(SILICON), BottomBoundary.SEMI_INFINITE), B,
                Map.of(LineHeater.HEATER_THICKNESS, 4e-7, LineHeater.HEATER_HEAT_CAPACITY, 2.49e6,
                        LineHeater.BOUNDARY_RESISTANCE, 2e-8));
        double[] d = at(diff, 5e4);
        double[] s = at(onSample, 5e4);
        double[] r = at(onReference, 5e4);
        assertEquals(s[0] - r[0], d[0], 0.0);
        assertEquals(s[1] - r[1], d[1], 0.0);
    }

    @Test
    void aStackWithoutAFilmIsRefusedAtTheGeometry() {
        InputException e = assertThrows(InputException.class, () -> difference(new Stack(List.of(SILICON),
                BottomBoundary.SEMI_INFINITE), Map.of(LineHeater.HALF_WIDTH, B)));
        assertEquals("geometry.type", e.path());
        assertTrue(e.problem().startsWith("the differential method needs a film on a substrate"), e.problem());
    }
}
