package lamella.materials;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Pattern;
import lamella.api.Block;
import lamella.api.Names;
import lamella.api.material.Curation;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryInfo;
import lamella.api.material.Material;
import lamella.api.material.MaterialProperty;
import lamella.api.material.MaterialQuantity;
import lamella.api.material.TemperatureCurve;

/**
 * Reads one entry of a library file and checks it whole: keys, units and ranges, tables, sources, and that its
 * properties state conductivity and heat capacity in one consistent way. The first error keeps the entry out;
 * warnings are collected and the entry stays.
 */
final class EntryReader {

    static final Set<String> ENTRY_KEYS = Set.of("id", "name", "aliases", "replaces", "version", "reviewed_by",
            "reviewed_on", "source", "notes", "properties");
    static final Set<String> PROPERTY_KEYS = Set.of("value", "at_k", "range_k", "table", "uncertainty_rel", "source",
            "notes");
    /** Ids are what case files type: lower case, digits and a few joiners, no spaces. */
    static final Pattern ID = Pattern.compile("[a-z0-9][a-z0-9._+-]*");

    private final String file;
    private final LibraryJson json;
    private final LibraryInfo library;
    private final List<LibraryFinding> warnings;

    EntryReader(String file, LibraryJson json, LibraryInfo library, List<LibraryFinding> warnings) {
        this.file = file;
        this.json = json;
        this.library = library;
        this.warnings = warnings;
    }

    Material read(Block e) throws FindingException {
        onlyKnown(e, ENTRY_KEYS, "an entry");
        String id = text(e, "id", true);
        if (!ID.matcher(id).matches()) {
            throw error(e.pathOf("id"), "the id '" + id + "' must be lower case letters, digits and . _ + -,"
                    + " starting with a letter or digit");
        }
        String name = text(e, "name", true);
        List<String> aliases = names(e, "aliases", "alias");
        List<String> replaces = names(e, "replaces", "replaced name");
        Curation curation = curation(e);
        String defaultSource = e.has("source") ? text(e, "source", true) : null;
        String notes = e.has("notes") ? text(e, "notes", false) : "";
        Object raw = e.get("properties");
        if (!(raw instanceof Block props) || props.values().isEmpty()) {
            throw error(e.pathOf("properties"), raw == null
                    ? "missing; expected an object of properties such as k_w_mk, density_kg_m3, specific_heat_j_kgk"
                    : "expected a non-empty object of properties, got " + Block.describe(raw));
        }
        Map<MaterialQuantity, MaterialProperty> properties = new LinkedHashMap<>();
        for (String key : props.values().keySet()) {
            MaterialQuantity q = MaterialQuantity.ofKey(key).orElseThrow(() -> {
                Set<String> known = new TreeSet<>();
                for (MaterialQuantity m : MaterialQuantity.values()) {
                    known.add(m.key());
                }
                String hint = Names.closest(key, known).map(k -> " (did you mean '" + k + "'?)").orElse("");
                return error(props.pathOf(key), "unknown property" + hint + "; expected one of: "
                        + String.join(", ", known));
            });
            properties.put(q, property(props, key, q, defaultSource));
        }
        consistentForms(props, new EnumMap<>(properties));
        return new Material(id, name, aliases, replaces, properties, curation, notes, library,
                file + ":" + json.lineOf(e.path()));
    }

    /** A list of names under {@code key} (aliases, or the lower tiers' entries an entry replaces). */
    private List<String> names(Block e, String key, String what) throws FindingException {
        if (!e.has(key)) {
            return List.of();
        }
        if (!(e.get(key) instanceof List<?> list)) {
            throw error(e.pathOf(key), "expected a list of names, got " + Block.describe(e.get(key)));
        }
        List<String> out = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            String at = e.pathOf(key) + "[" + i + "]";
            if (!(list.get(i) instanceof String s) || s.isBlank()) {
                throw error(at, "expected a non-blank name, got " + Block.describe(list.get(i)));
            }
            if (out.stream().anyMatch(a -> a.equalsIgnoreCase(s.trim()))) {
                throw error(at, "the " + what + " '" + s + "' is listed twice");
            }
            out.add(s.trim());
        }
        return out;
    }

    private Curation curation(Block e) throws FindingException {
        Object v = e.get("version");
        if (v == null) {
            throw error(e.pathOf("version"), "missing; expected the entry's revision, a whole number from 1, raised"
                    + " at every change of a value");
        }
        if (!(v instanceof Double d) || d != Math.rint(d) || d < 1 || d > Integer.MAX_VALUE) {
            throw error(e.pathOf("version"), "expected a whole number from 1, got " + Block.describe(v));
        }
        Optional<String> by = e.has("reviewed_by") ? Optional.of(text(e, "reviewed_by", true)) : Optional.empty();
        Optional<LocalDate> on = Optional.empty();
        if (e.has("reviewed_on")) {
            String s = text(e, "reviewed_on", true);
            try {
                on = Optional.of(LocalDate.parse(s));
            } catch (DateTimeParseException ex) {
                throw error(e.pathOf("reviewed_on"), "expected a date as YYYY-MM-DD, got \"" + s + "\"");
            }
            if (by.isEmpty()) {
                throw error(e.pathOf("reviewed_on"), "a review date needs reviewed_by: who reviewed it");
            }
        }
        return new Curation(d.intValue(), by, on);
    }

    private MaterialProperty property(Block props, String key, MaterialQuantity q, String defaultSource)
            throws FindingException {
        Object raw = props.get(key);
        String at = props.pathOf(key);
        if (!(raw instanceof Block p)) {
            throw error(at, "expected an object with value or table, uncertainty_rel and source, got "
                    + Block.describe(raw));
        }
        onlyKnown(p, PROPERTY_KEYS, "a property");
        TemperatureCurve curve;
        if (p.has("value") == p.has("table")) {
            throw error(at, "give either value (with at_k or range_k) or table, exactly one of them");
        }
        if (p.has("value")) {
            double v = positive(p, "value", q);
            if (p.has("at_k") == p.has("range_k")) {
                throw error(at, "a single value needs the temperature it holds at: at_k, or range_k [low, high]"
                        + " over which the curator vouches for it (exactly one of them)");
            }
            if (p.has("at_k")) {
                double t = temperature(p.get("at_k"), p.pathOf("at_k"));
                curve = TemperatureCurve.constant(v, t, t);
            } else {
                double[] r = range(p);
                curve = TemperatureCurve.constant(v, r[0], r[1]);
            }
        } else {
            for (String k : List.of("at_k", "range_k")) {
                if (p.has(k)) {
                    throw error(p.pathOf(k), "a table states its own temperatures; leave " + k + " out");
                }
            }
            curve = table(p, q);
        }
        OptionalDouble u = OptionalDouble.empty();
        if (p.has("uncertainty_rel")) {
            Object uv = p.get("uncertainty_rel");
            if (!(uv instanceof Double d) || !(d > 0) || !(d < 1)) {
                throw error(p.pathOf("uncertainty_rel"), "expected the relative standard uncertainty as a fraction"
                        + " between 0 and 1 (0.05 for 5 %), got " + Block.describe(uv));
            }
            u = OptionalDouble.of(d);
        } else {
            warn(at, "no uncertainty_rel: the value cannot enter an uncertainty budget");
        }
        String source = p.has("source") ? text(p, "source", true) : defaultSource;
        if (source == null) {
            throw error(at, "no source: name the publication or handbook table in the property's or the entry's"
                    + " source (say \"from memory\" where the value was recalled)");
        }
        String notes = p.has("notes") ? text(p, "notes", false) : "";
        for (double v : curve.values()) {
            if (v < q.plausibleLow() || v > q.plausibleHigh()) {
                warn(at, Numbers.plain(v) + " is outside " + Numbers.plain(q.plausibleLow()) + "–"
                        + Numbers.plain(q.plausibleHigh()) + " for " + q.description()
                        + " in " + lamella.api.Units.ofKey(q.key()) + "; is the unit right?");
                break;
            }
        }
        return new MaterialProperty(q, curve, u, source, notes);
    }

    private TemperatureCurve table(Block p, MaterialQuantity q) throws FindingException {
        String at = p.pathOf("table");
        if (!(p.get("table") instanceof List<?> rows) || rows.size() < 2) {
            throw error(at, "expected a list of at least two [T_K, value] rows, got " + Block.describe(p.get("table")));
        }
        double[] t = new double[rows.size()];
        double[] v = new double[rows.size()];
        for (int i = 0; i < rows.size(); i++) {
            String row = at + "[" + i + "]";
            if (!(rows.get(i) instanceof List<?> pair) || pair.size() != 2 || !(pair.get(0) instanceof Double)
                    || !(pair.get(1) instanceof Double)) {
                throw error(row, "expected a row [T_K, value] of two numbers, got " + Block.describe(rows.get(i)));
            }
            t[i] = temperature(pair.get(0), row + "[0]");
            v[i] = (Double) pair.get(1);
            if (!(v[i] > 0)) {
                throw error(row + "[1]", "expected a positive " + q.description() + " in "
                        + lamella.api.Units.ofKey(q.key()) + ", got " + v[i]);
            }
            if (i > 0 && !(t[i] > t[i - 1])) {
                throw error(row + "[0]", "temperatures must increase from row to row: " + t[i] + " K follows "
                        + t[i - 1] + " K");
            }
        }
        return TemperatureCurve.table(t, v);
    }

    private double[] range(Block p) throws FindingException {
        String at = p.pathOf("range_k");
        if (!(p.get("range_k") instanceof List<?> r) || r.size() != 2) {
            throw error(at, "expected [low_K, high_K], got " + Block.describe(p.get("range_k")));
        }
        double lo = temperature(r.get(0), at + "[0]");
        double hi = temperature(r.get(1), at + "[1]");
        if (hi < lo) {
            throw error(at, "the range's high end " + hi + " K is below its low end " + lo + " K");
        }
        return new double[] {lo, hi};
    }

    private double temperature(Object v, String at) throws FindingException {
        if (!(v instanceof Double d) || !(d > 0)) {
            throw error(at, "expected a positive temperature in K, got " + Block.describe(v));
        }
        return d;
    }

    private double positive(Block p, String key, MaterialQuantity q) throws FindingException {
        Object v = p.get(key);
        if (!(v instanceof Double d) || !(d > 0)) {
            throw error(p.pathOf(key), "expected a positive " + q.description() + " in "
                    + lamella.api.Units.ofKey(q.key()) + ", got " + Block.describe(v));
        }
        return d;
    }

    /** Each quantity is stated in exactly one way, so no two stated values can disagree. */
    private void consistentForms(Block props, Map<MaterialQuantity, MaterialProperty> p) throws FindingException {
        boolean iso = p.containsKey(MaterialQuantity.K);
        boolean film = p.containsKey(MaterialQuantity.K_THROUGH) || p.containsKey(MaterialQuantity.K_IN_PLANE);
        boolean uniaxial = p.containsKey(MaterialQuantity.K_PARALLEL_C)
                || p.containsKey(MaterialQuantity.K_PERPENDICULAR_C);
        if ((iso ? 1 : 0) + (film ? 1 : 0) + (uniaxial ? 1 : 0) > 1) {
            throw error(props.path(), "state conductivity in one way only: k_w_mk (isotropic), or k_through_w_mk"
                    + " and k_in_plane_w_mk (a film), or k_parallel_c_w_mk and k_perpendicular_c_w_mk (a uniaxial"
                    + " crystal)");
        }
        pair(props, p, MaterialQuantity.K_THROUGH, MaterialQuantity.K_IN_PLANE,
                "a film states both; if it is isotropic, state k_w_mk instead");
        pair(props, p, MaterialQuantity.K_PARALLEL_C, MaterialQuantity.K_PERPENDICULAR_C,
                "a uniaxial crystal states both");
        if (p.containsKey(MaterialQuantity.HEAT_CAPACITY)
                && (p.containsKey(MaterialQuantity.DENSITY) || p.containsKey(MaterialQuantity.SPECIFIC_HEAT))) {
            throw error(props.path(), "state heat capacity in one way only: heat_capacity_j_m3k, or density_kg_m3"
                    + " and specific_heat_j_kgk (from which it is derived); both ways could disagree");
        }
        pair(props, p, MaterialQuantity.DENSITY, MaterialQuantity.SPECIFIC_HEAT,
                "the heat capacity is derived from both");
    }

    private void pair(Block props, Map<MaterialQuantity, MaterialProperty> p, MaterialQuantity a, MaterialQuantity b,
                      String why) throws FindingException {
        if (p.containsKey(a) != p.containsKey(b)) {
            MaterialQuantity given = p.containsKey(a) ? a : b;
            MaterialQuantity missing = given == a ? b : a;
            throw error(props.pathOf(given.key()), given.key() + " without " + missing.key() + ": " + why);
        }
    }

    private String text(Block b, String key, boolean required) throws FindingException {
        Object v = b.get(key);
        if (v == null) {
            throw error(b.pathOf(key), "missing; expected a text value");
        }
        if (!(v instanceof String s)) {
            throw error(b.pathOf(key), "expected a text value, got " + Block.describe(v));
        }
        if (required && s.isBlank()) {
            throw error(b.pathOf(key), "must not be blank");
        }
        return s;
    }

    private void onlyKnown(Block b, Set<String> known, String what) throws FindingException {
        for (String key : b.values().keySet()) {
            if (!known.contains(key)) {
                String hint = Names.closest(key, known).map(k -> " (did you mean '" + k + "'?)").orElse("");
                throw error(b.pathOf(key), "unknown key in " + what + hint + "; expected one of: "
                        + String.join(", ", new TreeSet<>(known)));
            }
        }
    }

    private void warn(String path, String message) {
        warnings.add(new LibraryFinding(LibraryFinding.Severity.WARNING, file, json.lineOf(path), path, message));
    }

    private FindingException error(String path, String message) {
        return new FindingException(file, json.lineOf(path), path, message);
    }
}
