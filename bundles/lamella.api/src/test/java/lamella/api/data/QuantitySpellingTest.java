package lamella.api.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Units as instrument software writes them (common practice, no source); the SI prefixes are exact by definition. */
class QuantitySpellingTest {

    @Test
    void microIsTheMicroSignTheGreekMuOrU() {
        for (String u : new String[] {"µV", "μV", "uV", "µv", "uv", "µVrms"}) {
            assertEquals(1e-6, Quantity.VOLTAGE.factor(u), 0, u);
        }
        for (String u : new String[] {"µs", "μs", "us", "usec", "µsec"}) {
            assertEquals(1e-6, Quantity.TIME.factor(u), 0, u);
        }
    }

    @Test
    void degreesEveryCommonWay() {
        for (String u : new String[] {"°", "º", "˚", "deg", "Deg", "DEG", "degree", "degrees", " ° "}) {
            assertEquals(1.0, Quantity.PHASE.factor(u), 0, u);
        }
        assertEquals(180 / Math.PI, Quantity.PHASE.factor("radians"), 1e-12);
    }

    @Test
    void frequencyCaseIsFreeExceptWhereItDecidesMilliOrMega() {
        assertEquals(1e3, Quantity.FREQUENCY.factor("khz"), 0);
        assertEquals(1e9, Quantity.FREQUENCY.factor("GHZ"), 0);
        assertEquals(1e6, Quantity.FREQUENCY.factor("MHz"), 0);
        assertEquals(1e-3, Quantity.FREQUENCY.factor("mHz"), 0);
        for (String u : new String[] {"mhz", "MHZ", "Mhz"}) {
            IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Quantity.FREQUENCY.factor(u));
            assertTrue(e.getMessage().contains("could be mHz (millihertz) or MHz (megahertz)"), e.getMessage());
        }
    }

    @Test
    void aUnitOfAnotherQuantityIsNamedAsSuch() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class, () -> Quantity.PHASE.factor("ps"));
        assertTrue(e.getMessage().startsWith("'ps' is a unit of a time, but this column is a phase"), e.getMessage());
    }
}
