package lamella.ui.workbench;

import java.math.BigDecimal;
import java.math.MathContext;
import lamella.api.Units;

/**
 * A value of a case-file key in the unit a practitioner reads it in (MHz, µm, ps, mW), chosen by the key's SI
 * suffix and the size of the value; the window's own texts use it where no unit chooser stands beside the value.
 */
final class Readable {

    private record Scale(String unit, double factor) {
    }

    private Readable() {
    }

    /** "9 MHz", "10 µm", "76 MHz", "300 K"; keys without a known unit keep their SI value and unit. */
    static String of(String key, double si) {
        String unit = Units.ofKey(key);
        Scale s = switch (unit) {
            case "Hz" -> pick(si, new Scale("Hz", 1), new Scale("kHz", 1e3), new Scale("MHz", 1e6),
                    new Scale("GHz", 1e9));
            case "m" -> pick(si, new Scale("nm", 1e-9), new Scale("µm", 1e-6), new Scale("mm", 1e-3),
                    new Scale("m", 1));
            case "s" -> pick(si, new Scale("ps", 1e-12), new Scale("ns", 1e-9), new Scale("µs", 1e-6),
                    new Scale("ms", 1e-3), new Scale("s", 1));
            case "W" -> pick(si, new Scale("µW", 1e-6), new Scale("mW", 1e-3), new Scale("W", 1));
            default -> new Scale(unit, 1);
        };
        String number = plain(si / s.factor());
        return s.unit().isEmpty() ? number : number + " " + s.unit();
    }

    /** The largest unit in which the value is at least 1 (the smallest unit for smaller values). */
    private static Scale pick(double si, Scale... ascending) {
        Scale chosen = ascending[0];
        for (Scale s : ascending) {
            if (Math.abs(si) >= s.factor() * (1 - 1e-12)) {
                chosen = s;
            }
        }
        return chosen;
    }

    /** Six significant digits at most, trailing zeros dropped. */
    static String plain(double v) {
        if (v == 0 || !Double.isFinite(v)) {
            return v == 0 ? "0" : Double.toString(v);
        }
        BigDecimal b = new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros();
        int exponent = b.precision() - b.scale() - 1;
        return exponent >= -4 && exponent < 7 ? b.toPlainString() : b.toString();
    }
}
