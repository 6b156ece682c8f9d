package lamella.materials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
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
 * The shipped library against an independent copy of the values its sources print, written down here separately
 * from the library file as they were read: Incropera, DeWitt, Bergman &amp; Lavine, Fundamentals of Heat and Mass
 * Transfer, Tables A.1 and A.2 (6th ed. 2007; the 7th ed. 2011 prints the same numbers), the NIST-JANAF
 * Thermochemical Tables (Chase, J. Phys. Chem. Ref. Data Monograph 9, 1998, as tabulated in the NIST Chemistry
 * WebBook), and the papers and data sheets named at each check.
 */
class ShippedLibraryTest {

    /** Avogadro's constant, exact since the 2019 SI. */
    private static final double AVOGADRO = 6.02214076e23;
    private static final Path README = Path.of("../../README.md");
    private static final String MEMORY_TABLE_HEADER = "| entry | properties recalled from memory |";

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
    void everyValueNamesItsSourceAndUncertainty() {
        for (Material m : shipped.materials()) {
            for (MaterialProperty p : m.properties().values()) {
                assertFalse(p.source().isBlank(), m.id() + " " + p.quantity().key());
                assertTrue(p.uncertaintyRel().isPresent(), m.id() + " " + p.quantity().key());
            }
        }
    }

    /** The README lists, for a person to check, exactly the values whose source still says "from memory". */
    @Test
    void theValuesStillRecalledFromMemoryAreExactlyThoseTheReadmeLists() throws IOException {
        Set<String> inLibrary = new TreeSet<>();
        for (Material m : shipped.materials()) {
            for (MaterialProperty p : m.properties().values()) {
                if (p.source().contains("from memory")) {
                    inLibrary.add(m.id() + " " + p.quantity().key());
                }
            }
        }
        assertEquals(inLibrary, readmeMemoryList());
        assertTrue(inLibrary.size() < 30, "most of the 90 values were looked up: " + inLibrary.size());
    }

    /** A table over temperature stays only where a source prints its rows; a recalled table would be a guess. */
    @Test
    void everyTableOverTemperatureComesFromASourceThatPrintsTheRows() {
        for (Material m : shipped.materials()) {
            for (MaterialProperty p : m.properties().values()) {
                if (p.curve().isTable()) {
                    assertFalse(p.source().contains("from memory"), m.id() + " " + p.quantity().key() + ": "
                            + p.source());
                }
            }
        }
    }

    /** Incropera, DeWitt, Bergman &amp; Lavine, Table A.1 at 300 K: ρ kg/m³, c_p J/(kg K), k W/(m K). */
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
            "silicon, 2330, 712, 148"})
    void metalsAndSiliconMatchTableA1(String id, double rho, double cp, double k) throws Exception {
        assertRoomTemperature(id, rho, cp, k);
    }

    /**
     * Table A.1 rows away from 300 K (k W/(m K) and c_p J/(kg K) at 100 K and at the last row the library keeps).
     */
    @ParameterizedTest(name = "{0}: Table A.1 rows at 100 K and {1} K")
    @CsvSource({
            "aluminium, 800, 302, 218, 482, 1146",
            "gold, 800, 327, 284, 109, 140",
            "platinum, 800, 77.5, 75.6, 100, 146",
            "titanium, 800, 30.5, 19.7, 300, 633",
            "copper, 800, 482, 366, 252, 433",
            "silicon, 1000, 884, 31.2, 259, 946",
            "germanium, 1000, 232, 17.4, 190, 375"})
    void tableA1RowsAwayFromRoomTemperature(String id, double highK, double k100, double kHigh, double cp100,
                                            double cpHigh) throws Exception {
        Material m = catalog.lookup(id);
        assertEquals(k100, m.value(MaterialQuantity.K, 100).value(), 1e-9, id + " k at 100 K");
        assertEquals(kHigh, m.value(MaterialQuantity.K, highK).value(), 1e-9, id + " k at " + highK + " K");
        assertEquals(cp100, m.value(MaterialQuantity.SPECIFIC_HEAT, 100).value(), 1e-9, id + " c_p at 100 K");
        assertEquals(cpHigh, m.value(MaterialQuantity.SPECIFIC_HEAT, highK).value(), 1e-9, id + " c_p at " + highK);
    }

    /** Germanium: Table A.1's c_p and k; density from the Ioffe Institute NSM Archive (5.3234 g/cm³). */
    @Test
    void germaniumTakesItsDensityFromTheIoffeArchive() throws Exception {
        assertRoomTemperature("germanium", 5323, 322, 59.9);
    }

    /** Table A.2 at 300 K: silicon carbide (ρ 3160, c_p 675, k 490) and sapphire (ρ 3970, c_p 765). */
    @Test
    void nonmetallicSolidsMatchTableA2() throws Exception {
        assertRoomTemperature("sic", 3160, 675, 490);
        Material s = catalog.lookup("sapphire");
        assertEquals(3970, s.value(MaterialQuantity.DENSITY, 300).value(), 1e-9);
        assertEquals(765, s.value(MaterialQuantity.SPECIFIC_HEAT, 300).value(), 1e-9);
    }

    /**
     * Handbook specific heats against a second source, NIST-JANAF molar heat capacities at 300 K (298.15 K for
     * α-Al₂O₃, from Table 14 of the Alumina chapter of Ceramic and Glass Materials, Springer 2008) divided by the
     * molar mass from the IUPAC standard atomic weights (from memory). The two sources agree within 1.5 %.
     */
    @ParameterizedTest(name = "{0}: c_p within 1.5 % of {1} J/(mol K) / {2} g/mol")
    @CsvSource({
            "silicon, 20.05, 28.0855",
            "titanium, 25.28, 47.867",
            "chromium, 23.47, 51.996",
            "nickel, 26.02, 58.693",
            "sic, 26.93, 40.096",
            "sapphire, 79.015, 101.961"})
    void handbookSpecificHeatsAgreeWithJanaf(String id, double molarCp, double molarMassG) throws Exception {
        double janaf = molarCp / (molarMassG * 1e-3);
        double cp = catalog.lookup(id).value(MaterialQuantity.SPECIFIC_HEAT, 300).value();
        assertEquals(janaf, cp, 0.015 * janaf, id);
    }

    /** Quartz c_p rows are NIST-JANAF's quartz-phase C_p (J/(mol K)) over M = 60.084 g/mol, rounded to 1 J/(kg K). */
    @ParameterizedTest(name = "quartz c_p at {0} K from {1} J/(mol K)")
    @CsvSource({"300, 44.77", "400, 53.43", "500, 59.64", "600, 64.42", "700, 68.77", "800, 73.70"})
    void quartzSpecificHeatIsJanafOverTheMolarMass(double t, double molarCp) throws Exception {
        double expected = molarCp / 0.060084;
        assertEquals(expected, catalog.lookup("quartz").value(MaterialQuantity.SPECIFIC_HEAT, t).value(), 0.6, t + " K");
    }

    /** MgO c_p is NIST-JANAF's 37.18 J/(mol K) at 300 K over M = 40.304 g/mol. */
    @Test
    void magnesiumOxideSpecificHeatIsJanafOverTheMolarMass() throws Exception {
        assertEquals(37.18 / 0.040304, catalog.lookup("mgo").value(MaterialQuantity.SPECIFIC_HEAT, 300).value(), 0.6);
    }

    /**
     * Crystal densities against the X-ray density Z·M/(N_A·V) of the unit cell, an independent computation from
     * published lattice constants: Ge a = 5.658 Å (Ioffe NSM Archive); GaAs a = 5.6533 Å (Ioffe, AlGaAs at x = 0);
     * diamond a = 3.56683 Å (S. Sque's diamond table); MgO a = 4.212 Å (Handbook of Mineralogy, periclase). Molar
     * masses from the IUPAC standard atomic weights (from memory). Agreement within 0.2 %.
     */
    @ParameterizedTest(name = "{0}: X-ray density of a cubic cell, a = {1} Å")
    @CsvSource({
            "germanium, 5.658, 8, 72.630",
            "gaas, 5.6533, 4, 144.645",
            "diamond, 3.56683, 8, 12.011",
            "mgo, 4.212, 4, 40.304"})
    void cubicCrystalDensitiesMatchTheirLatticeConstants(String id, double aAngstrom, int z, double molarMassG)
            throws Exception {
        double a = aAngstrom * 1e-10;
        assertXrayDensity(id, z * molarMassG * 1e-3 / (AVOGADRO * a * a * a));
    }

    /** GaN: wurtzite cell (√3/2)a²c with a = 3.1893 Å, c = 5.1851 Å (Sci. Rep. 8, 2018, Table 1), Z = 2. */
    @Test
    void galliumNitrideDensityMatchesItsLatticeConstants() throws Exception {
        double a = 3.1893e-10;
        double c = 5.1851e-10;
        assertXrayDensity("gan", 2 * 83.730e-3 / (AVOGADRO * Math.sqrt(3) / 2 * a * a * c));
    }

    /**
     * Values from the papers, archives and data sheets each entry cites: GaAs 55 W/(m K) and 0.33 J/(g K) (Ioffe);
     * GaN 213 W/(m K) (JETP Letters 112, 2020) and 0.49 J/(g K) (Ioffe); AlN 3.19 W/(cm K), 738 J/(kg K),
     * 3.26 g/cm³ (Merck Index); fused silica 1.38 W/(m K), 2203 kg/m³ (Crystran handbook, 5th ed.); Pyrex 7740
     * 1.1 W/(m K), 2.23 g/cm³ (a supplier's sheet) and 850 J/(kg K) (Callister, 3rd ed., Table B.8); Kapton HN
     * 0.12 W/(m K), 1.42 g/cm³, 1.09 J/(g K) (DuPont); polystyrene 1.050 g/cm³ (Ho et al., CINDAS Report 38, 1977).
     */
    @Test
    void semiconductorOxideAndPolymerValuesMatchTheirSources() throws Exception {
        assertAt300("gaas", MaterialQuantity.K, 55);
        assertAt300("gaas", MaterialQuantity.SPECIFIC_HEAT, 330);
        assertAt300("gan", MaterialQuantity.K, 213);
        assertAt300("gan", MaterialQuantity.SPECIFIC_HEAT, 490);
        assertAt300("aln", MaterialQuantity.K, 319);
        assertAt300("aln", MaterialQuantity.SPECIFIC_HEAT, 738);
        assertAt300("aln", MaterialQuantity.DENSITY, 3260);
        assertAt300("fused-silica", MaterialQuantity.K, 1.38);
        assertAt300("fused-silica", MaterialQuantity.DENSITY, 2203);
        assertAt300("pyrex", MaterialQuantity.K, 1.1);
        assertAt300("pyrex", MaterialQuantity.DENSITY, 2230);
        assertAt300("pyrex", MaterialQuantity.SPECIFIC_HEAT, 850);
        assertAt300("polyimide", MaterialQuantity.K, 0.12);
        assertAt300("polyimide", MaterialQuantity.DENSITY, 1420);
        assertAt300("polyimide", MaterialQuantity.SPECIFIC_HEAT, 1090);
        assertAt300("polystyrene", MaterialQuantity.DENSITY, 1050);
    }

    /**
     * PMMA c_p: 131.8 J/(mol K) per monomer unit at 300 K (Lebedev &amp; Rabinovich 1971, in the NIST Chemistry
     * WebBook) over the monomer's 100.117 g/mol, rounded to 10 J/(kg K).
     */
    @Test
    void pmmaSpecificHeatIsTheCalorimetricValuePerMonomerUnit() throws Exception {
        double expected = 131.8 / 0.100117;
        assertEquals(expected, catalog.lookup("pmma").value(MaterialQuantity.SPECIFIC_HEAT, 300).value(), 5);
    }

    /**
     * Sapphire: about 35 W/(m K) at 300 K (Aggarwal &amp; Ramdas, Physical Properties of Diamond and Sapphire, 2019);
     * a supplier's sheet gives 35.1 parallel and 33 perpendicular to the c axis.
     */
    @Test
    void sapphireConductsBetterAlongItsCAxis() throws Exception {
        Material s = catalog.lookup("sapphire");
        assertEquals(35, s.value(MaterialQuantity.K_PARALLEL_C, 300).value(), 1e-9);
        assertEquals(33, s.value(MaterialQuantity.K_PERPENDICULAR_C, 300).value(), 1e-9);
    }

    /**
     * Quartz conducts markedly better along its c axis: two crystal suppliers' sheets give 10.7/6.2 (25 °C) and
     * 9.5/6.10 W/(m K) (300 K), ratios 1.73 and 1.56; the recalled values must keep a ratio in that band.
     */
    @Test
    void quartzIsAnisotropicAsTheSuppliersSheetsSay() throws Exception {
        Material q = catalog.lookup("quartz");
        double ratio = q.value(MaterialQuantity.K_PARALLEL_C, 300).value()
                / q.value(MaterialQuantity.K_PERPENDICULAR_C, 300).value();
        assertTrue(ratio > 1.56 && ratio < 1.73, "k∥/k⊥ = " + ratio);
        assertEquals(2650, q.value(MaterialQuantity.DENSITY, 300).value(), 1e-9, "the suppliers' 2.65 g/cm³");
    }

    /** Volumetric heat capacities worked out by hand from the cited ρ and c_p at 300 K, rounded to three figures. */
    @ParameterizedTest(name = "{0}: C = {1} J/(m³ K)")
    @CsvSource({"aluminium, 2.44e6", "gold, 2.49e6", "silicon, 1.66e6", "sapphire, 3.04e6", "platinum, 2.85e6",
                "copper, 3.44e6", "aln, 2.41e6", "gan, 2.98e6"})
    void derivedHeatCapacityMatchesDensityTimesSpecificHeat(String id, double c) throws Exception {
        assertEquals(c, catalog.lookup(id).value(MaterialQuantity.HEAT_CAPACITY, 300).value(), c * 5e-3);
        assertTrue(catalog.lookup(id).value(MaterialQuantity.HEAT_CAPACITY, 300).derived());
    }

    /** Table A.1 rows at 400 and 600 K; values between are linear in T. */
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
        assertThrows(OutOfRangeException.class, () -> catalog.lookup("diamond").value(MaterialQuantity.K, 400),
                "diamond's recalled rows were left out: 300 K only");
    }

    @Test
    void lookupIgnoresLetterCaseAndUsesAliases() throws Exception {
        Map<String, String> names = Map.of("Al", "aluminium", "ALUMINUM", "aluminium", "Si", "silicon",
                "fused-quartz", "fused-silica", "STO", "srtio3");
        for (Map.Entry<String, String> e : names.entrySet()) {
            assertEquals(e.getValue(), catalog.lookup(e.getKey()).id(), e.getKey());
        }
    }

    private static void assertRoomTemperature(String id, double rho, double cp, double k) throws Exception {
        assertAt300(id, MaterialQuantity.DENSITY, rho);
        assertAt300(id, MaterialQuantity.SPECIFIC_HEAT, cp);
        assertAt300(id, MaterialQuantity.K, k);
        // C = ρ c_p, within the rounding of the table's three or four figures.
        assertEquals(rho * cp, catalog.lookup(id).value(MaterialQuantity.HEAT_CAPACITY, 300).value(), rho * cp * 5e-3,
                id + " C");
    }

    private static void assertAt300(String id, MaterialQuantity q, double expected) throws Exception {
        assertEquals(expected, catalog.lookup(id).value(q, 300).value(), Math.abs(expected) * 1e-9, id + " " + q.key());
    }

    private static void assertXrayDensity(String id, double xray) throws Exception {
        assertEquals(xray, catalog.lookup(id).value(MaterialQuantity.DENSITY, 300).value(), 0.002 * xray, id);
    }

    /** The README's table of values recalled from memory, as "entry property" pairs. */
    private static Set<String> readmeMemoryList() throws IOException {
        List<String> lines = Files.readAllLines(README, StandardCharsets.UTF_8);
        int header = lines.indexOf(MEMORY_TABLE_HEADER);
        assertTrue(header >= 0, "the README lists the recalled values under: " + MEMORY_TABLE_HEADER);
        Set<String> listed = new TreeSet<>();
        for (int i = header + 2; i < lines.size() && lines.get(i).startsWith("|"); i++) {
            String[] cells = lines.get(i).split("\\|");
            String entry = cells[1].trim().replace("`", "");
            for (String key : cells[2].split(",")) {
                listed.add(entry + " " + key.trim().replace("`", ""));
            }
        }
        return listed;
    }
}
