package lamella.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class OwnInputsTest {

    @TempDir
    Path dir;

    @Test
    void everySpellingOfAnInputIsCaught() throws Exception {
        Path data = Files.createDirectories(dir.resolve("data")).resolve("scan.csv");
        Files.writeString(data, "x,y\n");
        Path caseFile = dir.resolve("case.json");
        Files.writeString(caseFile, "{\"fit\": {\"datasets\": [{\"file\": \"data/scan.csv\"}]}, \"name\": \"x\"}");
        List<Path> inputs = OwnInputs.ofCase(caseFile);
        assertTrue(inputs.size() == 2, inputs.toString());
        assertEquals(caseFile, OwnInputs.clash(dir.resolve("./case.json"), inputs));
        assertEquals(caseFile, OwnInputs.clash(dir.resolve("data/../case.json"), inputs));
        Path link = dir.resolve("link.csv");
        Files.createSymbolicLink(link, data);
        assertTrue(OwnInputs.clash(link, inputs) != null);
        Path hard = dir.resolve("hard.csv");
        Files.createLink(hard, data);
        assertTrue(OwnInputs.clash(hard, inputs) != null);
        assertNull(OwnInputs.clash(dir.resolve("new.csv"), inputs));
        Path other = dir.resolve("other.csv");
        Files.writeString(other, "x");
        assertNull(OwnInputs.clash(other, inputs));
    }
}
