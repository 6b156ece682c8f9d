package lamella.materials;

import static lamella.materials.Folders.aliased;
import static lamella.materials.Folders.entries;
import static lamella.materials.Folders.entry;
import static lamella.materials.Folders.replacing;
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

/**
 * User over facility over data bundle over shipped, whole entries, replacement only where an entry says so, and names
 * that two entries in effect answer to refused. Values invented for tests of the rules.
 */
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
    void userBeatsFacilityBeatsShippedWhereTheEntrySaysItReplaces() throws Exception {
        ReadLibrary shipped = library("s", LibraryTier.SHIPPED, entry("film", 1.0), entry("only-shipped", 4.0));
        ReadLibrary facility = library("f", LibraryTier.FACILITY, replacing(entry("film", 2.0), "film"),
                entry("only-facility", 5.0));
        ReadLibrary user = library("u", LibraryTier.USER, replacing(entry("film", 3.0), "film"));
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
        String kOnly = "{\"id\": \"film\", \"name\": \"f\", \"replaces\": [\"film\"], \"version\": 2, \"source\": \"test, invented\", \"properties\": {"
                + "\"k_w_mk\": {\"value\": 9, \"at_k\": 300, \"uncertainty_rel\": 0.1}}}";
        MaterialCatalog c = new MaterialCatalog(List.of(library("s", LibraryTier.SHIPPED, withRho),
                library("f", LibraryTier.FACILITY, kOnly)));
        InputException e = assertThrows(InputException.class,
                () -> c.lookup("film").value(MaterialQuantity.HEAT_CAPACITY, 300));
        assertTrue(e.getMessage().contains("Library f (facility), entry film v2"), e.getMessage());
        assertTrue(e.getMessage().contains("states no heat capacity"), e.getMessage());
    }

    @Test
    void aHigherTierAliasEqualToALowerTiersAliasIsAnErrorNamingBothEntries() throws Exception {
        ReadLibrary shipped = library("s", LibraryTier.SHIPPED, aliased(entry("silicon", 148), "si"));
        ReadLibrary facility = library("f", LibraryTier.FACILITY, aliased(entry("thermal-glue", 1.15), "si"));
        MaterialCatalog c = new MaterialCatalog(List.of(shipped, facility));
        List<LibraryFinding> f = c.conflicts();
        assertEquals(1, f.size(), f.toString());
        assertTrue(f.get(0).isError(), f.toString());
        String both = f.get(0).toString();
        for (String s : List.of("'si'", "Library f (facility), entry thermal-glue v1, "
                + dir.resolve("f/entries.json") + ":3", "Library s (shipped), entry silicon v1, "
                + dir.resolve("s/entries.json") + ":3", "\"replaces\": [\"silicon\"]")) {
            assertTrue(both.contains(s), "expected " + s + " in " + both);
        }
        InputException e = assertThrows(InputException.class, () -> c.lookup("SI"));
        assertTrue(e.getMessage().contains("ambiguous") && e.getMessage().contains("entry thermal-glue v1")
                && e.getMessage().contains("entry silicon v1"), e.getMessage());
        assertEquals(148.0, k(c.lookup("silicon")), "a name only one entry answers to still works");
        assertEquals(1.15, k(c.lookup("thermal-glue")));
        assertEquals(List.of("silicon", "thermal-glue"), c.effective().stream().map(Material::id).toList());
    }

    @Test
    void aHigherTierIdEqualToALowerTiersIdOrAliasIsAnErrorUntilItSaysItReplaces() throws Exception {
        ReadLibrary shipped = library("s", LibraryTier.SHIPPED, aliased(entry("silicon", 148), "si"));
        for (String clash : List.of(entry("silicon", 1.15), entry("si", 1.15))) {
            MaterialCatalog c = new MaterialCatalog(List.of(shipped, library("u", LibraryTier.USER, clash)));
            assertEquals(1, c.conflicts().size(), c.conflicts().toString());
            assertTrue(c.conflicts().get(0).isError());
            String named = clash.contains("\"si\"") ? "si" : "silicon";
            assertThrows(InputException.class, () -> c.lookup(named), "the name both entries answer to");
        }
        MaterialCatalog declared = new MaterialCatalog(List.of(shipped,
                library("u2", LibraryTier.USER, replacing(entry("si", 1.15), "silicon"))));
        assertEquals(List.of(), declared.conflicts());
        assertEquals(1.15, k(declared.lookup("si")));
        assertEquals(1.15, k(declared.lookup("silicon")), "a replaced entry's names mean the entry replacing it");
        assertEquals(List.of("si"), declared.effective().stream().map(Material::id).toList());
        assertEquals(List.of("silicon"), declared.replacedBy(declared.lookup("si")).stream().map(Material::id).toList());
    }

    @Test
    void anAliasMayTakeALowerTiersNameWhenItSaysWhatItReplaces() throws Exception {
        ReadLibrary shipped = library("s", LibraryTier.SHIPPED, entry("aluminium", 237));
        ReadLibrary facility = library("f", LibraryTier.FACILITY,
                replacing(aliased(entry("al-film", 170), "aluminium"), "aluminium"));
        MaterialCatalog c = new MaterialCatalog(List.of(shipped, facility));
        assertEquals("al-film", c.lookup("aluminium").id());
        assertEquals(List.of(), c.conflicts());
    }

    @Test
    void replacesThatNamesNothingInALowerTierIsAnError() throws Exception {
        ReadLibrary shipped = library("s", LibraryTier.SHIPPED, entry("silicon", 148));
        ReadLibrary facility = library("f", LibraryTier.FACILITY, replacing(entry("sapphire-film", 30), "saphire"),
                entry("own", 3));
        ReadLibrary sameTier = library("g", LibraryTier.FACILITY, replacing(entry("own-copy", 3), "own"));
        MaterialCatalog c = new MaterialCatalog(List.of(shipped, facility, sameTier));
        List<LibraryFinding> f = c.conflicts();
        assertEquals(2, f.size(), f.toString());
        assertTrue(f.stream().allMatch(LibraryFinding::isError), f.toString());
        assertTrue(f.get(0).toString().contains("entry sapphire-film v1 says it replaces 'saphire', but no entry of a"
                + " lower tier than facility has that name"), f.toString());
        assertTrue(f.get(1).toString().contains("entry own-copy v1 says it replaces 'own'"),
                "an entry of the same tier is not replaced: " + f);
        assertEquals(3.0, k(c.lookup("own")));
    }

    @Test
    void replacementsChainThroughTheTiersAndADataBundleRanksAboveTheShippedLibrary() throws Exception {
        ReadLibrary shipped = library("s", LibraryTier.SHIPPED, aliased(entry("silicon", 148), "si"));
        ReadLibrary bundle = library("b", LibraryTier.BUNDLE, aliased(entry("silicon", 150), "si"));
        MaterialCatalog undeclared = new MaterialCatalog(List.of(shipped, bundle));
        assertEquals(1, undeclared.conflicts().size(), "a data bundle must say it replaces too");
        assertTrue(undeclared.conflicts().get(0).toString().contains("Library b (bundle), entry silicon v1"),
                undeclared.conflicts().toString());

        ReadLibrary declaredBundle = library("b2", LibraryTier.BUNDLE,
                replacing(aliased(entry("wafer-si", 150), "si"), "si"));
        ReadLibrary facility = library("f", LibraryTier.FACILITY, replacing(entry("fh-si", 140), "wafer-si"));
        ReadLibrary user = library("u", LibraryTier.USER, replacing(entry("my-si", 130), "silicon"));
        MaterialCatalog c = new MaterialCatalog(List.of(shipped, declaredBundle, facility, user));
        assertEquals(List.of(), c.conflicts());
        for (String n : List.of("silicon", "si", "wafer-si", "fh-si", "my-si")) {
            assertEquals(130.0, k(c.lookup(n)), n);
        }
        assertEquals(List.of("fh-si", "wafer-si", "silicon"),
                c.replacedBy(c.lookup("my-si")).stream().map(Material::id).toList());
        assertEquals(List.of("my-si"), c.effective().stream().map(Material::id).toList());
    }

    @Test
    void onlyLamellasOwnLibraryBundleIsOfTheShippedTier() {
        assertEquals(LibraryTier.SHIPPED, LibraryExtender.tierOf("lamella.materials.shipped"));
        assertEquals(LibraryTier.BUNDLE, LibraryExtender.tierOf("org.example.lab.films"));
        assertTrue(LibraryTier.BUNDLE.outranks(LibraryTier.SHIPPED) && LibraryTier.FACILITY.outranks(LibraryTier.BUNDLE));
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
