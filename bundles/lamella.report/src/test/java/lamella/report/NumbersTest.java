package lamella.report;

import static org.junit.jupiter.api.Assertions.assertEquals;

import org.junit.jupiter.api.Test;

/** How the page writes numbers: a layout rule of this program, no physics. */
class NumbersTest {

    @Test
    void aValueIsRoundedToTheTwoLeadingDigitsOfItsSigma() {
        assertEquals("1.400 ± 0.070", Numbers.withSigma(1.4, 0.07));
        assertEquals("−12.30 ± 0.45", Numbers.withSigma(-12.3, 0.45));
        assertEquals("1234 ± 56", Numbers.withSigma(1234.4, 56));
    }

    @Test
    void largeAndSmallValuesShareOnePowerOfTenWithTheirSigma() {
        assertEquals("(1.20 ± 0.15) × 10⁸", Numbers.withSigma(1.2e8, 1.5e7));
        assertEquals("(6.00 ± 0.25) × 10⁻⁶", Numbers.withSigma(6.0e-6, 2.5e-7));
    }

    @Test
    void aSigmaThatIsNotPositiveIsShownAsItIs() {
        assertEquals("1.500 ± not a number", Numbers.withSigma(1.5, Double.NaN));
        assertEquals("1.500 ± ∞", Numbers.withSigma(1.5, Double.POSITIVE_INFINITY));
        assertEquals("1.500 ± 0", Numbers.withSigma(1.5, 0));
    }

    @Test
    void plainNumbersKeepFourSignificantDigits() {
        assertEquals("1.630 × 10⁶", Numbers.plain(1.63e6));
        assertEquals("0.001234", Numbers.plain(0.0012344));
        assertEquals("10.00", Numbers.plain(9.99996));
        assertEquals("−2.500 × 10⁻⁹", Numbers.plain(-2.5e-9));
        assertEquals("0", Numbers.plain(0));
    }

    @Test
    void percentagesKeepTwoSignificantDigits() {
        assertEquals("5.0", Numbers.percent(0.05));
        assertEquals("13", Numbers.percent(0.125));
        assertEquals("0.42", Numbers.percent(0.0042));
    }
}
