package lamella.materials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import java.util.Map;
import lamella.api.material.LibraryTier;
import lamella.api.material.Material;
import lamella.api.material.MaterialCatalog;
import lamella.api.material.MaterialProperty;
import lamella.api.material.MaterialQuantity;
import lamella.api.material.OutOfRangeException;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * The shipped library against an independent copy of its cited tables: Incropera & DeWitt, Fundamentals of
 * Heat and Mass Transfer, 6th ed., Tables A.1 (metals) and A.2 (nonmetallic solids) at 300 K — every value below
 * from memory, written down separately from the library file.
 */
class ShippedLibraryTest {

    private static ReadLibrary shipped;
    private static MaterialCatalog catalog;

    @BeforeAll
    static void read() {
        shipped = LibraryFolder.read(Folders.SHIPPED, LibraryTier.SHIPPED);
        catalog = new MaterialCatalog(List.of(shipped));
    }

    @Test
    void theShippedLibraryReadsWithoutAnyFinding() {
        assertEquals(List.of(), shipped.findings());
        assertEquals("lamella-shipped", shipped.info().id());
        assertTrue(shipped.materials().size() >= 25, "entries: " + shipped.materials().size());
    }

    @Test
    void itHoldsTheMaterialsAThermoreflectanceLabMeets() throws Exception {
        for (String name : List.of("al", "au", "pt", "cr", "ti", "cu", "si", "ge", "gaas", "gan", "aln", "sic",
                "diamond", "sapphire", "quartz", "fused-silica", "mgo", "srtio3", "pmma", "polystyrene", "polyimide")) {
            catalog.lookup(name);
        }
        assertEquals(Material.ConductivityForm.UNIAXIAL, catalog.lookup("sapphire").conductivityForm());
        assertEquals(Material.ConductivityForm.UNIAXIAL, catalog.lookup("quartz").conductivityForm());
    }

    @Test
    void everyValueNamesItsSourceAndRecalledOnesSaySo() {
        for (Material m : shipped.materials()) {
            for (MaterialProperty p : m.properties().values()) {
                assertFalse(p.source().isBlank(), m.id() + " " + p.quantity());
                assertTrue(p.source().contains("from memory"), m.id() + " " + p.quantity().key()
                        + ": every shipped value was recalled, and its source must say so: " + p.source());
                assertTrue(p.uncertaintyRel().isPresent(), m.id() + " " + p.quantity().key());
            }
        }
    }

    /** Incropera & DeWitt 6th ed., Table A.1 at 300 K (from memory): ρ kg/m³, c_p J/(kg K), k W/(m K). */
    @ParameterizedTest(name = "{0}: Table A.1 at 300 K")
    @CsvSource({
            "aluminium, 2702, 903, 237",
            "chromium, 7160, 449, 93.7",
            "copper, 8933, 385, 401",
            "gold, 19300, 129, 317",
            "platinum, 21450, 133, 71.6",
            "titanium, 4500, 522, 21.9",
            "nickel, 8900, 444, 90.7",
            "tungsten, 19300, 132, 174",
            "silver, 10500, 235, 429",
            "molybdenum, 10240, 251, 138",
            "tantalum, 16600, 140, 57.5",
            "silicon, 2330, 712, 148",
            "germanium, 5360, 322, 59.9"})
    void metalsAndSemiconductorsMatchTableA1(String id, double rho, double cp, double k) throws Exception {
        assertRoomTemperature(id, rho, cp, k);
    }

    /** Incropera & DeWitt 6th ed., Table A.2 at 300 K (from memory). */
    @ParameterizedTest(name = "{0}: Table A.2 at 300 K")
    @CsvSource({
            "fused-silica, 2220, 745, 1.38",
            "diamond, 3500, 509, 2300",
            "sic, 3160, 675, 490",
            "pyrex, 2225, 835, 1.40",
            "silicon-nitride, 2400, 691, 16.0",
            "titanium-dioxide, 4157, 710, 8.4"})
    void nonmetallicSolidsMatchTableA2(String id, double rho, double cp, double k) throws Exception {
        assertRoomTemperature(id, rho, cp, k);
    }

    /** Table A.2 gives crystalline quartz's conductivity along and across the c axis (from memory). */
    @Test
    void quartzIsAnisotropicAsTableA2Says() throws Exception {
        Material q = catalog.lookup("quartz");
        assertEquals(10.4, q.value(MaterialQuantity.K_PARALLEL_C, 300).value(), 1e-9);
        assertEquals(6.21, q.value(MaterialQuantity.K_PERPENDICULAR_C, 300).value(), 1e-9);
        assertEquals(2650, q.value(MaterialQuantity.DENSITY, 300).value(), 1e-9);
        assertEquals(745, q.value(MaterialQuantity.SPECIFIC_HEAT, 300).value(), 1e-9);
    }

    /** Sapphire: Table A.2's ρ and c_p (from memory); k∥c above k⊥c by about 10 % (from memory). */
    @Test
    void sapphireConductsBetterAlongItsCAxis() throws Exception {
        Material s = catalog.lookup("sapphire");
        double parallel = s.value(MaterialQuantity.K_PARALLEL_C, 300).value();
        double perpendicular = s.value(MaterialQuantity.K_PERPENDICULAR_C, 300).value();
        assertTrue(parallel / perpendicular > 1.05 && parallel / perpendicular < 1.2, parallel + " / " + perpendicular);
        assertEquals(3970, s.value(MaterialQuantity.DENSITY, 300).value(), 1e-9);
        assertEquals(765, s.value(MaterialQuantity.SPECIFIC_HEAT, 300).value(), 1e-9);
    }

    private static void assertRoomTemperature(String id, double rho, double cp, double k) throws Exception {
        Material m = catalog.lookup(id);
        assertEquals(rho, m.value(MaterialQuantity.DENSITY, 300).value(), rho * 1e-9, id + " density");
        assertEquals(cp, m.value(MaterialQuantity.SPECIFIC_HEAT, 300).value(), cp * 1e-9, id + " specific heat");
        assertEquals(k, m.value(MaterialQuantity.K, 300).value(), k * 1e-9, id + " conductivity");
        // C = ρ c_p, within the rounding of the table's three or four figures.
        assertEquals(rho * cp, m.value(MaterialQuantity.HEAT_CAPACITY, 300).value(), rho * cp * 5e-3, id + " C");
    }

    /**
     * Volumetric heat capacities worked out by hand from Table A.1/A.2's ρ and c_p at 300 K (from memory), rounded to
     * three figures: the derivation must agree within that rounding.
     */
    @ParameterizedTest(name = "{0}: C = {1} J/(m³ K)")
    @CsvSource({"aluminium, 2.44e6", "gold, 2.49e6", "silicon, 1.66e6", "fused-silica, 1.65e6", "sapphire, 3.04e6",
                "platinum, 2.85e6", "copper, 3.44e6"})
    void derivedHeatCapacityMatchesDensityTimesSpecificHeat(String id, double c) throws Exception {
        assertEquals(c, catalog.lookup(id).value(MaterialQuantity.HEAT_CAPACITY, 300).value(), c * 5e-3);
        assertTrue(catalog.lookup(id).value(MaterialQuantity.HEAT_CAPACITY, 300).derived());
    }

    /** Table A.1 rows at 400 and 600 K (from memory); values between are linear in T. */
    @Test
    void tablesInterpolateLinearlyBetweenRows() throws Exception {
        Material al = catalog.lookup("aluminium");
        assertEquals(240, al.value(MaterialQuantity.K, 400).value(), 1e-9, "a table row is returned as written");
        assertEquals((240 + 231) / 2.0, al.value(MaterialQuantity.K, 500).value(), 1e-9);
        assertEquals(240 + 0.25 * (231 - 240), al.value(MaterialQuantity.K, 450).value(), 1e-9);
        Material si = catalog.lookup("silicon");
        assertEquals((264 + 148) / 2.0, si.value(MaterialQuantity.K, 250).value(), 1e-9);
        assertEquals(2330 * (556 + 712) / 2.0, si.value(MaterialQuantity.HEAT_CAPACITY, 250).value(), 1e-6,
                "C over temperature: the density times the interpolated specific heat");
    }

    @Test
    void outsideItsRangeAValueIsAnErrorNeverAnExtrapolation() throws Exception {
        Material si = catalog.lookup("silicon");
        OutOfRangeException e = assertThrows(OutOfRangeException.class, () -> si.value(MaterialQuantity.K, 1200));
        for (String s : List.of("silicon", "k_w_mk", "100–1000 K", "1200 K", "Lamella shipped materials (shipped)")) {
            assertTrue(e.getMessage().contains(s), "expected '" + s + "' in: " + e.getMessage());
        }
        Material gaas = catalog.lookup("gaas");
        assertThrows(OutOfRangeException.class, () -> gaas.value(MaterialQuantity.K, 301),
                "a value stated at 300 K holds at 300 K only");
        assertThrows(OutOfRangeException.class, () -> catalog.lookup("aluminium").value(MaterialQuantity.K, 99.9));
    }

    @Test
    void lookupIgnoresLetterCaseAndUsesAliases() throws Exception {
        Map<String, String> names = Map.of("Al", "aluminium", "ALUMINUM", "aluminium", "Si", "silicon",
                "fused-quartz", "fused-silica", "STO", "srtio3");
        for (Map.Entry<String, String> e : names.entrySet()) {
            assertEquals(e.getValue(), catalog.lookup(e.getKey()).id(), e.getKey());
        }
    }
}
