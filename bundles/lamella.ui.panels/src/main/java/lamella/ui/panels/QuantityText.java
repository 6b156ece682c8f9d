package lamella.ui.panels;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Values as typed and shown in fields: a number in the field's unit ({@code 85}), or with a unit of the same
 * quantity ({@code 0.085 µm}, {@code 9.8 MHz}); lists of them ({@code 1, 10, 100 kHz}); and ranges with a count and
 * a spacing ({@code 1 kHz to 10 MHz, 30 log}, {@code 100 ps to 4 ns, 40 linear}). Strict: a decimal point, nothing
 * guessed; a unit of another quantity is an error.
 */
final class QuantityText {

    /** The most values a typed range may make; more is a typing slip, not a measurement plan. */
    static final int MOST_POINTS = 10_000;

    private static final Pattern ONE = Pattern.compile(
            "\\s*([-+]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][-+]?\\d+)?)\\s*(\\S(?:.*\\S)?)?\\s*");
    private static final Pattern RANGE = Pattern.compile(
            "(?i)\\s*(.+?)\\s+(?:to|\\.\\.)\\s+(.+?)\\s*[,;]\\s*(\\d+)\\s*(?:points?\\s*)?(log(?:arithmic)?|lin(?:ear)?)"
                    + "\\s*");

    /** A parsed value in SI, and the unit it was written in (the field's own when none was written). */
    record Reading(double si, DisplayUnit unit) {
    }

    /** What went wrong, in words for the field's status line. */
    static final class Refusal extends Exception {
        private static final long serialVersionUID = 1L;

        Refusal(String problem) {
            super(problem);
        }
    }

    private QuantityText() {
    }

    /** A value as a field shows it: up to six significant digits, in the field's unit (the unit stands beside). */
    static String format(double si, DisplayUnit unit) {
        return digits(unit.shown(si), 6);
    }

    /** One number, in the field's unit unless the text names another unit of the key's quantity. */
    static Reading parse(String text, String key, DisplayUnit fieldUnit) throws Refusal {
        Matcher m = ONE.matcher(text);
        if (text.isBlank() || !m.matches() || text.matches(".*\\d,\\d.*")) {
            throw new Refusal("'" + text.strip() + "' is not a number; write it with a decimal point, such as 1.5"
                    + " or 2e-3, optionally followed by its unit (" + DisplayUnit.wording(key) + ")");
        }
        DisplayUnit unit = fieldUnit;
        if (m.group(2) != null) {
            unit = DisplayUnit.named(key, m.group(2)).orElseThrow(() -> new Refusal("'" + m.group(2)
                    + "' is not a unit of this value; use " + DisplayUnit.wording(key)
                    + (m.group(2).equalsIgnoreCase("mhz") ? " (MHz is mega-, mHz milli-hertz)" : "")));
        }
        // In decimal, so that 0.085 µm is the double nearest 8.5e-8 m, as a file written by hand would say.
        double si = new java.math.BigDecimal(m.group(1)).multiply(java.math.BigDecimal.valueOf(unit.factor()))
                .doubleValue();
        if (!Double.isFinite(si)) {
            throw new Refusal("'" + text.strip() + "' is too large to be a value");
        }
        return new Reading(si, unit);
    }

    /**
     * A list or a range. A number without a unit is in the unit written at the end of the list, if there is one,
     * else in the field's unit.
     */
    static double[] parseList(String text, String key, DisplayUnit fieldUnit) throws Refusal {
        Matcher r = RANGE.matcher(text);
        if (r.matches()) {
            return range(r, key, fieldUnit);
        }
        String[] items = text.split("\\s*[,;]\\s*");
        List<String> parts = new ArrayList<>();
        for (String item : items) {
            if (!item.isBlank()) {
                parts.add(item.strip());
            }
        }
        if (parts.isEmpty()) {
            throw new Refusal("no values; write a list such as 1, 10, 100 kHz, or a range such as 1 kHz to 10 MHz,"
                    + " 30 log");
        }
        DisplayUnit trailing = parse(parts.get(parts.size() - 1), key, fieldUnit).unit();
        double[] out = new double[parts.size()];
        for (int i = 0; i < out.length; i++) {
            out[i] = parse(parts.get(i), key, trailing).si();
        }
        return out;
    }

    private static double[] range(Matcher r, String key, DisplayUnit fieldUnit) throws Refusal {
        Reading to = parse(r.group(2), key, fieldUnit);
        Reading from = parse(r.group(1), key, to.unit());
        int n;
        try {
            n = Integer.parseInt(r.group(3));
        } catch (NumberFormatException e) {
            n = Integer.MAX_VALUE;
        }
        if (n < 2 || n > MOST_POINTS) {
            throw new Refusal("a range has from 2 to " + MOST_POINTS + " points, not " + r.group(3));
        }
        if (from.si() == to.si()) {
            throw new Refusal("a range needs two different ends");
        }
        boolean log = r.group(4).toLowerCase(Locale.ROOT).startsWith("log");
        if (log && !(from.si() > 0 && to.si() > 0)) {
            throw new Refusal("a log range needs two positive ends; use linear for a range through zero");
        }
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            double t = (double) i / (n - 1);
            x[i] = log ? Math.exp(Math.log(from.si()) + t * (Math.log(to.si()) - Math.log(from.si())))
                    : from.si() + t * (to.si() - from.si());
        }
        x[0] = from.si();
        x[n - 1] = to.si();
        return x;
    }

    /**
     * A list as a field shows it: as a range when its values are evenly spaced (on a log or a linear scale), so that
     * what was typed as a range reads back as one; else the values, with the unit once at the end.
     */
    static String formatList(double[] si, DisplayUnit unit) {
        if (si.length == 0) {
            return "";
        }
        Optional<String> spacing = spacing(si);
        if (spacing.isPresent()) {
            return digits(unit.shown(si[0]), 6) + " to " + digits(unit.shown(si[si.length - 1]), 6) + " "
                    + unit.unit() + ", " + si.length + " " + spacing.get();
        }
        List<String> parts = new ArrayList<>();
        for (double v : si) {
            parts.add(digits(unit.shown(v), 6));
        }
        return String.join(", ", parts) + (unit.unit().isEmpty() ? "" : " " + unit.unit());
    }

    /** "log" or "linear" for at least four evenly spaced values (to 1e-9), else empty. */
    private static Optional<String> spacing(double[] x) {
        if (x.length < 4) {
            return Optional.empty();
        }
        if (evenly(x, false)) {
            return Optional.of("linear");
        }
        boolean positive = true;
        for (double v : x) {
            positive &= v > 0;
        }
        return positive && evenly(x, true) ? Optional.of("log") : Optional.empty();
    }

    private static boolean evenly(double[] x, boolean log) {
        int n = x.length;
        double a = log ? Math.log(x[0]) : x[0];
        double b = log ? Math.log(x[n - 1]) : x[n - 1];
        double span = Math.abs(b - a);
        if (span == 0) {
            return false;
        }
        for (int i = 0; i < n; i++) {
            double v = log ? Math.log(x[i]) : x[i];
            double want = a + (b - a) * i / (n - 1);
            if (Math.abs(v - want) > 1e-9 * span) {
                return false;
            }
        }
        return true;
    }

    /** A number with at most the given significant digits, without trailing zeros; exponents for the extremes. */
    static String digits(double v, int significant) {
        if (Double.isNaN(v)) {
            return "—";
        }
        if (Double.isInfinite(v)) {
            return v > 0 ? "∞" : "−∞";
        }
        if (v == 0) {
            return "0";
        }
        double abs = Math.abs(v);
        String s;
        if (abs >= 1e-3 && abs < 1e7) {
            java.math.BigDecimal d = new java.math.BigDecimal(v).round(new java.math.MathContext(significant));
            s = d.stripTrailingZeros().toPlainString();
        } else {
            s = String.format(Locale.ROOT, "%." + (significant - 1) + "e", v);
            int e = s.indexOf('e');
            String mantissa = s.substring(0, e).replaceAll("0+$", "").replaceAll("\\.$", "");
            s = mantissa + "e" + Integer.parseInt(s.substring(e + 1));
        }
        return s;
    }
}
