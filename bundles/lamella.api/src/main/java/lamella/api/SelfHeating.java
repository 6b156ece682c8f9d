package lamella.api;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.ArrayList;
import java.util.List;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import lamella.api.material.Material;
import lamella.api.material.MaterialQuantity;

/**
 * Self-heating of the sample by the absorbed pump power: the library values of a stack taken at the case's temperature
 * plus the steady temperature rise that power causes, iterated until the rise and the values agree.
 *
 * <p>Every layer is taken at the same temperature, its own base temperature (its {@code temperature_k}, else the
 * case's) plus the steady rise at the heated plane as the probe reads it ({@link Simulation#steadyRisePerWatt()}
 * times the power). That is the hottest part of the stack under the spot: the layers within the probed depth
 * (transducer, film) are close to it, and a substrate is taken a little warmer than its mean under the spot, so the
 * shift is, if anything, overstated.
 *
 * <p>A value bound to a library entry is shifted by the entry's relative change, value × f(T + ΔT) / f(T), so a
 * value that a fit or a sensitivity moves away from the library's is moved the same way and is read as its value at
 * the base temperature; an unmoved value is the entry's value at T + ΔT itself. Values the case writes are not bound
 * and never shifted. A temperature outside the range an entry states takes the value at the range's end, with a
 * warning that names the material, the range and the temperature.
 *
 * @param absorbedPowerW the absorbed power, W (0: no rise, the values as read)
 * @param path           the JSON path of the power, for messages
 * @param bindings       the stack values taken from libraries
 */
public record SelfHeating(double absorbedPowerW, String path, List<LibraryBinding> bindings) {

    /** No self-heating: the values as read. */
    public static final SelfHeating OFF = new SelfHeating(0, "", List.of());

    /** The iteration stops when two successive rises differ by less than this fraction of the rise … */
    public static final double TOLERANCE_REL = 1e-9;
    /** … or by less than this many kelvin. */
    public static final double TOLERANCE_K = 1e-12;
    /** The most iterations before the rise is declared unsettled. */
    public static final int MAX_ITERATIONS = 60;

    public SelfHeating {
        bindings = List.copyOf(bindings);
        if (!(absorbedPowerW >= 0) || Double.isInfinite(absorbedPowerW)) {
            throw new IllegalArgumentException("an absorbed power must be finite and not negative, got "
                    + absorbedPowerW);
        }
    }

    /**
     * One stack value taken from a library entry.
     *
     * @param layer        the layer's name
     * @param key          the layer key ({@code k_through_w_mk}, {@code k_in_plane_x_w_mk}, {@code k_in_plane_y_w_mk}
     *                     or {@code heat_capacity_j_m3k})
     * @param material     the entry
     * @param quantity     the entry's quantity the value is
     * @param temperatureK the base temperature it was read at
     * @param value        the value read there
     * @param lowK         the lowest temperature the entry states it for
     * @param highK        the highest
     */
    public record LibraryBinding(String layer, String key, Material material, MaterialQuantity quantity,
                                 double temperatureK, double value, double lowK, double highK) {
    }

    /**
     * One layer value under self-heating.
     *
     * @param layer        the layer's name
     * @param key          the layer key
     * @param temperatureK the temperature it was taken at (base + rise)
     * @param baseValue    the value at the base temperature
     * @param value        the value used
     */
    public record ShiftedValue(String layer, String key, double temperatureK, double baseValue, double value) {
    }

    /**
     * The consistent state.
     *
     * @param absorbedPowerW the absorbed power, W
     * @param riseK          the steady rise at the heated plane, K
     * @param iterations     how many evaluations of the steady response it took
     * @param stack          the stack with the shifted values, the one the simulation uses
     * @param values         every library value with the temperature it was taken at
     * @param warnings       a line for every value whose temperature lies outside its entry's range
     */
    public record Outcome(double absorbedPowerW, double riseK, int iterations, Stack stack, List<ShiftedValue> values,
                          List<String> warnings) {

        public Outcome {
            values = List.copyOf(values);
            warnings = List.copyOf(warnings);
        }

        /** The model input in words, for explanations and reports. */
        public String inWords() {
            StringBuilder sb = new StringBuilder("Self-heating: ").append(number(absorbedPowerW * 1e3))
                    .append(" mW absorbed raise the heated plane by ").append(number(riseK))
                    .append(" K in steady state (as the probe reads it); every library value is taken at its layer's"
                            + " temperature plus that rise, iterated to consistency (").append(iterations)
                    .append(iterations == 1 ? " evaluation" : " evaluations")
                    .append("); values the case writes are not shifted.");
            if (values.isEmpty()) {
                sb.append(" No layer takes a value from a library, so nothing is shifted.");
            }
            return sb.toString();
        }

        /**
         * The state as plain JSON-ready values, the one record that result files and reports write: the power, the
         * rise, the iterations, the model in words, every library value with its temperature, and the warnings.
         */
        public Map<String, Object> record() {
            Map<String, Object> out = new LinkedHashMap<>();
            out.put("absorbed_power_w", absorbedPowerW);
            out.put("steady_rise_k", riseK);
            out.put("evaluations", iterations);
            out.put("model", inWords());
            List<Map<String, Object>> rows = new ArrayList<>();
            for (ShiftedValue v : values) {
                Map<String, Object> row = new LinkedHashMap<>();
                row.put("layer", v.layer());
                row.put("key", v.key());
                row.put("temperature_k", v.temperatureK());
                row.put("value_as_read", v.baseValue());
                row.put("value_used", v.value());
                row.put("unit", Units.ofKey(v.key()));
                rows.add(row);
            }
            out.put("values", rows);
            out.put("warnings", warnings);
            return out;
        }
    }

    /** The steady response of a stack, K/W, as the simulation's geometry gives it at 0 Hz. */
    @FunctionalInterface
    public interface SteadyResponse {
        double perWatt(Stack stack) throws InputException;
    }

    /** Whether the case asks for self-heating at all. */
    public boolean isOn() {
        return !path.isEmpty();
    }

    /**
     * The rise and the values consistent with it, by fixed-point iteration: ΔT₀ = P·R(values at T), then
     * ΔTₙ₊₁ = P·R(values at T + ΔTₙ) until two rises agree within {@link #TOLERANCE_REL} of the rise (or
     * {@link #TOLERANCE_K}).
     *
     * @param base the stack as read (its values at the base temperatures)
     * @throws InputException when the rise does not settle within {@link #MAX_ITERATIONS}
     */
    public Outcome settle(Stack base, SteadyResponse response) throws InputException {
        if (absorbedPowerW == 0) {
            return new Outcome(0, 0, 0, base, shift(base, 0, new ArrayList<>()).values, List.of());
        }
        double rise = rise(base, response);
        double previous = Double.NaN;
        for (int n = 1; n <= MAX_ITERATIONS; n++) {
            Shifted s = shift(base, rise, new ArrayList<>());
            double next = rise(s.stack, response);
            if (Math.abs(next - rise) <= TOLERANCE_REL * Math.abs(next) + TOLERANCE_K) {
                List<String> warnings = new ArrayList<>();
                Shifted last = shift(base, next, warnings);
                return new Outcome(absorbedPowerW, next, n + 1, last.stack, last.values, warnings);
            }
            previous = rise;
            rise = next;
        }
        throw InputException.at(path, "the steady rise under self-heating does not settle: after "
                + MAX_ITERATIONS + " iterations it still moves between " + number(previous) + " K and "
                + number(rise) + " K (the temperature-dependent library values feed back on the rise too strongly"
                + " for a consistent steady state, or the heating runs away); lower the absorbed power, or write the"
                + " values of the layers concerned in the case");
    }

    private double rise(Stack s, SteadyResponse response) throws InputException {
        double perWatt = response.perWatt(s);
        if (!(perWatt >= 0) || Double.isInfinite(perWatt)) {
            throw new ModelEvaluationException("the steady response under self-heating is " + perWatt
                    + " K/W; a finite, non-negative rise is needed");
        }
        return absorbedPowerW * perWatt;
    }

    private record Shifted(Stack stack, List<ShiftedValue> values) {
    }

    private Shifted shift(Stack base, double rise, List<String> warnings) throws InputException {
        Stack out = base;
        List<ShiftedValue> values = new ArrayList<>();
        for (Layer l : base.allLayers()) {
            List<LibraryBinding> mine = bindings.stream().filter(b -> b.layer().equals(l.name())).toList();
            if (mine.isEmpty()) {
                continue;
            }
            double kz = shifted(l, "k_through_w_mk", l.kThrough(), mine, rise, values, warnings);
            double kx = l.tie().x() ? kz : shifted(l, "k_in_plane_x_w_mk", l.kInPlaneX(), mine, rise, values,
                    warnings);
            double ky = l.tie().y() ? kz : shifted(l, "k_in_plane_y_w_mk", l.kInPlaneY(), mine, rise, values,
                    warnings);
            double c = shifted(l, "heat_capacity_j_m3k", l.heatCapacity(), mine, rise, values, warnings);
            if (rise != 0) {
                out = out.withLayer(l.name(), new Layer(l.name(), l.thickness(), kz, kx, ky, c, l.conductanceBelow(),
                        l.tie()));
            }
        }
        return new Shifted(out, values);
    }

    private static double shifted(Layer l, String key, double current, List<LibraryBinding> mine, double rise,
                                  List<ShiftedValue> values, List<String> warnings) throws InputException {
        Optional<LibraryBinding> found = mine.stream().filter(b -> b.key().equals(key)).findFirst();
        if (found.isEmpty()) {
            return current;
        }
        LibraryBinding b = found.get();
        double t = b.temperatureK() + rise;
        double used = rise == 0 ? current : current == b.value() ? at(b, t, warnings)
                : current * (at(b, t, warnings) / b.value());
        values.add(new ShiftedValue(l.name(), key, t, b.value(), used));
        return used;
    }

    private static double at(LibraryBinding b, double t, List<String> warnings) throws InputException {
        double within = Math.min(Math.max(t, b.lowK()), b.highK());
        if (within != t) {
            String range = b.lowK() == b.highK() ? "at " + kelvin(b.lowK()) + " only"
                    : "for " + kelvin(b.lowK()).replace(" K", "") + "–" + kelvin(b.highK()) + " only";
            warnings.add("layer '" + b.layer() + "': material '" + b.material().id() + "' (" + b.material().label()
                    + ") states " + b.quantity().key() + " " + range + ", but under self-heating the layer is at "
                    + kelvin(t) + " (" + kelvin(b.temperatureK()) + " + the steady rise " + number(t
                    - b.temperatureK()) + " K); its value at " + kelvin(within) + " is used for " + b.key()
                    + " (values are never extrapolated)");
        }
        return b.material().value(b.quantity(), within).value();
    }

    /** A temperature to 0.01 K: "347.02 K", "300 K". */
    static String kelvin(double t) {
        return BigDecimal.valueOf(t).setScale(2, RoundingMode.HALF_EVEN).stripTrailingZeros().toPlainString() + " K";
    }

    /** Four significant digits, plain where short. */
    static String number(double v) {
        if (v == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(4)).stripTrailingZeros();
        return Math.abs(v) >= 1e-3 && Math.abs(v) < 1e7 ? d.toPlainString() : String.format(Locale.ROOT, "%.3e", v);
    }
}
