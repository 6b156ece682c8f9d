package lamella.ui.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import lamella.api.ParameterRef;
import lamella.api.fit.BudgetLine;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The fit flows back: its values go into the case as one undoable step, any other edit makes it out of date, and
 * it is kept with the project. The outcome here is made up to exercise the bookkeeping; no physics is checked.
 */
class ProjectFitTest {

    private static final ParameterRef FILM_K = ParameterRef.layer("film", "k_through_w_mk");

    @TempDir
    Path dir;

    /** A made-up outcome: the film's conductivity at 1.37 ± 0.05, one dataset of three points. */
    private static FitOutcome outcome() {
        FittedParameter k = new FittedParameter(FILM_K, "isotropic Λ", 1.0, 1.37, 0.05, 0.02, false, true);
        DatasetFit d = new DatasetFit(0, "tdtr-9.8mhz.csv", "tdtr", "ratio", "delay_s",
                new double[] {1e-10, 1e-9, 3e-9}, new double[] {1.5, 1.2, 0.9}, new double[] {0.01, 0.01, Double.NaN},
                new double[] {1.49, 1.21, 0.91}, true, 1.1);
        BudgetLine noise = new BudgetLine(null, "", 0, new double[] {0.02});
        BudgetLine thickness = new BudgetLine(ParameterRef.layer("transducer", "thickness_m"), "", 2.5e-9,
                new double[] {0.045});
        return new FitOutcome(List.of(k), new double[][] {{1}}, List.of(d), List.of(noise, thickness),
                Optional.empty(), List.of("a warning to read"), 42, 1.1, true);
    }

    private static double filmK(Project p) {
        return p.tree().path("stack").path("layers").get(1).path("k_through_w_mk").asDouble();
    }

    @Test
    void usingTheFittedValuesIsOneStepThatUndoes() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.setLastFit(outcome());
        assertTrue(p.lastFitCurrent());
        assertFalse(p.fittedValuesInUse());
        p.useFittedValues();
        assertEquals(1.37, filmK(p), 0);
        assertEquals("use fitted values", p.undoName().orElseThrow());
        assertTrue(p.lastFitCurrent(), "the case with the fitted values taken in still belongs to the fit");
        assertTrue(p.fittedValuesInUse());
        assertEquals(1.37, p.tree().path("fit").path("free").get(0).path("initial").asDouble(), 0,
                "the next fit starts from the fitted value");
        p.undo();
        assertEquals(1.0, filmK(p), 0);
        assertTrue(p.lastFitCurrent());
        assertFalse(p.fittedValuesInUse());
    }

    @Test
    void anyOtherEditMakesTheFitOutOfDateAndUndoingItDoesNot() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.setLastFit(outcome());
        p.set(ParameterRef.layer("transducer", "thickness_m"), 9e-8);
        assertFalse(p.lastFitCurrent());
        p.undo();
        assertTrue(p.lastFitCurrent());
        p.edit("exclude delays below 100 ps of dataset 1",
                d -> ((com.fasterxml.jackson.databind.node.ObjectNode) d.path("fit").path("datasets").get(0))
                        .put("exclude_below_s", 1e-10));
        assertFalse(p.lastFitCurrent(), "an edit of the fit block counts too");
    }

    @Test
    void theLastFitIsKeptWithTheProjectAndComesBackOnReopening() throws Exception {
        Project p = Project.open(ProjectTest.DEMO, ProjectTest.READER);
        p.setLastFit(outcome());
        assertTrue(p.dirty(), "a fit not yet saved is something to save");
        Path target = dir.resolve("kept/case.json");
        p.save(target);
        assertFalse(p.dirty());
        assertTrue(new ObjectMapper().readTree(Files.readString(target)).path("workbench").has("last_fit"));
        ProjectTest.READER.read(target);

        Project again = Project.open(target, ProjectTest.READER);
        FitOutcome back = again.lastFit().orElseThrow();
        FitOutcome was = outcome();
        assertEquals(was.parameters(), back.parameters());
        assertEquals(was.warnings(), back.warnings());
        assertEquals(42, back.evaluations());
        assertEquals(0.045, back.budget().get(1).contributions()[0], 0);
        assertEquals(null, back.budget().get(0).source());
        assertTrue(Double.isNaN(back.datasets().get(0).sigma()[2]), "NaN survives");
        assertEquals(1.49, back.datasets().get(0).model()[0], 0);
        assertTrue(again.lastFitCurrent(), "reopened, the fit still belongs to the case");
        assertFalse(again.tree().path("workbench").has("last_fit"), "the document holds no copy of its own");
        assertFalse(again.dirty());
        again.save(target);
        Project third = Project.open(target, ProjectTest.READER);
        assertEquals(was.parameters(), third.lastFit().orElseThrow().parameters(), "saving again keeps it");
    }

    @Test
    void aKeptFitThatCannotBeReadIsReportedNotShown() throws Exception {
        Path target = dir.resolve("broken/case.json");
        Project.open(ProjectTest.DEMO, ProjectTest.READER).save(target);
        var tree = (com.fasterxml.jackson.databind.node.ObjectNode) new ObjectMapper().readTree(
                Files.readString(target));
        tree.putObject("workbench").putObject("last_fit").put("parameters", "not a list");
        Files.writeString(target, tree.toString());
        Project p = Project.open(target, ProjectTest.READER);
        assertTrue(p.lastFit().isEmpty());
        assertTrue(p.lastFitProblem().orElseThrow().contains("workbench.last_fit could not be read"),
                p.lastFitProblem().toString());
    }

    @Test
    void theDataFilesContentDecidesWhetherTheFitIsCurrentNotTheirNames() throws Exception {
        Path saved = dir.resolve("first/case.json");
        Project.open(ProjectTest.DEMO, ProjectTest.READER).save(saved);
        Project p = Project.open(saved, ProjectTest.READER);
        p.setLastFit(outcome());
        Path data = p.dataFile(0);

        Path again = dir.resolve("second/case.json");
        p.save(again);
        assertTrue(p.lastFitCurrent(), "re-saved elsewhere, the same data: still current");
        Path copied = p.dataFile(0);
        assertTrue(copied.startsWith(again.getParent()) && !copied.equals(data), copied.toString());

        Files.move(copied, copied.resolveSibling("renamed.csv"));
        p.edit("point dataset 0 at the renamed file", d -> ((com.fasterxml.jackson.databind.node.ObjectNode)
                d.path("fit").path("datasets").get(0)).put("data", copied.resolveSibling("renamed.csv").toString()));
        assertTrue(p.lastFitCurrent(), "another name for the same bytes keeps the fit");
        p.undo();
        assertFalse(p.lastFitCurrent(), "the file it named is gone");
        Files.move(copied.resolveSibling("renamed.csv"), copied);
        assertTrue(p.lastFitCurrent());

        List<String> lines = Files.readAllLines(copied);
        int last = lines.size() - 1;
        lines.set(last, lines.get(last) + "1");
        Files.write(copied, lines);
        assertFalse(p.lastFitCurrent(), "an edited data file makes the fit out of date");
        p.save(again);
        Project reopened = Project.open(again, ProjectTest.READER);
        assertFalse(reopened.lastFitCurrent(), "and it stays out of date when the project is opened again");
    }
}
