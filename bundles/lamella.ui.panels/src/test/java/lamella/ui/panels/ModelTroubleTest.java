package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import lamella.api.ParameterRef;
import lamella.ui.api.Messages;
import lamella.ui.api.Project;
import org.junit.jupiter.api.Test;

/** A model that cannot finish, or cannot be evaluated, never freezes the panels and is reported in words. */
class ModelTroubleTest {

    private static final List<String> TEST_KEYS = List.of("probe_radius_m");

    @Test
    void aSlowModelIsMarkedSupersededByTheNextEditAndStoppedByTheInterrupt() throws Exception {
        try (PanelHarness h = new PanelHarness(1100, 720)) {
            SignalView v = (SignalView) h.open(new SignalPanel());
            Project p = h.workbench.project();
            assertTrue(h.pumpUntil(() -> v.modelValues().length > 0, 20_000), v.statusText());

            p.switchType("geometry", -1, "slow-test", TEST_KEYS);
            assertTrue(h.pumpUntil(() -> v.statusText().startsWith("Computing the model"), 5_000), v.statusText());
            h.screenshot("signal-slow-model");
            p.set(ParameterRef.layer("film", "k_through_w_mk"), 2.0);
            p.undo();
            p.undo();
            assertEquals("gaussian", p.tree().path("geometry").path("type").asText());
            assertTrue(h.pumpUntil(() -> v.statusText().startsWith("TDTR model"), 20_000),
                    "the edit after the slow model was computed without waiting for it: " + v.statusText());

            // The guard stops the superseded evaluations at their next frequency, though the plug-in ignores
            // interrupts: no more than one evaluation per abandoned request finishes after this.
            h.pump(400);
            int settled = TroubleGeometries.SLOW_FINISHED.get();
            h.pump(1000);
            assertEquals(settled, TroubleGeometries.SLOW_FINISHED.get(), "nothing keeps computing the slow model");
        }
    }

    @Test
    void stoppingTheWorkSaysTheCurveIsForEarlierValues() throws Exception {
        try (PanelHarness h = new PanelHarness(1100, 720)) {
            SignalView v = (SignalView) h.open(new SignalPanel());
            Project p = h.workbench.project();
            assertTrue(h.pumpUntil(() -> v.modelValues().length > 0, 20_000), v.statusText());
            p.switchType("geometry", -1, "slow-test", TEST_KEYS);
            assertTrue(h.pumpUntil(() -> v.statusText().startsWith("Computing the model"), 5_000), v.statusText());
            h.workbench.stopAll();
            assertTrue(h.pumpUntil(() -> v.statusText().startsWith("Stopped"), 5_000), v.statusText());
        }
    }

    @Test
    void aModelThatCannotBeEvaluatedClearsTheLineAndSaysWhyInThePanelMessagesAndStatusLine() throws Exception {
        try (PanelHarness h = new PanelHarness(1100, 720)) {
            SignalView v = (SignalView) h.open(new SignalPanel());
            Project p = h.workbench.project();
            assertTrue(h.pumpUntil(() -> v.modelValues().length > 0, 20_000), v.statusText());
            p.switchType("geometry", -1, "broken-test", TEST_KEYS);
            assertTrue(h.pumpUntil(() -> v.statusText().startsWith("The model could not be computed"), 10_000),
                    v.statusText());
            assertTrue(v.statusText().contains("the spectral integral did not converge"), v.statusText());
            assertTrue(v.statusText().contains("geometry 'broken-test'"), "the plug-in is named: " + v.statusText());
            assertEquals(0, v.modelValues().length, "no line that belongs to other values");
            assertTrue(h.workbench.problems.get(SignalView.WHERE).contains("did not converge"),
                    h.workbench.problems.toString());
            assertTrue(h.workbench.messages().all().stream().anyMatch(m -> m.level() == Messages.Level.ERROR
                    && m.text().contains("did not converge") && !m.text().contains("Exception")),
                    h.workbench.messages().all().toString());
            h.screenshot("signal-broken-model");

            p.undo();
            assertTrue(h.pumpUntil(() -> v.modelValues().length > 0, 20_000), v.statusText());
            assertTrue(h.workbench.problems.isEmpty(), "the status line is told that all is well again");
        }
    }

    @Test
    void anInvalidCaseClearsTheLineAndNamesThePath() throws Exception {
        try (PanelHarness h = new PanelHarness(1100, 720)) {
            SignalView v = (SignalView) h.open(new SignalPanel());
            Project p = h.workbench.project();
            assertTrue(h.pumpUntil(() -> v.modelValues().length > 0, 20_000), v.statusText());
            int startedBefore = h.workbench.started.get();
            p.switchType("geometry", -1, "ring", List.of("ring_radius_m", "ring_width_m", "probe_radius_m"));
            assertEquals("geometry.ring_radius_m", p.problem().orElseThrow().path(),
                    "a required key missing from a block is a problem of the case");
            assertTrue(h.pumpUntil(() -> v.modelValues().length == 0, 5_000));
            assertTrue(v.statusText().contains("geometry.ring_radius_m"), v.statusText());
            assertEquals(0, h.workbench.started.get() - startedBefore, "nothing is computed from an invalid case");
        }
    }
}
