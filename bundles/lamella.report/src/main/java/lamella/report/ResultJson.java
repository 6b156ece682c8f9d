package lamella.report;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Map;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.Layer;
import lamella.api.Sample;
import lamella.api.Stack;
import lamella.api.ValueOrigin;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.MonteCarloSummary;
import lamella.api.fit.SensitivityTable;

/**
 * Everything of a report in one JSON document, for scripts and archives. Numbers are SI, keys carry their unit as
 * case-file keys do, and a number that is not finite is written as null (JSON has no NaN) with the reason beside
 * it where one is known: a semi-infinite layer has no thickness, perfect contact no conductance.
 */
final class ResultJson {

    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ResultJson() {
    }

    static String of(CaseDocument doc, FitOutcome o, List<SensitivityTable> sensitivities, ReportStamp stamp) {
        ObjectNode root = MAPPER.createObjectNode();
        ObjectNode made = root.putObject("written_by");
        made.put("program", "Lamella");
        made.put("version", stamp.version());
        made.put("written_utc", stamp.written().toString());
        root.set("case", caseNode(doc));
        root.set("fit", fitNode(o));
        ArrayNode tables = root.putArray("sensitivities");
        for (SensitivityTable t : sensitivities) {
            tables.add(sensitivityNode(t));
        }
        try {
            return MAPPER.writeValueAsString(root);
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a JSON tree of plain values could not be written", e);
        }
    }

    private static void layers(ArrayNode layers, List<Layer> side) {
        for (Layer l : side) {
            ObjectNode n = layers.addObject();
            n.put("name", l.name());
            n.put("semi_infinite", l.isSemiInfinite());
            number(n, "thickness_m", l.thickness());
            number(n, "k_through_w_mk", l.kThrough());
            number(n, "k_in_plane_x_w_mk", l.kInPlaneX());
            number(n, "k_in_plane_y_w_mk", l.kInPlaneY());
            number(n, "heat_capacity_j_m3k", l.heatCapacity());
            n.put("perfect_contact_below", l.hasPerfectContactBelow());
            number(n, "conductance_below_w_m2k", l.conductanceBelow());
        }
    }

    private static void stack(ObjectNode n, Stack s) {
        layers(n.putArray("layers"), s.layers());
        n.put("bottom", s.bottom().caseName());
        if (s.heatsBothWays()) {
            layers(n.putArray("above"), s.above());
            n.put("top", s.top().caseName());
        }
        if (s.optics().inDepth()) {
            number(n, "absorption_depth_m", s.optics().absorption());
            number(n, "sensing_depth_m", s.optics().sensing());
            n.put("sensing_follows_absorption", s.optics().sensingFollows());
        }
        n.put("model", s.heatFlowInWords());
    }

    private static ObjectNode caseNode(CaseDocument doc) {
        ObjectNode c = MAPPER.createObjectNode();
        c.put("file", doc.file() == null ? null : doc.file().toString());
        c.put("description", CaseText.description(doc));
        if (doc.samples().get(0).named()) {
            ArrayNode samples = c.putArray("samples");
            for (Sample s : doc.samples()) {
                ObjectNode n = samples.addObject();
                n.put("name", s.name());
                stack(n.putObject("stack"), s.stack());
                if (s.geometry() != null) {
                    n.set("geometry", block(s.geometry()));
                }
            }
        } else {
            stack(c.putObject("stack"), doc.stack());
        }
        ArrayNode library = c.putArray("library_values");
        for (ValueOrigin v : doc.libraryValues()) {
            library.add(MAPPER.valueToTree(v.provenance()));
        }
        c.set("geometry", block(doc.geometry()));
        c.set("measurement", block(doc.measurement()));
        if (doc.root().get("fit") instanceof Block fit) {
            c.set("fit", block(fit));
        }
        return c;
    }

    private static ObjectNode fitNode(FitOutcome o) {
        ObjectNode f = MAPPER.createObjectNode();
        f.put("converged", o.converged());
        f.put("evaluations", o.evaluations());
        number(f, "reduced_chi_square", o.reducedChiSquare());
        ArrayNode warnings = f.putArray("warnings");
        o.warnings().forEach(warnings::add);
        ArrayNode params = f.putArray("parameters");
        for (FittedParameter p : o.parameters()) {
            ObjectNode n = params.addObject();
            n.put("name", p.ref().toString());
            quantity(n, p.quantity());
            n.put("unit", p.ref().unit());
            number(n, "initial", p.initial());
            number(n, "value", p.value());
            number(n, "sigma_total", p.sigma());
            number(n, "sigma_noise", p.sigmaNoise());
            n.put("at_bound", p.atBound());
            n.put("identifiable", p.identifiable());
        }
        ArrayNode correlation = f.putArray("correlation");
        for (double[] row : o.correlation()) {
            correlation.add(numbers(row));
        }
        ArrayNode datasets = f.putArray("datasets");
        for (DatasetFit d : o.datasets()) {
            ObjectNode n = datasets.addObject();
            n.put("index", d.index());
            n.put("source", d.source());
            n.put("technique", d.technique());
            n.put("signal", d.signal());
            n.put("x_column", d.xColumn());
            n.put("sigma_from_data", d.sigmaFromData());
            number(n, "reduced_chi_square", d.reducedChiSquare());
            n.set("x", numbers(d.x()));
            n.set("data", numbers(d.data()));
            n.set("sigma", numbers(d.sigma()));
            n.set("model", numbers(d.model()));
            d.heating().ifPresent(h -> n.set("self_heating", MAPPER.valueToTree(h.record())));
        }
        ArrayNode budget = f.putArray("budget");
        for (BudgetLine line : o.budget()) {
            ObjectNode n = budget.addObject();
            n.put("source", line.source() == null ? null : line.source().toString());
            quantity(n, line.quantity());
            number(n, "input_sigma", line.inputSigma());
            n.put("input_unit", Budget.inputUnit(line));
            n.set("contributions", numbers(line.contributions()));
        }
        o.monteCarlo().ifPresent(mc -> f.set("monte_carlo", monteCarloNode(mc)));
        return f;
    }

    private static ObjectNode monteCarloNode(MonteCarloSummary mc) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("samples", mc.samples());
        n.put("failed", mc.failed());
        n.set("levels_percent", numbers(MonteCarloSummary.LEVELS));
        n.set("mean", numbers(mc.mean()));
        n.set("std", numbers(mc.std()));
        ArrayNode percentiles = n.putArray("percentiles");
        for (double[] p : mc.percentiles()) {
            percentiles.add(numbers(p));
        }
        n.set("std_over_linearised_sigma", numbers(mc.stdOverLinearised()));
        return n;
    }

    private static ObjectNode sensitivityNode(SensitivityTable t) {
        ObjectNode n = MAPPER.createObjectNode();
        n.put("x_column", t.xColumn());
        n.put("signal", t.signal());
        n.put("phase_like", t.phaseLike());
        n.set("x", numbers(t.x()));
        ObjectNode values = n.putObject("values");
        ObjectNode quantities = n.putObject("quantities");
        for (int p = 0; p < t.parameters().size(); p++) {
            values.set(t.parameters().get(p).toString(), numbers(t.values()[p]));
            if (!t.quantities().get(p).isEmpty()) {
                quantities.put(t.parameters().get(p).toString(), t.quantities().get(p));
            }
        }
        return n;
    }

    /** A case block as read: numbers, text, flags, nested blocks and lists, keys in file order. */
    private static ObjectNode block(Block b) {
        ObjectNode n = MAPPER.createObjectNode();
        for (Map.Entry<String, Object> e : b.values().entrySet()) {
            n.set(e.getKey(), value(e.getValue()));
        }
        return n;
    }

    private static JsonNode value(Object v) {
        if (v instanceof Block b) {
            return block(b);
        }
        if (v instanceof List<?> list) {
            ArrayNode a = MAPPER.createArrayNode();
            list.forEach(item -> a.add(value(item)));
            return a;
        }
        if (v instanceof Double d) {
            return Double.isFinite(d) ? MAPPER.getNodeFactory().numberNode(d) : MAPPER.getNodeFactory().nullNode();
        }
        if (v instanceof Boolean flag) {
            return MAPPER.getNodeFactory().booleanNode(flag);
        }
        return MAPPER.getNodeFactory().textNode(String.valueOf(v));
    }

    /** What a conductivity path moved ("isotropic Λ"), where its key alone does not say. */
    private static void quantity(ObjectNode n, String quantity) {
        if (!quantity.isEmpty()) {
            n.put("quantity", quantity);
        }
    }

    private static void number(ObjectNode n, String key, double v) {
        if (Double.isFinite(v)) {
            n.put(key, v);
        } else {
            n.putNull(key);
        }
    }

    private static ArrayNode numbers(double[] values) {
        ArrayNode a = MAPPER.createArrayNode();
        for (double v : values) {
            if (Double.isFinite(v)) {
                a.add(v);
            } else {
                a.addNull();
            }
        }
        return a;
    }
}
