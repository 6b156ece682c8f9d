package lamella.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.Optional;
import lamella.api.Block;
import org.junit.jupiter.api.Test;

/** The report's words for the heater model follow the geometry's keys; wording of this program, no physics. */
class HeaterWordsTest {

    @Test
    void aLumpedHeaterIsDescribedWithItsValues() {
        String w = HeaterWords.geometry(new Block("geometry", Map.of("type", "line", "half_width_m", 5e-6,
                "heater_thickness_m", 4e-7, "heater_heat_capacity_j_m3k", 2.5e6,
                "heater_boundary_resistance_m2k_w", 2e-8))).orElseThrow();
        assertTrue(w.contains("(ρc d)_h = 1.000 J/(m² K)"), w);
        assertTrue(w.contains("R = 2.000 × 10⁻⁸ m² K/W"), w);
    }

    @Test
    void aPlainHeaterIsSaidToBeMasslessAndOtherGeometriesGetNoWords() {
        assertTrue(HeaterWords.geometry(new Block("geometry", Map.of("type", "line", "half_width_m", 5e-6)))
                .orElseThrow().startsWith("The heater is modelled as a massless strip"));
        assertEquals(Optional.empty(), HeaterWords.geometry(new Block("geometry", Map.of("type", "gaussian"))));
        assertTrue(HeaterWords.geometry(new Block("geometry", Map.of("type", "line-film-difference", "half_width_m",
                5e-6))).orElseThrow().startsWith("The signal is the difference between the heater's temperature"));
        assertTrue(HeaterWords.measurement(new Block("measurement", Map.of("type", "3omega-voltage")))
                .orElseThrow().contains("V3ω = ½ I³ R0 (dR/dT) H_h(2f)/L"));
        assertEquals(Optional.empty(), HeaterWords.measurement(new Block("measurement", Map.of("type", "3omega"))));
    }
}
