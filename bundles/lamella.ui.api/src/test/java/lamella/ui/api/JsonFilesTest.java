package lamella.ui.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The workbench's JSON goes through the shared strict reader: problems in Lamella's words at file:line:path. */
class JsonFilesTest {

    @TempDir
    Path dir;

    @Test
    void aBrokenFileIsToldAtItsLineAndPath() throws IOException {
        Path f = Files.writeString(dir.resolve("recent.json"), "{\n  \"recent\": [\"a\",\n    NaN]\n}\n");
        IOException e = assertThrows(IOException.class, () -> JsonFiles.read(f));
        assertEquals(f + ":3: recent[1]: NaN is not allowed: a value must be a finite number", e.getMessage());
        assertFalse(e.getMessage().contains("ALLOW_"), e.getMessage());
    }

    @Test
    void nullIsAllowedAndTheTreeIsRead() throws IOException {
        Path f = Files.writeString(dir.resolve("a.json"), "\uFEFF{\"enlarged\": null, \"x\": [1]}");
        assertTrue(JsonFiles.read(f).get("enlarged").isNull());
        assertEquals(1, JsonFiles.read(f).get("x").get(0).asInt());
    }

    @Test
    void aMissingFileGivesTheSystemsReason() {
        Path f = dir.resolve("none.json");
        IOException e = assertThrows(IOException.class, () -> JsonFiles.read(f));
        assertEquals(f + ": cannot read the file: no such file or folder", e.getMessage());
    }

    @Test
    void caseTextCutShort() {
        IOException e = assertThrows(IOException.class, () -> JsonFiles.parse("{\n\"stack\": {"));
        assertEquals("line 2: stack: the file is cut short: the object stack (opened at line 2) is not closed",
                e.getMessage());
    }
}
