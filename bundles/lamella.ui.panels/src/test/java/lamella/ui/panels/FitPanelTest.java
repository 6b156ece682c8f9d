package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import lamella.api.ParameterRef;
import lamella.api.fit.FittedParameter;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableItem;
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
                    assertEquals(SigmaRounding.valueAndSigma(film.value(), film.sigma()),
                            v.results().getItem(i).getText(1), "the value to the digits its σ allows");
                    assertEquals("W/(m K)", v.results().getItem(i).getText(3));
                    found = true;
                }
            }
            assertTrue(found, "the film's conductivity is in the table");
            Table budget = v.budget();
            TableItem total = budget.getItem(budget.getItemCount() - 1);
            assertEquals("total (in quadrature)", total.getText(0));
            for (int c = 2; c < budget.getColumnCount(); c++) {
                assertTrue(total.getText(c).endsWith("(100 %)"), total.getText(c));
                double shares = 0;
                for (int r = 0; r < budget.getItemCount() - 1; r++) {
                    String cell = budget.getItem(r).getText(c);
                    shares += Double.parseDouble(cell.substring(cell.indexOf('(') + 1, cell.indexOf(" %")));
                }
                assertEquals(100, shares, 0.5 * budget.getItemCount(), "the shares add up to the whole variance");
            }
            assertTrue(v.startButton().getEnabled(), "a new fit can start");
            h.screenshot("fit");

            // The Fit panel's room in the default arrangement at 1280×800: the values and their correlations show
            // every row, the residuals have a tab of their own.
            h.shell.setSize(806, 513);
            h.pump(300);
            h.screenshot("fit-806x513");
            assertTrue(v.resultTabs() != null, "results and residuals on tabs when narrow");
            for (Table t : java.util.List.of(v.results(), v.correlation())) {
                int rows = t.getHeaderHeight() + t.getItemCount() * t.getItemHeight();
                assertTrue(t.getClientArea().height + t.getHeaderHeight() >= rows, "every row of a table has room: "
                        + t.getClientArea() + " for " + t.getItemCount() + " rows");
                org.eclipse.swt.graphics.Rectangle last = t.getItem(t.getItemCount() - 1).getBounds();
                org.eclipse.swt.graphics.Point bottom = t.toDisplay(0, last.y + last.height);
                org.eclipse.swt.widgets.Composite view = t.getParent().getParent();
                org.eclipse.swt.graphics.Point viewBottom = view.toDisplay(0, view.getClientArea().height);
                assertTrue(bottom.y <= viewBottom.y, "the last row is in view without scrolling: " + bottom
                        + " within " + viewBottom);
            }
        }
    }
}
