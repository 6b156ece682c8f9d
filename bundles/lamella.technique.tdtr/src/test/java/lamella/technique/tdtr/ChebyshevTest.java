package lamella.technique.tdtr;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.util.List;
import lamella.api.BottomBoundary;
import lamella.api.FrequencyResponse;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.Stack;
import lamella.engine.LayeredStack;
import org.junit.jupiter.api.Test;

class ChebyshevTest {

    /**
     * A response that is not smooth (alternating sign from one evaluation to the next) is refused in words, its
     * band in the trade's units (common practice, no source).
     */
    @Test
    void aResponseThatIsNotSmoothIsRefusedWithItsBandInWords() {
        boolean[] flip = {false};
        FrequencyResponse rough = (f, out) -> {
            flip[0] = !flip[0];
            out[0] = flip[0] ? 1 : -1;
            out[1] = 0;
        };
        ModelEvaluationException e = assertThrows(ModelEvaluationException.class,
                () -> Chebyshev.fit(rough, Math.log(8.262e8), Math.log(5.42e11), 48, 768, 1e-9));
        assertEquals("the high-frequency response could not be interpolated to a relative 1e-09 with 768 Chebyshev"
                + " nodes; it is not smooth between 826 MHz and 542 GHz", e.getMessage());
    }

    @Test
    void frequenciesInWordsTakeTheirUnit() {
        assertEquals("950 Hz", Chebyshev.frequency(950));
        assertEquals("1 kHz", Chebyshev.frequency(999.7));
        assertEquals("9.8 MHz", Chebyshev.frequency(9.8e6));
        assertEquals("1.2 THz", Chebyshev.frequency(1.2e12));
    }

    /**
     * The many-point recurrence is the one-point recurrence run side by side: on the one-dimensional response of a
     * layered stack between 1 GHz and 500 GHz, every value equals the one-point value bit for bit (common practice,
     * no source: the same operations in the same order).
     */
    @Test
    void manyPointsAtOnceEqualOnePointAtATime() {
        Stack stack = new Stack(List.of(
                Layer.isotropicInPlane("cap", 9e-8, 200, 200, 2.45e6).withConductanceBelow(1.2e8),
                Layer.isotropicInPlane("base", Double.POSITIVE_INFINITY, 1.4, 1.4, 1.65e6)),
                BottomBoundary.SEMI_INFINITE);
        LayeredStack kernel = new LayeredStack(stack);
        FrequencyResponse oneD = (f, out) -> kernel.radialResponse(0, 2 * Math.PI * f, out);
        double a = Math.log(1e9);
        double b = Math.log(5e11);
        Chebyshev c = Chebyshev.fit(oneD, a, b, 48, 768, 1e-9);
        int n = 1001;
        double[] t = new double[n];
        double[] twoT = new double[n];
        double[] s = new double[n];
        for (int i = 0; i < n; i++) {
            s[i] = a + (b - a) * i / (n - 1);
            t[i] = (2 * s[i] - a - b) / (b - a);
            twoT[i] = 2 * t[i];
        }
        double[] re = new double[n];
        double[] im = new double[n];
        c.atAll(t, twoT, re, im);
        double[] z = new double[2];
        for (int i = 0; i < n; i++) {
            c.at(s[i], z);
            assertEquals(Double.doubleToLongBits(z[0]), Double.doubleToLongBits(re[i]), "re at " + i);
            assertEquals(Double.doubleToLongBits(z[1]), Double.doubleToLongBits(im[i]), "im at " + i);
        }
    }
}
