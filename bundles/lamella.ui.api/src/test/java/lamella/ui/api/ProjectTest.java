package lamella.ui.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lamella.api.CaseDocument;
import lamella.api.ParameterRef;
import lamella.casefile.CaseFileReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ProjectTest {

    static final Path DEMO = Path.of("../../demo-data/oxide-film-joint/case.json");
    static final CaseReader READER = new CaseFileReader()::read;

    @TempDir
    Path dir;

    @Test
    void editsAreCheckedAndWhatIsSavedReadsBackTheSame() throws Exception {
        Project p = Project.open(DEMO, READER);
        List<Project.Change> seen = new ArrayList<>();
        p.addListener(seen::add);
        ParameterRef k = ParameterRef.layer("film", "k_through_w_mk");
        p.set(k, 2.5);
        assertTrue(p.dirty());
        assertEquals(2.5, p.current().orElseThrow().stack().layer("film").orElseThrow().kThrough());
        assertTrue(seen.contains(Project.Change.INPUTS));
        p.set(k, -1);
        assertTrue(p.problem().isPresent(), "a negative conductivity is refused by the case reader");
        assertEquals(2.5, p.current().orElseThrow().stack().layer("film").orElseThrow().kThrough(),
                "current() keeps the last accepted version");
        p.set(k, 3.0);
        assertFalse(p.problem().isPresent());
        Path saved = dir.resolve("sub/copy.json");
        p.save(saved);
        assertFalse(p.dirty());
        CaseDocument back = READER.read(saved);
        assertEquals(3.0, back.stack().layer("film").orElseThrow().kThrough());
        assertTrue(Files.isRegularFile(p.dataFile(0)), "data paths follow the project to its new folder");
    }

    @Test
    void rolesMoveBetweenFreeUncertainAndFixed() throws Exception {
        Project p = Project.open(DEMO, READER);
        ParameterRef c = ParameterRef.layer("film", "heat_capacity_j_m3k");
        assertEquals(Project.Role.UNCERTAIN, p.role(c));
        assertEquals(0.03, p.relativeSigma(c), 1e-15);
        p.setFree(c, 1e6, 3e6);
        assertEquals(Project.Role.FREE, p.role(c));
        p.setFixed(c);
        assertEquals(Project.Role.FIXED, p.role(c));
        ParameterRef r = ParameterRef.geometry("pump_radius_m").inDataset(2);
        assertEquals(Project.Role.UNCERTAIN, p.role(r));
        assertFalse(p.problem().isPresent(), p.problem().map(Throwable::getMessage).orElse(""));
    }
}
