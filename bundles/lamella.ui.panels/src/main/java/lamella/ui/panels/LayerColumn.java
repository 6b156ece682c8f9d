package lamella.ui.panels;

import java.util.List;

/**
 * A value column of the stack table: the case-file key, its short name for the heading (the symbols of the
 * trade, so that every column fits beside the others), what it means in full, and the unit it is shown in first.
 */
record LayerColumn(String key, String words, String meaning, DisplayUnit unit) {

    static final List<LayerColumn> VALUES = List.of(
            of("thickness_m", "thickness", "layer thickness d"),
            of("k_through_w_mk", "Λz", "through-plane thermal conductivity Λz"),
            of("k_in_plane_w_mk", "Λr", "in-plane thermal conductivity Λr (both in-plane directions)"),
            of("heat_capacity_j_m3k", "C", "volumetric heat capacity C (density × specific heat)"),
            of("conductance_below_w_m2k", "G below", "thermal boundary conductance G to the layer below (for a"
                    + " layer above the heated plane: of its interface toward the plane)"));

    private static LayerColumn of(String key, String words, String meaning) {
        return new LayerColumn(key, words, meaning, DisplayUnit.of(key, true));
    }
}
