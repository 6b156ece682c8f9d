package lamella.ui.panels;

import java.util.Locale;

/** Numbers in fields and tables: four significant digits out, strict parsing in (a decimal point, nothing guessed). */
final class NumberText {

    private NumberText() {
    }

    static String format(double v) {
        if (Double.isNaN(v)) {
            return "—";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "∞" : "−∞";
        }
        String s = String.format(Locale.ROOT, "%.4g", v);
        int e = s.indexOf('e');
        String mantissa = e < 0 ? s : s.substring(0, e);
        if (mantissa.contains(".")) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return e < 0 ? mantissa : mantissa + "e" + Integer.parseInt(s.substring(e + 1));
    }

    /** The value, or null when the text is not a finite number. */
    static Double parse(String text) {
        String t = text.trim();
        if (t.isEmpty()) {
            return null;
        }
        try {
            double v = Double.parseDouble(t);
            return Double.isFinite(v) ? v : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }

    static String notANumber(String text) {
        return "'" + text.trim() + "' is not a number; write it with a decimal point, such as 1.5 or 2e-3";
    }
}
