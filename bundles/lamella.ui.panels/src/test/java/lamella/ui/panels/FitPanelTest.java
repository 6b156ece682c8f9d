package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import lamella.api.ParameterRef;
import lamella.api.fit.FittedParameter;
import org.eclipse.swt.SWT;
import org.junit.jupiter.api.Test;

class FitPanelTest {

    @Test
    void aFitOnTheDemoProjectFinishesAndItsTableShowsTheFittedValues() throws Exception {
        try (PanelHarness h = new PanelHarness(1280, 760)) {
            FitView v = (FitView) h.open(new FitPanel());
            h.screenshot("fit-before");
            v.startButton().notifyListeners(SWT.Selection, null);
            assertTrue(h.pumpUntil(() -> h.workbench.project().lastFit().isPresent()
                    || !h.workbench.messageLog().all().isEmpty(), 300_000) && h.workbench.project().lastFit().isPresent(),
                    "the fit finishes: " + v.statusText() + " " + h.workbench.messageLog().all());
            h.pump(100);
            var outcome = h.workbench.project().lastFit().orElseThrow();
            assertEquals(3, outcome.parameters().size());
            assertEquals(3, v.results().getItemCount());
            FittedParameter film = outcome.parameters().stream()
                    .filter(p -> p.ref().equals(ParameterRef.layer("film", "k_through_w_mk"))).findFirst().orElseThrow();
            boolean found = false;
            for (int i = 0; i < v.results().getItemCount(); i++) {
                if (v.results().getItem(i).getText(0).equals("film · Λ through (isotropic Λ)")) {
                    assertEquals(NumberText.format(film.value()), v.results().getItem(i).getText(1));
                    assertEquals("W/(m K)", v.results().getItem(i).getText(4));
                    found = true;
                }
            }
            assertTrue(found, "the film's conductivity is in the table");
            assertTrue(v.startButton().getEnabled(), "a new fit can start");
            h.screenshot("fit");
        }
    }
}
