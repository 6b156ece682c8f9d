package lamella.materials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import lamella.api.ExplainedCase;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.ValueOrigin;
import lamella.api.material.LibraryTier;
import lamella.casefile.CaseFileReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The demo cases that take values from libraries, read by the real case format over the shipped library and the
 * invented Fenwick Hall facility library, as the demo runs them.
 */
class LibraryCasesTest {

    @TempDir
    Path dir;

    static final Path LIBRARY_CASES = Path.of("../../demo-data/cases/libraries");

    private static CaseFileReader reader(boolean withFacility) {
        CaseFileReader reader = new CaseFileReader();
        reader.addLibrary(LibraryFolder.read(Folders.SHIPPED, LibraryTier.SHIPPED));
        if (withFacility) {
            reader.addLibrary(LibraryFolder.read(Folders.DEMO_FACILITY, LibraryTier.FACILITY));
        }
        return reader;
    }

    static List<Path> cases() throws IOException {
        try (Stream<Path> s = Files.list(LIBRARY_CASES)) {
            return s.filter(p -> p.toString().endsWith(".json")).sorted().toList();
        }
    }

    @Test
    void everyLibraryDemoCaseReadsWithTheDemoFacilityLibrary() throws Exception {
        List<Path> cases = cases();
        assertTrue(!cases.isEmpty(), "demo cases in " + LIBRARY_CASES.toAbsolutePath());
        for (Path c : cases) {
            assertTrue(!reader(true).read(c).stack().layers().isEmpty(), c.toString());
        }
    }

    @Test
    void theFacilityFilmReplacesShippedBulkAluminium() throws Exception {
        Path c = LIBRARY_CASES.resolve("oxide-on-sapphire-tdtr.json");
        ExplainedCase facility = reader(true).readExplained(c);
        Layer transducer = facility.document().stack().layers().get(0);
        assertEquals(170.0, transducer.kThrough(), "the invented facility value");
        assertEquals(2.42e6, transducer.heatCapacity());
        ValueOrigin k = facility.origins().stream()
                .filter(o -> o.path().equals("stack.layers[0].k_through_w_mk")).findFirst().orElseThrow();
        assertTrue(k.describe().startsWith("library Fenwick Hall thermal lab films (facility), entry aluminium v3, "),
                k.describe());

        Path alone = Files.writeString(dir.resolve("al.json"), "{\"stack\": {\"layers\": [{\"name\": \"t\","
                + " \"material\": \"aluminium\"}]}, \"geometry\": {\"type\": \"gaussian\"},"
                + " \"measurement\": {\"type\": \"sstr\"}}");
        Layer bulk = reader(false).read(alone).stack().layers().get(0);
        assertEquals(237.0, bulk.kThrough(), "without the facility library: Incropera, DeWitt, Bergman & Lavine,"
                + " Table A.1 at 300 K");
        assertEquals(2702 * 903, bulk.heatCapacity(), 2702 * 903 * 1e-12);
    }

    @Test
    void sapphireWithItsCAxisNormalToTheSurface() throws Exception {
        Layer substrate = reader(true).read(LIBRARY_CASES.resolve("oxide-on-sapphire-tdtr.json")).stack().layers().get(2);
        // Aggarwal & Ramdas, Physical Properties of Diamond and Sapphire (2019): about 35 W/(m K) at 300 K; a
        // supplier's data sheet: 33 W/(m K) perpendicular to c.
        assertEquals(35.0, substrate.kThrough(), "k parallel to c, through the plane");
        assertEquals(33.0, substrate.kInPlaneX());
        assertEquals(33.0, substrate.kInPlaneY());
        assertEquals(3970 * 765, substrate.heatCapacity(), 1e-3, "Incropera et al., Table A.2: ρ c_p");
    }

    @Test
    void theFacilityFilmNeedsTheFacilityLibrary() {
        InputException e = assertThrows(InputException.class,
                () -> reader(false).read(LIBRARY_CASES.resolve("oxide-on-sapphire-tdtr.json")));
        assertEquals("stack.layers[1].material", e.path());
        assertTrue(e.getMessage().contains("no material 'fh-sio2'"), e.getMessage());
    }

    @Test
    void aCaseNamingAMaterialThatAFacilityEntryTakesWithoutSayingSoStopsNamingBothEntries() throws Exception {
        Path lib = Folders.library(dir.resolve("glue"), "glue", "Glue library");
        Path file = Folders.file(lib, "a.json", Folders.entries(Folders.aliased(Folders.entry("thermal-glue", 1.15),
                "si")));
        CaseFileReader reader = new CaseFileReader();
        reader.addLibrary(LibraryFolder.read(Folders.SHIPPED, LibraryTier.SHIPPED));
        reader.addLibrary(LibraryFolder.read(lib, LibraryTier.FACILITY));
        Path c = Files.writeString(dir.resolve("si.json"), "{\"stack\": {\"layers\": [{\"name\": \"substrate\","
                + " \"material\": \"si\"}]}, \"geometry\": {\"type\": \"gaussian\"},"
                + " \"measurement\": {\"type\": \"sstr\"}}");
        InputException e = assertThrows(InputException.class, () -> reader.read(c));
        assertEquals("stack.layers[0].material", e.path());
        for (String s : List.of("material 'si' is ambiguous", "library Glue library (facility), entry thermal-glue v1, "
                + file + ":3", "library Lamella shipped materials (shipped), entry silicon v1, "
                + Folders.SHIPPED.resolve("semiconductors.json") + ":3")) {
            assertTrue(e.getMessage().contains(s), "expected '" + s + "' in: " + e.getMessage());
        }
        Path named = Files.writeString(dir.resolve("silicon.json"), Files.readString(c).replace("\"si\"",
                "\"silicon\""));
        assertEquals(148.0, reader.read(named).stack().layers().get(0).kThrough(),
                "the shipped entry's other name still means it (Incropera et al., Table A.1, 300 K)");
    }
}
