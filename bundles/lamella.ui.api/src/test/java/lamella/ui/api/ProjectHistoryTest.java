package lamella.ui.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import lamella.api.ParameterRef;
import org.junit.jupiter.api.Test;

/** Every edit of a project is a named step that can be undone and redone; the saved state is the clean point. */
class ProjectHistoryTest {

    private static final ParameterRef FILM_K = ParameterRef.layer("film", "k_through_w_mk");

    private static double filmK(Project p) {
        return p.current().orElseThrow().stack().layer("film").orElseThrow().kThrough();
    }

    @Test
    void removingALayerUndoesWithItsFitRolesAndRedoes() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        String original = p.json();
        p.removeLayer(1);
        assertEquals(Optional.of("remove layer 'film'"), p.undoName());
        assertEquals(Project.Role.FIXED, p.role(FILM_K), "the removed layer's free value left the fit");
        assertEquals(2, p.current().orElseThrow().stack().layers().size());
        assertTrue(p.dirty());

        List<Project.Change> seen = new ArrayList<>();
        p.addListener(seen::add);
        assertTrue(p.undo());
        assertEquals(original, p.json(), "undo gives back exactly the document before the edit");
        assertEquals(Project.Role.FREE, p.role(FILM_K));
        assertFalse(p.dirty(), "back at the opened state: nothing to save");
        assertTrue(seen.containsAll(Set.of(Project.Change.INPUTS, Project.Change.FIT_SETUP, Project.Change.FILE)),
                seen.toString());
        assertEquals(Optional.of("remove layer 'film'"), p.redoName());

        assertTrue(p.redo());
        assertEquals(2, p.current().orElseThrow().stack().layers().size());
        assertTrue(p.dirty());
        assertFalse(p.redo(), "nothing more to redo");
    }

    @Test
    void aNewEditAfterUndoDropsTheRedoSteps() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.set(FILM_K, 2.0);
        p.set(FILM_K, 3.0);
        p.undo();
        assertTrue(p.redoName().isPresent());
        p.set(FILM_K, 4.0);
        assertTrue(p.redoName().isEmpty());
        assertEquals(4.0, filmK(p));
        p.undo();
        assertEquals(2.0, filmK(p));
    }

    @Test
    void theHistoryIsDeepAndBounded() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        String original = p.json();
        for (int i = 1; i <= 600; i++) {
            p.set(FILM_K, 1.0 + i * 1e-3);
        }
        assertEquals(600, p.undoSteps());
        while (p.undo()) {
            // back to the start, one step at a time
        }
        assertEquals(original, p.json());
        for (int i = 1; i <= EditHistory.DEPTH + 20; i++) {
            p.set(FILM_K, 2.0 + i * 1e-3);
        }
        assertEquals(EditHistory.DEPTH, p.undoSteps(), "the oldest steps are forgotten first");
    }

    @Test
    void keystrokesOfOneVisitToAFieldAreOneStep() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        Object visit = new Object();
        p.set(FILM_K, 2.0, visit);
        p.set(FILM_K, 2.5, visit);
        p.set(FILM_K, 2.57, visit);
        assertEquals(1, p.undoSteps());
        Object nextVisit = new Object();
        p.set(FILM_K, 3.0, nextVisit);
        assertEquals(2, p.undoSteps(), "a new visit to the field is a new step");
        p.undo();
        assertEquals(2.57, filmK(p));
        p.undo();
        assertEquals(1.0, filmK(p));
    }

    @Test
    void typingBackToTheStartingValueLeavesNoStep() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        Object visit = new Object();
        p.set(FILM_K, 1.5, visit);
        p.set(FILM_K, 1.0, visit);
        assertEquals(0, p.undoSteps());
        assertFalse(p.dirty());
    }

    @Test
    void anEditThatChangesNothingIsNotRecorded() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.set(FILM_K, 1.0);
        p.setFixed(ParameterRef.layer("substrate", "thickness_m"));
        assertEquals(0, p.undoSteps());
        assertFalse(p.dirty());
    }

    @Test
    void savingIsTheCleanPointThatUndoAndRedoReturnTo() throws Exception {
        java.nio.file.Path dir = java.nio.file.Files.createTempDirectory("lamella-history");
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        Object visit = new Object();
        p.set(FILM_K, 2.0, visit);
        p.save(dir.resolve("case.json"));
        assertFalse(p.dirty());
        p.set(FILM_K, 3.0, visit);
        assertEquals(2, p.undoSteps(), "an edit after a save never merges into a step before it");
        p.undo();
        assertFalse(p.dirty(), "undone back to what was saved");
        p.undo();
        assertTrue(p.dirty(), "undone past the save");
        p.redo();
        assertFalse(p.dirty());
    }

    @Test
    void aRecoveredProjectIsUnsavedFromTheStart() throws Exception {
        Project p = Project.recovered(Project.open(ProjectTest.DEMO, ProjectTest.READER).json(),
                ProjectTest.DEMO.getParent(), ProjectTest.READER);
        assertTrue(p.dirty());
        assertTrue(p.problem().isEmpty(), p.problem().map(Throwable::getMessage).orElse(""));
    }

    @Test
    void anyMutationThroughEditIsUndoable() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.edit("write a description", d -> d.put("description", "changed"));
        assertEquals("changed", p.tree().path("description").asText());
        p.undo();
        assertTrue(p.tree().path("description").asText().startsWith("Invented demo"));
    }

    @Test
    void theTreeGivenOutIsACopy() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        ObjectNode t = p.tree();
        t.put("description", "not through an edit");
        assertFalse(p.json().contains("not through an edit"));
        assertFalse(p.dirty());
    }
}
