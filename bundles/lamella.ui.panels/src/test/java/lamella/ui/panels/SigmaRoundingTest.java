package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** Rounding to σ: two significant digits of σ, the value to the same place (GUM, JCGM 100:2008, §7.2.6). */
class SigmaRoundingTest {

    @Test
    void theValueKeepsTheDigitsItsSigmaAllows() {
        assertEquals("1.234 ± 0.012", SigmaRounding.valueAndSigma(1.23449, 0.01234));
        assertEquals("1.40 ± 0.15", SigmaRounding.valueAndSigma(1.4012, 0.1499));
        assertEquals("50.3 ± 1.2", SigmaRounding.valueAndSigma(50.31, 1.23));
        assertEquals("1310 ± 250", SigmaRounding.valueAndSigma(1312, 247));
        assertEquals("−0.50 ± 0.10", SigmaRounding.valueAndSigma(-0.5012, 0.0996));
        assertEquals("0.0097", SigmaRounding.sigma(0.009666));
        assertEquals("2.5 ± —", SigmaRounding.valueAndSigma(2.5, Double.NaN));
    }
}
