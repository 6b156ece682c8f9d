package lamella.api.data;

import java.util.Locale;
import java.util.regex.Pattern;

/**
 * Strict reading of one numeric cell written with a decimal point or a decimal comma. Only plain and scientific
 * notation are numbers: no NaN, no infinity, no thousands separators, no units glued on — a cell that is not clearly
 * one finite number is an error, never a guess.
 */
public final class Decimals {

    private static final Pattern POINT = Pattern.compile("[+-]?(\\d+(\\.\\d*)?|\\.\\d+)([eE][+-]?\\d+)?");
    private static final Pattern COMMA = Pattern.compile("[+-]?(\\d+(,\\d*)?|,\\d+)([eE][+-]?\\d+)?");
    private static final Pattern NOT_FINITE = Pattern.compile("[+-]?(nan|inf|infinity|∞)", Pattern.CASE_INSENSITIVE);

    private Decimals() {
    }

    /** Whether the text is a number with this decimal mark ('.' or ','). */
    public static boolean isNumber(String text, char decimalMark) {
        return (decimalMark == ',' ? COMMA : POINT).matcher(text.strip()).matches();
    }

    /**
     * The number a cell holds.
     *
     * @throws NumberFormatException saying what is wrong with the cell, for the caller to locate
     */
    public static double parse(String cell, char decimalMark) {
        String t = cell.strip();
        if (t.isEmpty()) {
            throw new NumberFormatException("the cell is empty; expected a number");
        }
        if (NOT_FINITE.matcher(t).matches()) {
            throw new NumberFormatException("'" + t + "' is not a finite number; Lamella reads only measured values");
        }
        if (!isNumber(t, decimalMark)) {
            String mark = decimalMark == ',' ? "a decimal comma" : "a decimal point";
            throw new NumberFormatException("'" + abbreviate(t) + "' is not a number (expected " + mark
                    + ", such as " + (decimalMark == ',' ? "-1,25e-6" : "-1.25e-6") + ")");
        }
        double v = Double.parseDouble(decimalMark == ',' ? t.replace(',', '.') : t);
        if (Double.isInfinite(v)) {
            throw new NumberFormatException("'" + t + "' is too large for a double-precision number");
        }
        return v;
    }

    /** A cell's text shortened for a message, so that a line of garbage does not flood the terminal. */
    public static String abbreviate(String text) {
        return text.length() <= 40 ? text : text.substring(0, 37) + "...";
    }

    /** A number for messages: plain, locale-independent. */
    public static String show(double v) {
        return String.format(Locale.ROOT, "%.6g", v);
    }
}
