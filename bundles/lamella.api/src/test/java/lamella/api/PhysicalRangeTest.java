package lamella.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every numeric key has a range by the unit it ends in; values outside never reach a model. The limits are wide
 * bounds of the trade (common practice, no source): every value of PRACTICE-typical samples and instruments lies
 * far inside, and 1e308 or 1e-308 lie outside.
 */
class PhysicalRangeTest {

    @ParameterizedTest
    @CsvSource({
        "k_through_w_mk, a thermal conductivity", "k_in_plane_x_w_mk, a thermal conductivity",
        "conductance_below_w_m2k, a thermal boundary conductance", "heat_capacity_j_m3k, a volumetric heat capacity",
        "modulation_hz, a frequency", "frequencies_hz, a frequency", "temperature_k, a temperature",
        "pump_power_w, a power", "delays_s, a time", "thickness_m, a length", "pump_radius_m, a length",
        "ring_radius_m, a length", "heater_boundary_resistance_m2k_w, a thermal boundary resistance",
        "dr_dt_ohm_per_k, a temperature coefficient of resistance", "heater_resistance_ohm, an electrical resistance",
        "drive_voltage_v, a voltage", "v3_in_phase_v, a voltage", "drive_current_a, an electrical current"})
    void theUnitAKeyEndsInNamesItsQuantity(String key, String quantity) {
        assertEquals(quantity, PhysicalRange.forKey(key).orElseThrow().quantity());
    }

    @Test
    void aKeyWithoutAnSiSuffixHasNoRange() {
        assertTrue(PhysicalRange.forKey("count").isEmpty());
        assertTrue(PhysicalRange.forKey("seed").isEmpty());
    }

    @Test
    void extremesAreRefusedAtTheirPathAndTypicalValuesPass() {
        for (String key : List.of("k_through_w_mk", "thickness_m", "pump_radius_m", "heat_capacity_j_m3k",
                "conductance_below_w_m2k", "modulation_hz", "heater_boundary_resistance_m2k_w", "dr_dt_ohm_per_k",
                "heater_resistance_ohm", "drive_voltage_v", "drive_current_a")) {
            for (double extreme : new double[] {1e308, 1e-308, -1e308, Double.MIN_VALUE}) {
                InputException e = assertThrows(InputException.class,
                        () -> PhysicalRange.checkKey(key, extreme, "stack.layers[0]." + key));
                assertEquals("stack.layers[0]." + key, e.path());
                assertTrue(e.problem().contains("is outside the range Lamella accepts for"), e.getMessage());
            }
        }
        // Typical values from PRACTICE-style set-ups (common practice, no source): 80 nm Al, 200 W/(m K),
        // 2.4e6 J/(m³ K), 1e8 W/(m² K), a 6 µm spot, 10 MHz, 80 MHz, a 4 ns delay, 300 K, 20 mW.
        Map<String, Double> typical = Map.of("thickness_m", 8e-8, "k_through_w_mk", 200.0,
                "heat_capacity_j_m3k", 2.4e6, "conductance_below_w_m2k", 1e8, "pump_radius_m", 6e-6,
                "modulation_hz", 1e7, "repetition_hz", 8e7, "delays_s", 4e-9, "temperature_k", 300.0,
                "pump_power_w", 0.02);
        typical.forEach((k, v) -> assertTrue(PhysicalRange.forKey(k).orElseThrow().admits(v), k));
        // A 3ω heater (common practice, no source): 1e-8 m² K/W to the sample, 20 Ω with 0.05 Ω/K, driven by
        // 10 mA or 0.2 V, a third-harmonic voltage of 10 µV.
        Map<String, Double> heater = Map.of("heater_boundary_resistance_m2k_w", 1e-8, "heater_resistance_ohm", 20.0,
                "dr_dt_ohm_per_k", 0.05, "drive_current_a", 0.01, "drive_voltage_v", 0.2, "v3_in_phase_v", 1e-5);
        heater.forEach((k, v) -> assertTrue(PhysicalRange.forKey(k).orElseThrow().admits(v), k));
    }

    /** A suffix is not read as the shorter one it ends in: m² K/W is no power, Ω/K no temperature. */
    @Test
    void aLongerSuffixWinsOverTheOneItEndsIn() {
        assertEquals("m² K/W", PhysicalRange.forKey("heater_boundary_resistance_m2k_w").orElseThrow().unit());
        assertEquals("Ω/K", PhysicalRange.forKey("dr_dt_ohm_per_k").orElseThrow().unit());
        assertEquals("m² K/W", Units.ofKey("heater_boundary_resistance_m2k_w"));
        assertEquals("Ω/K", Units.ofKey("dr_dt_ohm_per_k"));
        assertEquals("V", Units.ofKey("v3_amplitude_v"));
        assertEquals("A", Units.ofKey("drive_current_a"));
        assertEquals("Ω", Units.ofKey("heater_resistance_ohm"));
    }

    @Test
    void zeroAndNegativesAreLeftToTheKeysOwnConstraint() {
        PhysicalRange length = PhysicalRange.forKey("offset_x_m").orElseThrow();
        assertTrue(length.admits(0));
        assertTrue(length.admits(-3e-6));
        assertFalse(length.admits(-20));
    }

    @Test
    void theWordingNamesQuantityLimitsAndUnit() {
        assertEquals("a thermal conductivity between 1e-4 and 10000 W/(m K)",
                PhysicalRange.forKey("k_w_mk").orElseThrow().wording());
        assertEquals("a relative uncertainty between 1e-9 and 1", PhysicalRange.RELATIVE_UNCERTAINTY.wording());
    }

    @Test
    void boundParametersAreRangeChecked() {
        Block b = new Block("geometry", Map.of("pump_radius_m", 1e308));
        InputException e = assertThrows(InputException.class, () -> Parameters.bind(b,
                List.of(ParameterSpec.required("pump_radius_m", ParameterSpec.Constraint.POSITIVE, "the radius")),
                java.util.Set.of(), "geometry 'g'"));
        assertEquals("geometry.pump_radius_m", e.path());
        assertTrue(e.problem().startsWith("1e308 is outside the range Lamella accepts for a length between 1e-11"
                + " and 10 m"), e.problem());
    }
}
