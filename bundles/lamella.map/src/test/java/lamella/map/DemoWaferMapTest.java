package lamella.map;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import lamella.api.CaseDocument;
import lamella.api.fit.CurveFit;
import lamella.api.fit.FitOutcome;
import org.junit.jupiter.api.Test;

/**
 * The demo wafer map in demo-data is what {@link WaferMapDemo} makes from the demo case's own model (so it stays
 * true to the model as the model evolves), and its invented features come out of the fit: the delaminated spot's low
 * conductance and the two positions that lost a reading.
 */
class DemoWaferMapTest {

    static final Path FOLDER = Path.of("../../demo-data/wafer-map");

    @Test
    void theCommittedMapIsWhatTheGeneratorMakes() throws Exception {
        List<String> committed = Files.readAllLines(FOLDER.resolve("map.csv"));
        List<String> made = List.of(WaferMapDemo.table(FOLDER.resolve("case.json")).split("\n"));
        assertEquals(made.size(), committed.size());
        for (int i = 0; i < made.size(); i++) {
            String[] a = made.get(i).split(",", -1);
            String[] b = committed.get(i).split(",", -1);
            assertEquals(a.length, b.length, "line " + (i + 1));
            for (int c = 0; c < a.length; c++) {
                if (a[c].equals(b[c])) {
                    continue;
                }
                // the last printed digit may differ where a platform's exp or log rounds the other way
                double x = Double.parseDouble(a[c]);
                double y = Double.parseDouble(b[c]);
                assertTrue(Math.abs(x - y) <= 1e-9 * Math.abs(x), "line " + (i + 1) + ": " + a[c] + " vs " + b[c]);
            }
        }
    }

    @Test
    void theDefectAndTheDropoutsShowInTheFit() throws Exception {
        CaseDocument doc = SyntheticMap.read(FOLDER.resolve("case.json"));
        CurveFit fit = SyntheticMap.fitter().curves(doc, null);
        MapData data = MapData.read(FOLDER.resolve("map.csv"), fit.xColumn(), fit.signal());
        assertEquals(WaferMapDemo.spots().size(), data.positions.size());
        long dropouts = data.positions.stream().filter(p -> p.problem() != null).count();
        assertEquals(2, dropouts);
        for (MapData.Position p : data.positions) {
            double dx = p.xM() - WaferMapDemo.DEFECT_X_M;
            double dy = p.yM() - WaferMapDemo.DEFECT_Y_M;
            double d = Math.sqrt(dx * dx + dy * dy) / WaferMapDemo.DEFECT_RADIUS_M;
            if (d > 2.5 || p.problem() != null) {
                continue;
            }
            FitOutcome o = fit.fit(data.x, p.y(), p.sigma(), null);
            double k = o.parameters().get(0).value();
            double sigma = o.parameters().get(0).sigma();
            double truth = WaferMapDemo.truth(p.xM(), p.yM())[0];
            // invented truth of the demo, checked within 5σ (common practice, no source)
            assertTrue(Math.abs(k - truth) < 5 * sigma, p + ": " + k + " ± " + sigma + " vs " + truth);
        }
    }
}
