package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import org.junit.jupiter.api.Test;

class OtherPanelsTest {

    @Test
    void theSetUpPanelWarnsOfALargeSteadyRiseAtHighPower() throws Exception {
        try (PanelHarness h = new PanelHarness(760, 820)) {
            SetupView v = (SetupView) h.open(new SetupPanel());
            assertTrue(h.pumpUntil(() -> v.riseText().startsWith("Predicted"), 20_000), v.riseText());
            assertTrue(!v.riseText().contains("large"), "10 mW is modest on this sample: " + v.riseText());
            h.screenshot("setup");
            v.setPower("100");
            assertTrue(h.pumpUntil(() -> v.riseText().contains("That is large"), 20_000), v.riseText());
            h.screenshot("setup-warning");
            v.setPower("abc");
            assertTrue(v.riseText().contains("'abc' is not a number"), v.riseText());
        }
    }

    @Test
    void theSetUpPanelTurnsSelfHeatingOnInTheCaseAsOneUndoableStep() throws Exception {
        try (PanelHarness h = new PanelHarness(760, 820)) {
            SetupView v = (SetupView) h.open(new SetupPanel());
            assertTrue(h.pumpUntil(() -> v.riseText().startsWith("Predicted"), 20_000), v.riseText());
            assertTrue(!v.riseText().contains("Self-heating is on"), v.riseText());
            int steps = h.workbench.project().undoSteps();
            v.setPower("4");
            v.setSelfHeating(true);
            assertEquals(0.004, h.workbench.project().tree().path("self_heating").path("absorbed_power_w").asDouble(),
                    1e-15, "the panel's power becomes the case's");
            assertEquals(steps + 1, h.workbench.project().undoSteps());
            assertTrue(h.pumpUntil(() -> v.riseText().contains("Self-heating is on"), 20_000), v.riseText());
            h.screenshot("setup-self-heating");
            h.workbench.project().undo();
            h.pump(50);
            assertTrue(h.workbench.project().tree().path("self_heating").isMissingNode());
            assertTrue(!v.selfHeatingShown(), "the box follows the undo");
        }
    }

    @Test
    void theSensitivityPanelDrawsACurvePerInput() throws Exception {
        try (PanelHarness h = new PanelHarness(1100, 720)) {
            SensitivityView v = (SensitivityView) h.open(new SensitivityPanel());
            assertTrue(h.pumpUntil(() -> v.shown() != null, 60_000));
            assertTrue(v.shown().parameters().size() >= 10, "every numeric input: " + v.shown().parameters());
            h.screenshot("sensitivity");
        }
    }

    @Test
    void theMaterialsPanelListsAndSearchesTheLibraries() throws Exception {
        try (PanelHarness h = new PanelHarness(1200, 640)) {
            assumeTrue(h.workbench.materials().isPresent(), "no material library in this test set-up");
            MaterialsView v = (MaterialsView) h.open(new MaterialsPanel());
            int all = v.entries().getItemCount();
            assertTrue(all > 10, "entries listed: " + all);
            assertTrue(v.properties().getItemCount() > 0, "the first entry's values are shown");
            h.screenshot("materials");
            v.search("zzzz-no-such-material");
            assertTrue(v.entries().getItemCount() == 0);
            v.search("al");
            assertTrue(v.entries().getItemCount() > 0 && v.entries().getItemCount() < all);
        }
    }
}
