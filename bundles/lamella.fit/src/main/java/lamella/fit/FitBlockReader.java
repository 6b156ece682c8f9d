package lamella.fit;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.Names;
import lamella.api.PhysicalRange;
import lamella.api.ParameterRef;

/**
 * Reads the {@code fit} block of a case: what to fit to, what is free, what is uncertain. Every mistake is an
 * InputException at its JSON path; unknown keys are errors.
 */
final class FitBlockReader {

    static final Set<String> FIT_KEYS = Set.of("datasets", "free", "uncertain", "weights", "multistart",
            "monte_carlo", "seed");
    static final Set<String> DATASET_KEYS = Set.of("data", "signal", "measurement", "geometry", "x_range", "exclude",
            "weights");
    static final Set<String> REF_KEYS = Set.of("layer", "property", "geometry", "measurement", "dataset");
    static final Set<String> FREE_KEYS = union(REF_KEYS, Set.of("initial", "min", "max"));
    static final Set<String> UNCERTAIN_KEYS = union(REF_KEYS, Set.of("sigma", "sigma_relative"));

    private FitBlockReader() {
    }

    static FitSpec read(CaseDocument doc) throws InputException {
        Block fit = fitBlock(doc, "\"fit\": {\"datasets\": […], \"free\": […]}");
        return read(doc, fit, datasets(fit, doc.file(), false));
    }

    /**
     * The fit block as a plan reads it: no data are needed, so {@code datasets} and their {@code data} are optional;
     * without datasets the case's own geometry and measurement make the one measurement planned.
     */
    static FitSpec readForPlan(CaseDocument doc) throws InputException {
        Block fit = fitBlock(doc, "\"fit\": {\"datasets\": […], \"free\": […]}");
        List<DatasetSpec> datasets = !fit.has("datasets") ? List.of(new DatasetSpec(0,
                "the case's measurement", null, null, null, null, RowSelection.ALL, null, "measurement"))
                : datasets(fit, doc.file(), true);
        return read(doc, fit, datasets);
    }

    /**
     * The fit rules for curves measured under the case's own blocks (a map's positions), as the one dataset
     * {@code curve}; the fit block's own datasets, if any, are not read.
     */
    static FitSpec readForCurves(CaseDocument doc, DatasetSpec curve) throws InputException {
        return read(doc, fitBlock(doc, "\"fit\": {\"free\": […]}"), List.of(curve));
    }

    private static Block fitBlock(CaseDocument doc, String example) throws InputException {
        Object raw = doc.root().get("fit");
        if (raw == null) {
            throw InputException.at("fit", "the case has no fit block; add " + example);
        }
        if (!(raw instanceof Block fit)) {
            throw InputException.at("fit", "expected an object, got " + Block.describe(raw));
        }
        only(fit, FIT_KEYS, "the fit block");
        return fit;
    }

    private static FitSpec read(CaseDocument doc, Block fit, List<DatasetSpec> datasets) throws InputException {
        CaseModel base = new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
        List<FreeInput> free = new ArrayList<>();
        Set<ParameterRef> seen = new HashSet<>();
        for (Block e : objects(fit, "free", true)) {
            only(e, FREE_KEYS, "a free input");
            ParameterRef ref = ref(e, datasets);
            if (!seen.add(ref)) {
                throw InputException.at(e.path(), ref + " is listed twice");
            }
            free.add(freeInput(e, ref, base, datasets));
        }
        List<UncertainInput> uncertain = new ArrayList<>();
        for (Block e : objects(fit, "uncertain", false)) {
            only(e, UNCERTAIN_KEYS, "an uncertain input");
            ParameterRef ref = ref(e, datasets);
            if (!seen.add(ref)) {
                throw InputException.at(e.path(), ref + " is already free or uncertain; an input is one or the other");
            }
            double v = value(base, datasets, ref, e.path());
            uncertain.add(new UncertainInput(ref, v, sigma(e, ref, v),
                    e.has("sigma_relative") ? finite(e, "sigma_relative") : Double.NaN, e.path()));
        }
        checkDirectionsNamedOnce(free, uncertain);
        FitSpec.Weighting weighting = fit.has("weights") ? weighting(fit) : FitSpec.Weighting.AUTO;
        return new FitSpec(datasets, free, uncertain, weighting, count(fit, "multistart"), count(fit, "monte_carlo"),
                fit.has("seed") ? (long) count(fit, "seed") : 1L);
    }

    private static List<DatasetSpec> datasets(Block fit, Path caseFile, boolean planning) throws InputException {
        List<DatasetSpec> out = new ArrayList<>();
        Path folder = caseFile.toAbsolutePath().getParent();
        for (Block d : objects(fit, "datasets", true)) {
            only(d, DATASET_KEYS, "a dataset");
            String data = planning && !d.has("data") ? null : d.requireString("data");
            String signal = d.has("signal") ? d.requireString("signal") : null;
            out.add(new DatasetSpec(out.size(), data != null ? data : d.path(),
                    data != null ? folder.resolve(data).normalize() : null, signal,
                    optionalObject(d, "geometry"), optionalObject(d, "measurement"), rows(d),
                    d.has("weights") ? weighting(d) : null, d.path()));
        }
        return out;
    }

    private static FitSpec.Weighting weighting(Block b) throws InputException {
        String w = b.requireString("weights");
        return switch (w) {
            case "auto" -> FitSpec.Weighting.AUTO;
            case "data" -> FitSpec.Weighting.DATA;
            case "residuals" -> FitSpec.Weighting.RESIDUALS;
            default -> throw InputException.at(b.pathOf("weights"), "unknown weighting '" + w
                    + "'; expected auto, data or residuals");
        };
    }

    /** A dataset's {@code x_range} [from, to] and {@code exclude} [[from, to], …], x in the data's SI unit. */
    private static RowSelection rows(Block d) throws InputException {
        double[] range = d.has("x_range") ? range(d.get("x_range"), d.pathOf("x_range")) : null;
        List<double[]> excluded = new ArrayList<>();
        Object ex = d.get("exclude");
        if (ex != null) {
            if (!(ex instanceof List<?> list)) {
                throw InputException.at(d.pathOf("exclude"), "expected a list of [from, to] ranges, such as"
                        + " [[-1e-9, 1e-10]], got " + Block.describe(ex));
            }
            for (int i = 0; i < list.size(); i++) {
                excluded.add(range(list.get(i), d.pathOf("exclude") + "[" + i + "]"));
            }
        }
        return range == null && excluded.isEmpty() ? RowSelection.ALL : new RowSelection(
                range == null ? Double.NEGATIVE_INFINITY : range[0],
                range == null ? Double.POSITIVE_INFINITY : range[1], excluded);
    }

    private static double[] range(Object v, String path) throws InputException {
        if (!(v instanceof List<?> l) || l.size() != 2 || !(l.get(0) instanceof Double a)
                || !(l.get(1) instanceof Double b)) {
            throw InputException.at(path, "expected [from, to]: two numbers in the data's x unit (s or Hz), got "
                    + Block.describe(v));
        }
        if (!(a < b)) {
            throw InputException.at(path, "from (" + a + ") must be less than to (" + b + ")");
        }
        return new double[] {a, b};
    }

    static ParameterRef ref(Block e, List<DatasetSpec> datasets) throws InputException {
        int kinds = (e.has("layer") ? 1 : 0) + (e.has("geometry") ? 1 : 0) + (e.has("measurement") ? 1 : 0);
        if (kinds != 1) {
            throw InputException.at(e.path(), "name exactly one of \"layer\" (with \"property\"), \"geometry\" or"
                    + " \"measurement\"");
        }
        if (e.has("layer")) {
            if (e.has("dataset")) {
                throw InputException.at(e.pathOf("dataset"), "layers belong to the stack every dataset shares");
            }
            String property = e.requireString("property");
            if (!CaseModel.LAYER_KEYS.contains(property)) {
                String hint = Names.closest(property, CaseModel.LAYER_KEYS).map(k -> " (did you mean '" + k + "'?)")
                        .orElse("");
                throw InputException.at(e.pathOf("property"), "unknown layer property '" + property + "'" + hint
                        + "; expected one of: " + String.join(", ", CaseModel.LAYER_KEYS));
            }
            return ParameterRef.layer(e.requireString("layer"), property);
        }
        if (e.has("property")) {
            throw InputException.at(e.pathOf("property"), "\"property\" goes with \"layer\"; for a geometry or"
                    + " measurement input the key itself is the value, e.g. {\"geometry\": \"pump_radius_m\"}");
        }
        boolean geometry = e.has("geometry");
        String key = e.requireString(geometry ? "geometry" : "measurement");
        ParameterRef ref = geometry ? ParameterRef.geometry(key) : ParameterRef.measurement(key);
        if (e.has("dataset")) {
            int i = count(e, "dataset");
            if (i >= datasets.size()) {
                throw InputException.at(e.pathOf("dataset"), "there are only " + datasets.size() + " datasets");
            }
            DatasetSpec d = datasets.get(i);
            if ((geometry ? d.geometry() : d.measurement()) == null) {
                throw InputException.at(e.pathOf("dataset"), "dataset " + i + " has no " + (geometry ? "geometry"
                        : "measurement") + " block of its own; leave out \"dataset\" to address the case's");
            }
            ref = ref.inDataset(i);
        }
        return ref;
    }

    /** The input's value in the case, checking that some dataset actually uses it. */
    private static double value(CaseModel base, List<DatasetSpec> datasets, ParameterRef ref, String at)
            throws InputException {
        if (ref.scope() == ParameterRef.Scope.LAYER) {
            return base.value(ref, at);
        }
        boolean geometry = ref.scope() == ParameterRef.Scope.GEOMETRY;
        if (ref.dataset() >= 0) {
            DatasetSpec d = datasets.get(ref.dataset());
            Block b = geometry ? d.geometry() : d.measurement();
            return new CaseModel(base.stack(), geometry ? b : base.geometry(), geometry ? base.measurement() : b)
                    .value(new ParameterRef(ref.scope(), null, ref.key(), -1), at);
        }
        boolean used = datasets.stream().anyMatch(d -> (geometry ? d.geometry() : d.measurement()) == null);
        if (!used) {
            throw InputException.at(at, "every dataset has its own " + (geometry ? "geometry" : "measurement")
                    + " block, so the case's " + ref.key() + " is not used; add \"dataset\": N");
        }
        return base.value(ref, at);
    }

    /**
     * The isotropic Λ moves every direction, and Λr both in-plane ones: naming a direction through two paths of one
     * layer would leave its value to the order of the list, so it is refused.
     */
    private static void checkDirectionsNamedOnce(List<FreeInput> free, List<UncertainInput> uncertain)
            throws InputException {
        List<ParameterRef> refs = new ArrayList<>();
        List<String> paths = new ArrayList<>();
        free.forEach(f -> {
            refs.add(f.ref());
            paths.add(f.path());
        });
        uncertain.forEach(u -> {
            refs.add(u.ref());
            paths.add(u.path());
        });
        for (int b = 0; b < refs.size(); b++) {
            for (int a = 0; a < b; a++) {
                ParameterRef first = refs.get(a);
                ParameterRef second = refs.get(b);
                if (first.scope() == ParameterRef.Scope.LAYER && second.scope() == ParameterRef.Scope.LAYER
                        && first.layer().equals(second.layer()) && overlap(first.key(), second.key())) {
                    throw InputException.at(paths.get(b), second + " and " + first + " (" + paths.get(a)
                            + ") both move " + shared(first.key(), second.key()) + " of layer '" + first.layer()
                            + "'; name each direction once: k_w_mk alone for an isotropic Λ, or k_through_w_mk with"
                            + " k_in_plane_w_mk (or its x and y parts)");
                }
            }
        }
    }

    private static boolean overlap(String a, String b) {
        boolean aK = CaseModel.CONDUCTIVITY_KEYS.contains(a);
        boolean bK = CaseModel.CONDUCTIVITY_KEYS.contains(b);
        if (!aK || !bK) {
            return false;
        }
        if (a.equals("k_w_mk") || b.equals("k_w_mk")) {
            return true;
        }
        return (a.equals("k_in_plane_w_mk") && b.startsWith("k_in_plane_"))
                || (b.equals("k_in_plane_w_mk") && a.startsWith("k_in_plane_"));
    }

    private static String shared(String a, String b) {
        return a.equals("k_w_mk") || b.equals("k_w_mk") ? "the conductivity" : "an in-plane conductivity";
    }

    /**
     * A free input from its entry. Its current value is the default start; an isotropic Λ fitted on a layer whose
     * directions differ has no current value and needs {@code initial} (the fit then makes the layer isotropic).
     */
    private static FreeInput freeInput(Block e, ParameterRef ref, CaseModel base, List<DatasetSpec> datasets)
            throws InputException {
        boolean startGiven = e.has("initial");
        double initial;
        if (startGiven && ref.scope() == ParameterRef.Scope.LAYER && ref.key().equals("k_w_mk")) {
            base.value(ParameterRef.layer(ref.layer(), "k_through_w_mk"), e.path());
            initial = finite(e, "initial");
        } else {
            double current = value(base, datasets, ref, e.path());
            initial = startGiven ? finite(e, "initial") : current;
        }
        if (startGiven) {
            PhysicalRange.checkKey(ref.key(), initial, e.pathOf("initial"));
        }
        double min = e.has("min") ? inRange(e, "min", ref) : Double.NEGATIVE_INFINITY;
        double max = e.has("max") ? inRange(e, "max", ref) : Double.POSITIVE_INFINITY;
        if (min >= max) {
            throw InputException.at(e.pathOf("max"), "the upper bound " + max + " must exceed the lower bound " + min);
        }
        if (initial < min || initial > max) {
            throw InputException.at(e.has("initial") ? e.pathOf("initial") : e.path(), "the initial value " + initial
                    + " lies outside [" + min + ", " + max + "]");
        }
        boolean positive = ref.scope() == ParameterRef.Scope.LAYER || (initial > 0 && min >= 0);
        if (ref.scope() == ParameterRef.Scope.LAYER && !(initial > 0)) {
            throw InputException.at(e.has("initial") ? e.pathOf("initial") : e.path(), "a layer property is"
                    + " positive; the initial value " + initial + " is not");
        }
        if (positive && min == 0) {
            min = Double.NEGATIVE_INFINITY;
        }
        double scale = Math.max(Math.abs(initial), Math.max(finiteOr(Math.abs(min)), finiteOr(Math.abs(max))));
        return new FreeInput(ref, initial, min, max, positive, scale > 0 ? scale : 1.0, e.path());
    }

    private static double sigma(Block e, ParameterRef ref, double value) throws InputException {
        if (e.has("sigma") == e.has("sigma_relative")) {
            throw InputException.at(e.path(), "give either \"sigma\" (absolute, in the input's unit) or"
                    + " \"sigma_relative\" (a fraction of its value)");
        }
        String key = e.has("sigma") ? "sigma" : "sigma_relative";
        double given = finite(e, key);
        if (!(given > 0)) {
            throw InputException.at(e.pathOf(key), "an uncertainty must be positive");
        }
        if (key.equals("sigma_relative")) {
            PhysicalRange.RELATIVE_UNCERTAINTY.check(given, e.pathOf(key));
            return given * Math.abs(value);
        }
        Optional<PhysicalRange> range = PhysicalRange.forKey(ref.key());
        if (range.isPresent() && given > range.get().max()) {
            throw InputException.at(e.pathOf(key), "the uncertainty " + given + " exceeds every value Lamella"
                    + " accepts for " + range.get().wording());
        }
        return given;
    }

    static List<Block> objects(Block parent, String key, boolean required) throws InputException {
        Object v = parent.get(key);
        if (v == null) {
            if (required) {
                throw InputException.at(parent.pathOf(key), "missing; expected a non-empty list");
            }
            return List.of();
        }
        if (!(v instanceof List<?> list) || (required && list.isEmpty())) {
            throw InputException.at(parent.pathOf(key), "expected a" + (required ? " non-empty" : "")
                    + " list of objects, got " + Block.describe(v));
        }
        List<Block> out = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            if (!(list.get(i) instanceof Block b)) {
                throw InputException.at(parent.pathOf(key) + "[" + i + "]", "expected an object, got "
                        + Block.describe(list.get(i)));
            }
            out.add(b);
        }
        return out;
    }

    private static Block optionalObject(Block parent, String key) throws InputException {
        Object v = parent.get(key);
        if (v == null) {
            return null;
        }
        if (!(v instanceof Block b)) {
            throw InputException.at(parent.pathOf(key), "expected an object, got " + Block.describe(v));
        }
        return b;
    }

    static double finite(Block b, String key) throws InputException {
        Object v = b.get(key);
        if (!(v instanceof Double d)) {
            throw InputException.at(b.pathOf(key), "expected a number, got " + Block.describe(v));
        }
        return d;
    }

    /** A bound of a free input: zero, or a value within the range of the input's key. */
    private static double inRange(Block e, String key, ParameterRef ref) throws InputException {
        double v = finite(e, key);
        PhysicalRange.checkKey(ref.key(), v, e.pathOf(key));
        return v;
    }

    static int count(Block b, String key) throws InputException {
        if (!b.has(key)) {
            return 0;
        }
        double d = finite(b, key);
        if (d < 0 || d != Math.rint(d) || d > Integer.MAX_VALUE) {
            throw InputException.at(b.pathOf(key), "expected a whole number ≥ 0, got " + d);
        }
        return (int) d;
    }

    private static double finiteOr(double v) {
        return Double.isFinite(v) ? v : 0.0;
    }

    static void only(Block b, Set<String> known, String what) throws InputException {
        for (String key : b.values().keySet()) {
            if (!known.contains(key)) {
                String hint = Names.closest(key, known).map(k -> " (did you mean '" + k + "'?)").orElse("");
                throw InputException.at(b.pathOf(key), "unknown key in " + what + hint + "; expected one of: "
                        + String.join(", ", new TreeSet<>(known)));
            }
        }
    }

    static Set<String> union(Set<String> a, Set<String> b) {
        Set<String> s = new HashSet<>(a);
        s.addAll(b);
        return Set.copyOf(s);
    }
}
