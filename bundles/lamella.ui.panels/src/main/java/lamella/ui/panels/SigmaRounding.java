package lamella.ui.panels;

import java.math.BigDecimal;
import java.math.RoundingMode;

/**
 * A value shown to the precision its uncertainty allows: σ to two significant digits and the value to the same
 * decimal place, as results are usually quoted (common practice, no source; the GUM, JCGM 100:2008 §7.2.6,
 * advises no more than two significant digits for an uncertainty).
 */
final class SigmaRounding {

    private SigmaRounding() {
    }

    /** "1.234 ± 0.012"; without a usable σ, the value to four significant digits and "± —". */
    static String valueAndSigma(double value, double sigma) {
        if (!Double.isFinite(value)) {
            return NumberText.format(value);
        }
        if (!(sigma > 0) || !Double.isFinite(sigma)) {
            return NumberText.format(value) + " ± —";
        }
        int place = place(sigma);
        return plain(value, place) + " ± " + plain(sigma, place);
    }

    /** σ alone to two significant digits. */
    static String sigma(double sigma) {
        if (!(sigma > 0) || !Double.isFinite(sigma)) {
            return NumberText.format(sigma);
        }
        return plain(sigma, place(sigma));
    }

    /** The decimal place (a power of ten) of σ's second significant digit. */
    private static int place(double sigma) {
        BigDecimal s = new BigDecimal(sigma).round(new java.math.MathContext(2, RoundingMode.HALF_EVEN));
        return s.precision() - s.scale() - 2;
    }

    private static String plain(double v, int place) {
        BigDecimal d = new BigDecimal(v).setScale(-place, RoundingMode.HALF_EVEN);
        String s = d.scale() < 0 ? d.setScale(0, RoundingMode.HALF_EVEN).toPlainString() : d.toPlainString();
        return s.startsWith("-") ? "−" + s.substring(1) : s;
    }
}
