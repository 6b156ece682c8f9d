package lamella.api.material;

import java.util.Arrays;
import java.util.Locale;

/**
 * A property over temperature: one value that holds over a stated range (which may be a single temperature), or a
 * table of (T, value) pairs interpolated linearly between neighbouring rows. Nothing is extrapolated: a temperature
 * outside the range has no value.
 */
public final class TemperatureCurve {

    private final double[] temperatures;
    private final double[] values;
    private final boolean table;

    private TemperatureCurve(double[] temperatures, double[] values, boolean table) {
        this.temperatures = temperatures;
        this.values = values;
        this.table = table;
    }

    /** One value over [lowK, highK]; lowK == highK for a value that holds at one temperature only. */
    public static TemperatureCurve constant(double value, double lowK, double highK) {
        if (!(lowK > 0) || !(highK >= lowK) || !Double.isFinite(highK)) {
            throw new IllegalArgumentException("a temperature range needs 0 < low <= high, got " + lowK + ", " + highK);
        }
        requireFinite(value);
        return new TemperatureCurve(new double[] {lowK, highK}, new double[] {value, value}, false);
    }

    /** A table with at least two rows at strictly increasing positive temperatures. */
    public static TemperatureCurve table(double[] temperaturesK, double[] values) {
        if (temperaturesK.length != values.length || temperaturesK.length < 2) {
            throw new IllegalArgumentException("a table needs at least two rows of (T, value)");
        }
        for (int i = 0; i < temperaturesK.length; i++) {
            requireFinite(values[i]);
            if (!(temperaturesK[i] > 0) || !Double.isFinite(temperaturesK[i])
                    || (i > 0 && !(temperaturesK[i] > temperaturesK[i - 1]))) {
                throw new IllegalArgumentException("table temperatures must be positive and strictly increasing");
            }
        }
        return new TemperatureCurve(temperaturesK.clone(), values.clone(), true);
    }

    public boolean isTable() {
        return table;
    }

    public double lowK() {
        return temperatures[0];
    }

    public double highK() {
        return temperatures[temperatures.length - 1];
    }

    public boolean covers(double temperatureK) {
        return temperatureK >= lowK() && temperatureK <= highK();
    }

    /** The rows of a table, or the range's two ends carrying the one value. */
    public double[] temperatures() {
        return temperatures.clone();
    }

    public double[] values() {
        return values.clone();
    }

    /** The value at a temperature that {@link #covers} admits. */
    public double valueAt(double temperatureK) {
        if (!covers(temperatureK)) {
            throw new IllegalArgumentException(temperatureK + " K is outside " + range());
        }
        int i = Arrays.binarySearch(temperatures, temperatureK);
        if (i >= 0) {
            return values[i];
        }
        int hi = -i - 1;
        int lo = hi - 1;
        double f = (temperatureK - temperatures[lo]) / (temperatures[hi] - temperatures[lo]);
        return values[lo] + f * (values[hi] - values[lo]);
    }

    /** "300 K" or "100–800 K", for messages. */
    public String range() {
        return lowK() == highK() ? kelvin(lowK()) : number(lowK()) + "–" + kelvin(highK());
    }

    static String kelvin(double t) {
        return number(t) + " K";
    }

    private static String number(double t) {
        return t == Math.rint(t) ? String.format(Locale.ROOT, "%.0f", t) : String.valueOf(t);
    }

    private static void requireFinite(double v) {
        if (!Double.isFinite(v)) {
            throw new IllegalArgumentException("a property value must be finite, got " + v);
        }
    }
}
