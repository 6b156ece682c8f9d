package lamella.api;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Optional;
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
}
