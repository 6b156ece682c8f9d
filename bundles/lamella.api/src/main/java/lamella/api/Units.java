package lamella.api;

import java.util.List;
import java.util.Map;

/** Units for labels, from the suffix of a case-file key: every key carries its SI unit in its name. */
public final class Units {

    private static final List<Map.Entry<String, String>> SUFFIXES = List.of(
            Map.entry("_w_mk", "W/(m K)"),
            Map.entry("_w_m2k", "W/(m² K)"),
            Map.entry("_j_m3k", "J/(m³ K)"),
            Map.entry("_j_kgk", "J/(kg K)"),
            Map.entry("_kg_m3", "kg/m³"),
            Map.entry("_hz", "Hz"),
            Map.entry("_m", "m"),
            Map.entry("_s", "s"),
            Map.entry("_k", "K"),
            Map.entry("_deg", "°"),
            Map.entry("_w", "W"),
            Map.entry("_k_per_w", "K/W"),
            Map.entry("_k_m_per_w", "K m/W"),
            Map.entry("_m2k_w", "m² K/W"),
            Map.entry("_v", "V"),
            Map.entry("_a", "A"),
            Map.entry("_ohm", "Ω"),
            Map.entry("_ohm_per_k", "Ω/K"));

    private Units() {
    }

    /**
     * The unit of a key such as {@code pump_radius_m} or {@code conductance_below_w_m2k} (a key that is its unit
     * alone, such as {@code k_per_w}, counts too); empty if none.
     */
    public static String ofKey(String key) {
        String best = "";
        int bestLength = 0;
        String k = "_" + key;
        for (Map.Entry<String, String> e : SUFFIXES) {
            if (k.endsWith(e.getKey()) && e.getKey().length() > bestLength) {
                best = e.getValue();
                bestLength = e.getKey().length();
            }
        }
        return best;
    }
}
