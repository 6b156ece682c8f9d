package lamella.ui.panels;

import java.util.List;

/** A value column of the stack table: the case-file key and how the column shows it. */
record LayerColumn(String key, String heading, DisplayUnit unit) {

    static final List<LayerColumn> VALUES = List.of(
            of("thickness_m", "thickness"),
            of("k_through_w_mk", "Λ through"),
            of("k_in_plane_w_mk", "Λ in-plane"),
            of("heat_capacity_j_m3k", "C"),
            of("conductance_below_w_m2k", "G below"));

    private static LayerColumn of(String key, String words) {
        DisplayUnit u = DisplayUnit.of(key, true);
        return new LayerColumn(key, words + " (" + u.unit() + ")", u);
    }
}
