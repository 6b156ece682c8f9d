package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import lamella.api.InputException;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Rows a fit leaves out: those the data file marks excluded or outlier (conditioning marks and never drops), those
 * outside a dataset's {@code x_range} and inside its {@code exclude} ranges. The data are the model's own, two rows
 * ruined and marked; the oracle is the fit of a file that never had those rows (common practice, no source).
 */
class RowSelectionTest {

    private static final double TRUE_K = 1.4;
    private static final String BASE = "{" + Synthetic.STACK.formatted(1.2e8, 1.0) + ","
            + "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 6e-6, \"probe_radius_m\": 4e-6},"
            + "\"measurement\": {\"type\": \"fdtr\"},\n\"fit\": {\"datasets\": [%s],"
            + " \"free\": [{\"layer\": \"film\", \"property\": \"k_through_w_mk\"}]}}";

    @TempDir
    Path dir;
    private double[] f;

    @BeforeEach
    void data() throws Exception {
        f = Synthetic.logSpaced(1e4, 1e7, 16);
        String truth = "{" + Synthetic.STACK.formatted(1.2e8, TRUE_K) + ","
                + "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 6e-6, \"probe_radius_m\": 4e-6},"
                + "\"measurement\": {\"type\": \"fdtr\"}}";
        double[] clean = Synthetic.model(dir, truth, f, "phase_deg");
        StringBuilder sb = new StringBuilder("frequency_hz,phase_deg,sigma_phase_deg,outlier,excluded\n");
        StringBuilder kept = new StringBuilder("frequency_hz,phase_deg,sigma_phase_deg\n");
        for (int i = 0; i < f.length; i++) {
            boolean ruined = i == 5;
            boolean first = i == 0;
            String row = String.format(Locale.ROOT, ",%.12e,0.05", clean[i] + (ruined ? 25.0 : first ? -30.0 : 0.0));
            sb.append(f[i]).append(row).append(ruined ? ",1" : ",0").append(first ? ",1\n" : ",0\n");
            if (!ruined && !first) {
                kept.append(f[i]).append(row).append('\n');
            }
        }
        Files.writeString(dir.resolve("marked.csv"), sb.toString());
        Files.writeString(dir.resolve("kept.csv"), kept.toString());
    }

    private FitOutcome fit(String dataset) throws Exception {
        return Synthetic.fitter().fit(Synthetic.read(dir, BASE.formatted(dataset)), FitSettings.defaults(),
                Progress.NONE);
    }

    @Test
    void rowsTheFileMarksAreLeftOutSoTheRuinedOnesDoNotPullTheFit() throws Exception {
        FitOutcome o = fit("{\"data\": \"marked.csv\"}");
        DatasetFit d = o.datasets().get(0);
        assertEquals(14, d.x().length, "16 rows, one marked outlier and one excluded");
        assertFalse(contains(d.x(), f[0]) || contains(d.x(), f[5]));
        FitOutcome without = fit("{\"data\": \"kept.csv\"}");
        assertEquals(without.parameters().get(0).value(), o.parameters().get(0).value(), 1e-9,
                "the same fit as of a file without the marked rows");
        assertEquals(TRUE_K, o.parameters().get(0).value(), 0.01 * TRUE_K, "near the conductivity the data were"
                + " made with (their in-plane conductivity differs, so not exactly)");
    }

    @Test
    void aDatasetsRangeAndExclusionsLeaveOutTheirRowsEndsIncluded() throws Exception {
        FitOutcome o = fit("{\"data\": \"marked.csv\", \"x_range\": [" + f[1] + ", " + f[12] + "],"
                + " \"exclude\": [[" + f[3] + ", " + f[4] + "]]}");
        double[] x = o.datasets().get(0).x();
        assertEquals(List.of(f[2], f[6], f[7], f[8], f[9], f[10], f[11]), boxed(x).subList(1, 8));
        assertEquals(f[1], x[0]);
        assertEquals(f[12], x[x.length - 1]);
        assertEquals(9, x.length, "rows 1..12 less 3, 4 (excluded range) and 5 (outlier)");
    }

    @Test
    void aDatasetCanTakeItsWeightsFromItsResidualsAlone() throws Exception {
        FitOutcome data = fit("{\"data\": \"marked.csv\"}");
        assertTrue(data.datasets().get(0).sigmaFromData());
        FitOutcome residuals = fit("{\"data\": \"marked.csv\", \"weights\": \"residuals\"}");
        assertFalse(residuals.datasets().get(0).sigmaFromData());
    }

    @Test
    void badRangesAreErrorsAtTheirPath() {
        InputException reversed = assertThrows(InputException.class,
                () -> fit("{\"data\": \"marked.csv\", \"x_range\": [1e6, 1e4]}"));
        assertEquals("fit.datasets[0].x_range", reversed.path());
        InputException shape = assertThrows(InputException.class,
                () -> fit("{\"data\": \"marked.csv\", \"exclude\": [1e4, 1e5]}"));
        assertEquals("fit.datasets[0].exclude[0]", shape.path());
        InputException empty = assertThrows(InputException.class,
                () -> fit("{\"data\": \"marked.csv\", \"x_range\": [1e8, 1e9]}"));
        assertEquals("fit.datasets[0]", empty.path());
        assertTrue(empty.getMessage().contains("no row of marked.csv is left to fit"), empty.getMessage());
        InputException weights = assertThrows(InputException.class,
                () -> fit("{\"data\": \"marked.csv\", \"weights\": \"sigma\"}"));
        assertEquals("fit.datasets[0].weights", weights.path());
    }

    private static boolean contains(double[] xs, double v) {
        for (double x : xs) {
            if (x == v) {
                return true;
            }
        }
        return false;
    }

    private static List<Double> boxed(double[] xs) {
        return java.util.Arrays.stream(xs).boxed().toList();
    }
}
