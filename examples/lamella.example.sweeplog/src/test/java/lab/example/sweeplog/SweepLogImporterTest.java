package lab.example.sweeplog;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.InputException;
import lamella.api.data.Dataset;
import lamella.api.data.Scan;
import lamella.api.data.SignalNames;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The importer's reading and its refusals; no physics here, so no source to name. */
class SweepLogImporterTest {

    /** The example file shipped beside the pom, which the README and the product's drop-in test use. */
    private static final Path EXAMPLE = Path.of("sweep-example.swlog");

    private final SweepLogImporter importer = new SweepLogImporter();

    @TempDir
    Path dir;

    @Test
    void readsTheExampleFile() throws Exception {
        Dataset d = importer.read(EXAMPLE);
        assertEquals("sweep-log", d.format());
        assertEquals(SignalNames.FREQUENCY_HZ, d.xColumn());
        assertEquals(1, d.scans().size());
        Scan s = d.scans().get(0);
        assertArrayEquals(new double[] {1e3, 1e4, 1e5, 1e6, 1e7}, s.x(), 0.0);
        assertArrayEquals(new double[] {-11.42, -15.87, -21.36, -29.04, -38.75}, s.signals().get("phase_deg"), 0.0);
        assertEquals("fdtr", d.metadata().get("technique"));
        assertEquals("0.0000032", d.metadata().get("pump_radius_m"));
        assertEquals("0.0000028", d.metadata().get("probe_radius_m"));
        assertEquals("oxide film FH-0417 (invented)", d.metadata().get("sample"));
    }

    @Test
    void isSureOnlyOfAFileThatDeclaresTheFormat() {
        assertEquals(1.0, importer.confidence(EXAMPLE, "sweep-log 1\nsample = x\n".getBytes(StandardCharsets.UTF_8)));
        assertEquals(1.0, importer.confidence(EXAMPLE, "\uFEFFsweep-log 1\r\n".getBytes(StandardCharsets.UTF_8)));
        assertEquals(0.0, importer.confidence(EXAMPLE, "sweep-log 10\n".getBytes(StandardCharsets.UTF_8)));
        assertEquals(0.0, importer.confidence(EXAMPLE, "f (Hz),phase (deg)\n".getBytes(StandardCharsets.UTF_8)));
        assertEquals(0.0, importer.confidence(EXAMPLE, new byte[0]));
    }

    @Test
    void ascendingOrDescendingSweepsReadAscending() throws Exception {
        Dataset d = importer.read(file("sweep-log 1\npoint = 2e3 -14\npoint = 1e3 -12.5\n"));
        assertArrayEquals(new double[] {1e3, 2e3}, d.scans().get(0).x(), 0.0);
        assertArrayEquals(new double[] {-12.5, -14}, d.scans().get(0).signals().get("phase_deg"), 0.0);
    }

    @Test
    void everyProblemNamesItsLine() throws Exception {
        refused("sample = a\n", 1, "expected the first line 'sweep-log 1'");
        refused("sweep-log 1\nsample a\n", 2, "expected 'key = value'");
        refused("sweep-log 1\n\n# c\nspot = 3\n", 4, "unknown key 'spot'");
        refused("sweep-log 1\nsample = a\nsample = b\n", 3, "'sample' is given again (first on line 2)");
        refused("sweep-log 1\npump_radius_um = 3,2\n", 2, "'3,2' is not a number");
        refused("sweep-log 1\nprobe_radius_um = -1\n", 2, "expected a radius above zero");
        refused("sweep-log 1\npoint = 1000\n", 2, "'point' takes two numbers");
        refused("sweep-log 1\npoint = 1000 NaN\n", 2, "not a finite number");
        refused("sweep-log 1\npoint = 0 -3\n", 2, "expected a modulation frequency above zero");
        refused("sweep-log 1\npoint = 1000 -3\npoint = 2000 -4\npoint = 1500 -5\n", 4, "");
        refused("sweep-log 1\nsample = a\n", 2, "no 'point = FREQUENCY_HZ PHASE_DEG' line");
    }

    private void refused(String text, int line, String words) throws IOException {
        Path f = file(text);
        InputException e = assertThrows(InputException.class, () -> importer.read(f));
        assertEquals(line, e.line(), e.getMessage());
        assertTrue(e.getMessage().contains(words), e.getMessage());
        assertTrue(e.getMessage().contains(f.getFileName().toString()), e.getMessage());
    }

    private Path file(String text) throws IOException {
        Path f = Files.createTempFile(dir, "log", ".swlog");
        Files.writeString(f, text, StandardCharsets.UTF_8);
        return f;
    }
}
