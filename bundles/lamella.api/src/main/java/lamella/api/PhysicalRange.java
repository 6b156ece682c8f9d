package lamella.api;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * The values of a quantity that a layered-stack model of a thermoreflectance or 3ω measurement can take, found by
 * the unit a case-file key ends in ({@code _m}, {@code _w_mk}, {@code _hz}, …): a value outside is an input error at
 * its JSON path before any model sees it, so 1e308 or 1e-308 never reach the numerics. The limits are wide — every
 * real sample and instrument lies far inside — and the README's table lists them. They bound magnitudes: whether a
 * key may be zero or negative is its own constraint (an offset may be either), and a zero is always left to it.
 *
 * @param quantity what the key measures, in words
 * @param unit     its SI unit as printed
 * @param min      the smallest magnitude accepted (other than zero, where the key allows zero)
 * @param max      the largest magnitude accepted
 */
public record PhysicalRange(String quantity, String unit, double min, double max) {

    /**
     * Suffixes, a longer one before any it ends in: {@code _w_m2k} is not taken for {@code _k}, {@code _m2k_w} not
     * for {@code _w}, {@code _ohm_per_k} not for {@code _k}.
     */
    private static final List<Suffix> SUFFIXES = List.of(
            new Suffix("_m2k_w", new PhysicalRange("a thermal boundary resistance", "m² K/W", 1e-13, 1e-3)),
            new Suffix("_ohm_per_k", new PhysicalRange("a temperature coefficient of resistance", "Ω/K", 1e-9,
                    1e6)),
            new Suffix("_ohm", new PhysicalRange("an electrical resistance", "Ω", 1e-6, 1e9)),
            new Suffix("_v", new PhysicalRange("a voltage", "V", 1e-15, 1e3)),
            new Suffix("_a", new PhysicalRange("an electrical current", "A", 1e-12, 10.0)),
            new Suffix("_w_mk", new PhysicalRange("a thermal conductivity", "W/(m K)", 1e-4, 1e4)),
            new Suffix("_w_m2k", new PhysicalRange("a thermal boundary conductance", "W/(m² K)", 1e3, 1e13)),
            new Suffix("_j_m3k", new PhysicalRange("a volumetric heat capacity", "J/(m³ K)", 1e2, 1e8)),
            new Suffix("_hz", new PhysicalRange("a frequency", "Hz", 1e-3, 1e11)),
            new Suffix("_k", new PhysicalRange("a temperature", "K", 1e-1, 1e4)),
            new Suffix("_w", new PhysicalRange("a power", "W", 1e-12, 1e3)),
            new Suffix("_s", new PhysicalRange("a time", "s", 1e-16, 1e3)),
            new Suffix("_m", new PhysicalRange("a length", "m", 1e-11, 10.0)));

    /** The fraction of a value that {@code sigma_relative} gives as its uncertainty. */
    public static final PhysicalRange RELATIVE_UNCERTAINTY = new PhysicalRange("a relative uncertainty", "", 1e-9,
            1.0);

    private record Suffix(String suffix, PhysicalRange range) {
    }

    /** The range of a key by the unit it ends in; empty for a key without one of the SI suffixes above. */
    public static Optional<PhysicalRange> forKey(String key) {
        for (Suffix s : SUFFIXES) {
            if (key.endsWith(s.suffix())) {
                return Optional.of(s.range());
            }
        }
        return Optional.empty();
    }

    /** Whether a value's magnitude lies in the range; zero is for the key's own constraint to accept or refuse. */
    public boolean admits(double v) {
        double a = Math.abs(v);
        return a == 0 || (a >= min && a <= max);
    }

    /** "a thermal conductivity between 1e-4 and 1e4 W/(m K)". */
    public String wording() {
        return quantity + " between " + number(min) + " and " + number(max) + (unit.isEmpty() ? "" : " " + unit);
    }

    /** Checks a value read at a JSON path. */
    public void check(double v, String path) throws InputException {
        if (!admits(v)) {
            throw InputException.at(path, number(v) + " is outside the range Lamella accepts for " + wording());
        }
    }

    /** Checks a value against the range of its key, when the key has one. */
    public static void checkKey(String key, double v, String path) throws InputException {
        Optional<PhysicalRange> r = forKey(key);
        if (r.isPresent()) {
            r.get().check(v, path);
        }
    }

    private static String number(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e6) {
            return String.format(Locale.ROOT, "%.0f", v);
        }
        return String.valueOf(v).replace("E", "e").replace(".0e", "e");
    }
}
