package lamella.conditioning;

import lamella.api.InputException;
import lamella.api.data.Decimals;

/** A closed range of x, in the dataset's SI unit, whose rows the user excludes from fitting. */
public record XRange(double from, double to) {

    public XRange {
        if (!Double.isFinite(from) || !Double.isFinite(to) || !(from < to)) {
            throw new IllegalArgumentException("a range needs finite from < to, got " + from + ":" + to);
        }
    }

    /** Reads {@code FROM:TO}, such as {@code -1e-9:1e-10}. */
    public static XRange parse(String text) throws InputException {
        int colon = text.indexOf(':');
        if (colon < 0) {
            throw InputException.at("--exclude", "'" + Decimals.abbreviate(text) + "'; expected FROM:TO in the x"
                    + " column's SI unit, such as -1e-9:1e-10");
        }
        double from;
        double to;
        try {
            from = Decimals.parse(text.substring(0, colon), '.');
            to = Decimals.parse(text.substring(colon + 1), '.');
        } catch (NumberFormatException e) {
            throw InputException.at("--exclude", e.getMessage());
        }
        if (!(from < to)) {
            throw InputException.at("--exclude", "'" + text + "': FROM must be less than TO");
        }
        return new XRange(from, to);
    }

    public boolean contains(double x) {
        return x >= from && x <= to;
    }

    @Override
    public String toString() {
        return Decimals.show(from) + ":" + Decimals.show(to);
    }
}
