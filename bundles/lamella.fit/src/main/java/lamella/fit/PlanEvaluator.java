package lamella.fit;

import java.nio.file.Files;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.EvaluationCancelledException;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.ModelEvaluationException;
import lamella.api.ParameterRef;
import lamella.api.Simulation;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.SensitivityTable;
import lamella.api.plan.PlanSetting;
import lamella.api.plan.PlannedSensitivity;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PredictedSigma;

/**
 * Evaluates plans: builds each plan's measurements from the case (its datasets' blocks with the design values set,
 * a measurement repeated for each value chosen together), and computes the linearised σ the fit of those
 * measurements would give, with the expected noise as σ and the case's values as the truth. Thread-safe; the
 * Jacobian rows of a measurement are kept and reused by every plan that contains the same measurement.
 */
final class PlanEvaluator {

    /** Forward-difference step in each free input's fitting variable u (relative 1e-4 for a positive input). */
    static final double STEP = Solver.FINAL_STEP;

    private final CaseDocument doc;
    private final FitSpec fit;
    private final PlanSpec plan;
    private final ModelCatalog catalog;
    private final List<ParameterRef> named = new ArrayList<>();
    private final Map<String, Rows> rows = new ConcurrentHashMap<>();
    private final Map<Integer, double[]> dataX = new ConcurrentHashMap<>();

    /** The values of one plan: per design variable, one value, or several measured together. */
    record Choice(double[][] values) {
    }

    /** One measurement of a plan. */
    private record Measurement(DatasetSpec source, CaseModel model, String replica, ParameterRef.Scope repeated) {
    }

    /** One input of a plan's fit: a free input, or an uncertain one (split per measurement where repeated). */
    private record Input(ParameterRef label, String quantity, ParameterRef local, FreeInput free,
                         UncertainInput uncertain, boolean[] reaches, double value) {
    }

    /** The weighted-model rows of one measurement: m/σ and its derivative by each input that reaches it. */
    private record Rows(double[] sigma, double[][] columns) {
    }

    PlanEvaluator(CaseDocument doc, FitSpec fit, PlanSpec plan, ModelCatalog catalog) throws InputException {
        this.doc = doc;
        this.fit = fit;
        this.plan = plan;
        this.catalog = catalog;
        fit.free().forEach(f -> named.add(f.ref()));
        fit.uncertain().forEach(u -> named.add(u.ref()));
        for (PlanSpec.Variable v : plan.variables()) {
            if (!v.joint()) {
                continue;
            }
            for (FreeInput f : fit.free()) {
                if (f.ref().scope() == v.ref().scope() && fit.datasets().stream()
                        .anyMatch(d -> reaches(d, v.ref()) && reaches(d, f.ref()))) {
                    throw InputException.at(f.path(), "the plan measures several values of " + v.label() + " ("
                            + v.path() + ") one after the other, so the free " + f.ref() + " would be a separate"
                            + " unknown of each measurement; hold it fixed or make it uncertain for the plan");
                }
            }
        }
    }

    /** Every plan: the product of each variable's choices (one value, or a chosen set of values). */
    List<Choice> choices() {
        List<double[][]> perVariable = new ArrayList<>();
        for (PlanSpec.Variable v : plan.variables()) {
            List<double[]> sets = new ArrayList<>();
            for (int k : v.choose()) {
                combinations(v.values(), k, 0, new double[k], 0, sets);
            }
            perVariable.add(sets.toArray(new double[0][]));
        }
        List<Choice> out = new ArrayList<>();
        product(perVariable, 0, new double[perVariable.size()][], out);
        return out;
    }

    private static void combinations(double[] values, int k, int from, double[] chosen, int depth, List<double[]> out) {
        if (depth == k) {
            out.add(chosen.clone());
            return;
        }
        for (int i = from; i <= values.length - (k - depth); i++) {
            chosen[depth] = values[i];
            combinations(values, k, i + 1, chosen, depth + 1, out);
        }
    }

    private static void product(List<double[][]> sets, int at, double[][] current, List<Choice> out) {
        if (at == sets.size()) {
            out.add(new Choice(current.clone()));
            return;
        }
        for (double[] s : sets.get(at)) {
            current[at] = s;
            product(sets, at + 1, current, out);
        }
    }

    /** The values of a plan as the outcome lists them: a number, or the list of values measured together. */
    static List<Object> values(Choice c) {
        List<Object> out = new ArrayList<>();
        if (c == null) {
            return out;
        }
        for (double[] v : c.values()) {
            if (v.length == 1) {
                out.add(v[0]);
            } else {
                List<Double> l = new ArrayList<>();
                for (double x : v) {
                    l.add(x);
                }
                out.add(l);
            }
        }
        return out;
    }

    /**
     * The baseline (c == null: the case as written) or one plan. Bad input that every plan shares (a measurement
     * without x values) is an InputException; what only this plan's values cause is reported in the result.
     */
    PlannedResult evaluate(Choice c) throws InputException {
        PlannedResult.Status ok = c == null ? PlannedResult.Status.BASELINE : PlannedResult.Status.RANKED;
        List<Object> values = values(c);
        List<Measurement> ms;
        try {
            ms = measurements(c);
        } catch (InputException e) {
            if (c == null) {
                throw e;
            }
            return notEvaluable(values, "these values together make the case invalid: " + e.getMessage(), 0);
        }
        try {
            return predict(c, values, ms, ok);
        } catch (ModelEvaluationException e) {
            return notEvaluable(values, "the model cannot be evaluated: " + e.getMessage(), ms.size());
        } catch (InputException e) {
            if (c == null) {
                throw e;
            }
            return notEvaluable(values, e.getMessage(), ms.size());
        }
    }

    private static PlannedResult notEvaluable(List<Object> values, String reason, int measurements) {
        return new PlannedResult(0, values, PlannedResult.Status.NOT_EVALUABLE, reason, Double.NaN, List.of(),
                List.of(), Double.NaN, Double.NaN, measurements);
    }

    private List<Measurement> measurements(Choice c) throws InputException {
        List<PlanSpec.Variable> vars = plan.variables();
        CaseModel shared = new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
        int repeated = -1;
        if (c != null) {
            for (int i = 0; i < vars.size(); i++) {
                PlanSpec.Variable v = vars.get(i);
                if (c.values()[i].length > 1) {
                    repeated = i;
                } else if (v.ref().scope() == ParameterRef.Scope.LAYER || v.ref().dataset() < 0) {
                    shared = Designs.apply(shared, v.ref(), v.end(), c.values()[i][0]);
                }
            }
        }
        List<Measurement> out = new ArrayList<>();
        for (DatasetSpec d : fit.datasets()) {
            CaseModel m = new CaseModel(shared.stack(), d.geometry() != null ? d.geometry() : shared.geometry(),
                    d.measurement() != null ? d.measurement() : shared.measurement());
            if (c != null) {
                for (int i = 0; i < vars.size(); i++) {
                    PlanSpec.Variable v = vars.get(i);
                    if (i != repeated && v.ref().scope() != ParameterRef.Scope.LAYER && v.ref().dataset() >= 0
                            && v.ref().dataset() == d.index()) {
                        m = Designs.apply(m, v.ref(), v.end(), c.values()[i][0]);
                    }
                }
            }
            if (repeated >= 0 && reaches(d, vars.get(repeated).ref())) {
                PlanSpec.Variable v = vars.get(repeated);
                for (double value : c.values()[repeated]) {
                    out.add(new Measurement(d, Designs.apply(m, v.ref(), v.end(), value).apartFor(named),
                            "of the measurement at " + v.label() + " = " + number(value), v.ref().scope()));
                }
            } else {
                out.add(new Measurement(d, m.apartFor(named), null, null));
            }
        }
        return out;
    }

    /** The choice a plan of the outcome stands for (null for the baseline), from its values. */
    Choice choiceOf(PlannedResult p) throws InputException {
        if (p.status() == PlannedResult.Status.BASELINE) {
            return null;
        }
        List<PlanSpec.Variable> vars = plan.variables();
        if (p.values().size() != vars.size()) {
            throw InputException.at("plan.vary", "the plan has " + p.values().size() + " values but the plan block"
                    + " varies " + vars.size() + " keys; plan the case again");
        }
        double[][] values = new double[vars.size()][];
        for (int i = 0; i < values.length; i++) {
            Object v = p.values().get(i);
            if (v instanceof Double d) {
                values[i] = new double[] {d};
            } else if (v instanceof List<?> l && !l.isEmpty() && l.stream().allMatch(Double.class::isInstance)) {
                values[i] = l.stream().mapToDouble(Double.class::cast).toArray();
            } else {
                throw InputException.at(vars.get(i).path(), "the plan's value of " + vars.get(i).label() + " is "
                        + v + "; expected a number or a list of numbers");
            }
        }
        return new Choice(values);
    }

    /** The value each varied key takes in the case under one plan (a moved end: the whole list). */
    List<PlanSetting> settings(Choice c) throws InputException {
        List<PlanSetting> out = new ArrayList<>();
        if (c == null) {
            return out;
        }
        List<PlanSpec.Variable> vars = plan.variables();
        for (int i = 0; i < vars.size(); i++) {
            PlanSpec.Variable v = vars.get(i);
            double[] values = c.values()[i];
            if (values.length > 1) {
                StringBuilder list = new StringBuilder();
                for (double x : values) {
                    list.append(list.length() == 0 ? "" : ", ").append(number(x));
                }
                throw InputException.at(v.path(), "this plan measures " + v.label() + " at " + list + " together,"
                        + " and a case holds one value of it per dataset: give each measurement a dataset of its"
                        + " own and set the value there");
            }
            if (v.end() == null) {
                out.add(new PlanSetting(v.ref(), values[0]));
                continue;
            }
            CaseModel moved = Designs.apply(modelOf(v.ref()), v.ref(), v.end(), values[0]);
            Block block = v.ref().scope() == ParameterRef.Scope.GEOMETRY ? moved.geometry() : moved.measurement();
            out.add(new PlanSetting(v.ref(), block.get(v.ref().key())));
        }
        return out;
    }

    /** The case's own value of each varied key (a moved end: that end of its list); NaN where it states none. */
    List<Object> baselineValues() {
        List<Object> out = new ArrayList<>();
        for (PlanSpec.Variable v : plan.variables()) {
            double value = Double.NaN;
            try {
                CaseModel m = modelOf(v.ref());
                if (v.end() == null) {
                    value = m.value(local(v.ref()), v.path());
                } else {
                    Block b = v.ref().scope() == ParameterRef.Scope.GEOMETRY ? m.geometry() : m.measurement();
                    if (b.get(v.ref().key()) instanceof List<?> l && !l.isEmpty()
                            && l.get(v.end().equals("first") ? 0 : l.size() - 1) instanceof Double d) {
                        value = d;
                    }
                }
            } catch (InputException e) {
                value = Double.NaN;
            }
            out.add(value);
        }
        return out;
    }

    /** The case, or for a key of a dataset's own block that dataset's blocks, as written. */
    private CaseModel modelOf(ParameterRef ref) throws InputException {
        if (ref.dataset() >= 0) {
            for (DatasetSpec d : fit.datasets()) {
                if (d.index() == ref.dataset()) {
                    return new CaseModel(doc.stack(), d.geometry() != null ? d.geometry() : doc.geometry(),
                            d.measurement() != null ? d.measurement() : doc.measurement());
                }
            }
            throw InputException.at("plan.vary", ref + " names dataset " + ref.dataset() + ", which the fit block"
                    + " does not have");
        }
        return new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
    }

    /** The sensitivities of each of a plan's measurements at its x values. */
    List<PlannedSensitivity> sensitivity(Choice c) throws InputException {
        List<PlannedSensitivity> out = new ArrayList<>();
        for (Measurement m : measurements(c)) {
            EvaluationCancelledException.checkpoint();
            Simulation sim = m.model.simulation(catalog);
            String signal = Designs.signal(m.source, sim.technique());
            SensitivityTable t = Sensitivities.of(m.model, catalog, sim.technique().xColumn().orElse("x"),
                    x(m, sim), signal);
            List<ParameterRef> refs = t.parameters().stream().map(r -> named(r, m.source)).toList();
            String words = "dataset " + m.source.index()
                    + (m.replica == null ? "" : ", " + m.replica.substring("of the ".length()));
            out.add(new PlannedSensitivity(words, new SensitivityTable(t.xColumn(), t.x(), t.signal(),
                    t.phaseLike(), refs, t.quantities(), t.values())));
        }
        return out;
    }

    /** A dataset's own geometry or measurement block is addressed through the dataset, as the fit block does. */
    private static ParameterRef named(ParameterRef r, DatasetSpec d) {
        boolean own = (r.scope() == ParameterRef.Scope.GEOMETRY && d.geometry() != null)
                || (r.scope() == ParameterRef.Scope.MEASUREMENT && d.measurement() != null);
        return own ? r.inDataset(d.index()) : r;
    }

    /** Whether a parameter of the case reaches a dataset of the fit block (as the fit decides it). */
    static boolean reaches(DatasetSpec d, ParameterRef ref) {
        if (ref.scope() == ParameterRef.Scope.LAYER) {
            return true;
        }
        boolean own = (ref.scope() == ParameterRef.Scope.GEOMETRY ? d.geometry() : d.measurement()) != null;
        return ref.dataset() < 0 ? !own : ref.dataset() == d.index();
    }

    private List<Input> inputs(List<Measurement> ms) throws InputException {
        List<Input> out = new ArrayList<>();
        for (FreeInput f : fit.free()) {
            boolean[] r = reachMask(ms, f.ref());
            int first = firstOf(r);
            if (first < 0) {
                throw InputException.at(f.path(), f.ref() + " reaches no measurement of the plan");
            }
            double v;
            try {
                v = ms.get(first).model.value(local(f.ref()), f.path());
            } catch (InputException e) {
                v = f.initial();
            }
            FreeInput at = new FreeInput(f.ref(), v, f.min(), f.max(), f.logScale() && v > 0, f.scale(), f.path());
            out.add(new Input(f.ref(), ms.get(first).model.quantity(f.ref()), local(f.ref()), at, null, r, v));
        }
        for (UncertainInput u : fit.uncertain()) {
            boolean split = false;
            for (Measurement m : ms) {
                split |= m.repeated != null && m.repeated == u.ref().scope() && reaches(m.source, u.ref());
            }
            if (!split) {
                boolean[] r = reachMask(ms, u.ref());
                int first = firstOf(r);
                if (first < 0) {
                    continue;
                }
                double v = ms.get(first).model.value(local(u.ref()), u.path());
                out.add(new Input(u.ref(), ms.get(first).model.quantity(u.ref()), local(u.ref()), null,
                        u.at(u.ref(), v), r, v));
            } else {
                for (int j = 0; j < ms.size(); j++) {
                    Measurement m = ms.get(j);
                    if (!reaches(m.source, u.ref())) {
                        continue;
                    }
                    boolean[] r = new boolean[ms.size()];
                    r[j] = true;
                    double v = m.model.value(local(u.ref()), u.path());
                    out.add(new Input(u.ref(), m.replica == null ? "" : m.replica, local(u.ref()), null,
                            u.at(u.ref(), v), r, v));
                }
            }
        }
        return out;
    }

    private static boolean[] reachMask(List<Measurement> ms, ParameterRef ref) {
        boolean[] r = new boolean[ms.size()];
        for (int j = 0; j < ms.size(); j++) {
            r[j] = reaches(ms.get(j).source, ref);
        }
        return r;
    }

    private static int firstOf(boolean[] r) {
        for (int j = 0; j < r.length; j++) {
            if (r[j]) {
                return j;
            }
        }
        return -1;
    }

    private static ParameterRef local(ParameterRef r) {
        return r.dataset() < 0 ? r : new ParameterRef(r.scope(), null, r.key(), -1);
    }

    private PlannedResult predict(Choice c, List<Object> values, List<Measurement> ms, PlannedResult.Status ok)
            throws InputException {
        List<Input> inputs = inputs(ms);
        List<FreeInput> free = new ArrayList<>();
        List<UncertainInput> uncertain = new ArrayList<>();
        for (Input in : inputs) {
            if (in.free != null) {
                free.add(in.free);
            } else {
                uncertain.add(in.uncertain);
            }
        }
        int p = free.size();
        double[] u = new double[p];
        for (int a = 0; a < p; a++) {
            u[a] = free.get(a).toU(free.get(a).initial());
        }
        List<double[][]> blocks = new ArrayList<>();
        int n = 0;
        double risePerWatt = Double.NaN;
        String riseProblem = null;
        for (int j = 0; j < ms.size(); j++) {
            EvaluationCancelledException.checkpoint();
            Rows r = rows(ms.get(j), j, inputs);
            blocks.add(r.columns);
            n += r.sigma.length;
            try {
                double perWatt = simulation(ms.get(j), j, inputs).steadyRisePerWatt();
                if (!Double.isNaN(perWatt)) {
                    risePerWatt = Double.isNaN(risePerWatt) ? perWatt : Math.max(risePerWatt, perWatt);
                }
            } catch (ModelEvaluationException e) {
                riseProblem = e.getMessage();
            }
        }
        if (n <= p) {
            throw InputException.at("plan", p + " free inputs but only " + n + " points planned; a fit needs more"
                    + " points than unknowns");
        }
        double[][] j = new double[n][p];
        double[][] ju = new double[n][uncertain.size()];
        int row = 0;
        for (int m = 0; m < ms.size(); m++) {
            double[][] cols = blocks.get(m);
            int len = cols[0].length;
            int a = 0;
            int k = 0;
            for (int q = 0; q < inputs.size(); q++) {
                Input in = inputs.get(q);
                double[] col = cols[1 + q];
                for (int i = 0; i < len; i++) {
                    double d = col == null ? 0 : col[i];
                    if (in.free != null) {
                        j[row + i][a] = d;
                    } else {
                        ju[row + i][k] = d;
                    }
                }
                if (in.free != null) {
                    a++;
                } else {
                    k++;
                }
            }
            row += len;
        }
        Linearised lin = Linearised.of(j, ju, free, uncertain, u);
        List<PredictedSigma> predicted = new ArrayList<>();
        int[] at = new int[plan.targets().size()];
        double objective = 0;
        for (int t = 0; t < at.length; t++) {
            ParameterRef target = plan.targets().get(t);
            int a = 0;
            while (!free.get(a).ref().equals(target)) {
                a++;
            }
            at[t] = a;
            double value = free.get(a).initial();
            double sigma = lin.total[a];
            double relative = sigma / Math.abs(value);
            predicted.add(new PredictedSigma(target, inputs.get(a).quantity, value, sigma,
                    lin.singular[a] ? Double.POSITIVE_INFINITY : lin.noise[a], relative,
                    lin.identifiable(a, free.get(a), u[a])));
            objective = plan.combine() == PlanSpec.Combine.LARGEST ? Math.max(objective, relative)
                    : objective + plan.weights()[t] * relative;
        }
        if (Double.isNaN(objective)) {
            objective = Double.POSITIVE_INFINITY;
        }
        List<BudgetLine> budget = new ArrayList<>();
        double[] noise = new double[at.length];
        for (int t = 0; t < at.length; t++) {
            noise[t] = lin.noise[at[t]];
        }
        budget.add(new BudgetLine(null, "", 0, noise));
        int k = 0;
        for (Input in : inputs) {
            if (in.uncertain == null) {
                continue;
            }
            double[] contributions = new double[at.length];
            for (int t = 0; t < at.length; t++) {
                contributions[t] = lin.contributions[k][at[t]];
            }
            budget.add(new BudgetLine(in.label, in.quantity, in.uncertain.sigma(), contributions));
            k++;
        }
        PlanSpec.Limits limits = plan.limits();
        double rise = Double.isNaN(limits.absorbedPowerW()) ? Double.NaN : risePerWatt * limits.absorbedPowerW();
        List<String> beyond = new ArrayList<>(limitProblems(ms));
        PlannedResult.Status status = ok;
        if (!Double.isNaN(limits.absorbedPowerW())) {
            if (riseProblem != null || Double.isNaN(rise)) {
                return new PlannedResult(0, values, PlannedResult.Status.NOT_EVALUABLE, "its steady rise cannot be"
                        + " estimated" + (riseProblem != null ? ": " + riseProblem : " (a line heater's response is"
                        + " per unit length)"), objective, predicted, budget, risePerWatt, rise, ms.size());
            }
            if (rise > limits.maxRiseK()) {
                beyond.add(String.format(Locale.ROOT, "steady rise %.3g K exceeds %.3g K at %.3g W absorbed", rise,
                        limits.maxRiseK(), limits.absorbedPowerW()));
            }
        }
        String reason = String.join("; ", beyond);
        if (!beyond.isEmpty() && ok == PlannedResult.Status.RANKED) {
            status = PlannedResult.Status.BEYOND_LIMIT;
        }
        return new PlannedResult(0, values, status, reason, objective, predicted, budget, risePerWatt, rise,
                ms.size());
    }

    private List<String> limitProblems(List<Measurement> ms) {
        PlanSpec.Limits l = plan.limits();
        List<String> out = new ArrayList<>();
        for (Measurement m : ms) {
            for (Map.Entry<String, Object> e : m.model.geometry().values().entrySet()) {
                ParameterRef ref = ParameterRef.geometry(e.getKey());
                if (PlanBlockReader.isSpot(ref) && e.getValue() instanceof Double v) {
                    if (v < l.minSpotM()) {
                        out.add(ref + " = " + number(v) + " m is below the smallest spot, " + number(l.minSpotM())
                                + " m");
                    } else if (v > l.maxSpotM()) {
                        out.add(ref + " = " + number(v) + " m is above the largest spot, " + number(l.maxSpotM())
                                + " m");
                    }
                }
            }
            for (Map.Entry<String, Object> e : m.model.measurement().values().entrySet()) {
                String key = e.getKey();
                if (!key.endsWith("_hz") || key.equals("repetition_hz")) {
                    continue;
                }
                List<?> list = e.getValue() instanceof List<?> li ? li : List.of(e.getValue());
                for (Object o : list) {
                    if (o instanceof Double f && (f < l.bandLowHz() || f > l.bandHighHz())) {
                        out.add("measurement." + key + " " + number(f) + " Hz lies outside the band "
                                + number(l.bandLowHz()) + " to " + number(l.bandHighHz()) + " Hz");
                        break;
                    }
                }
            }
        }
        return out.stream().distinct().toList();
    }

    static String number(double v) {
        return String.format(Locale.ROOT, "%.4g", v);
    }

    private CaseModel nominal(Measurement m, int index, List<Input> inputs) throws InputException {
        CaseModel model = m.model;
        for (Input in : inputs) {
            if (in.reaches[index]) {
                model = model.with(in.local, in.value);
            }
        }
        return model;
    }

    private Simulation simulation(Measurement m, int index, List<Input> inputs) throws InputException {
        return nominal(m, index, inputs).simulation(catalog);
    }

    /** The measurement's weighted rows, from the cache when another plan made the same measurement. */
    private Rows rows(Measurement m, int index, List<Input> inputs) throws InputException {
        CaseModel base = nominal(m, index, inputs);
        StringBuilder key = new StringBuilder();
        key.append(m.source.index()).append('|').append(base.stack()).append('|')
                .append(base.geometry().values()).append('|').append(base.measurement().values());
        for (Input in : inputs) {
            if (in.reaches[index]) {
                key.append('|').append(in.local).append(in.free != null ? 'F' : 'U').append(in.value);
            } else {
                key.append("|-");
            }
        }
        String k = key.toString();
        Rows cached = rows.get(k);
        if (cached != null) {
            return cached;
        }
        Simulation sim = base.simulation(catalog);
        String signal = Designs.signal(m.source, sim.technique());
        double[] x = x(m, sim);
        double[] y = sim.run(x).column(signal);
        PlanSpec.Noise noise = plan.noise().get(signal);
        double[] sigma = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            sigma[i] = noise.sigma(y[i]);
            if (!(sigma[i] > 0) || !Double.isFinite(sigma[i])) {
                throw new ModelEvaluationException("the " + signal + " is " + y[i] + " at x = " + number(x[i])
                        + ", so its relative noise gives no σ there");
            }
        }
        double[][] cols = new double[1 + inputs.size()][];
        cols[0] = sigma;
        for (int q = 0; q < inputs.size(); q++) {
            Input in = inputs.get(q);
            if (!in.reaches[index]) {
                continue;
            }
            EvaluationCancelledException.checkpoint();
            double shifted;
            double h;
            if (in.free != null) {
                double u = in.free.toU(in.value);
                shifted = in.free.toP(u + STEP);
                h = STEP;
            } else {
                h = STEP * Math.max(Math.abs(in.value), in.uncertain.sigma());
                shifted = in.value + h;
            }
            double[] up = base.with(in.local, shifted).simulation(catalog).run(x).column(signal);
            double[] col = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                col[i] = (up[i] - y[i]) / (h * sigma[i]);
            }
            cols[1 + q] = col;
        }
        Rows r = new Rows(sigma, cols);
        rows.putIfAbsent(k, r);
        return r;
    }

    /** The x values of a planned measurement: its block's list, else the rows of its dataset's data file. */
    private double[] x(Measurement m, Simulation sim) throws InputException {
        double[] x = sim.measurement().xValues();
        if (x.length > 0) {
            return x;
        }
        DatasetSpec d = m.source;
        if (d.file() != null && Files.isRegularFile(d.file())) {
            double[] cached = dataX.get(d.index());
            if (cached != null) {
                return cached;
            }
            String column = sim.technique().xColumn().orElse("x");
            DataTable table = DataTable.read(d.file());
            if (!table.has(column)) {
                throw new InputException(d.file(), null, 1, "no column '" + column + "' for " + d.path());
            }
            double[] fromData = RowSelection.select(table.column(column), d.rows().rows(table, column));
            dataX.put(d.index(), fromData);
            return fromData;
        }
        String key = sim.technique().xParameter().orElse("x values");
        Block block = m.model.measurement();
        throw InputException.at(block.pathOf(key), "missing; a plan evaluates each measurement at its "
                + sim.technique().xColumn().orElse("x") + " values: give them in the measurement block"
                + (d.file() == null ? "" : " (or a data file for " + d.path() + ")"));
    }
}
