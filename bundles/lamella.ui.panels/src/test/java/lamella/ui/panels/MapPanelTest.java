package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.fit.CurveFitService;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Map panel on the invented wafer-map demo: fitted here, drawn, read under the cursor, a position's fit on a
 * click, and map results opened from a file (good and broken). Common practice, no source: the demo's film
 * conductivity is 1.3 W/(m K) away from the edge and the delaminated spot (demo-data/README.md), so the fitted
 * map's median lies near it.
 */
class MapPanelTest {

    static final Path WAFER = Path.of("../../demo-data/wafer-map/case.json");

    @TempDir
    Path dir;

    private static CurveFitService curves(PanelHarness h) {
        return (CurveFitService) h.workbench.fitter().orElseThrow();
    }

    @Test
    void theCaseMapIsFittedHereDrawnReadAndEachPositionShowsItsFit() throws Exception {
        try (PanelHarness h = new PanelHarness(1280, 800, WAFER)) {
            MapView v = (MapView) h.open(new MapPanel(curves(h)));
            assertTrue(h.pumpUntil(() -> v.loaded() != null, 60_000), v.statusText());
            int n = v.loaded().data().positions.size();
            assertTrue(n > 500, "the demo's positions: " + n);
            assertNull(v.results());
            Event click = new Event();
            findFitButton(v).notifyListeners(SWT.Selection, click);
            assertTrue(h.pumpUntil(() -> v.results() != null, 240_000), v.statusText());
            assertTrue(v.statusText().startsWith("Fitted " + n + " positions in "), v.statusText());
            MapResults r = v.results();
            assertEquals(n, r.size());
            double[] k = new double[n];
            int ok = 0;
            for (int i = 0; i < n; i++) {
                if (r.status()[i].equals("ok")) {
                    k[ok++] = r.values()[i][0];
                }
            }
            assertTrue(ok > n * 0.9, r.counts());
            double[] sorted = java.util.Arrays.copyOf(k, ok);
            java.util.Arrays.sort(sorted);
            double median = sorted[ok / 2];
            assertTrue(median > 1.0 && median < 2.0, "median film conductivity " + median);
            assertNotNull(v.mapCanvas().chart(), "the map is drawn");
            assertEquals(2 * r.names().size() + 1, v.showChoice().getItemCount(), "each input, its σ, and χ²");
            h.screenshot("map-1280x800");
            // The read-out and a click at one position.
            int i = n / 2;
            assertEquals(i, r.nearest(r.xM()[i] + 0.2 * r.spacing(), r.yM()[i]));
            assertEquals(-1, r.nearest(r.xM()[i] + 50 * r.spacing(), r.yM()[i] + 50 * r.spacing()),
                    "far outside the map there is no position");
            v.select(i);
            assertTrue(v.positionText().contains(r.names().get(0) + " = "), v.positionText());
            assertTrue(h.pumpUntil(() -> v.curveCanvas().chart() != null, 60_000), v.positionText());
            assertTrue(v.curveCanvas().chart().getTitle().getText().contains("χ²ᵣ"));
            // The σ image and the χ² image.
            v.showChoice().select(1);
            v.showChoice().notifyListeners(SWT.Selection, new Event());
            assertTrue(v.mapCanvas().chart().getTitle().getText().startsWith("1σ of "));
            h.screenshot("map-sigma-1280x800");
        }
    }

    @Test
    void resultsOfAnEarlierMapOpenAndABrokenFileIsRefusedAtItsLine() throws Exception {
        Path good = dir.resolve("map.csv");
        Files.writeString(good, "x_m,y_m,film.k_through_w_mk,sigma_film.k_through_w_mk,reduced_chi_square,status,"
                + "message\n0,0,1.3,0.05,1.1,ok,\n1e-4,0,1.4,0.06,0.9,warning,\"fit hit a bound, then left it\"\n"
                + "2e-4,0,,,,failed,too few points\n");
        try (PanelHarness h = new PanelHarness(1920, 1080, WAFER)) {
            MapView v = (MapView) h.open(new MapPanel(curves(h)));
            v.openResults(good);
            assertTrue(h.pumpUntil(() -> v.results() != null, 30_000), v.statusText());
            MapResults r = v.results();
            assertEquals(3, r.size());
            assertEquals("fit hit a bound, then left it", r.message()[1]);
            assertTrue(Double.isNaN(r.values()[2][0]));
            assertEquals("W/(m K)", r.units().get(0));
            assertTrue(v.statusText().contains("1 ok, 1 with warnings, 1 failed"), v.statusText());
            v.select(1);
            assertTrue(v.positionText().contains(SigmaRounding.valueAndSigma(1.4, 0.06) + " W/(m K)"), v.positionText());
            h.screenshot("map-results-1920x1080");

            Path broken = dir.resolve("broken.csv");
            Files.writeString(broken, "x_m,y_m,film.k_through_w_mk,sigma_film.k_through_w_mk,reduced_chi_square,"
                    + "status,message\n0,0,1.3,0.05,1.1,ok,\n1e-4,0,1.4,0.06\n");
            v.openResults(broken);
            assertTrue(h.pumpUntil(() -> v.statusText().startsWith("These map results cannot be shown"), 30_000),
                    v.statusText());
            assertTrue(v.statusText().contains(broken + ":3: has 4 cells, but the header names 7"), v.statusText());
            assertTrue(v.results() == r, "the map shown stays");
        }
    }

    private static org.eclipse.swt.widgets.Button findFitButton(MapView v) {
        for (org.eclipse.swt.widgets.Control c : ((org.eclipse.swt.widgets.Composite) v.control()).getChildren()) {
            if (c instanceof org.eclipse.swt.widgets.Button b && b.getText().equals("Fit map")) {
                return b;
            }
        }
        throw new AssertionError("no Fit map button");
    }
}
