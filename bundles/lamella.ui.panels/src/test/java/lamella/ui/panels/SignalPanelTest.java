package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Arrays;
import lamella.api.ParameterRef;
import org.junit.jupiter.api.Test;

class SignalPanelTest {

    private static final ParameterRef FILM_K = ParameterRef.layer("film", "k_through_w_mk");

    @Test
    void editingTheFilmConductivityChangesThePlottedModel() throws Exception {
        try (PanelHarness h = new PanelHarness(1100, 720)) {
            SignalView v = (SignalView) h.open(new SignalPanel());
            assertTrue(h.pumpUntil(() -> v.modelValues().length > 0, 20_000), "a model is drawn: " + v.statusText());
            double[] before = v.modelValues();
            h.screenshot("signal");
            h.workbench.project().set(FILM_K, 3.0);
            assertTrue(h.pumpUntil(() -> !Arrays.equals(before, v.modelValues()), 20_000),
                    "the model follows the edit: " + v.statusText());
            assertEquals(before.length, v.modelValues().length);
        }
    }

    /**
     * SSTR data are a power sweep: the panel draws the steady rise over absorbed pump power with the sweep's points,
     * a straight line through them (linear heat conduction: the rise is the rise per watt times the power).
     */
    @Test
    void anSstrPowerSweepIsDrawnOverPumpPower() throws Exception {
        Path demo = Path.of("../../demo-data/sstr-calibration/case.json");
        try (PanelHarness h = new PanelHarness(1100, 720, demo)) {
            SignalView v = (SignalView) h.open(new SignalPanel());
            assertTrue(h.pumpUntil(() -> v.modelValues().length > 0, 20_000), "a model is drawn: " + v.statusText());
            h.screenshot("signal-sstr");
            double[] y = v.modelValues();
            assertEquals(SignalCurve.MODEL_POINTS, y.length);
            double slope = (y[y.length - 1] - y[0]) / (y.length - 1);
            for (int i = 1; i < y.length; i++) {
                assertEquals(slope, y[i] - y[i - 1], 1e-9 * Math.abs(y[y.length - 1]), "linear in power at " + i);
            }
        }
    }

    /**
     * A dataset measured on another sample is drawn with that sample's stack and times the gain it names: in the SSTR
     * demo the unknown's ceramic (Λ 5 W/(m K) as written) under the same transducer rises less than the glass
     * reference (Λ 1.38), and a gain of 0.5 halves the curve.
     */
    @Test
    void eachDatasetIsDrawnWithItsSampleAndItsGain() throws Exception {
        Path demo = Path.of("../../demo-data/sstr-calibration/case.json");
        try (PanelHarness h = new PanelHarness(1100, 720, demo)) {
            SignalView v = (SignalView) h.open(new SignalPanel());
            assertTrue(h.pumpUntil(() -> v.modelValues().length > 0, 20_000), "a model is drawn: " + v.statusText());
            double[] reference = v.modelValues();
            v.picker().select(1);
            assertTrue(h.pumpUntil(() -> !Arrays.equals(reference, v.modelValues()), 20_000),
                    "the unknown sample's curve: " + v.statusText());
            double[] unknown = v.modelValues();
            double ratio = unknown[unknown.length - 1] / reference[reference.length - 1];
            assertTrue(ratio > 0.2 && ratio < 0.6, "the better conductor rises less: " + ratio);
            h.workbench.project().set(lamella.api.ParameterRef.gain("probe"), 0.5);
            assertTrue(h.pumpUntil(() -> !Arrays.equals(unknown, v.modelValues()), 20_000), v.statusText());
            assertEquals(0.5 * unknown[unknown.length - 1], v.modelValues()[unknown.length - 1],
                    1e-9 * unknown[unknown.length - 1], "the gain multiplies the curve");
        }
    }
}
