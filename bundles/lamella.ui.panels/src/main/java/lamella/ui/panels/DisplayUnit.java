package lamella.ui.panels;

import lamella.api.ParameterRef;
import lamella.api.Units;

/**
 * How a value is shown: SI inside, and at the edge the unit a reader of thin-film work expects — nm for layer
 * thickness, µm for beam radii and offsets, MJ/(m³ K) for heat capacity, MW/(m² K) for boundary conductance.
 *
 * @param unit   the label
 * @param factor SI value = shown value × factor
 */
record DisplayUnit(String unit, double factor) {

    static DisplayUnit of(ParameterRef ref) {
        return of(ref.key(), ref.scope() == ParameterRef.Scope.LAYER);
    }

    static DisplayUnit of(String key, boolean layer) {
        if (key.equals("thickness_m") && layer) {
            return new DisplayUnit("nm", 1e-9);
        }
        if (key.endsWith("_w_m2k")) {
            return new DisplayUnit("MW/(m² K)", 1e6);
        }
        if (key.endsWith("_j_m3k")) {
            return new DisplayUnit("MJ/(m³ K)", 1e6);
        }
        String si = Units.ofKey(key);
        if (si.equals("m")) {
            return new DisplayUnit("µm", 1e-6);
        }
        return new DisplayUnit(si, 1);
    }

    double shown(double si) {
        return si / factor;
    }

    double si(double shown) {
        return shown * factor;
    }
}
