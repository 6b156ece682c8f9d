package lamella.report;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.stream.Collectors;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.Layer;
import lamella.api.ParameterRef;
import lamella.api.Sample;
import lamella.api.SelfHeating;
import lamella.api.Stack;
import lamella.api.Units;
import lamella.api.ValueOrigin;
import lamella.api.material.Material;
import lamella.api.material.PropertyValue;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;

/** The inputs of the case on the page: the stack layer by layer, then the geometry, measurement and fit blocks. */
final class InputTables {

    /** Lists up to this long are shown in full; longer ones by count, first and last value (all are in result.json). */
    private static final int LONGEST_LIST_SHOWN = 12;

    private InputTables() {
    }

    static void write(Html h, CaseDocument doc, FitOutcome o) {
        if (doc.samples().get(0).named()) {
            h.element("p", "The case holds " + doc.samples().size() + " sample" + (doc.samples().size() == 1 ? ""
                    : "s") + ", each with its own stack; every dataset names the sample it was measured on. A layer"
                    + " input named without a sample is one value shared by every sample that has that layer;"
                    + " samples[NAME].… names one sample's own.");
        }
        for (Sample s : doc.samples()) {
            Set<String> free = o.parameters().stream().map(FittedParameter::ref)
                    .filter(r -> r.scope() == ParameterRef.Scope.LAYER
                            && (r.sample() == null || r.sample().equals(s.name())))
                    .map(r -> r.local().toString()).collect(Collectors.toSet());
            if (s.named()) {
                h.element("h3", "Sample " + s.name());
            }
            stack(h, free, s.stack());
            if (s.geometry() != null && doc.severalSamples()) {
                block(h, "Geometry of sample " + s.name(), s.geometry());
            }
        }
        libraryValues(h, doc);
        selfHeating(h, o);
        if (doc.states("geometry")) {
            block(h, "Geometry", doc.geometry());
            HeaterWords.geometry(doc.geometry()).ifPresent(w -> h.element("p", w));
        }
        if (doc.states("measurement")) {
            block(h, "Measurement", doc.measurement());
            HeaterWords.measurement(doc.measurement()).ifPresent(w -> h.element("p", w));
        }
        if (doc.root().get("fit") instanceof Block fit) {
            block(h, "Fit settings", fit);
        }
    }

    private static void stack(Html h, Set<String> free, Stack stack) {
        h.element("p", stack.heatFlowInWords());
        h.element("h3", stack.heatsBothWays() ? "Layers, from the heated plane down"
                : "Layers, from the heated surface down");
        layerTable(h, free, stack.layers(), "G to the layer below (W/(m² K))", true);
        if (stack.heatsBothWays()) {
            h.element("h3", "Layers above the heated plane, from it up");
            layerTable(h, free, stack.above(), "G toward the heated plane (W/(m² K))", false);
        }
        h.raw("<p class=\"note\">").text("Below the last layer: " + stack.bottom().caseName() + ". "
                        + (stack.heatsBothWays() ? "Above the outermost layer above: "
                        + stack.top().caseName() + ". " : ""))
                .raw("<span class=\"free-key\">Shaded</span>")
                .text(" values are fitted; the case file's starting value is shown here, the result above.")
                .raw("</p>\n");
    }

    private static void layerTable(Html h, Set<String> free, List<Layer> layers, String conductanceHeading,
                                   boolean lastHasNone) {
        h.raw("<table class=\"inputs\"><thead>");
        h.headRow(List.of("layer", "thickness (m)", "Λ through-plane (W/(m K))", "Λ in-plane x (W/(m K))",
                "Λ in-plane y (W/(m K))", "C volumetric (J/(m³ K))", conductanceHeading));
        h.raw("</thead><tbody>\n");
        for (int i = 0; i < layers.size(); i++) {
            Layer l = layers.get(i);
            boolean last = i == layers.size() - 1;
            h.raw("<tr><th scope=\"row\">").text(l.name()).raw("</th>");
            cell(h, free, l, l.isSemiInfinite() ? "semi-infinite" : Numbers.plain(l.thickness()), "thickness_m");
            boolean throughX = l.tie().x();
            boolean throughY = l.tie().y();
            cell(h, free, l, Numbers.plain(l.kThrough()), "k_through_w_mk", "k_w_mk");
            cell(h, free, l, Numbers.plain(l.kInPlaneX()), "k_in_plane_x_w_mk", "k_in_plane_w_mk", "k_w_mk",
                    throughX ? "k_through_w_mk" : "k_w_mk");
            cell(h, free, l, Numbers.plain(l.kInPlaneY()), "k_in_plane_y_w_mk", "k_in_plane_w_mk", "k_w_mk",
                    throughY ? "k_through_w_mk" : "k_w_mk");
            cell(h, free, l, Numbers.plain(l.heatCapacity()), "heat_capacity_j_m3k");
            String g = last && lastHasNone ? "—" : l.hasPerfectContactBelow() ? "perfect contact"
                    : Numbers.plain(l.conductanceBelow());
            cell(h, free, l, g, "conductance_below_w_m2k");
            h.raw("</tr>\n");
        }
        h.raw("</tbody></table>\n");
    }

    /** Every layer value a material library gave: which library and tier, which entry and version, which source. */
    private static void libraryValues(Html h, CaseDocument doc) {
        List<ValueOrigin> values = doc.libraryValues();
        h.element("h3", "Values from material libraries");
        if (values.isEmpty()) {
            h.element("p", "note", "No layer value came from a material library.");
            return;
        }
        h.raw("<table class=\"inputs keys\"><thead>");
        h.headRow(List.of("layer", "key", "value", "unit", "library (tier)", "entry, version", "read from", "source",
                "at", "relative σ"));
        h.raw("</thead><tbody>\n");
        for (ValueOrigin v : values) {
            PropertyValue p = v.library().orElseThrow();
            Material m = p.material();
            h.row(List.of(v.layer(), v.key() + (v.how().isEmpty() ? "" : " (" + v.how() + ")"), Numbers.plain(v.value()),
                    unit(v.key()), m.library().label() + ", " + m.library().id(),
                    m.id() + " v" + m.curation().version(), m.location(), p.sources(),
                    java.math.BigDecimal.valueOf(p.temperatureK()).stripTrailingZeros().toPlainString() + " K",
                    p.uncertaintyRel().isPresent() ? Numbers.percent(p.uncertaintyRel().getAsDouble()) + " %" : "—"));
        }
        h.raw("</tbody></table>\n");
    }

    /** The steady rise and the temperatures of the library values at the best fit, dataset by dataset. */
    private static void selfHeating(Html h, FitOutcome o) {
        List<DatasetFit> heated = o.datasets().stream().filter(d -> d.heating().isPresent()).toList();
        if (heated.isEmpty()) {
            return;
        }
        h.element("h3", "Self-heating at the best fit");
        for (DatasetFit d : heated) {
            SelfHeating.Outcome s = d.heating().orElseThrow();
            h.element("p", "Dataset " + d.index() + " (" + d.source() + "): " + s.inWords());
            if (s.values().isEmpty()) {
                continue;
            }
            h.raw("<table class=\"inputs keys\"><thead>");
            h.headRow(List.of("layer", "key", "temperature (K)", "value as read", "value used", "unit"));
            h.raw("</thead><tbody>\n");
            for (SelfHeating.ShiftedValue v : s.values()) {
                h.row(List.of(v.layer(), v.key(), Numbers.plain(v.temperatureK()), Numbers.plain(v.baseValue()),
                        Numbers.plain(v.value()), unit(v.key())));
            }
            h.raw("</tbody></table>\n");
            for (String w : s.warnings()) {
                h.element("p", "note", w);
            }
        }
    }

    private static void cell(Html h, Set<String> free, Layer l, String text, String... keys) {
        boolean fitted = false;
        for (String key : keys) {
            fitted |= free.contains(ParameterRef.layer(l.name(), key).toString());
        }
        h.raw(fitted ? "<td class=\"free\">" : "<td>").text(text).raw("</td>");
    }

    /** A block as key, value and unit rows; nested blocks and lists of blocks by their path. */
    private static void block(Html h, String heading, Block b) {
        h.element("h3", heading);
        h.raw("<table class=\"inputs keys\"><thead>");
        h.headRow(List.of("key", "value", "unit"));
        h.raw("</thead><tbody>\n");
        List<List<String>> rows = new ArrayList<>();
        flatten(b, rows);
        rows.forEach(h::row);
        h.raw("</tbody></table>\n");
    }

    /** Rows keyed by JSON path, so that they read as the addresses the results and errors use. */
    private static void flatten(Block b, List<List<String>> rows) {
        for (Map.Entry<String, Object> e : b.values().entrySet()) {
            Object v = e.getValue();
            if (v instanceof Block nested) {
                flatten(nested, rows);
            } else if (v instanceof List<?> list && !list.isEmpty() && list.get(0) instanceof Block) {
                for (int i = 0; i < list.size(); i++) {
                    if (list.get(i) instanceof Block item) {
                        flatten(item, rows);
                    } else {
                        rows.add(List.of(b.pathOf(e.getKey()) + "[" + i + "]", shown(list.get(i)),
                                unit(e.getKey())));
                    }
                }
            } else {
                rows.add(List.of(b.pathOf(e.getKey()), shown(v), unit(e.getKey())));
            }
        }
    }

    private static String unit(String key) {
        String u = Units.ofKey(key);
        return u.isEmpty() ? "—" : u;
    }

    private static String shown(Object v) {
        if (v instanceof Double d) {
            return Numbers.plain(d);
        }
        if (v instanceof List<?> list) {
            if (list.size() <= LONGEST_LIST_SHOWN) {
                return list.stream().map(InputTables::shown).collect(Collectors.joining("; "));
            }
            return list.size() + " values: " + shown(list.get(0)) + " … " + shown(list.get(list.size() - 1));
        }
        return String.valueOf(v);
    }
}
