package lamella.fit;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.Names;
import lamella.api.ParameterRef;
import lamella.api.ParameterSpec;
import lamella.api.Simulation;

/**
 * Reads the {@code plan} block of a case against its fit block: targets among the free inputs, design variables
 * whose every value the model accepts, the expected noise of every fitted signal, the limits. Every mistake is an
 * InputException at its JSON path; unknown keys are errors.
 */
final class PlanBlockReader {

    static final Set<String> PLAN_KEYS = Set.of("targets", "combine", "vary", "noise", "limits");
    static final Set<String> TARGET_KEYS = FitBlockReader.union(FitBlockReader.REF_KEYS, Set.of("weight"));
    static final Set<String> VARY_KEYS = FitBlockReader.union(FitBlockReader.REF_KEYS,
            Set.of("values", "min", "max", "steps", "spacing", "choose", "end"));
    static final Set<String> LIMIT_KEYS = Set.of("absorbed_power_w", "max_rise_k", "min_spot_m", "max_spot_m",
            "band_hz");

    /**
     * The smallest 1/e² beam radius a plan may vary to: a 785 nm beam focused at NA 0.5 has w₀ ≈ λ/(π·NA) ≈ 0.5 µm
     * (Gaussian-beam optics; common practice, no source). Below it a Gaussian spot is not what an objective makes.
     */
    static final double SMALLEST_SPOT_M = 5e-7;

    /** Plans beyond this many are refused: the grid is meant to be looked at, and each plan costs model runs. */
    static final int MAX_PLANS = 20_000;

    /** The steady rise allowed when a power is stated and no limit (common practice, no source: PRACTICE notes). */
    static final double DEFAULT_MAX_RISE_K = 10;

    /**
     * Expected noise per point when the plan block states none (common practice, no source): a TDTR ratio about 1 %
     * of its value after averaging (0.5–2 % is usual), an FDTR phase about 0.2° (0.1–0.3°), an SSTR slope about 1 %
     * (0.5–1 %).
     */
    static final Map<String, PlanSpec.Noise> DEFAULT_NOISE = Map.of(
            "ratio", new PlanSpec.Noise(0.01, true, "default, 1 % of the ratio"),
            "phase_deg", new PlanSpec.Noise(0.2, false, "default, 0.2°"),
            "k_per_w", new PlanSpec.Noise(0.01, true, "default, 1 % of the signal"),
            "temperature_rise_k", new PlanSpec.Noise(0.01, true, "default, 1 % of the signal"));

    private PlanBlockReader() {
    }

    static PlanSpec read(CaseDocument doc, FitSpec fit, ModelCatalog catalog) throws InputException {
        Object raw = doc.root().get("plan");
        if (raw == null) {
            throw InputException.at("plan", "the case has no plan block; add \"plan\": {\"vary\": [{\"measurement\":"
                    + " \"modulation_hz\", \"values\": [1e6, 3e6, 1e7]}]}");
        }
        if (!(raw instanceof Block plan)) {
            throw InputException.at("plan", "expected an object, got " + Block.describe(raw));
        }
        FitBlockReader.only(plan, PLAN_KEYS, "the plan block");
        PlanSpec.Combine combine = combine(plan);
        List<ParameterRef> targets = new ArrayList<>();
        List<Double> weights = new ArrayList<>();
        List<ParameterRef> free = fit.free().stream().map(FreeInput::ref).toList();
        for (Block t : FitBlockReader.objects(plan, "targets", false)) {
            FitBlockReader.only(t, TARGET_KEYS, "a target");
            ParameterRef ref = FitBlockReader.ref(t, fit.datasets());
            if (!free.contains(ref)) {
                throw InputException.at(t.path(), ref + " is not a free input of the fit block; a target is one of: "
                        + String.join(", ", free.stream().map(ParameterRef::toString).toList()));
            }
            if (targets.contains(ref)) {
                throw InputException.at(t.path(), ref + " is listed twice");
            }
            if (t.has("weight") && combine != PlanSpec.Combine.WEIGHTED_SUM) {
                throw InputException.at(t.pathOf("weight"), "weights go with \"combine\": \"weighted_sum\"");
            }
            double w = t.has("weight") ? FitBlockReader.finite(t, "weight") : 1.0;
            if (!(w > 0)) {
                throw InputException.at(t.pathOf("weight"), "a weight must be positive, got " + w);
            }
            targets.add(ref);
            weights.add(w);
        }
        if (targets.isEmpty()) {
            targets.addAll(free);
            free.forEach(f -> weights.add(1.0));
        }
        List<PlanSpec.Variable> variables = new ArrayList<>();
        Object vary = plan.get("vary");
        if (vary == null || (vary instanceof List<?> l && l.isEmpty())) {
            throw InputException.at(plan.pathOf("vary"), "the plan varies nothing; list at least one design variable,"
                    + " such as {\"measurement\": \"modulation_hz\", \"values\": [1e6, 3e6, 1e7]}");
        }
        Set<String> seen = new LinkedHashSet<>();
        for (Block v : FitBlockReader.objects(plan, "vary", true)) {
            PlanSpec.Variable var = variable(v, doc, fit, catalog);
            if (!seen.add(var.label())) {
                throw InputException.at(v.path(), var.label() + " is varied twice");
            }
            variables.add(var);
        }
        long joint = variables.stream().filter(PlanSpec.Variable::joint).count();
        if (joint > 1) {
            throw InputException.at(plan.pathOf("vary"), "only one design variable may choose several values to be"
                    + " measured together; " + joint + " do");
        }
        long plans = 1;
        for (PlanSpec.Variable v : variables) {
            plans *= choices(v);
            if (plans > MAX_PLANS) {
                throw InputException.at(plan.pathOf("vary"), "these variables make more than " + MAX_PLANS
                        + " plans; use fewer values or steps");
            }
        }
        Map<String, PlanSpec.Noise> noise = noise(plan, doc, fit, catalog);
        double[] w = weights.stream().mapToDouble(Double::doubleValue).toArray();
        return new PlanSpec(targets, w, combine, variables, noise, limits(plan));
    }

    /** How many plans a variable gives alone: Σ over its choose counts of C(values, count). */
    static long choices(PlanSpec.Variable v) {
        long total = 0;
        for (int k : v.choose()) {
            total += binomial(v.values().length, k);
        }
        return total;
    }

    private static long binomial(int n, int k) {
        long c = 1;
        for (int i = 0; i < k; i++) {
            c = c * (n - i) / (i + 1);
        }
        return c;
    }

    private static PlanSpec.Combine combine(Block plan) throws InputException {
        if (!plan.has("combine")) {
            return PlanSpec.Combine.LARGEST;
        }
        String c = plan.requireString("combine");
        return switch (c) {
            case "largest" -> PlanSpec.Combine.LARGEST;
            case "weighted_sum" -> PlanSpec.Combine.WEIGHTED_SUM;
            default -> throw InputException.at(plan.pathOf("combine"), "unknown way to combine the targets '" + c
                    + "'; expected largest (the largest relative σ) or weighted_sum");
        };
    }

    private static PlanSpec.Variable variable(Block v, CaseDocument doc, FitSpec fit, ModelCatalog catalog)
            throws InputException {
        FitBlockReader.only(v, VARY_KEYS, "a design variable");
        ParameterRef ref = FitBlockReader.ref(v, fit.datasets());
        CaseModel base = baseModel(doc, fit, ref, v.path());
        String keyPath = v.pathOf(v.has("layer") ? "property" : v.has("geometry") ? "geometry" : "measurement");
        boolean list = false;
        if (ref.scope() != ParameterRef.Scope.LAYER) {
            Block block = ref.scope() == ParameterRef.Scope.GEOMETRY ? base.geometry() : base.measurement();
            List<ParameterSpec> specs = parameters(catalog, block, ref.scope());
            Optional<ParameterSpec> spec = specs.stream().filter(s -> s.key().equals(ref.key())).findFirst();
            if (spec.isEmpty()) {
                Set<String> keys = new TreeSet<>();
                specs.forEach(s -> keys.add(s.key()));
                String hint = Names.closest(ref.key(), keys).map(k -> " (did you mean '" + k + "'?)").orElse("");
                throw InputException.at(keyPath, "unknown key '" + ref.key() + "' for " + scopeWord(ref) + " '"
                        + block.get("type") + "'" + hint + "; expected one of: " + String.join(", ", keys));
            }
            list = spec.get().kind() == ParameterSpec.Kind.NUMBER_LIST;
        } else {
            base.value(ref, keyPath);
        }
        String end = null;
        if (list) {
            if (!v.has("end")) {
                throw InputException.at(v.path(), ref.key() + " is a list; say which of its ends the values move:"
                        + " \"end\": \"first\" or \"last\" (the points keep their places between the ends)");
            }
            end = v.requireString("end");
            if (!end.equals("first") && !end.equals("last")) {
                throw InputException.at(v.pathOf("end"), "expected \"first\" or \"last\", got \"" + end + "\"");
            }
        } else if (v.has("end")) {
            throw InputException.at(v.pathOf("end"), "\"end\" goes with a list key (frequencies, delays); "
                    + ref.key() + " is one number");
        }
        double[] values = values(v, ref);
        int[] choose = choose(v, values.length, ref);
        for (int i = 0; i < values.length; i++) {
            String at = v.has("values") ? v.pathOf("values") + "[" + i + "]"
                    : v.pathOf(i == 0 ? "min" : i == values.length - 1 ? "max" : "steps");
            check(base, ref, end, values[i], at, catalog);
        }
        return new PlanSpec.Variable(ref, values, choose, end, v.path());
    }

    /** The model a design variable's values are checked on: the case with the block the key belongs to. */
    private static CaseModel baseModel(CaseDocument doc, FitSpec fit, ParameterRef ref, String at)
            throws InputException {
        if (ref.scope() == ParameterRef.Scope.LAYER) {
            return new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
        }
        boolean geometry = ref.scope() == ParameterRef.Scope.GEOMETRY;
        for (DatasetSpec d : fit.datasets()) {
            Block own = geometry ? d.geometry() : d.measurement();
            if (ref.dataset() >= 0 ? d.index() == ref.dataset() : own == null) {
                return new CaseModel(doc.stack(), d.geometry() != null ? d.geometry() : doc.geometry(),
                        d.measurement() != null ? d.measurement() : doc.measurement());
            }
        }
        throw InputException.at(at, "every dataset has its own " + (geometry ? "geometry" : "measurement")
                + " block, so the case's " + ref.key() + " is not used; add \"dataset\": N");
    }

    private static List<ParameterSpec> parameters(ModelCatalog catalog, Block block, ParameterRef.Scope scope)
            throws InputException {
        String type = block.requireString("type");
        if (scope == ParameterRef.Scope.GEOMETRY) {
            return catalog.geometry(type).orElseThrow(() -> InputException.at(block.pathOf("type"),
                    "unknown geometry '" + type + "'")).parameters();
        }
        return catalog.technique(type).orElseThrow(() -> InputException.at(block.pathOf("type"),
                "unknown technique '" + type + "'")).parameters();
    }

    private static String scopeWord(ParameterRef ref) {
        return ref.scope() == ParameterRef.Scope.GEOMETRY ? "geometry" : "technique";
    }

    /** Frequencies and beam or ring radii are spread evenly in ln; other keys linearly. */
    static boolean logByDefault(String key) {
        return key.endsWith("_hz") || key.contains("radius");
    }

    static boolean isSpot(ParameterRef ref) {
        return ref.scope() == ParameterRef.Scope.GEOMETRY
                && (ref.key().startsWith("pump_radius") || ref.key().startsWith("probe_radius"));
    }

    private static double[] values(Block v, ParameterRef ref) throws InputException {
        boolean listed = v.has("values");
        boolean ranged = v.has("min") || v.has("max") || v.has("steps");
        if (listed == ranged) {
            throw InputException.at(v.path(), "give either \"values\": [...] or \"min\", \"max\" and \"steps\"");
        }
        if (listed) {
            if (v.has("spacing")) {
                throw InputException.at(v.pathOf("spacing"), "\"spacing\" goes with a min/max/steps range");
            }
            Object raw = v.get("values");
            if (!(raw instanceof List<?> l) || l.isEmpty()) {
                throw InputException.at(v.pathOf("values"), "expected a non-empty list of numbers, got "
                        + Block.describe(raw));
            }
            double[] out = new double[l.size()];
            for (int i = 0; i < out.length; i++) {
                if (!(l.get(i) instanceof Double d)) {
                    throw InputException.at(v.pathOf("values") + "[" + i + "]", "expected a number, got "
                            + Block.describe(l.get(i)));
                }
                for (int j = 0; j < i; j++) {
                    if (out[j] == d) {
                        throw InputException.at(v.pathOf("values") + "[" + i + "]", d + " is listed twice");
                    }
                }
                out[i] = d;
            }
            return out;
        }
        for (String k : List.of("min", "max", "steps")) {
            if (!v.has(k)) {
                throw InputException.at(v.pathOf(k), "missing; a range needs min, max and steps");
            }
        }
        double min = FitBlockReader.finite(v, "min");
        double max = FitBlockReader.finite(v, "max");
        int steps = FitBlockReader.count(v, "steps");
        if (!(min < max)) {
            throw InputException.at(v.pathOf("max"), "max (" + max + ") must exceed min (" + min + ")");
        }
        if (steps < 2) {
            throw InputException.at(v.pathOf("steps"), "a range needs at least 2 steps, got " + steps);
        }
        boolean log = logByDefault(ref.key());
        if (v.has("spacing")) {
            String s = v.requireString("spacing");
            if (!s.equals("log") && !s.equals("linear")) {
                throw InputException.at(v.pathOf("spacing"), "expected \"log\" or \"linear\", got \"" + s + "\"");
            }
            log = s.equals("log");
        }
        if (log && !(min > 0)) {
            throw InputException.at(v.pathOf("min"), "a log-spaced range needs min > 0, got " + min
                    + (v.has("spacing") ? "" : " (" + ref.key() + " is spaced in ln by default; \"spacing\":"
                    + " \"linear\" spaces it evenly)"));
        }
        double[] out = new double[steps];
        for (int i = 0; i < steps; i++) {
            double t = (double) i / (steps - 1);
            out[i] = log ? Math.exp(Math.log(min) + t * (Math.log(max) - Math.log(min))) : min + t * (max - min);
        }
        out[steps - 1] = max;
        return out;
    }

    private static int[] choose(Block v, int count, ParameterRef ref) throws InputException {
        if (!v.has("choose")) {
            return new int[] {1};
        }
        Object raw = v.get("choose");
        List<?> list = raw instanceof List<?> l ? l : List.of(raw);
        if (list.isEmpty()) {
            throw InputException.at(v.pathOf("choose"), "expected a count or a list of counts, such as [1, 2]");
        }
        int[] out = new int[list.size()];
        for (int i = 0; i < out.length; i++) {
            String at = raw instanceof List<?> ? v.pathOf("choose") + "[" + i + "]" : v.pathOf("choose");
            if (!(list.get(i) instanceof Double d) || d != Math.rint(d) || d < 1) {
                throw InputException.at(at, "expected a whole number ≥ 1, got " + Block.describe(list.get(i)));
            }
            if (d > count) {
                throw InputException.at(at, "cannot choose " + d.intValue() + " of " + count + " values");
            }
            for (int j = 0; j < i; j++) {
                if (out[j] == d.intValue()) {
                    throw InputException.at(at, d.intValue() + " is listed twice");
                }
            }
            out[i] = d.intValue();
        }
        boolean several = false;
        for (int c : out) {
            several |= c > 1;
        }
        if (several && ref.scope() == ParameterRef.Scope.LAYER) {
            throw InputException.at(v.pathOf("choose"), "a sample has one stack: a layer value is not measured"
                    + " several ways together; choose applies to measurement and geometry keys");
        }
        return out;
    }

    /** A design value is checked on the case alone: it must make a model the services accept. */
    private static void check(CaseModel base, ParameterRef ref, String end, double value, String at,
                              ModelCatalog catalog) throws InputException {
        if (isSpot(ref) && value < SMALLEST_SPOT_M) {
            throw InputException.at(at, ref + " = " + value + " m is below the smallest beam radius a plan takes, "
                    + SMALLEST_SPOT_M + " m (a focused visible or near-infrared beam, 1/e² radius ≈ λ/(π·NA))");
        }
        try {
            Simulation s = Designs.apply(base, ref, end, value).simulation(catalog);
            s.technique();
        } catch (InputException e) {
            throw InputException.at(at, value + " makes the case invalid: " + e.getMessage());
        }
    }

    private static Map<String, PlanSpec.Noise> noise(Block plan, CaseDocument doc, FitSpec fit, ModelCatalog catalog)
            throws InputException {
        Set<String> columns = new TreeSet<>();
        Set<String> fitted = new LinkedHashSet<>();
        for (DatasetSpec d : fit.datasets()) {
            CaseModel m = new CaseModel(doc.stack(), d.geometry() != null ? d.geometry() : doc.geometry(),
                    d.measurement() != null ? d.measurement() : doc.measurement());
            Simulation s;
            try {
                s = m.simulation(catalog);
            } catch (InputException e) {
                throw InputException.at(e.path(), e.problem());
            }
            columns.addAll(s.technique().signalColumns());
            fitted.add(Designs.signal(d, s.technique()));
        }
        Map<String, PlanSpec.Noise> out = new LinkedHashMap<>();
        Object raw = plan.get("noise");
        if (raw != null && !(raw instanceof Block)) {
            throw InputException.at(plan.pathOf("noise"), "expected an object, got " + Block.describe(raw));
        }
        Block given = raw instanceof Block b ? b : new Block(plan.pathOf("noise"), Map.of());
        Set<String> keys = new TreeSet<>();
        columns.forEach(c -> {
            keys.add(c);
            keys.add(c + "_relative");
        });
        for (String k : given.values().keySet()) {
            if (!keys.contains(k)) {
                String hint = Names.closest(k, keys).map(x -> " (did you mean '" + x + "'?)").orElse("");
                throw InputException.at(given.pathOf(k), "unknown signal '" + k + "'" + hint + "; the noise of a"
                        + " signal is given as SIGNAL (absolute, in its unit) or SIGNAL_relative (a fraction): "
                        + String.join(", ", keys));
            }
            double v = FitBlockReader.finite(given, k);
            if (!(v > 0)) {
                throw InputException.at(given.pathOf(k), "a noise level must be positive, got " + v);
            }
        }
        for (String s : columns) {
            boolean abs = given.has(s);
            boolean rel = given.has(s + "_relative");
            if (abs && rel) {
                throw InputException.at(given.pathOf(s + "_relative"), "give the noise of '" + s + "' one way: "
                        + s + " or " + s + "_relative");
            }
            if (abs || rel) {
                String k = rel ? s + "_relative" : s;
                out.put(s, new PlanSpec.Noise(FitBlockReader.finite(given, k), rel, given.pathOf(k)));
            } else if (fitted.contains(s)) {
                PlanSpec.Noise d = DEFAULT_NOISE.get(s);
                if (d == null) {
                    throw InputException.at(given.path(), "the plan fits signal '" + s + "', which has no default"
                            + " noise; give it as \"" + s + "\" (absolute) or \"" + s + "_relative\"");
                }
                out.put(s, d);
            }
        }
        return out;
    }

    private static PlanSpec.Limits limits(Block plan) throws InputException {
        Object raw = plan.get("limits");
        if (raw == null) {
            return new PlanSpec.Limits(Double.NaN, Double.POSITIVE_INFINITY, 0, Double.POSITIVE_INFINITY, 0,
                    Double.POSITIVE_INFINITY);
        }
        if (!(raw instanceof Block l)) {
            throw InputException.at(plan.pathOf("limits"), "expected an object, got " + Block.describe(raw));
        }
        FitBlockReader.only(l, LIMIT_KEYS, "the limits");
        double power = l.has("absorbed_power_w") ? positive(l, "absorbed_power_w") : Double.NaN;
        if (l.has("max_rise_k") && Double.isNaN(power)) {
            throw InputException.at(l.pathOf("max_rise_k"), "a rise limit needs the absorbed power it is reached"
                    + " at: add \"absorbed_power_w\"");
        }
        double rise = l.has("max_rise_k") ? positive(l, "max_rise_k")
                : Double.isNaN(power) ? Double.POSITIVE_INFINITY : DEFAULT_MAX_RISE_K;
        double minSpot = l.has("min_spot_m") ? positive(l, "min_spot_m") : 0;
        double maxSpot = l.has("max_spot_m") ? positive(l, "max_spot_m") : Double.POSITIVE_INFINITY;
        if (minSpot >= maxSpot) {
            throw InputException.at(l.pathOf("max_spot_m"), "max_spot_m must exceed min_spot_m");
        }
        double low = 0;
        double high = Double.POSITIVE_INFINITY;
        if (l.has("band_hz")) {
            Object b = l.get("band_hz");
            if (!(b instanceof List<?> band) || band.size() != 2 || !(band.get(0) instanceof Double lo)
                    || !(band.get(1) instanceof Double hi) || !(lo >= 0) || !(lo < hi)) {
                throw InputException.at(l.pathOf("band_hz"), "expected [low, high] in Hz with 0 ≤ low < high, got "
                        + Block.describe(b));
            }
            low = lo;
            high = hi;
        }
        return new PlanSpec.Limits(power, rise, minSpot, maxSpot, low, high);
    }

    private static double positive(Block b, String key) throws InputException {
        double v = FitBlockReader.finite(b, key);
        if (!(v > 0)) {
            throw InputException.at(b.pathOf(key), "expected a positive number, got " + v);
        }
        return v;
    }
}
