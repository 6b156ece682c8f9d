package lamella.report;

import java.util.Optional;
import lamella.api.Block;

/**
 * The line heater and its third-harmonic voltage in words, from the keys of the geometry and measurement blocks:
 * what the report says of the heater model beside the tables of those blocks.
 */
final class HeaterWords {

    private HeaterWords() {
    }

    /**
     * For a {@code line} geometry: a massless heater in perfect contact, or the lumped heater with its values; for
     * {@code line-film-difference} the same, said of the sample's heater and the reference's.
     */
    static Optional<String> geometry(Block g) {
        if ("line-film-difference".equals(g.get("type"))) {
            return heater(g).map(w -> "The signal is the difference between the heater's temperature on this stack"
                    + " and on the same stack without its first layer (the differential method, Lee & Cahill, J."
                    + " Appl. Phys. 81, 2590, 1997), at the same power per unit length. For both: " + w);
        }
        if (!"line".equals(g.get("type"))) {
            return Optional.empty();
        }
        return heater(g);
    }

    private static Optional<String> heater(Block g) {
        Object d = g.get("heater_thickness_m");
        Object c = g.get("heater_heat_capacity_j_m3k");
        Object r = g.get("heater_boundary_resistance_m2k_w");
        double mass = d instanceof Double dd && c instanceof Double cc ? dd * cc : 0;
        double resistance = r instanceof Double rr ? rr : 0;
        if (mass == 0 && resistance == 0) {
            return Optional.of("The heater is modelled as a massless strip in perfect thermal contact with the sample:"
                    + " its temperature is the sample's surface temperature averaged over its width 2b.");
        }
        return Optional.of("The heater is modelled as a lumped body of its own (Borca-Tasciuc, Kumar & Chen, Rev."
                + " Sci. Instrum. 72, 2139, 2001): heat capacity per unit area (ρc d)_h = " + Numbers.plain(mass)
                + " J/(m² K) (thickness × volumetric heat capacity) and a boundary resistance R = "
                + Numbers.plain(resistance) + " m² K/W to the sample. The heater's temperature per unit power per"
                + " unit length is H_h = (H + R/(2b)) / (1 + iω (ρc d)_h (R + 2b H)), with H the sample's"
                + " width-averaged response.");
    }

    /** For a {@code 3omega-voltage} measurement: how the voltage follows from the heater's 2f temperature. */
    static Optional<String> measurement(Block m) {
        if (!"3omega-voltage".equals(m.get("type"))) {
            return Optional.empty();
        }
        return Optional.of("The signal is the heater's third-harmonic voltage (rms), V3ω = ½ I³ R0 (dR/dT) H_h(2f)/L,"
                + " for a constant rms drive current I (a drive voltage V counts as I = V/R0), its phase that of the"
                + " temperature at 2f (negative when lagging).");
    }
}
