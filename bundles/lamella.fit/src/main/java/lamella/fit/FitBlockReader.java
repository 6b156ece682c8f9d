package lamella.fit;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
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
import lamella.api.Sample;

/**
 * Reads the {@code fit} block of a case: what to fit to, what is free, what is uncertain. Every mistake is an
 * InputException at its JSON path; unknown keys are errors.
 */
final class FitBlockReader {

    static final Set<String> FIT_KEYS = Set.of("datasets", "free", "uncertain", "weights", "multistart",
            "monte_carlo", "seed", "gains");
    static final Set<String> DATASET_KEYS = Set.of("data", "signal", "measurement", "geometry", "x_range", "exclude",
            "weights", "sample", "gain");
    static final Set<String> REF_KEYS = Set.of("layer", "property", "geometry", "measurement", "dataset", "sample",
            "gain");
    /** Signals a gain may not multiply: a phase and the TDTR ratio carry no detector gain. */
    static final Set<String> GAINLESS_SIGNALS = Set.of("phase_deg", "ratio");
    static final Set<String> FREE_KEYS = union(REF_KEYS, Set.of("initial", "min", "max"));
    static final Set<String> UNCERTAIN_KEYS = union(REF_KEYS, Set.of("sigma", "sigma_relative"));

    private FitBlockReader() {
    }

    static FitSpec read(CaseDocument doc) throws InputException {
        Block fit = fitBlock(doc, "\"fit\": {\"datasets\": […], \"free\": […]}");
        Map<String, Double> gains = gains(fit);
        return read(doc, fit, datasets(fit, doc, gains, false), gains);
    }

    /**
     * The fit block as a plan reads it: no data are needed, so {@code datasets} and their {@code data} are optional;
     * without datasets the case's own geometry and measurement make the one measurement planned.
     */
    static FitSpec readForPlan(CaseDocument doc) throws InputException {
        doc.requireOneSample("a plan");
        Block fit = fitBlock(doc, "\"fit\": {\"datasets\": […], \"free\": […]}");
        if (fit.has("gains")) {
            throw InputException.at("fit.gains", "a plan does not model gains; plan without them (a gain scales a"
                    + " signal and its noise alike)");
        }
        List<DatasetSpec> datasets = !fit.has("datasets") ? List.of(new DatasetSpec(0,
                "the case's measurement", null, null, null, null, RowSelection.ALL, null, "measurement"))
                : datasets(fit, doc, Map.of(), true);
        return read(doc, fit, datasets, Map.of());
    }

    /**
     * The fit rules for curves measured under the case's own blocks (a map's positions), as the one dataset
     * {@code curve}; the fit block's own datasets, if any, are not read.
     */
    static FitSpec readForCurves(CaseDocument doc, DatasetSpec curve) throws InputException {
        doc.requireOneSample("a map");
        Block fit = fitBlock(doc, "\"fit\": {\"free\": […]}");
        if (fit.has("gains")) {
            throw InputException.at("fit.gains", "a map's curves are fitted without gains");
        }
        return read(doc, fit, List.of(curve), Map.of());
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

    private static FitSpec read(CaseDocument doc, Block fit, List<DatasetSpec> datasets, Map<String, Double> gains)
            throws InputException {
        Inputs base = new Inputs(doc, datasets, gains);
        List<FreeInput> free = new ArrayList<>();
        Map<ParameterRef, String> seen = new LinkedHashMap<>();
        for (Block e : objects(fit, "free", true)) {
            only(e, FREE_KEYS, "a free input");
            ParameterRef ref = ref(e, datasets, doc, gains);
            if (seen.containsKey(ref)) {
                throw InputException.at(e.path(), ref + " is listed twice");
            }
            notTwiceBySample(ref, e.path(), seen);
            seen.put(ref, e.path());
            free.add(freeInput(e, ref, base));
        }
        List<UncertainInput> uncertain = new ArrayList<>();
        for (Block e : objects(fit, "uncertain", false)) {
            only(e, UNCERTAIN_KEYS, "an uncertain input");
            ParameterRef ref = ref(e, datasets, doc, gains);
            if (seen.containsKey(ref)) {
                throw InputException.at(e.path(), ref + " is already free or uncertain; an input is one or the other");
            }
            notTwiceBySample(ref, e.path(), seen);
            seen.put(ref, e.path());
            double v = base.value(ref, e.path(), false);
            uncertain.add(new UncertainInput(ref, v, sigma(e, ref, v),
                    e.has("sigma_relative") ? finite(e, "sigma_relative") : Double.NaN, e.path()));
        }
        checkDirectionsNamedOnce(free, uncertain);
        FitSpec.Weighting weighting = fit.has("weights") ? weighting(fit) : FitSpec.Weighting.AUTO;
        for (String g : gains.keySet()) {
            if (datasets.stream().noneMatch(d -> g.equals(d.gain()))) {
                throw InputException.at("fit.gains." + g, "no dataset names the gain '" + g + "'; give a dataset"
                        + " \"gain\": \"" + g + "\", or leave it out");
            }
        }
        return new FitSpec(datasets, free, uncertain, weighting, count(fit, "multistart"), count(fit, "monte_carlo"),
                fit.has("seed") ? (long) count(fit, "seed") : 1L, gains);
    }

    /**
     * {@code fit.gains}: an object of named gains, each a positive dimensionless factor by which the signal of every
     * dataset that names it is multiplied (a detector's or lock-in's calibration). Empty when absent.
     */
    private static Map<String, Double> gains(Block fit) throws InputException {
        Object raw = fit.get("gains");
        if (raw == null) {
            return Map.of();
        }
        if (!(raw instanceof Block g) || g.values().isEmpty()) {
            throw InputException.at("fit.gains", "expected an object of named gains, such as {\"detector\": 1.0}"
                    + " (a positive factor on the signal of each dataset that names it), got "
                    + Block.describe(raw));
        }
        Map<String, Double> out = new LinkedHashMap<>();
        for (String name : g.values().keySet()) {
            double v = finite(g, name);
            if (!(v > 0) || v > 1e12 || v < 1e-12) {
                throw InputException.at(g.pathOf(name), "expected a positive gain between 1e-12 and 1e12 (a factor"
                        + " on the signal), got " + v);
            }
            out.put(name, v);
        }
        return out;
    }

    private static List<DatasetSpec> datasets(Block fit, CaseDocument doc, Map<String, Double> gains,
                                              boolean planning) throws InputException {
        List<DatasetSpec> out = new ArrayList<>();
        Path folder = doc.file().toAbsolutePath().getParent();
        for (Block d : objects(fit, "datasets", true)) {
            only(d, DATASET_KEYS, "a dataset");
            String data = planning && !d.has("data") ? null : d.requireString("data");
            String signal = d.has("signal") ? d.requireString("signal") : null;
            String gain = null;
            if (d.has("gain")) {
                gain = d.requireString("gain");
                if (!gains.containsKey(gain)) {
                    throw InputException.at(d.pathOf("gain"), "there is no gain '" + gain + "' in fit.gains"
                            + (gains.isEmpty() ? "; add \"gains\": {\"" + gain + "\": 1.0} to the fit block"
                            : "; gains: " + String.join(", ", gains.keySet())));
                }
            }
            out.add(new DatasetSpec(out.size(), data != null ? data : d.path(),
                    data != null ? folder.resolve(data).normalize() : null, signal,
                    optionalObject(d, "geometry"), optionalObject(d, "measurement"), rows(d),
                    d.has("weights") ? weighting(d) : null, d.path(), sampleOf(d, doc), gain));
        }
        return out;
    }

    /**
     * The sample a dataset names with {@code sample}: required when the case has several, optional when its
     * {@code samples} list has one, refused when the case has a single top-level stack.
     */
    private static Sample sampleOf(Block d, CaseDocument doc) throws InputException {
        if (!d.has("sample")) {
            if (doc.severalSamples()) {
                throw InputException.at(d.pathOf("sample"), "missing; the case has " + doc.samples().size()
                        + " samples, so every dataset names the one it was measured on: "
                        + String.join(", ", doc.sampleNames()));
            }
            return doc.samples().get(0);
        }
        return namedSample(d, "sample", doc);
    }

    private static Sample namedSample(Block e, String key, CaseDocument doc) throws InputException {
        String name = e.requireString(key);
        if (!doc.samples().get(0).named()) {
            throw InputException.at(e.pathOf(key), "the case has one stack and no samples list, so there is no"
                    + " sample '" + name + "' to name; leave \"" + key + "\" out");
        }
        return doc.sample(name).orElseThrow(() -> InputException.at(e.pathOf(key), "there is no sample '" + name
                + "'" + Names.closest(name, doc.sampleNames()).map(n -> " (did you mean '" + n + "'?)").orElse("")
                + "; samples: " + String.join(", ", doc.sampleNames())));
    }

    /**
     * A layer path with a sample and the same path without one (which already names that sample's layer), or the
     * other way round, would leave the value to the order of the list.
     */
    private static void notTwiceBySample(ParameterRef ref, String at, Map<ParameterRef, String> seen)
            throws InputException {
        for (Map.Entry<ParameterRef, String> e : seen.entrySet()) {
            ParameterRef o = e.getKey();
            if (o.scope() == ref.scope() && o.key().equals(ref.key()) && java.util.Objects.equals(o.layer(),
                    ref.layer()) && o.dataset() == ref.dataset() && (o.sample() == null) != (ref.sample() == null)) {
                ParameterRef unqualified = o.sample() == null ? o : ref;
                throw InputException.at(at, ref + " and " + o + " (" + e.getValue() + ") name the same input:"
                        + " " + unqualified + " already names it in every sample"
                        + (ref.scope() == ParameterRef.Scope.LAYER ? " that has layer '" + ref.layer() + "'" : "")
                        + "; name it once, for every sample or for one");
            }
        }
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

    /** A path of a plan block: no samples and no gains. */
    static ParameterRef ref(Block e, List<DatasetSpec> datasets) throws InputException {
        for (String key : List.of("sample", "gain")) {
            if (e.has(key)) {
                throw InputException.at(e.pathOf(key), "a plan varies inputs of one sample and has no gains; leave"
                        + " \"" + key + "\" out");
            }
        }
        return ref(e, datasets, null, Map.of());
    }

    /** A path of a free or uncertain input of the fit block, with its sample or gain where it names one. */
    static ParameterRef ref(Block e, List<DatasetSpec> datasets, CaseDocument doc, Map<String, Double> gains)
            throws InputException {
        int kinds = (e.has("layer") ? 1 : 0) + (e.has("geometry") ? 1 : 0) + (e.has("measurement") ? 1 : 0)
                + (e.has("gain") ? 1 : 0);
        if (kinds != 1) {
            throw InputException.at(e.path(), "name exactly one of \"layer\" (with \"property\"), \"geometry\","
                    + " \"measurement\" or \"gain\"");
        }
        if (e.has("gain")) {
            for (String key : List.of("sample", "dataset", "property")) {
                if (e.has(key)) {
                    throw InputException.at(e.pathOf(key), "a gain is one factor shared by every dataset that"
                            + " names it; leave \"" + key + "\" out");
                }
            }
            String name = e.requireString("gain");
            if (!gains.containsKey(name)) {
                throw InputException.at(e.pathOf("gain"), "there is no gain '" + name + "' in fit.gains"
                        + (gains.isEmpty() ? "" : "; gains: " + String.join(", ", gains.keySet())));
            }
            return ParameterRef.gain(name);
        }
        Sample sample = null;
        if (e.has("sample")) {
            if (e.has("measurement")) {
                throw InputException.at(e.pathOf("sample"), "a sample holds a stack and a geometry, not a"
                        + " measurement; name the dataset instead (\"dataset\": N)");
            }
            if (e.has("dataset")) {
                throw InputException.at(e.pathOf("sample"), "name either a sample or a dataset, not both");
            }
            sample = namedSample(e, "sample", doc);
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
            ParameterRef ref = ParameterRef.layer(e.requireString("layer"), property);
            if (sample != null) {
                String layer = ref.layer();
                if (sample.stack().layer(layer).isEmpty()) {
                    throw InputException.at(e.pathOf("layer"), "sample '" + sample.name() + "' has no layer '"
                            + layer + "'; its layers: " + String.join(", ", sample.stack().allLayers().stream()
                            .map(lamella.api.Layer::name).toList()));
                }
                ref = ref.inSample(sample.name());
            }
            return ref;
        }
        if (e.has("property")) {
            throw InputException.at(e.pathOf("property"), "\"property\" goes with \"layer\"; for a geometry or"
                    + " measurement input the key itself is the value, e.g. {\"geometry\": \"pump_radius_m\"}");
        }
        boolean geometry = e.has("geometry");
        String key = e.requireString(geometry ? "geometry" : "measurement");
        ParameterRef ref = geometry ? ParameterRef.geometry(key) : ParameterRef.measurement(key);
        if (sample != null) {
            if (sample.geometry() == null) {
                throw InputException.at(e.pathOf("sample"), "sample '" + sample.name() + "' has no geometry block"
                        + " of its own; leave out \"sample\" to address the case's");
            }
            return ref.inSample(sample.name());
        }
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

    /** The inputs of a case and its fit's datasets, as the free and uncertain entries read them. */
    private record Inputs(CaseDocument doc, List<DatasetSpec> datasets, Map<String, Double> gains) {

        /**
         * The input's value in the case, checking that some dataset actually uses it. A layer path without a sample
         * is one input of every sample that has the layer, so their values must agree unless the fit gives it a
         * start of its own ({@code started}).
         */
        double value(ParameterRef ref, String at, boolean started) throws InputException {
            CaseModel base = new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
            switch (ref.scope()) {
                case GAIN:
                    return gains.get(ref.key());
                case LAYER:
                    return layerValue(ref, at, started);
                default:
                    break;
            }
            boolean geometry = ref.scope() == ParameterRef.Scope.GEOMETRY;
            if (ref.sample() != null) {
                Sample s = doc.sample(ref.sample()).orElseThrow();
                boolean used = datasets.stream().anyMatch(d -> d.geometry() == null && d.sampleIn(doc) == s);
                if (!used) {
                    throw InputException.at(at, "no dataset of sample '" + s.name() + "' uses its geometry block"
                            + " (each has its own), so " + ref + " is not used; add \"dataset\": N");
                }
                return new CaseModel(s.stack(), s.geometry(), base.measurement()).value(ref.local(), at);
            }
            if (ref.dataset() >= 0) {
                DatasetSpec d = datasets.get(ref.dataset());
                Block b = geometry ? d.geometry() : d.measurement();
                return new CaseModel(base.stack(), geometry ? b : base.geometry(), geometry ? base.measurement() : b)
                        .value(ref.local(), at);
            }
            boolean used = datasets.stream().anyMatch(d -> (geometry ? d.geometry() : d.measurement()) == null
                    && (!geometry || d.sampleIn(doc).geometry() == null));
            if (!used) {
                throw InputException.at(at, "every dataset has its own " + (geometry ? "geometry" : "measurement")
                        + " block" + (geometry && doc.severalSamples() ? " or measures a sample with its own" : "")
                        + ", so the case's " + ref.key() + " is not used; add \"dataset\": N"
                        + (geometry && doc.severalSamples() ? " or \"sample\": NAME" : ""));
            }
            return base.value(ref, at);
        }

        private double layerValue(ParameterRef ref, String at, boolean started) throws InputException {
            if (ref.sample() != null) {
                Sample s = doc.sample(ref.sample()).orElseThrow();
                return new CaseModel(s.stack(), doc.geometry(), doc.measurement()).value(ref.local(), at);
            }
            List<Sample> having = doc.samples().stream().filter(s -> s.stack().layer(ref.layer()).isPresent())
                    .toList();
            if (having.isEmpty() && doc.samples().get(0).named()) {
                StringBuilder b = new StringBuilder();
                for (Sample s : doc.samples()) {
                    b.append(b.length() == 0 ? "" : "; ").append(s.name()).append(": ").append(String.join(", ",
                            s.stack().allLayers().stream().map(lamella.api.Layer::name).toList()));
                }
                throw InputException.at(at, "no sample has a layer '" + ref.layer() + "'; layers by sample: " + b);
            }
            if (having.isEmpty()) {
                return new CaseModel(doc.stack(), doc.geometry(), doc.measurement()).value(ref, at);
            }
            double first = Double.NaN;
            StringBuilder values = new StringBuilder();
            boolean differ = false;
            for (Sample s : having) {
                double v = new CaseModel(s.stack(), doc.geometry(), doc.measurement()).value(ref, at);
                if (values.length() > 0 && v != first) {
                    differ = true;
                }
                if (values.length() == 0) {
                    first = v;
                }
                values.append(values.length() == 0 ? "" : ", ").append(s.name()).append(": ").append(v);
            }
            if (differ && !started) {
                throw InputException.at(at, ref + " names one input shared by every sample that has layer '"
                        + ref.layer() + "', but its value differs between them (" + values + "); name one sample"
                        + " (\"sample\": NAME) for each, or give the shared one an \"initial\" value");
            }
            return first;
        }
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
                        && first.layer().equals(second.layer()) && overlap(first.key(), second.key())
                        && (first.sample() == null || second.sample() == null
                        || first.sample().equals(second.sample()))) {
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
    private static FreeInput freeInput(Block e, ParameterRef ref, Inputs base) throws InputException {
        boolean startGiven = e.has("initial");
        double initial;
        if (startGiven && ref.scope() == ParameterRef.Scope.LAYER && ref.key().equals("k_w_mk")) {
            ParameterRef through = ParameterRef.layer(ref.layer(), "k_through_w_mk");
            base.value(ref.sample() == null ? through : through.inSample(ref.sample()), e.path(), true);
            initial = finite(e, "initial");
        } else {
            double current = base.value(ref, e.path(), startGiven);
            initial = startGiven ? finite(e, "initial") : current;
        }
        if (startGiven) {
            checkRange(ref, initial, e.pathOf("initial"));
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
        boolean alwaysPositive = ref.scope() == ParameterRef.Scope.LAYER || ref.scope() == ParameterRef.Scope.GAIN;
        boolean positive = alwaysPositive || (initial > 0 && min >= 0);
        if (alwaysPositive && !(initial > 0)) {
            throw InputException.at(e.has("initial") ? e.pathOf("initial") : e.path(), "a "
                    + (ref.scope() == ParameterRef.Scope.GAIN ? "gain" : "layer property") + " is positive; the"
                    + " initial value " + initial + " is not");
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
        Optional<PhysicalRange> range = ref.scope() == ParameterRef.Scope.GAIN ? Optional.empty()
                : PhysicalRange.forKey(ref.key());
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
        if (v != 0) {
            checkRange(ref, v, e.pathOf(key));
        }
        return v;
    }

    /** A value of an input within the range of its key's quantity; a gain's within 1e-12 to 1e12. */
    private static void checkRange(ParameterRef ref, double v, String at) throws InputException {
        if (ref.scope() != ParameterRef.Scope.GAIN) {
            PhysicalRange.checkKey(ref.key(), v, at);
        } else if (!(Math.abs(v) >= 1e-12 && Math.abs(v) <= 1e12)) {
            throw InputException.at(at, "expected a gain between 1e-12 and 1e12 (a factor on the signal), got " + v);
        }
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
