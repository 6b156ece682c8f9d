package lamella.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.ModelCatalog;
import lamella.api.fit.FitSettings;
import lamella.cli.BatchManifest;
import lamella.cli.BatchRun;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The batch job on Spark in local mode inside this JVM against the runtime's own batch loop on the same cases: FDTR
 * data made by Lamella's model with seeded noise (invented test data), one case broken on purpose. Both engines fit
 * each case with the same code, so the tables must agree to 1e-9 (common practice, no source).
 */
class BatchJobTest {

    static final double[] FREQUENCIES = {2e4, 6e4, 2e5, 6e5, 2e6, 6e6, 2e7};

    @TempDir
    Path dir;

    @AfterEach
    void clearFault() {
        System.clearProperty(JobSettings.FAIL_TASK);
    }

    static String caseJson(double filmK, String data) {
        return String.format(Locale.ROOT, """
                {
                  "stack": {"layers": [
                    {"name": "transducer", "thickness_m": 9e-8, "k_through_w_mk": 150, "heat_capacity_j_m3k": 2.42e6,
                     "conductance_below_w_m2k": 8e7},
                    {"name": "film", "thickness_m": 5e-7, "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.9e6},
                    {"name": "substrate", "k_through_w_mk": 140, "heat_capacity_j_m3k": 1.63e6}]},
                  "geometry": {"type": "gaussian", "pump_radius_m": 4e-6, "probe_radius_m": 3e-6},
                  "measurement": {"type": "fdtr"},
                  "fit": {
                    "datasets": [{"data": "%s", "signal": "phase_deg"}],
                    "free": [{"layer": "film", "property": "k_through_w_mk", "initial": 1.0, "min": 0.05, "max": 50},
                             {"layer": "transducer", "property": "conductance_below_w_m2k", "initial": 5e7}]
                  }
                }
                """, filmK, data);
    }

    /** A folder of four cases: three with data made at film conductivities 1.3, 2.6 and 0.7, one broken. */
    Path cases() throws Exception {
        Path in = Files.createDirectories(dir.resolve("cases"));
        JobModels models = JobModels.of(JobSettings.fromSystem());
        ModelCatalog catalog = new ModelCatalog(models.services.geometries, models.services.techniques,
                new lamella.engine.Engine());
        double[] truths = {1.3, 2.6, 0.7};
        for (int c = 0; c < truths.length; c++) {
            String name = "film-" + (char) ('a' + c);
            Path truth = Files.writeString(dir.resolve("truth.json"), caseJson(truths[c], "none.csv"));
            CaseDocument doc = models.reader.read(truth);
            double[] phase = new CaseModel(doc.stack(), doc.geometry(), doc.measurement()).simulation(catalog)
                    .run(FREQUENCIES).column("phase_deg");
            SplittableRandom rng = new SplittableRandom(c + 1);
            StringBuilder csv = new StringBuilder("# invented test data: Lamella's model with noise\n"
                    + "frequency_hz,phase_deg,sigma_phase_deg\n");
            for (int i = 0; i < FREQUENCIES.length; i++) {
                csv.append(String.format(Locale.ROOT, "%.12e,%.12e,%.3e%n", FREQUENCIES[i],
                        phase[i] + 0.1 * rng.nextGaussian(), 0.1));
            }
            Files.writeString(in.resolve(name + ".csv"), csv.toString());
            Files.writeString(in.resolve(name + ".json"), caseJson(1.0, name + ".csv"));
        }
        Files.writeString(in.resolve("film-z-broken.json"), caseJson(1.0, "missing.csv"));
        return in;
    }

    SparkRun spark(String... args) {
        return SparkRun.in(dir, args);
    }

    /** The runtime's own batch loop into {@code out}. */
    void local(Path in, Path out) throws Exception {
        JobModels models = JobModels.of(JobSettings.fromSystem());
        new BatchRun(models.reader, models.fitter, FitSettings.defaults(), out,
                new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8))
                .run(BatchManifest.read(in));
    }

    static void assertSameTables(Path expected, Path actual) throws IOException {
        List<String> e = Files.readAllLines(expected);
        List<String> a = Files.readAllLines(actual);
        assertEquals(e.size(), a.size(), String.join("\n", a));
        for (int i = 0; i < e.size(); i++) {
            String[] ec = e.get(i).split(",", -1);
            String[] ac = a.get(i).split(",", -1);
            assertEquals(ec.length, ac.length, a.get(i));
            for (int c = 0; c < ec.length; c++) {
                try {
                    double w = Double.parseDouble(ec[c]);
                    assertEquals(w, Double.parseDouble(ac[c]), 1e-9 * Math.max(1, Math.abs(w)), a.get(i));
                } catch (NumberFormatException text) {
                    assertEquals(ec[c], ac[c], a.get(i));
                }
            }
        }
    }

    static long results(Path out) throws IOException {
        if (!Files.isDirectory(out.resolve("results"))) {
            return 0;
        }
        try (Stream<Path> s = Files.list(out.resolve("results"))) {
            return s.filter(p -> p.getFileName().toString().endsWith(".json")).count();
        }
    }

    @Test
    void everyCaseAsTheLocalBatchDoesItWithTheBrokenOneIsolated() throws Exception {
        Path in = cases();
        local(in, dir.resolve("local"));
        SparkRun r = spark("batch", "cases", "--out", "spark", "--threads", "2");
        assertEquals(1, r.status(), r.err());
        assertTrue(r.out().contains("4 cases: 3 fitted, 0 already done, 1 failed"), r.out());
        assertTrue(r.err().contains("film-z-broken: FAILED") && r.err().contains("missing.csv"), r.err());
        assertSameTables(dir.resolve("local/results.csv"), dir.resolve("spark/results.csv"));
        assertEquals(3, results(dir.resolve("spark")));
        assertEquals(Files.readString(dir.resolve("local/results/film-b.json")).length(),
                Files.readString(dir.resolve("spark/results/film-b.json")).length());
        SparkRun again = spark("batch", "cases", "--out", "spark", "--threads", "2");
        assertTrue(again.out().contains("4 cases: 0 fitted, 3 already done, 1 failed"), again.out());
    }

    @Test
    void aCaseThatFailsItsFirstAttemptIsRetriedAndAFailedRunResumes() throws Exception {
        Path in = cases();
        local(in, dir.resolve("local"));
        System.setProperty(JobSettings.FAIL_TASK, "1");
        SparkRun retried = spark("batch", "cases", "--out", "retried", "--master", "local[2,3]");
        assertEquals(1, retried.status(), retried.err());
        assertSameTables(dir.resolve("local/results.csv"), dir.resolve("retried/results.csv"));
        // No retries: case 3 fails, the job fails after the cases before it are written.
        System.setProperty(JobSettings.FAIL_TASK, "3");
        SparkRun failed = spark("batch", "cases", "--out", "resumed", "--master", "local[1]", "--partitions", "4");
        assertEquals(1, failed.status(), failed.err());
        assertTrue(failed.err().contains("the same command again fits only the rest"), failed.err());
        assertFalse(Files.exists(dir.resolve("resumed/results.csv")), "no table before every case is done");
        assertEquals(3, results(dir.resolve("resumed")));
        System.clearProperty(JobSettings.FAIL_TASK);
        SparkRun resumed = spark("batch", "cases", "--out", "resumed", "--master", "local[2]");
        assertTrue(resumed.out().contains("0 fitted, 3 already done, 1 failed"), resumed.out());
        assertSameTables(dir.resolve("local/results.csv"), dir.resolve("resumed/results.csv"));
    }

    @Test
    void anOutputThatIsAnInputIsRefusedBeforeAnythingRuns() throws Exception {
        Path in = cases();
        SparkRun r = spark("batch", "cases", "--out", "cases");
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains("nothing was written"), r.err());
        SparkRun missing = spark("batch", "no-such-folder", "--out", "x");
        assertEquals(2, missing.status(), missing.err());
        assertTrue(missing.err().contains("no-such-folder"), missing.err());
        assertTrue(Files.isDirectory(in));
    }
}
