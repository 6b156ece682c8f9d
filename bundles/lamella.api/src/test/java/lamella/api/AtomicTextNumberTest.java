package lamella.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The fast CSV number text against the exact decimal value of the double rounded half up to 13 significant digits
 * by BigDecimal (common practice, no source): equal everywhere. (Java's own {@code %.12e} rounds the shortest decimal text instead, so it is one
 * unit off on values whose shortest text ends just past a tie, and writes Double.MIN_VALUE as 4.9e-324.)
 */
class AtomicTextNumberTest {

    @Test
    void matchesTheExactRoundingOnValuesOfEveryMagnitude() {
        SplittableRandom random = new SplittableRandom(20261202);
        for (int i = 0; i < 20_000; i++) {
            double v = switch (i % 4) {
                case 0 -> Double.longBitsToDouble(random.nextLong()); // any bit pattern: every exponent
                case 1 -> (random.nextDouble() - 0.5) * Math.pow(10, random.nextInt(-30, 30));
                case 2 -> random.nextInt(-1_000_000, 1_000_000) * Math.pow(10, random.nextInt(-12, 12));
                default -> Math.nextUp(Math.pow(10, random.nextInt(-300, 300))) * (random.nextBoolean() ? 1 : -1);
            };
            assertEquals(exact(v), AtomicText.number(v), "" + v);
        }
    }

    /** Values made to lie as near a rounding tie in the 13th digit as a double can: the hard case. */
    @Test
    void valuesAtRoundingTiesAreRoundedByTheirExactValue() {
        SplittableRandom random = new SplittableRandom(7);
        int nearTies = 0;
        for (int i = 0; i < 1_000; i++) {
            long m = random.nextLong(1_000_000_000_000L, 10_000_000_000_000L);
            double v = Double.parseDouble(m + "5e" + random.nextInt(-320, 290));
            if (!Double.isFinite(v) || v == 0) {
                continue;
            }
            assertEquals(exact(v), AtomicText.number(v), "" + v);
            if (Double.isFinite(v) && nearTie(v)) {
                nearTies++;
            }
        }
        assertTrue(nearTies > 200, nearTies + " values near a tie");
    }

    @Test
    void edgesAreWrittenAsTheFormatterWritesThem() {
        double[] edges = {0.0, -0.0, 1.0, -1.0, 9.9999999999995, 9.99999999999949, 0.1, 1e-5, 123456.789,
            Double.MIN_VALUE, -Double.MIN_VALUE, Double.MIN_NORMAL, Double.MAX_VALUE, -Double.MAX_VALUE, 1e100,
            1e-100, 5e-324, 9.999999999999999e22, 1e23, Double.NaN, Double.POSITIVE_INFINITY,
            Double.NEGATIVE_INFINITY};
        for (double v : edges) {
            String expected = exact(v);
            String fast = AtomicText.number(v);
            assertEquals(expected, fast, "" + v);
        }
        assertEquals("1.000000000000e+00", AtomicText.number(1.0));
        assertEquals("-0.000000000000e+00", AtomicText.number(-0.0));
        assertEquals("1.000000000000e+01", AtomicText.number(9.99999999999996));
        assertEquals("4.940656458412e-324", AtomicText.number(Double.MIN_VALUE));
        assertEquals("-3.204116673205e+284", AtomicText.number(-3.2041166732045006E284));
        assertEquals("1.797693134862e+308", AtomicText.number(Double.MAX_VALUE));
        assertEquals("NaN", AtomicText.number(Double.NaN));
        assertEquals("-Infinity", AtomicText.number(Double.NEGATIVE_INFINITY));
    }

    /** The exact value rounded half up to 13 significant digits, in the {@code %.12e} layout. */
    private static String exact(double v) {
        if (!Double.isFinite(v)) {
            return Double.toString(v);
        }
        if (v == 0) {
            return (1 / v < 0 ? "-" : "") + "0.000000000000e+00";
        }
        BigDecimal r = new BigDecimal(v).round(new MathContext(13, RoundingMode.HALF_UP));
        String digits = r.unscaledValue().abs().toString();
        digits = (digits + "0000000000000").substring(0, 13);
        int e = r.precision() - r.scale() - 1;
        return String.format(Locale.ROOT, "%s%c.%se%c%02d", v < 0 ? "-" : "", digits.charAt(0), digits.substring(1),
                e < 0 ? '-' : '+', Math.abs(e));
    }

    /** True where the exact decimal value is within 1e-3 of a 13th-digit unit from a rounding tie. */
    private static boolean nearTie(double v) {
        BigDecimal exact = new BigDecimal(v).abs();
        if (exact.signum() == 0) {
            return false;
        }
        BigDecimal unit = BigDecimal.ONE.movePointRight(exact.precision() - exact.scale() - 13);
        BigDecimal rest = exact.remainder(unit).divide(unit, MathContext.DECIMAL64);
        return rest.subtract(new BigDecimal("0.5")).abs().compareTo(new BigDecimal("0.001")) < 0
                || exact.round(new MathContext(13, RoundingMode.HALF_UP)).precision() != exact
                        .round(new MathContext(13, RoundingMode.DOWN)).precision();
    }
}
