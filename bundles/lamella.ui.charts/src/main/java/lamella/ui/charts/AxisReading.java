package lamella.ui.charts;

import java.util.Locale;
import lamella.charts.DecadeAxis;

/** A value read off an axis, in the axis's own unit: the text in the last parentheses of its label. */
final class AxisReading {

    private AxisReading() {
    }

    static String unitOf(String label) {
        if (label == null) {
            return "";
        }
        int close = label.lastIndexOf(')');
        int open = label.lastIndexOf(" (");
        if (open < 0 || close < open) {
            return "";
        }
        String unit = label.substring(open + 2, close);
        return unit.equals("dimensionless") ? "" : unit;
    }

    /** Four significant digits, powers of ten for very small or large values, a typographic minus. */
    static String number(double v) {
        return plain(v).replace('-', '−');
    }

    private static String plain(double v) {
        if (!Double.isFinite(v)) {
            return String.valueOf(v);
        }
        double a = Math.abs(v);
        if (a != 0 && (a < 1e-3 || a >= 1e5)) {
            String s = String.format(Locale.ROOT, "%.3e", v);
            int e = s.indexOf('e');
            return s.substring(0, e) + "×" + DecadeAxis.powerOfTen(Integer.parseInt(s.substring(e + 1)));
        }
        return String.format(Locale.ROOT, "%.4g", v);
    }

    static String reading(String name, double v, String unit) {
        return name + " = " + number(v) + (unit.isEmpty() ? "" : " " + unit);
    }
}
