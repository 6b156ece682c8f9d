package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/** Values typed with units, lists and ranges; the conversions are SI prefixes (common practice, no source). */
class QuantityTextTest {

    private static final DisplayUnit NM = DisplayUnit.of("thickness_m", true);
    private static final DisplayUnit MHZ = DisplayUnit.of("modulation_hz", false);

    @Test
    void aNumberIsInTheFieldsUnitUnlessItSaysOtherwise() throws Exception {
        assertEquals("nm", NM.unit());
        assertEquals(85e-9, QuantityText.parse("85", "thickness_m", NM).si(), 1e-24);
        QuantityText.Reading r = QuantityText.parse("0.085 µm", "thickness_m", NM);
        assertEquals(85e-9, r.si(), 1e-24);
        assertEquals("µm", r.unit().unit());
        assertEquals(85e-9, QuantityText.parse("0.085um", "thickness_m", NM).si(), 1e-24);
        assertEquals(9.8e6, QuantityText.parse("9.8", "modulation_hz", MHZ).si(), 1e-6);
        assertEquals(9.8e6, QuantityText.parse("9800 kHz", "modulation_hz", MHZ).si(), 1e-6);
        assertEquals(5e7, QuantityText.parse("50 MW/(m² K)", "conductance_below_w_m2k",
                DisplayUnit.of("conductance_below_w_m2k", true)).si(), 1e-6);
        assertEquals(2e8, QuantityText.parse("0.2 GW/m2K", "conductance_below_w_m2k",
                DisplayUnit.of("conductance_below_w_m2k", true)).si(), 1e-6);
    }

    @Test
    void badTextIsRefusedInWords() {
        assertTrue(assertThrows(QuantityText.Refusal.class, () -> QuantityText.parse("1,5", "thickness_m", NM))
                .getMessage().startsWith("'1,5' is not a number; write it with a decimal point"));
        assertTrue(assertThrows(QuantityText.Refusal.class, () -> QuantityText.parse("5 MHz", "thickness_m", NM))
                .getMessage().contains("use nm, µm, mm or m"));
        assertTrue(assertThrows(QuantityText.Refusal.class, () -> QuantityText.parse("9.8 mhz", "modulation_hz",
                MHZ)).getMessage().contains("MHz is mega-"));
        assertThrows(QuantityText.Refusal.class, () -> QuantityText.parse("", "thickness_m", NM));
        assertThrows(QuantityText.Refusal.class, () -> QuantityText.parse("1e999", "thickness_m", NM));
    }

    @Test
    void listsTakeTheirTrailingUnit() throws Exception {
        DisplayUnit khz = DisplayUnit.of("frequencies_hz", false);
        assertArrayEquals(new double[] {1e3, 1e4, 1e5}, QuantityText.parseList("1, 10, 100 kHz", "frequencies_hz",
                MHZ), 1e-9);
        assertArrayEquals(new double[] {1e3, 1e6}, QuantityText.parseList("1 kHz; 1 MHz", "frequencies_hz", khz),
                1e-9);
        assertArrayEquals(new double[] {2e3, 3e3}, QuantityText.parseList("2, 3", "frequencies_hz", khz), 1e-9);
    }

    /** A log range is a geometric sequence; its ends are exact (closed form, derived). */
    @Test
    void rangesHaveACountAndASpacing() throws Exception {
        double[] f = QuantityText.parseList("1 kHz to 10 MHz, 5 log", "frequencies_hz", MHZ);
        assertArrayEquals(new double[] {1e3, 1e4, 1e5, 1e6, 1e7}, f, 1e-6);
        double[] t = QuantityText.parseList("100 ps to 4 ns, 40 linear", "delays_s", DisplayUnit.of("delays_s",
                false));
        assertEquals(40, t.length);
        assertEquals(1e-10, t[0], 0);
        assertEquals(4e-9, t[39], 0);
        assertEquals(1e-10 + 3.9e-9 / 39, t[1], 1e-22);
        assertThrows(QuantityText.Refusal.class, () -> QuantityText.parseList("0 to 1 ns, 10 log", "delays_s",
                MHZ));
        assertThrows(QuantityText.Refusal.class, () -> QuantityText.parseList("1 to 2 MHz, 1 log",
                "frequencies_hz", MHZ));
        assertThrows(QuantityText.Refusal.class, () -> QuantityText.parseList("1 to 2 MHz, 20000 log",
                "frequencies_hz", MHZ));
    }

    @Test
    void evenlySpacedListsReadBackAsTheRangeTheyCameFrom() throws Exception {
        DisplayUnit khz = DisplayUnit.of("frequencies_hz", false);
        String typed = "1 to 10000 kHz, 30 log";
        double[] f = QuantityText.parseList(typed, "frequencies_hz", khz);
        assertEquals(typed, QuantityText.formatList(f, khz));
        assertArrayEquals(f, QuantityText.parseList(QuantityText.formatList(f, khz), "frequencies_hz", khz), 0);
        assertEquals("1, 2, 5 kHz", QuantityText.formatList(new double[] {1e3, 2e3, 5e3}, khz));
    }

    @Test
    void fieldsShowSixSignificantDigits() {
        assertEquals("85", QuantityText.format(85e-9, NM));
        assertEquals("9.8", QuantityText.format(9.8e6, MHZ));
        assertEquals("1.23457", QuantityText.digits(1.234567, 6));
        assertEquals("1.5e-5", QuantityText.digits(1.5e-5, 6));
    }

    @Test
    void theThreeOmegaHeaterKeysAreShownInTheTradesUnits() throws Exception {
        assertEquals("nm", DisplayUnit.of("heater_thickness_m", false).unit());
        assertEquals("MJ/(m³ K)", DisplayUnit.of("heater_heat_capacity_j_m3k", false).unit());
        DisplayUnit rb = DisplayUnit.of("heater_boundary_resistance_m2k_w", false);
        assertEquals("m² K/GW", rb.unit());
        assertEquals(10, rb.shown(1e-8), 1e-12, "1e-8 m² K/W is 10 m² K/GW");
        assertEquals(1e-8, QuantityText.parse("1e-8 m2K/W", "heater_boundary_resistance_m2k_w", rb).si(), 1e-22);
        assertEquals(2e-8, QuantityText.parse("20", "heater_boundary_resistance_m2k_w", rb).si(), 1e-22);
        DisplayUnit drdt = DisplayUnit.of("dr_dt_ohm_per_k", false);
        assertEquals("mΩ/K", drdt.unit());
        assertEquals(0.12, QuantityText.parse("120", "dr_dt_ohm_per_k", drdt).si(), 1e-12);
        assertEquals(0.12, QuantityText.parse("0.12 ohm/K", "dr_dt_ohm_per_k", drdt).si(), 1e-12);
        DisplayUnit r = DisplayUnit.of("heater_resistance_ohm", false);
        assertEquals("Ω", r.unit());
        assertEquals(1500, QuantityText.parse("1.5 kΩ", "heater_resistance_ohm", r).si(), 1e-9);
        assertEquals("nm", DisplayUnit.of("absorption_depth_m", true).unit());
        assertTrue(assertThrows(QuantityText.Refusal.class, () -> QuantityText.parse("3 MHz",
                "dr_dt_ohm_per_k", drdt)).getMessage().contains("mΩ/K or Ω/K"));
    }
}
