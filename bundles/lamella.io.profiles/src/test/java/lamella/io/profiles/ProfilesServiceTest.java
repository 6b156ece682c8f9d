package lamella.io.profiles;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import lamella.api.InputException;
import lamella.api.data.Dataset;
import lamella.api.data.ImporterProfiles.Draft;
import lamella.api.data.ImporterProfiles.Finding;
import lamella.api.data.SignalNames;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Checking a folder before it is published, trying it on a file, and a one-off mapping made a profile. */
class ProfilesServiceTest {

    private final ProfilesService service = new ProfilesService();
    private static final Path FACILITY = ProfileTableTest.DEMO.resolve("profiles/fenwick-hall");

    @Test
    void theDemoFacilityFolderChecksClean() {
        assertEquals(List.of(), service.check(FACILITY));
    }

    @Test
    void aFolderWithTwoProfilesOfOneNameAndABrokenOneHasFindings(@TempDir Path dir) throws Exception {
        Files.copy(FACILITY.resolve("halden-hx2.json"), dir.resolve("a.json"));
        Files.copy(FACILITY.resolve("halden-hx2.json"), dir.resolve("b.json"));
        Files.writeString(dir.resolve("c.json"), "{\"profile\": \"c\",\n \"summary\": 3}");
        List<Finding> all = service.check(dir);
        assertTrue(all.stream().anyMatch(f -> f.file().endsWith("b.json") && f.problem().contains("also the name")),
                all.toString());
        assertTrue(all.stream().anyMatch(f -> f.file().endsWith("c.json") && f.line() == 2
                && f.path().equals("summary")), all.toString());
        assertTrue(service.check(dir.resolve("missing")).get(0).problem().contains("no such folder"));
    }

    @Test
    void tryingTheFolderOnAFilePicksTheProfileThatRecognisesIt() throws Exception {
        Dataset fdtr = service.tryOn(FACILITY, ProfileTableTest.DEMO.resolve("raw/halden-hx2-sweep.txt"));
        assertEquals("halden-hx2", fdtr.format());
        Dataset tdtr = service.tryOn(FACILITY, ProfileTableTest.DEMO.resolve("raw/quillon-tdtr-records.csv"));
        assertEquals("quillon-records", tdtr.format());
        InputException none = assertThrows(InputException.class, () -> service.tryOn(FACILITY,
                ProfileTableTest.DEMO.resolve("raw/oxide-film-fdtr.csv")));
        assertTrue(none.getMessage().contains("none of the 2 profiles"), none.getMessage());
    }

    @Test
    void aOneOffMappingReadsAColumnLamellaDoesNotKnowAndWritesAStartingProfile(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("sweep.csv");
        Files.writeString(f, "modulation_hz: 1e6\nsample: test\nf (kHz), phase (rad), phase sd (rad)\n"
                + "1, -0.1, 0.01\n2, -0.2, 0.01\n5, -0.3, 0.02\n");
        InputException unknown = assertThrows(InputException.class, () -> service.draft(f, List.of()));
        assertEquals(3, unknown.line());
        assertTrue(unknown.getMessage().contains("'phase sd (rad)'"), unknown.getMessage());
        Draft draft = service.draft(f, List.of("phase sd (rad)=sigma_phase:rad"));
        Dataset d = draft.importer().read(f);
        assertEquals(List.of(SignalNames.PHASE_DEG), d.signalColumns());
        assertEquals(Math.toDegrees(-0.2), d.scans().get(0).signals().get(SignalNames.PHASE_DEG)[1], 1e-12);
        assertEquals(Math.toDegrees(0.02), d.scans().get(0).sigmas().get(SignalNames.PHASE_DEG)[2], 1e-12);
        assertEquals("1000000.0", d.metadata().get("modulation_hz"));
        // the text is a profile that checks clean and reads the file the same way
        Path saved = dir.resolve("draft.json");
        Files.writeString(saved, draft.profileText());
        assertEquals(List.of(), service.check(saved));
        assertEquals(d.scans().get(0).sigmas().get(SignalNames.PHASE_DEG)[2],
                service.tryOn(saved, f).scans().get(0).sigmas().get(SignalNames.PHASE_DEG)[2], 0.0);
        InputException meaning = assertThrows(InputException.class, () -> service.draft(f,
                List.of("phase sd (rad)=phase_sd")));
        assertTrue(meaning.getMessage().contains("'phase_sd' is not a column meaning"), meaning.getMessage());
    }
}
