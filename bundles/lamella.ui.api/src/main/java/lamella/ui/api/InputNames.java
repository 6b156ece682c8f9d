package lamella.ui.api;

import java.util.Map;
import lamella.api.ParameterRef;
import lamella.api.Units;

/** Inputs of a case in the trade's words, for labels, messages and the names of edits. */
public final class InputNames {

    private static final Map<String, String> LAYER_KEYS = Map.of(
            "thickness_m", "thickness",
            "k_w_mk", "isotropic Λ",
            "k_through_w_mk", "Λ through",
            "k_in_plane_w_mk", "Λ in-plane",
            "k_in_plane_x_w_mk", "Λ in-plane x",
            "k_in_plane_y_w_mk", "Λ in-plane y",
            "heat_capacity_j_m3k", "C",
            "conductance_below_w_m2k", "G below");

    private static final String[] UNIT_SUFFIXES = {"_k_m_per_w", "_k_per_w", "_w_m2k", "_w_mk", "_j_m3k", "_j_kgk",
        "_kg_m3", "_hz", "_deg", "_m", "_s", "_k"};

    private InputNames() {
    }

    /** "film · Λ through", "geometry · pump radius", "dataset 2 · geometry · pump radius" (datasets numbered as the case file
     * numbers them, from 0). */
    public static String of(ParameterRef ref) {
        String prefix = ref.dataset() >= 0 ? "dataset " + ref.dataset() + " · "
                : ref.sample() != null ? "sample " + ref.sample() + " · " : "";
        return switch (ref.scope()) {
            case GAIN -> "gain · " + ref.key();
            case LAYER -> prefix + ref.layer() + " · " + LAYER_KEYS.getOrDefault(ref.key(), key(ref.key()));
            case GEOMETRY -> prefix + "geometry · " + key(ref.key());
            case MEASUREMENT -> prefix + "measurement · " + key(ref.key());
        };
    }

    /** A case-file key in words, without its unit suffix: {@code pump_radius_m} → "pump radius". */
    public static String key(String key) {
        String stem = key;
        if (!Units.ofKey(key).isEmpty()) {
            for (String suffix : UNIT_SUFFIXES) {
                if (key.endsWith(suffix)) {
                    stem = key.substring(0, key.length() - suffix.length());
                    break;
                }
            }
        }
        return stem.replace('_', ' ');
    }
}
