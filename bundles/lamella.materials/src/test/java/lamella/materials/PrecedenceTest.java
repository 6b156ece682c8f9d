package lamella.materials;

import static lamella.materials.Folders.entries;
import static lamella.materials.Folders.entry;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import lamella.api.InputException;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryTier;
import lamella.api.material.Material;
import lamella.api.material.MaterialCatalog;
import lamella.api.material.MaterialQuantity;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** User over facility over shipped, whole entries, and names claimed twice in one tier refused. Values invented. */
class PrecedenceTest {

    @TempDir
    Path dir;

    private ReadLibrary library(String id, LibraryTier tier, String... entries) throws Exception {
        Path lib = Folders.library(dir.resolve(id), id, "Library " + id);
        Folders.file(lib, "entries.json", entries(entries));
        return LibraryFolder.read(lib, tier);
    }

    private static double k(Material m) throws InputException {
        return m.value(MaterialQuantity.K, 300).value();
    }

    @Test
    void userBeatsFacilityBeatsShipped() throws Exception {
        ReadLibrary shipped = library("s", LibraryTier.SHIPPED, entry("film", 1.0), entry("only-shipped", 4.0));
        ReadLibrary facility = library("f", LibraryTier.FACILITY, entry("film", 2.0), entry("only-facility", 5.0));
        ReadLibrary user = library("u", LibraryTier.USER, entry("film", 3.0));
        MaterialCatalog all = new MaterialCatalog(List.of(shipped, user, facility));
        assertEquals(3.0, k(all.lookup("film")));
        assertEquals("u", all.lookup("film").library().id());
        assertEquals(2.0, k(new MaterialCatalog(List.of(shipped, facility)).lookup("film")));
        assertEquals(1.0, k(new MaterialCatalog(List.of(shipped)).lookup("film")));
        assertEquals(4.0, k(all.lookup("only-shipped")), "entries no higher tier has stay in effect");
        assertEquals(5.0, k(all.lookup("only-facility")));
        assertEquals(List.of("u", "f", "s"), all.libraries().stream().map(l -> l.id()).toList());
        assertEquals(List.of("f", "s"), all.replacedBy(all.lookup("film")).stream().map(m -> m.library().id()).toList());
        assertEquals(List.of("film", "only-facility", "only-shipped"),
                all.effective().stream().map(Material::id).toList());
        assertEquals(List.of(), all.findings());
    }

    @Test
    void aHigherTierReplacesAWholeEntryNeverMixingValues() throws Exception {
        String withRho = "{\"id\": \"film\", \"name\": \"f\", \"version\": 1, \"source\": \"test, invented\", \"properties\": {"
                + "\"k_w_mk\": {\"value\": 1, \"at_k\": 300, \"uncertainty_rel\": 0.1},"
                + "\"density_kg_m3\": {\"value\": 2000, \"at_k\": 300, \"uncertainty_rel\": 0.1},"
                + "\"specific_heat_j_kgk\": {\"value\": 700, \"at_k\": 300, \"uncertainty_rel\": 0.1}}}";
        String kOnly = "{\"id\": \"film\", \"name\": \"f\", \"version\": 2, \"source\": \"test, invented\", \"properties\": {"
                + "\"k_w_mk\": {\"value\": 9, \"at_k\": 300, \"uncertainty_rel\": 0.1}}}";
        MaterialCatalog c = new MaterialCatalog(List.of(library("s", LibraryTier.SHIPPED, withRho),
                library("f", LibraryTier.FACILITY, kOnly)));
        InputException e = assertThrows(InputException.class,
                () -> c.lookup("film").value(MaterialQuantity.HEAT_CAPACITY, 300));
        assertTrue(e.getMessage().contains("Library f (facility), entry film v2"), e.getMessage());
        assertTrue(e.getMessage().contains("states no heat capacity"), e.getMessage());
    }

    @Test
    void anAliasMayPointAtAnotherEntryInAHigherTierWithAWarning() throws Exception {
        ReadLibrary shipped = library("s", LibraryTier.SHIPPED, entry("aluminium", 237));
        ReadLibrary facility = library("f", LibraryTier.FACILITY,
                entry("al-film", 170).replace("\"version\"", "\"aliases\": [\"aluminium\"], \"version\""));
        MaterialCatalog c = new MaterialCatalog(List.of(shipped, facility));
        assertEquals("al-film", c.lookup("aluminium").id());
        List<LibraryFinding> f = c.conflicts();
        assertEquals(1, f.size(), f.toString());
        assertEquals(LibraryFinding.Severity.WARNING, f.get(0).severity());
        assertTrue(f.get(0).message().contains("'aluminium'"), f.toString());
    }

    @Test
    void aNameClaimedByTwoLibrariesOfOneTierIsAmbiguous() throws Exception {
        ReadLibrary a = library("a", LibraryTier.SHIPPED, entry("silicon", 148));
        ReadLibrary b = library("b", LibraryTier.SHIPPED, entry("wafer", 140)
                .replace("\"version\"", "\"aliases\": [\"Silicon\"], \"version\""), entry("other", 1));
        MaterialCatalog c = new MaterialCatalog(List.of(a, b));
        InputException e = assertThrows(InputException.class, () -> c.lookup("silicon"));
        assertTrue(e.getMessage().contains("ambiguous"), e.getMessage());
        assertTrue(e.getMessage().contains("Library a (shipped), entry silicon v1")
                && e.getMessage().contains("Library b (shipped), entry wafer v1"), e.getMessage());
        assertEquals("other", c.lookup("other").id(), "the rest of both libraries stays usable");
        List<LibraryFinding> f = c.conflicts();
        assertEquals(1, f.size(), f.toString());
        assertTrue(f.get(0).isError());
        MaterialCatalog withUser = new MaterialCatalog(List.of(a, b, library("u", LibraryTier.USER, entry("silicon", 150))));
        assertEquals(150.0, k(withUser.lookup("silicon")), "a higher tier settles the name");
    }

    @Test
    void anUnknownNameSuggestsTheClosestAndListsTheLibraries() throws Exception {
        MaterialCatalog c = new MaterialCatalog(List.of(library("s", LibraryTier.SHIPPED, entry("sapphire", 35))));
        InputException e = assertThrows(InputException.class, () -> c.lookup("saphire"));
        assertTrue(e.getMessage().contains("no material 'saphire'"), e.getMessage());
        assertTrue(e.getMessage().contains("did you mean 'sapphire'"), e.getMessage());
        assertTrue(e.getMessage().contains("Library s (shipped)"), e.getMessage());
    }

    @Test
    void withoutLibrariesTheLookupSaysSo() {
        InputException e = assertThrows(InputException.class, () -> new MaterialCatalog(List.of()).lookup("silicon"));
        assertTrue(e.getMessage().contains("no material libraries are live"), e.getMessage());
    }
}
