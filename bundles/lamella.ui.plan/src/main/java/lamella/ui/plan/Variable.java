package lamella.ui.plan;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import lamella.api.ParameterRef;
import lamella.charts.plan.PlanGrid;
import lamella.charts.plan.TradeUnit;

/**
 * A key a plan may vary — a measurement, geometry or layer key, or an end of a list key — as the plan block names it
 * ({@code vary[]}) and as the plans label it ({@code geometry.pump_radius_m}, {@code measurement.delays_s[last]}).
 *
 * @param ref     the key
 * @param end     {@code first} or {@code last} for an end of a list key; null otherwise
 * @param typical the case's value, SI (to choose the unit it is edited in)
 */
record Variable(ParameterRef ref, String end, double typical) {

    String label() {
        return ref + (end == null ? "" : "[" + end + "]");
    }

    TradeUnit unit() {
        return TradeUnit.of(ref.key(), typical);
    }

    /** Spread in ln by default: frequencies and beam radii, as the plan block reads a range. */
    boolean logByDefault() {
        return ref.key().endsWith("_hz") || (ref.scope() == ParameterRef.Scope.GEOMETRY
                && (ref.key().startsWith("pump_radius") || ref.key().startsWith("probe_radius")));
    }

    /** The keys of the case a plan may vary: numbers of its measurement, geometry and layers, ends of list keys. */
    static List<Variable> candidates(ObjectNode doc) {
        List<Variable> out = new ArrayList<>();
        for (String block : List.of("measurement", "geometry")) {
            JsonNode b = doc.path(block);
            b.fieldNames().forEachRemaining(k -> {
                JsonNode v = b.get(k);
                ParameterRef ref = block.equals("measurement") ? ParameterRef.measurement(k) : ParameterRef.geometry(k);
                if (v.isNumber()) {
                    out.add(new Variable(ref, null, v.asDouble()));
                } else if (v.isArray() && v.size() >= 2 && v.get(0).isNumber()) {
                    out.add(new Variable(ref, "first", v.get(0).asDouble()));
                    out.add(new Variable(ref, "last", v.get(v.size() - 1).asDouble()));
                }
            });
        }
        for (JsonNode layer : doc.path("stack").path("layers")) {
            String name = layer.path("name").asText();
            layer.fieldNames().forEachRemaining(k -> {
                if (layer.get(k).isNumber()) {
                    out.add(new Variable(ParameterRef.layer(name, k), null, layer.get(k).asDouble()));
                }
            });
        }
        return out;
    }

    /** The key of a plan block's {@code vary} entry; null when the entry names none the panel knows. */
    static Variable of(JsonNode entry, ObjectNode doc) {
        ParameterRef ref;
        if (entry.hasNonNull("measurement")) {
            ref = ParameterRef.measurement(entry.get("measurement").asText());
        } else if (entry.hasNonNull("geometry")) {
            ref = ParameterRef.geometry(entry.get("geometry").asText());
        } else if (entry.hasNonNull("layer") && entry.hasNonNull("property")) {
            ref = ParameterRef.layer(entry.get("layer").asText(), entry.get("property").asText());
        } else {
            return null;
        }
        if (entry.path("dataset").isInt()) {
            ref = ref.inDataset(entry.get("dataset").asInt());
        }
        String end = entry.hasNonNull("end") ? entry.get("end").asText() : null;
        double typical = Double.NaN;
        for (Variable c : candidates(doc)) {
            if (c.ref.key().equals(ref.key()) && c.ref.scope() == ref.scope() && java.util.Objects.equals(c.ref.layer(),
                    ref.layer()) && java.util.Objects.equals(c.end, end)) {
                typical = c.typical;
            }
        }
        double[] values = values(entry);
        if (Double.isNaN(typical) && values.length > 0) {
            typical = values[values.length - 1];
        }
        return new Variable(ref, end, typical);
    }

    /** The entry's values as written ({@code values}), or its range's ends (min, max); empty when neither. */
    static double[] values(JsonNode entry) {
        if (entry.path("values").isArray()) {
            double[] v = new double[entry.get("values").size()];
            for (int i = 0; i < v.length; i++) {
                v[i] = entry.get("values").get(i).asDouble();
            }
            return v;
        }
        if (entry.path("min").isNumber() && entry.path("max").isNumber()) {
            return new double[] {entry.get("min").asDouble(), entry.get("max").asDouble()};
        }
        return new double[0];
    }

    /** What an entry's values are, in words and in the key's unit: "1, 2, 4 MHz" or "3 to 24 µm, 4 steps in ln". */
    String describe(JsonNode entry) {
        TradeUnit u = unit();
        if (entry.path("values").isArray()) {
            List<String> parts = new ArrayList<>();
            for (double v : values(entry)) {
                parts.add(PlanGrid.number(u.factor() * v));
            }
            return String.join(", ", parts) + " " + u.symbol();
        }
        double[] ends = values(entry);
        if (ends.length < 2) {
            return "(no values)";
        }
        boolean log = entry.hasNonNull("spacing") ? entry.get("spacing").asText().equals("log") : logByDefault();
        return PlanGrid.number(u.factor() * ends[0]) + " to " + PlanGrid.number(u.factor() * ends[1]) + " "
                + u.symbol() + ", " + entry.path("steps").asInt() + " steps " + (log ? "in ln" : "linear");
    }

    /** The counts measured together, as written ("1", "1, 2"). */
    static String choose(JsonNode entry) {
        JsonNode c = entry.get("choose");
        if (c == null) {
            return "1";
        }
        if (c.isArray()) {
            List<String> parts = new ArrayList<>();
            c.forEach(x -> parts.add(x.asText()));
            return String.join(", ", parts);
        }
        return c.asText();
    }

    /** A plan block entry for this key: a range of {@code steps} values from {@code min} to {@code max} (SI). */
    ObjectNode entry(double min, double max, int steps, boolean log, List<Integer> choose) {
        ObjectNode e = JsonNodeFactory.instance.objectNode();
        switch (ref.scope()) {
            case MEASUREMENT -> e.put("measurement", ref.key());
            case GEOMETRY -> e.put("geometry", ref.key());
            case LAYER -> {
                e.put("layer", ref.layer());
                e.put("property", ref.key());
            }
        }
        if (ref.dataset() >= 0) {
            e.put("dataset", ref.dataset());
        }
        if (end != null) {
            e.put("end", end);
        }
        if (steps == 1) {
            e.putArray("values").add(min);
        } else {
            e.put("min", min);
            e.put("max", max);
            e.put("steps", steps);
            e.put("spacing", log ? "log" : "linear");
        }
        if (!choose.equals(List.of(1))) {
            ArrayNode c = e.putArray("choose");
            choose.forEach(c::add);
        }
        return e;
    }
}
