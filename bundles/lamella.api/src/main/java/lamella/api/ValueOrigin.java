package lamella.api;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import lamella.api.material.Material;
import lamella.api.material.MaterialProperty;
import lamella.api.material.PropertyValue;

/**
 * Where one value of a case's stack came from, so that a run can show every input with its source.
 *
 * @param path    the JSON path the value stands for, such as {@code stack.layers[0].k_through_w_mk}
 * @param layer   the layer's name
 * @param key     the layer key, with its unit in its name
 * @param value   the value used, SI
 * @param kind    written in the case, taken from a library, or a default rule
 * @param line    the case-file line of the key that decided it (the value's own key, or {@code material}); −1 if none
 * @param how     how the value was obtained when that is not plain, such as "k_in_plane_w_mk" or
 *                "k_perpendicular_c_w_mk, c axis normal to the surface"; empty otherwise
 * @param library the library value, for {@link Kind#LIBRARY}
 */
public record ValueOrigin(String path, String layer, String key, double value, Kind kind, int line, String how,
                          Optional<PropertyValue> library) {

    public enum Kind {
        EXPLICIT, LIBRARY, DEFAULT
    }

    public ValueOrigin {
        how = how == null ? "" : how;
        if ((kind == Kind.LIBRARY) != library.isPresent()) {
            throw new IllegalArgumentException("a library value, and only that, carries its library entry");
        }
    }

    /** "explicit in case file (line 7)", "library … (facility), entry al-film v2, source, at 300 K", "default: …". */
    public String describe() {
        switch (kind) {
            case EXPLICIT:
                return "explicit in case file" + (line > 0 ? " (line " + line + ")" : "")
                        + (how.isEmpty() ? "" : ", from " + how);
            case LIBRARY: {
                PropertyValue v = library.orElseThrow();
                StringBuilder sb = new StringBuilder(v.material().label());
                if (!how.isEmpty()) {
                    sb.append(", ").append(how);
                } else if (v.derived()) {
                    sb.append(", density × specific heat");
                }
                sb.append(", ").append(v.sources());
                sb.append(", at ").append(BigDecimal.valueOf(v.temperatureK()).stripTrailingZeros().toPlainString())
                        .append(" K");
                v.uncertaintyRel().ifPresent(u -> sb.append(", ±").append(new BigDecimal(100 * u)
                        .round(new MathContext(2)).stripTrailingZeros().toPlainString()).append(" %"));
                return sb.toString();
            }
            default:
                return "default: " + how;
        }
    }

    /**
     * The provenance of a library value as plain JSON-ready values, the one record that result files and reports
     * write: the path and value, the library (id, name, tier, where it lives), the entry (id, version, file and
     * line, review), the source of every stated property used, the temperature and the relative uncertainty.
     * Keys are those of the case and library files.
     *
     * @throws IllegalStateException for a value that is not a library value
     */
    public Map<String, Object> provenance() {
        PropertyValue v = library.orElseThrow(() -> new IllegalStateException(path + " is not a library value"));
        Material m = v.material();
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("path", path);
        out.put("layer", layer);
        out.put("key", key);
        out.put("value", value);
        out.put("unit", Units.ofKey(key));
        Map<String, Object> lib = new LinkedHashMap<>();
        lib.put("id", m.library().id());
        lib.put("name", m.library().name());
        lib.put("tier", m.library().tier().label());
        lib.put("location", m.library().location());
        out.put("library", lib);
        Map<String, Object> entry = new LinkedHashMap<>();
        entry.put("id", m.id());
        entry.put("version", m.curation().version());
        entry.put("read_from", m.location());
        m.curation().reviewedBy().ifPresent(by -> entry.put("reviewed_by", by));
        m.curation().reviewedOn().ifPresent(on -> entry.put("reviewed_on", on.toString()));
        out.put("entry", entry);
        out.put("source", v.sources());
        List<Map<String, Object>> from = v.from().stream().map(ValueOrigin::stated).toList();
        out.put("stated", from);
        if (!how.isEmpty()) {
            out.put("how", how);
        }
        out.put("temperature_k", v.temperatureK());
        v.uncertaintyRel().ifPresent(u -> out.put("uncertainty_rel", u));
        return out;
    }

    private static Map<String, Object> stated(MaterialProperty p) {
        Map<String, Object> out = new LinkedHashMap<>();
        out.put("key", p.quantity().key());
        out.put("source", p.source());
        p.uncertaintyRel().ifPresent(u -> out.put("uncertainty_rel", u));
        return out;
    }
}
