package lamella.engine;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.apache.commons.math3.special.BesselJ;
import org.junit.jupiter.api.Test;

class BesselTest {

    /** Oracle: Apache Commons Math's BesselJ (a port of Netlib's RJBESL), over both branches and the switch. */
    @Test
    void j0MatchesCommonsMath() {
        for (double x = 0; x <= 300; x += 0.0137) {
            assertEquals(BesselJ.value(0, x), Bessel.j0(x), 2e-11, "x=" + x);
        }
        assertEquals(1.0, Bessel.j0(0), 0.0);
    }

    /**
     * J₁ as printed in Abramowitz & Stegun, Handbook of Mathematical Functions (1964), Table 9.1 (J₁ to 10
     * decimals, x = 0(.1)17.5); the values were written down from memory of that table, and each is also checked
     * against Commons Math below, so a mistaken recollection cannot pass silently. The table's last digit is rounded:
     * agreement within 6e-11.
     */
    @Test
    void j1MatchesAbramowitzStegunTable91() {
        double[][] table = {
            {0.1, 0.0499375260},
            {0.5, 0.2422684577},
            {1.0, 0.4400505857},
            {2.0, 0.5767248078},
            {3.0, 0.3390589585},
            {5.0, -0.3275791376},
            {10.0, 0.0434727462},
            {15.0, 0.2051040386},
        };
        for (double[] row : table) {
            assertEquals(row[1], Bessel.j1(row[0]), 6e-11, "A&S Table 9.1, J1(" + row[0] + ")");
            assertEquals(row[1], BesselJ.value(1, row[0]), 6e-11, "Commons Math, J1(" + row[0] + ")");
        }
    }

    /** Oracle: Apache Commons Math's BesselJ over both branches and the switch at 12; J₁ is odd (A&S 9.1.5). */
    @Test
    void j1MatchesCommonsMathAndIsOdd() {
        for (double x = 0; x <= 300; x += 0.0137) {
            assertEquals(BesselJ.value(1, x), Bessel.j1(x), 2e-11, "x=" + x);
            assertEquals(-Bessel.j1(x), Bessel.j1(-x), 0.0, "x=" + x);
        }
        assertEquals(0.0, Bessel.j1(0), 0.0);
        // near zero J₁(x) ≈ x/2 (A&S 9.1.10, first term)
        assertEquals(5e-9, Bessel.j1(1e-8), 1e-24);
    }

    /**
     * The derivative relation J₀′ = −J₁ (A&S 9.1.28), by a central difference of step 1e-5: its truncation error is
     * ~1e-11, but J₀'s own rounding (~1e-12 where its series cancels) divided by the step allows 1e-7.
     */
    @Test
    void j1IsMinusTheDerivativeOfJ0() {
        double h = 1e-5;
        for (double x = 0.3; x < 40; x += 0.77) {
            double derivative = (Bessel.j0(x + h) - Bessel.j0(x - h)) / (2 * h);
            assertEquals(-derivative, Bessel.j1(x), 1e-7, "x=" + x);
        }
    }
}
