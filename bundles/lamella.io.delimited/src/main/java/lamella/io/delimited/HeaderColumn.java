package lamella.io.delimited;

import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import lamella.api.data.Quantity;
import lamella.api.data.SignalNames;

/**
 * What one header cell names: an x column or a signal (or its standard deviation), and the factor from the stated
 * unit to Lamella's. Names are matched after lower-casing and folding spaces, underscores and hyphens; a unit is given
 * in brackets ({@code f (kHz)}, {@code delay [ps]}) or, for Lamella's own names, as their suffix
 * ({@code frequency_hz}). Frequencies, delays and phases must state a unit; lock-in channels may omit it (they keep
 * the instrument's unit) and ratios have none.
 *
 * @param name   the dataset column ({@link SignalNames})
 * @param sigma  whether the cell names the standard deviation of {@code name}
 * @param factor multiplies the file's values to give Lamella's unit
 */
record HeaderColumn(String name, boolean sigma, double factor) {

    private record Meaning(String name, Quantity quantity, String impliedUnit) {
    }

    private static final Pattern WITH_UNIT = Pattern.compile("(.*?)\\s*[(\\[]\\s*([^)\\]]*?)\\s*[)\\]]\\s*");
    private static final String[] SIGMA_PREFIXES = {"sigma ", "σ ", "σ", "sd ", "std ", "stdev ", "std dev "};
    private static final Map<String, Meaning> NAMES = new LinkedHashMap<>();

    static {
        names(new Meaning(SignalNames.FREQUENCY_HZ, Quantity.FREQUENCY, null),
                "f", "freq", "frequency", "modulation frequency", "f mod");
        names(new Meaning(SignalNames.FREQUENCY_HZ, Quantity.FREQUENCY, "Hz"), "frequency hz");
        names(new Meaning(SignalNames.DELAY_S, Quantity.TIME, null),
                "delay", "t", "time", "delay time", "pump probe delay");
        names(new Meaning(SignalNames.DELAY_S, Quantity.TIME, "s"), "delay s");
        names(new Meaning(SignalNames.IN_PHASE, Quantity.VOLTAGE, null), "x", "in phase", "inphase", "v in", "vin");
        names(new Meaning(SignalNames.OUT_OF_PHASE, Quantity.VOLTAGE, null),
                "y", "out of phase", "quadrature", "v out", "vout");
        names(new Meaning(SignalNames.AMPLITUDE, Quantity.VOLTAGE, null), "r", "amplitude", "magnitude");
        names(new Meaning(SignalNames.PHASE_DEG, Quantity.PHASE, null), "phase", "theta", "θ", "phi", "φ");
        names(new Meaning(SignalNames.PHASE_DEG, Quantity.PHASE, "deg"), "phase deg");
        names(new Meaning(SignalNames.RATIO, Quantity.RATIO, "1"), "ratio", "-x/y", "-vin/vout");
        names(new Meaning(SignalNames.PUMP_POWER_W, Quantity.POWER, null), "pump power", "absorbed power",
                "absorbed pump power", "power");
        names(new Meaning(SignalNames.PUMP_POWER_W, Quantity.POWER, "W"), "pump power w");
        names(new Meaning(SignalNames.TEMPERATURE_RISE_K, Quantity.TEMPERATURE, null), "temperature rise", "rise",
                "delta t", "dt");
        names(new Meaning(SignalNames.TEMPERATURE_RISE_K, Quantity.TEMPERATURE, "K"), "temperature rise k");
        names(new Meaning(SignalNames.K_PER_W, Quantity.RISE_PER_POWER, "K/W"), "k per w");
    }

    private static void names(Meaning m, String... spellings) {
        for (String s : spellings) {
            NAMES.put(s, m);
        }
    }

    /**
     * Reads a header cell.
     *
     * @throws IllegalArgumentException saying what is wrong with the cell, for the caller to locate
     */
    static HeaderColumn parse(String cell) {
        String text = cell.strip();
        String unit = null;
        Matcher m = WITH_UNIT.matcher(text);
        if (m.matches()) {
            text = m.group(1);
            unit = m.group(2);
        }
        String folded = text.toLowerCase(Locale.ROOT).replaceAll("[\\s_]+", " ").replaceAll("(?<=\\w)-(?=\\w)", " ")
                .strip();
        boolean sigma = false;
        for (String p : SIGMA_PREFIXES) {
            if (folded.startsWith(p) && folded.length() > p.length()) {
                sigma = true;
                folded = folded.substring(p.length()).strip();
                break;
            }
        }
        Meaning meaning = NAMES.get(folded);
        if (meaning == null) {
            throw new IllegalArgumentException("'" + cell.strip() + "' names no column Lamella knows; expected an x"
                    + " column (f, frequency, delay, time, pump power), a lock-in channel (X, Y, R, phase, in-phase,"
                    + " out-of-phase, ratio), an SSTR rise (temperature rise, k_per_w) or a standard deviation of"
                    + " one (sigma X, sd phase), each with its unit"
                    + " in brackets where it has one, such as 'f (kHz)' or 'delay [ps]'; or say what it holds:"
                    + " lamella import FILE --column '" + cell.strip() + "=MEANING[:UNIT]'");
        }
        if (sigma && SignalNames.X_COLUMNS.contains(meaning.name())) {
            throw new IllegalArgumentException("'" + cell.strip() + "': standard deviations of x are not read");
        }
        String stated = unit != null ? unit : meaning.impliedUnit();
        double factor;
        if (stated == null || stated.isEmpty()) {
            if (meaning.quantity() == Quantity.VOLTAGE || meaning.quantity() == Quantity.RATIO) {
                factor = 1.0;
            } else {
                throw new IllegalArgumentException("'" + cell.strip() + "' is " + meaning.quantity().wording()
                        + " without a unit; state it in brackets, such as '" + text + " ("
                        + example(meaning.quantity()) + ")'");
            }
        } else {
            if (unit != null && meaning.impliedUnit() != null && !unit.equals(meaning.impliedUnit())) {
                throw new IllegalArgumentException("'" + cell.strip() + "' states two units");
            }
            try {
                factor = meaning.quantity().factor(stated);
            } catch (IllegalArgumentException e) {
                throw new IllegalArgumentException("'" + cell.strip() + "': " + e.getMessage(), e);
            }
        }
        return new HeaderColumn(meaning.name(), sigma, factor);
    }

    private static String example(Quantity q) {
        return switch (q) {
            case FREQUENCY -> "kHz";
            case TIME -> "ps";
            case PHASE -> "deg";
            case POWER -> "mW";
            case TEMPERATURE -> "K";
            default -> "V";
        };
    }
}
