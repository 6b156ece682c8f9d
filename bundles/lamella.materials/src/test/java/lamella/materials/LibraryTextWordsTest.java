package lamella.materials;

import static lamella.materials.Folders.entries;
import static lamella.materials.Folders.entry;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryTier;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/**
 * A library file's broken JSON is told at FILE:LINE: PATH in Lamella's words (the shared strict reader), never with
 * a parser library's feature or constraint names or a Java class name. Values are invented for tests of the format.
 */
class LibraryTextWordsTest {

    static final List<String> FOREIGN = List.of("ALLOW_", "StreamRead", "Constraints", "[Source", "Jackson",
            "jackson", "fasterxml", "Exception", "java.", "JsonToken", "START_", "END_", "VALUE_", "FIELD_NAME",
            "Feature", "Duplicate field", "Unexpected character", "Unrecognized token");

    @TempDir
    Path dir;

    @ParameterizedTest
    @CsvSource(delimiter = '|', value = {
        "\"value\": 1.0 | \"value\": NaN | 4 | materials[0].properties.k_w_mk.value | NaN is not allowed",
        "\"value\": 1.0 | \"value\": -Infinity | 4 | materials[0].properties.k_w_mk.value | -Infinity is not allowed",
        "\"version\": 1 | \"version\": 1 // first | 3 | materials[0] | comments are not part of JSON",
        "\"version\": 1 | \"version\": 1e400 | 3 | materials[0].version | outside the range of double precision",
        "\"version\": 1 | \"version\": 1, \"id\": \"y\" | 3 | materials[0].id | the key 'id' appears twice",
        "\"at_k\": 300, | \"at_k\": [[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[[300, "
                + "| 4 | materials[0].properties.k_w_mk.at_k[0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0]"
                + "[0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0][0]"
                + "[0][0][0][0][0][0] | nested more than 64 deep",
    })
    void toldAtFileLineAndPath(String piece, String replacement, int line, String path, String words)
            throws Exception {
        Path lib = Folders.library(dir.resolve("lib"), "test-lib", "Test library");
        String text = entries(entry("x", 1.0));
        assertTrue(text.contains(piece), piece);
        Path bad = Folders.file(lib, "bad.json", text.replaceFirst(java.util.regex.Pattern.quote(piece),
                java.util.regex.Matcher.quoteReplacement(replacement)));
        List<LibraryFinding> errors = LibraryFolder.read(lib, LibraryTier.FACILITY).findings().stream()
                .filter(LibraryFinding::isError).toList();
        assertEquals(1, errors.size(), errors.toString());
        LibraryFinding f = errors.get(0);
        assertEquals(bad.toString(), f.file());
        assertEquals(line, f.line(), f.toString());
        assertEquals(path, f.path(), f.toString());
        assertTrue(f.toString().startsWith(f.file() + ":" + line + ": " + path + ": "), f.toString());
        assertTrue(f.message().contains(words), f.toString());
        for (String foreign : FOREIGN) {
            assertFalse(f.toString().contains(foreign), "'" + foreign + "' in: " + f);
        }
    }
}
