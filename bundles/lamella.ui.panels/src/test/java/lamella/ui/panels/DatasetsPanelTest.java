package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Text;
import org.junit.jupiter.api.Test;

/** The Datasets panel shows every dataset's own settings, rows and σ source, and edits them as undoable steps. */
class DatasetsPanelTest {

    private static void type(PanelHarness h, Text t, String text) {
        t.setFocus();
        t.setText(text);
        t.notifyListeners(SWT.DefaultSelection, new org.eclipse.swt.widgets.Event());
        h.pump(50);
    }

    private static JsonNode dataset(PanelHarness h, int i) {
        return h.workbench.project().tree().path("fit").path("datasets").get(i);
    }

    @Test
    void everyDatasetIsListedWithItsPointsAndTheChosenOnesSettingsAreEditable() throws Exception {
        try (PanelHarness h = new PanelHarness(1280, 760)) {
            DatasetsView v = (DatasetsView) h.open(new DatasetsPanel());
            assertTrue(h.pumpUntil(() -> v.list().getItemCount() == 3 && !v.list().getItem(0).getText(4)
                    .equals("…"), 20_000), "three datasets read");
            assertEquals("0", v.list().getItem(0).getText(0), "numbered as the case file numbers them");
            assertEquals("tdtr-9.8mhz.csv", v.list().getItem(0).getText(1));
            assertEquals("fdtr", v.list().getItem(2).getText(2));
            assertEquals("phase_deg", v.list().getItem(2).getText(3));
            assertTrue(v.list().getItem(0).getText(7).equals("auto: the data"), v.list().getItem(0).getText(7));
            assertTrue(v.statusText().contains("bars: the data's σ"), v.statusText());
            h.screenshot("datasets");

            type(h, v.from(), "200 ps");
            type(h, v.to(), "3 ns");
            JsonNode range = dataset(h, 0).path("x_range");
            assertEquals(2e-10, range.get(0).asDouble(), 1e-22);
            assertEquals(3e-9, range.get(1).asDouble(), 1e-21);
            assertTrue(h.pumpUntil(() -> !v.list().getItem(0).getText(6).equals("none")
                    && !v.list().getItem(0).getText(6).equals("…"), 20_000), v.list().getItem(0).getText(6));
            type(h, v.leftOut(), "1 ns to 1.2 ns");
            assertEquals(1e-9, dataset(h, 0).path("exclude").get(0).get(0).asDouble(), 1e-21);
            assertEquals("set the ranges left out of dataset 0", h.workbench.project().undoName().orElseThrow());
            h.workbench.project().undo();
            assertFalse(dataset(h, 0).has("exclude"));
            h.screenshot("datasets-range");

            v.weights().select(3);
            v.weights().notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
            assertEquals("residuals", dataset(h, 0).path("weights").asText());

            assertFalse(dataset(h, 0).has("measurement"), "dataset 0 takes the case's technique");
            assertFalse(v.technique().field("modulation_hz").text().getEnabled(), "the case's values, greyed");
            v.select(1);
            h.pump(100);
            assertTrue(v.technique().field("modulation_hz").text().getEnabled(), "dataset 1 has its own");
            type(h, v.technique().field("modulation_hz").text(), "1.2 MHz");
            assertEquals(1.2e6, dataset(h, 1).path("measurement").path("modulation_hz").asDouble(), 1e-6);
            assertEquals(9.8e6, h.workbench.project().tree().path("measurement").path("modulation_hz").asDouble(),
                    1e-6, "the case's own block is untouched");
        }
    }

    /** The Datasets panel's room in the default arrangement at 1280×800: every column in view without scrolling. */
    @Test
    void everyColumnOfTheDatasetsTableIsInViewAt1280x800() throws Exception {
        try (PanelHarness h = new PanelHarness(806, 513)) {
            DatasetsView v = (DatasetsView) h.open(new DatasetsPanel());
            assertTrue(h.pumpUntil(() -> v.list().getItemCount() == 3 && !v.list().getItem(0).getText(4)
                    .equals("…"), 20_000), "three datasets read");
            h.pump(200);
            int widths = 0;
            for (org.eclipse.swt.widgets.TableColumn c : v.list().getColumns()) {
                widths += c.getWidth();
            }
            h.screenshot("datasets-806x513");
            assertTrue(widths <= v.list().getClientArea().width, widths + " px of columns in a table "
                    + v.list().getClientArea().width + " px wide");
            for (int c = 0; c < v.list().getColumnCount(); c++) {
                org.eclipse.swt.widgets.TableColumn col = v.list().getColumn(c);
                org.eclipse.swt.graphics.GC gc = new org.eclipse.swt.graphics.GC(v.list());
                try {
                    for (org.eclipse.swt.widgets.TableItem item : v.list().getItems()) {
                        assertTrue(gc.textExtent(item.getText(c)).x < col.getWidth(), "'" + item.getText(c)
                                + "' fits its column " + col.getText());
                    }
                } finally {
                    gc.dispose();
                }
            }
        }
    }
}
