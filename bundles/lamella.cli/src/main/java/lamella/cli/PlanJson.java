package lamella.cli;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Path;
import java.util.List;
import lamella.api.fit.BudgetLine;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlannedResult;
import lamella.api.plan.PredictedSigma;

/**
 * The plan file of {@code lamella plan --out}: the objective, targets, noise and limits, the case as written, and
 * every plan with its {@code values} (each varied key with its value, or the list of values measured together),
 * {@code predicted} σ per target ({@code parameter}, {@code sigma}, {@code sigma_noise}, {@code sigma_relative}),
 * budget, steady rise and status. SI units; a value that is not finite (an unidentifiable σ) is written as null.
 */
final class PlanJson {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private PlanJson() {
    }

    static String format(Path caseFile, PlanOutcome o) throws JsonProcessingException {
        ObjectNode root = MAPPER.createObjectNode();
        root.put("case", caseFile.toString());
        root.put("objective", o.objective());
        strings(root.putArray("targets"), o.targets());
        strings(root.putArray("varied"), o.varied());
        strings(root.putArray("noise"), o.noise());
        strings(root.putArray("limits"), o.limits());
        root.put("ranked", o.count(PlannedResult.Status.RANKED));
        root.put("beyond_limit", o.count(PlannedResult.Status.BEYOND_LIMIT));
        root.put("not_evaluable", o.count(PlannedResult.Status.NOT_EVALUABLE));
        plan(root.putObject("baseline"), o, o.baseline());
        ArrayNode plans = root.putArray("plans");
        for (PlannedResult p : o.plans()) {
            plan(plans.addObject(), o, p);
        }
        strings(root.putArray("warnings"), o.warnings());
        return MAPPER.writeValueAsString(root) + "\n";
    }

    private static void plan(ObjectNode n, PlanOutcome o, PlannedResult p) {
        if (p.rank() > 0) {
            n.put("rank", p.rank());
        }
        n.put("status", p.status().words());
        if (!p.reason().isEmpty()) {
            n.put("reason", p.reason());
        }
        ObjectNode values = n.putObject("values");
        for (int i = 0; i < p.values().size(); i++) {
            Object v = p.values().get(i);
            if (v instanceof List<?> l) {
                ArrayNode a = values.putArray(o.varied().get(i));
                l.forEach(x -> a.add((Double) x));
            } else {
                number(values, o.varied().get(i), (Double) v);
            }
        }
        n.put("measurements", p.measurements());
        number(n, "objective", p.objective());
        ArrayNode predicted = n.putArray("predicted");
        for (PredictedSigma s : p.predicted()) {
            ObjectNode t = predicted.addObject();
            FitResultJson.reference(t, s.ref(), s.quantity());
            number(t, "value", s.value());
            number(t, "sigma", s.sigma());
            number(t, "sigma_noise", s.sigmaNoise());
            number(t, "sigma_relative", s.sigmaRelative());
            t.put("unit", s.ref().unit());
            t.put("identifiable", s.identifiable());
        }
        ArrayNode budget = n.putArray("budget");
        for (BudgetLine b : p.budget()) {
            ObjectNode line = budget.addObject();
            line.put("source", b.source() == null ? "noise" : b.label());
            if (b.source() != null) {
                number(line, "input_sigma", b.inputSigma());
            }
            ObjectNode c = line.putObject("contributions");
            for (int t = 0; t < p.predicted().size(); t++) {
                number(c, p.predicted().get(t).ref().toString(), b.contributions()[t]);
            }
        }
        number(n, "steady_rise_k_per_w", p.risePerWatt());
        number(n, "steady_rise_k", p.rise());
    }

    private static void strings(ArrayNode a, List<String> values) {
        values.forEach(a::add);
    }

    private static void number(ObjectNode n, String key, double v) {
        if (Double.isFinite(v)) {
            n.put(key, v);
        } else {
            n.putNull(key);
        }
    }
}
