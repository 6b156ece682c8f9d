package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.Locale;
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

    /** A figure for the report, not a check: edit → new 3-layer FDTR curve drawn, median of repeated edits. */
    @Test
    void liveUpdateLatencyOfAThreeLayerFdtrCurve() throws Exception {
        try (PanelHarness h = new PanelHarness(1100, 720)) {
            SignalView v = (SignalView) h.open(new SignalPanel());
            assertTrue(h.pumpUntil(() -> v.modelValues().length > 0, 20_000), v.statusText());
            v.picker().select(2);
            assertTrue(h.pumpUntil(() -> v.statusText().startsWith("FDTR"), 20_000), v.statusText());
            h.screenshot("signal-fdtr");
            int edits = 15;
            long[] ms = new long[edits];
            for (int i = 0; i < edits; i++) {
                double[] before = v.modelValues();
                long t0 = System.nanoTime();
                h.workbench.project().set(FILM_K, 1.0 + 0.1 * (i + 1));
                h.pumpUntil(() -> !Arrays.equals(before, v.modelValues()), 10_000);
                v.canvas().update();
                ms[i] = (System.nanoTime() - t0) / 1_000_000;
            }
            long[] sorted = ms.clone();
            Arrays.sort(sorted);
            System.out.println(String.format(Locale.ROOT, "LIVE UPDATE 3-layer FDTR (%d model points): median %d ms,"
                    + " max %d ms, all %s", SignalCurve.MODEL_POINTS, sorted[edits / 2], sorted[edits - 1],
                    Arrays.toString(ms)));
        }
    }
}
