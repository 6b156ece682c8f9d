package lamella.ui.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.Set;
import lamella.api.CaseDocument;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A saved project is self-contained: its data files beside the case, written relative, with usual permissions. */
class ProjectSaveTest {

    @TempDir
    Path dir;

    @Test
    void saveAsCopiesTheDataBesideTheCaseAndWritesRelativePaths() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        Path target = dir.resolve("elsewhere/sample-117.json");
        p.save(target);
        JsonNode saved = new ObjectMapper().readTree(Files.readString(target));
        for (JsonNode d : saved.path("fit").path("datasets")) {
            String data = d.path("data").asText();
            assertFalse(Path.of(data).isAbsolute(), data);
            assertFalse(data.contains(".."), data);
            Path copy = target.getParent().resolve(data);
            assertTrue(Files.isRegularFile(copy), copy.toString());
            assertEquals(-1, Files.mismatch(copy, ProjectTest.DEMO.getParent().resolve(data)));
        }
        CaseDocument back = ProjectTest.READER.read(target);
        assertEquals(3, back.stack().layers().size());
        assertEquals(target.getParent().resolve("fdtr.csv"), p.dataFile(2), "the project now uses its own copies");
        assertFalse(p.dirty());
    }

    @Test
    void aDifferentFileOfTheSameNameIsNeverReplaced() throws Exception {
        Path folder = Files.createDirectories(dir.resolve("project"));
        Files.writeString(folder.resolve("fdtr.csv"), "someone else's file\n");
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.save(folder.resolve("case.json"));
        assertEquals("someone else's file\n", Files.readString(folder.resolve("fdtr.csv")));
        assertEquals(folder.resolve("fdtr-2.csv"), p.dataFile(2));
        p.save(folder.resolve("case.json"));
        assertFalse(Files.exists(folder.resolve("fdtr-3.csv")), "saving again copies nothing again");
    }

    @Test
    void undoingPastASaveAsKeepsTheProjectsOwnCopies() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.set(lamella.api.ParameterRef.layer("film", "k_through_w_mk"), 2.0);
        Path target = dir.resolve("moved/case.json");
        p.save(target);
        p.undo();
        assertEquals(target.getParent().resolve("tdtr-9.8mhz.csv"), p.dataFile(0));
    }

    @Test
    void filesGetTheUsersUsualPermissions() throws Exception {
        Path probe = Files.createFile(dir.resolve("probe"));
        Set<PosixFilePermission> usual = Files.getPosixFilePermissions(probe);
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        Path target = dir.resolve("perm/case.json");
        p.save(target);
        assertEquals(PosixFilePermissions.toString(usual),
                PosixFilePermissions.toString(Files.getPosixFilePermissions(target)));
        assertEquals(PosixFilePermissions.toString(usual),
                PosixFilePermissions.toString(Files.getPosixFilePermissions(target.resolveSibling("fdtr.csv"))));
        try (var s = Files.list(target.getParent())) {
            assertTrue(s.noneMatch(f -> f.getFileName().toString().endsWith(".part")), "no temporary file is left");
        }
    }
}
