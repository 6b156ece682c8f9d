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
}
