package lamella.materials;

import static lamella.materials.Folders.entries;
import static lamella.materials.Folders.entry;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryTier;
import lamella.api.material.Material;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * Every malformed library case has a finding that names file, line and JSON path; a broken file or entry never
 * takes the good entries down with it. The values are invented for tests of the format.
 */
class MalformedLibraryTest {

    @TempDir
    Path dir;

    private Path lib;

    @BeforeEach
    void library() throws Exception {
        lib = Folders.library(dir.resolve("lib"), "test-lib", "Test library");
    }

    private ReadLibrary read() {
        return LibraryFolder.read(lib, LibraryTier.FACILITY);
    }

    /** A library of one good file (entry "good") and one file with the given text; returns its only error. */
    private LibraryFinding onlyError(String badFileText) throws Exception {
        Folders.file(lib, "a-good.json", entries(entry("good", 2.0)));
        Path bad = Folders.file(lib, "b-bad.json", badFileText);
        ReadLibrary r = read();
        List<LibraryFinding> errors = r.findings().stream().filter(LibraryFinding::isError).toList();
        assertEquals(1, errors.size(), r.findings().toString());
        assertTrue(r.materials().stream().anyMatch(m -> m.id().equals("good")), "the good entry survives");
        assertEquals(bad.toString(), errors.get(0).file());
        return errors.get(0);
    }

    private static void assertFinding(LibraryFinding f, int line, String path, String... inMessage) {
        assertEquals(line, f.line(), f.toString());
        assertEquals(path, f.path(), f.toString());
        assertTrue(f.toString().startsWith(f.file() + ":" + line + ": " + (path.isEmpty() ? "" : path + ": ")),
                f.toString());
        for (String s : inMessage) {
            assertTrue(f.message().contains(s), "expected '" + s + "' in: " + f);
        }
    }

    private static int lineOf(String text, String marker) {
        int at = text.indexOf(marker);
        assertTrue(at >= 0, marker);
        return (int) text.substring(0, at).chars().filter(c -> c == '\n').count() + 1;
    }

    @Test
    void badJsonNamesItsLineAndTheOtherFilesStillLoad() throws Exception {
        String text = "{\n  \"materials\": [\n    {\"id\": \"x\",\n     \"name\" \"missing colon\"}\n  ]\n}\n";
        assertFinding(onlyError(text), 4, "materials[0].name", "expected ':' after the key 'name'");
    }

    @Test
    void aTruncatedFileIsNotValidJson() throws Exception {
        assertFinding(onlyError("{\n  \"materials\": [\n"), 3, "materials",
                "cut short: the list materials (opened at line 2) is not closed");
    }

    @Test
    void duplicateKeysAndNullsAreErrors() throws Exception {
        String dup = entries(entry("d", 1.0).replace("\"version\": 1", "\"version\": 1, \"version\": 2"));
        assertFinding(onlyError(dup), 3, "materials[0].version", "the key 'version' appears twice");
        Files.delete(lib.resolve("b-bad.json"));
        String nul = entries(entry("n", 1.0).replace("\"version\": 1", "\"version\": null"));
        assertFinding(onlyError(nul), 3, "materials[0].version", "null");
    }

    @Test
    void unknownEntryKeyWithHint() throws Exception {
        String text = entries(entry("x", 1.0).replace("\"name\"", "\"names\""));
        assertFinding(onlyError(text), lineOf(text, "\"names\""), "materials[0].names", "unknown key in an entry",
                "did you mean 'name'");
    }

    @Test
    void unknownPropertyWithHint() throws Exception {
        String text = entries(entry("x", 1.0).replace("\"k_w_mk\"", "\"k_w_m_k\""));
        assertFinding(onlyError(text), lineOf(text, "k_w_m_k"), "materials[0].properties.k_w_m_k",
                "unknown property", "did you mean 'k_w_mk'", "specific_heat_j_kgk");
    }

    @Test
    void unknownKeyInAPropertyAndInTheFile() throws Exception {
        String text = entries(entry("x", 1.0).replace("\"at_k\": 300,", "\"at_k\": 300, \"unit\": \"W/mK\","));
        assertFinding(onlyError(text), lineOf(text, "\"unit\""), "materials[0].properties.k_w_mk.unit",
                "unknown key in a property");
        Files.delete(lib.resolve("b-bad.json"));
        String fileKey = entries(entry("y", 1.0)).replace("{\n  \"materials\"", "{\n  \"library\": \"x\",\n  \"materials\"");
        LibraryFinding f = onlyError(fileKey);
        assertFinding(f, 2, "library", "unknown key in a library file", "library.json");
        assertTrue(read().materials().stream().anyMatch(m -> m.id().equals("y")),
                "an unknown file key is reported, and the file's entries are still read");
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "negative value|{\"value\": -2.0, \"at_k\": 300, \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk.value|expected a positive thermal conductivity",
            "zero value|{\"value\": 0, \"at_k\": 300, \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk.value|got the number 0.0",
            "value as text|{\"value\": \"2 W/mK\", \"at_k\": 300, \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk.value|the text",
            "value and table|{\"value\": 2, \"table\": [[300, 2], [400, 3]], \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk|exactly one",
            "no temperature|{\"value\": 2, \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk|at_k, or range_k",
            "reversed range|{\"value\": 2, \"range_k\": [400, 300], \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk.range_k|below its low end",
            "negative temperature|{\"value\": 2, \"at_k\": -300, \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk.at_k|positive temperature",
            "non-monotonic table|{\"table\": [[200, 3], [300, 2], [250, 2.5]], \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk.table[2][0]|250.0 K follows 300.0 K",
            "repeated table temperature|{\"table\": [[200, 3], [200, 2]], \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk.table[1][0]|must increase",
            "one-row table|{\"table\": [[300, 2]], \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk.table|at least two",
            "table row of three|{\"table\": [[200, 3, 1], [300, 2]], \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk.table[0]|two numbers",
            "negative table value|{\"table\": [[200, 3], [300, -2]], \"uncertainty_rel\": 0.05}|materials[0].properties.k_w_mk.table[1][1]|positive",
            "uncertainty in per cent|{\"value\": 2, \"at_k\": 300, \"uncertainty_rel\": 5}|materials[0].properties.k_w_mk.uncertainty_rel|fraction between 0 and 1",
            "property not an object|2.0|materials[0].properties.k_w_mk|expected an object"})
    void badPropertyValues(String what, String property, String path, String message) throws Exception {
        String bad = "{\"id\": \"bad\", \"name\": \"bad\", \"version\": 1, \"source\": \"test, invented\",\n"
                + "     \"properties\": {\n       \"k_w_mk\": " + property + ",\n"
                + "       \"heat_capacity_j_m3k\": {\"value\": 2e6, \"at_k\": 300, \"uncertainty_rel\": 0.05}}}";
        String text = entries(bad, entry("also-good", 3.0));
        LibraryFinding f = onlyError(text);
        assertFinding(f, lineOf(text, path.contains("k_w_mk") ? "\"k_w_mk\"" : "\"bad\""), path, message);
        assertTrue(read().materials().stream().anyMatch(m -> m.id().equals("also-good")),
                "the next entry of the same file is read");
        assertTrue(read().materials().stream().noneMatch(m -> m.id().equals("bad")));
    }

    @Test
    void missingSourceIsAnError() throws Exception {
        String text = entries(entry("x", 1.0).replace("\"source\": \"test value, invented\",", ""));
        assertFinding(onlyError(text), lineOf(text, "\"k_w_mk\""), "materials[0].properties.k_w_mk", "no source",
                "from memory");
    }

    @Test
    void aPropertysOwnSourceServesWhenTheEntryHasNone() throws Exception {
        String text = entries(entry("x", 1.0).replace("\"source\": \"test value, invented\",", "")
                .replace("\"uncertainty_rel\": 0.05}", "\"uncertainty_rel\": 0.05, \"source\": \"own, invented\"}"));
        Folders.file(lib, "a.json", text);
        ReadLibrary r = read();
        assertEquals(List.of(), r.findings());
        assertEquals("own, invented", r.materials().get(0).properties().values().iterator().next().source());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "no id|\"id\": \"x\", |materials[0].id|missing",
            "upper-case id|\"id\": \"x\"|materials[0].id|lower case",
            "no version|\"version\": 1, |materials[0].version|missing",
            "fractional version|\"version\": 1|materials[0].version|whole number",
            "bad review date|\"version\": 1|materials[0].reviewed_on|YYYY-MM-DD",
            "review date without reviewer|\"version\": 1|materials[0].reviewed_on|reviewed_by"})
    void badEntryFields(String what, String replaced, String path, String message) throws Exception {
        String replacement = switch (what) {
            case "upper-case id" -> "\"id\": \"Silicon X\"";
            case "fractional version" -> "\"version\": 1.5";
            case "bad review date" -> "\"version\": 1, \"reviewed_by\": \"A. Tester\", \"reviewed_on\": \"18/11/2024\"";
            case "review date without reviewer" -> "\"version\": 1, \"reviewed_on\": \"2024-11-18\"";
            default -> "";
        };
        String text = entries(entry("x", 1.0).replace(replaced, replacement));
        assertFinding(onlyError(text), 3, path, message);
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "two conductivity forms|\"k_through_w_mk\": {\"value\": 1, \"at_k\": 300, \"uncertainty_rel\": 0.1}, \"k_in_plane_w_mk\": {\"value\": 1, \"at_k\": 300, \"uncertainty_rel\": 0.1}|materials[0].properties|one way only",
            "two heat capacity forms|\"density_kg_m3\": {\"value\": 2000, \"at_k\": 300, \"uncertainty_rel\": 0.1}, \"specific_heat_j_kgk\": {\"value\": 1000, \"at_k\": 300, \"uncertainty_rel\": 0.1}|materials[0].properties|both ways could disagree"})
    void inconsistentForms(String what, String extra, String path, String message) throws Exception {
        String text = entries(entry("x", 1.0).replace("\"properties\": {", "\"properties\": {" + extra + ", "));
        assertFinding(onlyError(text), lineOf(text, "\"properties\""), path, message);
    }

    @Test
    void halfAPairIsAnError() throws Exception {
        String text = entries("{\"id\": \"x\", \"name\": \"x\", \"version\": 1, \"source\": \"test, invented\",\n"
                + "  \"properties\": {\"k_parallel_c_w_mk\": {\"value\": 10, \"at_k\": 300, \"uncertainty_rel\": 0.1},\n"
                + "  \"density_kg_m3\": {\"value\": 2000, \"at_k\": 300, \"uncertainty_rel\": 0.1},\n"
                + "  \"specific_heat_j_kgk\": {\"value\": 700, \"at_k\": 300, \"uncertainty_rel\": 0.1}}}");
        assertFinding(onlyError(text), 4, "materials[0].properties.k_parallel_c_w_mk", "without k_perpendicular_c_w_mk");
        Files.delete(lib.resolve("b-bad.json"));
        String rho = entries(entry("y", 1.0).replace("\"heat_capacity_j_m3k\"", "\"density_kg_m3\""));
        assertFinding(onlyError(rho), lineOf(rho, "density_kg_m3"), "materials[0].properties.density_kg_m3",
                "without specific_heat_j_kgk");
    }

    @Test
    void duplicateIdsAndAliasesWithinALibraryKeepTheFirst() throws Exception {
        String text = entries(entry("one", 1.0), entry("one", 2.0),
                entry("two", 3.0).replace("\"version\"", "\"aliases\": [\"ONE\"], \"version\""));
        Folders.file(lib, "a.json", text);
        ReadLibrary r = read();
        assertEquals(List.of("one"), r.materials().stream().map(Material::id).toList());
        assertEquals(2, r.findings().size(), r.findings().toString());
        assertFinding(r.findings().get(0), lineOf(text, "\"value\": 2.0") - 1, "materials[1].id",
                "'one' is already used by entry one");
        assertFinding(r.findings().get(1), lineOf(text, "\"two\""), "materials[2].aliases", "'ONE'");
    }

    @Test
    void aDuplicateAliasInOneEntry() throws Exception {
        String text = entries(entry("x", 1.0).replace("\"version\"", "\"aliases\": [\"a\", \"A\"], \"version\""));
        assertFinding(onlyError(text), 3, "materials[0].aliases[1]", "listed twice");
    }

    @Test
    void aMissingUncertaintyOrAnImplausibleValueIsAWarningAndTheEntryStays() throws Exception {
        String text = entries(entry("x", 1.0).replace("\"at_k\": 300, \"uncertainty_rel\": 0.05},\n",
                "\"at_k\": 300},\n").replace("\"value\": 2e6", "\"value\": 2.0"));
        Folders.file(lib, "a.json", text);
        ReadLibrary r = read();
        assertEquals(1, r.materials().size());
        assertEquals(2, r.findings().size(), r.findings().toString());
        assertTrue(r.findings().stream().noneMatch(LibraryFinding::isError));
        assertFinding(r.findings().get(0), lineOf(text, "\"k_w_mk\""), "materials[0].properties.k_w_mk",
                "no uncertainty_rel");
        assertFinding(r.findings().get(1), lineOf(text, "\"heat_capacity_j_m3k\""),
                "materials[0].properties.heat_capacity_j_m3k", "is the unit right?");
    }

    @Test
    void withoutLibraryJsonNoEntryIsRead() throws Exception {
        Files.delete(lib.resolve("library.json"));
        Folders.file(lib, "a.json", entries(entry("x", 1.0)));
        ReadLibrary r = read();
        assertEquals(List.of(), r.materials());
        assertEquals(1, r.findings().size());
        assertTrue(r.findings().get(0).message().contains("no library.json"), r.findings().toString());
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "wrong format|{\"library_format\": 2, \"id\": \"l\", \"name\": \"L\"}|library_format|reads library_format 1",
            "no format|{\"id\": \"l\", \"name\": \"L\"}|library_format|missing",
            "no name|{\"library_format\": 1, \"id\": \"l\"}|name|missing",
            "bad id|{\"library_format\": 1, \"id\": \"My Lab\", \"name\": \"L\"}|id|lower case",
            "unknown key|{\"library_format\": 1, \"id\": \"l\", \"name\": \"L\", \"owner\": \"x\"}|owner|unknown key"})
    void badLibraryJson(String what, String json, String path, String message) throws Exception {
        Folders.file(lib, "library.json", json);
        Folders.file(lib, "a.json", entries(entry("x", 1.0)));
        ReadLibrary r = read();
        assertEquals(List.of(), r.materials());
        assertEquals(1, r.findings().size(), r.findings().toString());
        assertFinding(r.findings().get(0), 1, path, message);
    }

    @Test
    void aMissingFolderIsAFindingNotACrash() {
        ReadLibrary r = LibraryFolder.read(dir.resolve("nowhere"), LibraryTier.FACILITY);
        assertEquals(List.of(), r.materials());
        assertTrue(r.findings().get(0).message().contains("does not exist"), r.findings().toString());
    }
}
