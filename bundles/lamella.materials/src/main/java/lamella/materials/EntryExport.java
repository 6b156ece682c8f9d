package lamella.materials;

import com.fasterxml.jackson.core.io.JsonStringEncoder;
import java.util.ArrayList;
import java.util.List;
import lamella.api.material.Material;
import lamella.api.material.MaterialProperty;
import lamella.api.material.TemperatureCurve;

/**
 * One entry as a library file of its own, in the format {@code materials check} accepts, so that a user can copy a
 * shipped or facility entry into a folder of their own and revise it (raising its version). The copy says that it
 * replaces the entry it was exported from, since in a higher tier it shares that entry's names.
 */
final class EntryExport {

    private EntryExport() {
    }

    static String json(Material m) {
        List<String> fields = new ArrayList<>();
        fields.add(field("id", quote(m.id())));
        fields.add(field("name", quote(m.name())));
        if (!m.aliases().isEmpty()) {
            fields.add(field("aliases", "[" + String.join(", ", m.aliases().stream().map(EntryExport::quote).toList())
                    + "]"));
        }
        fields.add(field("replaces", "[" + quote(m.id()) + "]"));
        fields.add(field("version", Integer.toString(m.curation().version())));
        m.curation().reviewedBy().ifPresent(by -> fields.add(field("reviewed_by", quote(by))));
        m.curation().reviewedOn().ifPresent(on -> fields.add(field("reviewed_on", quote(on.toString()))));
        if (!m.notes().isEmpty()) {
            fields.add(field("notes", quote(m.notes())));
        }
        List<String> props = new ArrayList<>();
        for (MaterialProperty p : m.properties().values()) {
            props.add("        " + quote(p.quantity().key()) + ": " + property(p));
        }
        fields.add(field("properties", "{\n" + String.join(",\n", props) + "\n      }"));
        return "{\n  \"materials\": [\n    {\n" + String.join(",\n", fields) + "\n    }\n  ]\n}\n";
    }

    private static String property(MaterialProperty p) {
        List<String> parts = new ArrayList<>();
        TemperatureCurve c = p.curve();
        if (c.isTable()) {
            double[] t = c.temperatures();
            double[] v = c.values();
            List<String> rows = new ArrayList<>();
            for (int i = 0; i < t.length; i++) {
                rows.add("[" + Numbers.plain(t[i]) + ", " + Numbers.plain(v[i]) + "]");
            }
            parts.add("\"table\": [" + String.join(", ", rows) + "]");
        } else {
            parts.add("\"value\": " + Numbers.plain(c.values()[0]));
            parts.add(c.lowK() == c.highK() ? "\"at_k\": " + Numbers.plain(c.lowK())
                    : "\"range_k\": [" + Numbers.plain(c.lowK()) + ", " + Numbers.plain(c.highK()) + "]");
        }
        p.uncertaintyRel().ifPresent(u -> parts.add("\"uncertainty_rel\": " + Numbers.plain(u)));
        parts.add("\"source\": " + quote(p.source()));
        if (!p.notes().isEmpty()) {
            parts.add("\"notes\": " + quote(p.notes()));
        }
        return "{" + String.join(", ", parts) + "}";
    }

    private static String field(String key, String json) {
        return "      " + quote(key) + ": " + json;
    }

    private static String quote(String s) {
        return "\"" + new String(JsonStringEncoder.getInstance().quoteAsString(s)) + "\"";
    }
}
