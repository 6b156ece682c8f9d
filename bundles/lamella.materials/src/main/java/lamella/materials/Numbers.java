package lamella.materials;

import java.math.BigDecimal;
import java.math.MathContext;

/** Numbers as listings and exported files show them: as written, without trailing zeros. */
final class Numbers {

    private Numbers() {
    }

    /** Up to 6 significant digits, for values computed (interpolated, derived) rather than written. */
    static String computed(double v) {
        return plain(new BigDecimal(v).round(new MathContext(6)).doubleValue());
    }

    /** The shortest text that reads back as the same double. */
    static String plain(double v) {
        BigDecimal d = BigDecimal.valueOf(v).stripTrailingZeros();
        return d.scale() < 0 && d.precision() - d.scale() <= 8 ? d.toPlainString() : d.toString();
    }
}
