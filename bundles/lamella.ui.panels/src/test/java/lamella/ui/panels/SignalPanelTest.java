package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

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
}
