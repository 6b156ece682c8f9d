package lamella.report;

import lamella.charts.DecadeAxis;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;

/**
 * Numbers as a reader of the page sees them: four significant digits, a power of ten written out beyond
 * 10⁻³…10⁵, a true minus sign, and a value with its uncertainty rounded to the uncertainty's two leading digits.
 * The CSV and JSON files keep full precision; this is for the eye only.
 */
final class Numbers {

    private static final MathContext FOUR_DIGITS = new MathContext(4);
    private static final int SMALLEST_PLAIN_EXPONENT = -3;
    private static final int LARGEST_PLAIN_EXPONENT = 4;
    /** Digits after the point beyond which the σ's rounding no longer matters to a reader. */
    private static final int MOST_DECIMALS = 9;

    private Numbers() {
    }

    static String plain(double v) {
        if (!Double.isFinite(v)) {
            return nonFinite(v);
        }
        if (v == 0) {
            return "0";
        }
        double r = new BigDecimal(v).round(FOUR_DIGITS).doubleValue();
        int e = exponent(r);
        if (e >= SMALLEST_PLAIN_EXPONENT && e <= LARGEST_PLAIN_EXPONENT) {
            return minus(String.format(Locale.ROOT, "%." + Math.max(0, 3 - e) + "f", r));
        }
        return minus(String.format(Locale.ROOT, "%.3f", r / Math.pow(10, e))) + " × " + powerOfTen(e);
    }

    /** A value and its 1σ, such as {@code 1.400 ± 0.070} or {@code (1.20 ± 0.15) × 10⁸}. */
    static String withSigma(double value, double sigma) {
        if (!Double.isFinite(value) || !Double.isFinite(sigma) || sigma <= 0) {
            return plain(value) + " ± " + (Double.isFinite(sigma) && sigma == 0 ? "0" : plain(sigma));
        }
        int e = exponent(value != 0 ? value : sigma);
        boolean scaled = e < SMALLEST_PLAIN_EXPONENT || e > LARGEST_PLAIN_EXPONENT;
        double scale = scaled ? Math.pow(10, e) : 1;
        double s = sigma / scale;
        int decimals = Math.min(MOST_DECIMALS, Math.max(0, 1 - exponent(s)));
        String pair = fixed(value / scale, decimals) + " ± " + fixed(s, decimals);
        return scaled ? "(" + pair + ") × " + powerOfTen(e) : pair;
    }

    /** A percentage with two significant digits (at least one decimal below 10 %). */
    static String percent(double fraction) {
        if (!Double.isFinite(fraction)) {
            return nonFinite(fraction);
        }
        double p = 100 * fraction;
        int decimals = p == 0 ? 0 : Math.min(MOST_DECIMALS, Math.max(0, 1 - exponent(p)));
        return fixed(p, decimals);
    }

    /** A correlation coefficient: two decimals. */
    static String coefficient(double r) {
        return Double.isFinite(r) ? fixed(r, 2) : nonFinite(r);
    }

    static String powerOfTen(int e) {
        return DecadeAxis.powerOfTen(e);
    }

    private static String fixed(double v, int decimals) {
        return minus(String.format(Locale.ROOT, "%." + decimals + "f", v));
    }

    private static int exponent(double v) {
        return (int) Math.floor(Math.log10(Math.abs(v)));
    }

    private static String minus(String s) {
        return s.replace('-', '−');
    }

    private static String nonFinite(double v) {
        if (Double.isNaN(v)) {
            return "not a number";
        }
        return v > 0 ? "∞" : "−∞";
    }
}
