package lamella.cli.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import lamella.cli.data.Runs.Run;
import lamella.io.profiles.ProfilesService;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A one-off file's unknown column named on the command line, and the starting profile written from it. */
class ImportColumnsTest {

    @TempDir
    Path dir;

    private ImportCommand command() {
        ImportCommand c = Runs.importCommand();
        c.addProfiles(new ProfilesService());
        return c;
    }

    @Test
    void aColumnMappingReadsTheFileAndWritesAProfileThatChecksClean() throws Exception {
        Path f = dir.resolve("sweep.csv");
        Files.writeString(f, "f (kHz), phase (deg), phase sd (deg)\n1, -10, 0.1\n2, -11, 0.1\n5, -12, 0.2\n");
        Run unknown = Runs.run(command(), dir, "sweep.csv");
        assertEquals(2, unknown.status());
        assertTrue(unknown.err().contains("--column 'phase sd (deg)=MEANING[:UNIT]'"), unknown.err());
        Run mapped = Runs.run(command(), dir, "sweep.csv", "--column", "phase sd (deg)=sigma_phase",
                "--write-profile", "lockin.json", "--out", "data.csv");
        assertEquals(0, mapped.status(), mapped.err());
        assertEquals("frequency_hz,phase_deg,sigma_phase_deg,outlier,excluded",
                Files.readAllLines(dir.resolve("data.csv")).get(0));
        assertTrue(Files.readString(dir.resolve("data.csv")).contains("\n2.000000000000e+03,-1.100000000000e+01,"),
                Files.readString(dir.resolve("data.csv")));
        assertEquals(java.util.List.of(), new ProfilesService().check(dir.resolve("lockin.json")));
    }

    @Test
    void theProfileIsNeverWrittenOverTheDataFileNorWithFormat() throws Exception {
        Path f = dir.resolve("sweep.csv");
        String text = "f (kHz), phase (deg)\n1, -10\n2, -11\n";
        Files.writeString(f, text);
        Run own = Runs.run(command(), dir, "sweep.csv", "--write-profile", "./sweep.csv");
        assertEquals(2, own.status());
        assertTrue(own.err().contains("would overwrite its own input"), own.err());
        assertEquals(text, Files.readString(f));
        Run both = Runs.run(command(), dir, "sweep.csv", "--format", "delimited", "--column", "f (kHz)=frequency");
        assertEquals(2, both.status());
        assertFalse(Files.exists(dir.resolve("lockin.json")));
    }
}
