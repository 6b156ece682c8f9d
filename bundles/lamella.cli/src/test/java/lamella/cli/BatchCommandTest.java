package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Stream;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.command.CommandIO;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitService;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;
import lamella.api.fit.SensitivityTable;
import lamella.casefile.CaseFileReader;
import lamella.engine.Engine;
import lamella.fit.Fitter;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.technique.fdtr.FrequencyDomain;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code lamella batch} with the real case format and fitter on FDTR data made by Lamella's own model with seeded
 * noise (the inputs are known, so the fitted values can be checked against them; common practice, no source): every
 * result and the table are written, a bad case is isolated, a second run skips what is done, an interrupted run
 * resumes and loses nothing, manifests name, override and are checked with their lines, and an output that is an
 * input is refused.
 */
class BatchCommandTest {

    private static final ModelCatalog CATALOG = new ModelCatalog(List.of(new GaussianBeams()),
            List.of(new FrequencyDomain()), new Engine());
    private static final double[] FREQUENCIES = {2e4, 6e4, 2e5, 6e5, 2e6, 6e6, 2e7};
    private static final double PHASE_SIGMA_DEG = 0.1;

    @TempDir
    Path dir;

    private final CaseFileReader reader = new CaseFileReader();
    private final Fitter fitter = new Fitter(new Engine(), List.of(new GaussianBeams()),
            List.of(new FrequencyDomain()));

    record Run(int status, String out, String err) {
    }

    static String caseJson(double filmK, double pumpRadius, String data) {
        return String.format(Locale.ROOT, """
                {
                  "stack": {"layers": [
                    {"name": "transducer", "thickness_m": 9e-8, "k_through_w_mk": 150, "heat_capacity_j_m3k": 2.42e6,
                     "conductance_below_w_m2k": 8e7},
                    {"name": "film", "thickness_m": 5e-7, "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.9e6},
                    {"name": "substrate", "k_through_w_mk": 140, "heat_capacity_j_m3k": 1.63e6}]},
                  "geometry": {"type": "gaussian", "pump_radius_m": %s, "probe_radius_m": 3e-6},
                  "measurement": {"type": "fdtr"},
                  "fit": {
                    "datasets": [{"data": "%s", "signal": "phase_deg"}],
                    "free": [{"layer": "film", "property": "k_through_w_mk", "initial": 1.0, "min": 0.05, "max": 50},
                             {"layer": "transducer", "property": "conductance_below_w_m2k", "initial": 5e7}]
                  }
                }
                """, filmK, pumpRadius, data);
    }

    /** A case in folder {@code in} whose data were made with film conductivity {@code truth}. */
    private Path sample(Path in, String name, double truth, long seed) throws IOException, InputException {
        Files.createDirectories(in);
        Path truthCase = Files.writeString(dir.resolve("truth-" + name + ".json"), caseJson(truth, 4e-6, "none.csv"));
        CaseDocument doc = reader.read(truthCase);
        double[] phase = new CaseModel(doc.stack(), doc.geometry(), doc.measurement()).simulation(CATALOG)
                .run(FREQUENCIES).column("phase_deg");
        SplittableRandom rng = new SplittableRandom(seed);
        StringBuilder csv = new StringBuilder("# invented test data: Lamella's model with noise\n"
                + "frequency_hz,phase_deg,sigma_phase_deg\n");
        for (int i = 0; i < FREQUENCIES.length; i++) {
            csv.append(String.format(Locale.ROOT, "%.12e,%.12e,%.3e%n", FREQUENCIES[i],
                    phase[i] + PHASE_SIGMA_DEG * rng.nextGaussian(), PHASE_SIGMA_DEG));
        }
        Files.writeString(in.resolve(name + ".csv"), csv.toString());
        return Files.writeString(in.resolve(name + ".json"), caseJson(1.0, 4e-6, name + ".csv"));
    }

    private Path threeCases() throws Exception {
        Path in = dir.resolve("cases");
        sample(in, "a-film", 1.3, 1);
        sample(in, "b-film", 2.6, 2);
        Files.writeString(in.resolve("c-broken.json"), caseJson(1.0, 4e-6, "missing.csv"));
        return in;
    }

    private Run run(FitService service, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        CommandIO io = new CommandIO(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir);
        int status = new BatchCommand(reader, service).run(List.of(args), io);
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private Run run(String... args) {
        return run(fitter, args);
    }

    private List<String> table(Path out) throws IOException {
        return Files.readAllLines(out.resolve("results.csv"));
    }

    private static double value(List<String> table, String caseName, String parameter, int column) {
        for (String line : table) {
            String[] cells = line.split(",");
            if (cells[0].equals(caseName) && cells[1].equals(parameter)) {
                return Double.parseDouble(cells[column]);
            }
        }
        throw new AssertionError("no row " + caseName + " " + parameter + " in " + table);
    }

    @Test
    void fitsEveryCaseOfAFolderAndIsolatesTheBrokenOne() throws Exception {
        Path in = threeCases();
        Run r = run("cases", "--out", "out");

        assertEquals(1, r.status(), "a failed case makes the run's status 1: " + r.err());
        Path out = dir.resolve("out");
        List<String> t = table(out);
        assertEquals(BatchRun.TABLE_HEADER, t.get(0));
        assertEquals(6, t.size(), "two parameters for each fitted case, one row for the failed one: " + t);
        for (String[] c : new String[][] {{"a-film", "1.3"}, {"b-film", "2.6"}}) {
            double k = value(t, c[0], "film.k_through_w_mk", 2);
            double sigma = value(t, c[0], "film.k_through_w_mk", 3);
            // the data were made with this conductivity; a fit within 5σ of it (common practice, no source)
            assertTrue(Math.abs(k - Double.parseDouble(c[1])) < 5 * sigma, c[0] + ": " + k + " ± " + sigma);
            assertTrue(Files.isRegularFile(out.resolve("results/" + c[0] + ".json")));
        }
        String failed = t.stream().filter(l -> l.startsWith("c-broken,")).findFirst().orElseThrow();
        assertTrue(failed.contains(",failed,"), failed);
        assertTrue(failed.contains("missing.csv") && failed.contains("no such file"), failed);
        assertFalse(Files.exists(out.resolve("results/c-broken.json")));
        assertTrue(r.err().contains("batch 3/3 c-broken: FAILED: "), r.err());
        assertTrue(r.err().contains("batch 1/3 a-film: fitted") && r.err().contains("left"), r.err());
        assertTrue(r.out().startsWith("3 cases: 2 fitted, 0 already done, 1 failed"), r.out());
        String json = Files.readString(out.resolve("results/a-film.json"));
        assertTrue(json.contains("\"parameter\" : \"film.k_through_w_mk\""), json);
        assertTrue(json.contains("\"fingerprint\""), json);
        assertTrue(in.resolve("a-film.json").toFile().exists());
    }

    @Test
    void aSecondRunSkipsWhatIsDoneAndRefitsWhatChanged() throws Exception {
        Path in = threeCases();
        run("cases", "--out", "out");
        Path a = dir.resolve("out/results/a-film.json");
        byte[] before = Files.readAllBytes(a);
        FileTime time = FileTime.fromMillis(0);
        Files.setLastModifiedTime(a, time);
        List<String> firstTable = table(dir.resolve("out"));
        Files.writeString(in.resolve("b-film.json"), caseJson(1.0, 4.2e-6, "b-film.csv"));

        Run again = run("cases", "--out", "out");

        assertEquals(1, again.status(), again.err());
        assertTrue(again.err().contains("batch 1/3 a-film: already done"), again.err());
        assertTrue(again.err().contains("batch 2/3 b-film: fitted"), again.err());
        assertTrue(again.out().startsWith("3 cases: 1 fitted, 1 already done, 1 failed"), again.out());
        assertArrayEquals(before, Files.readAllBytes(a));
        assertEquals(time, Files.getLastModifiedTime(a), "a result already done is not written again");
        List<String> t = table(dir.resolve("out"));
        assertEquals(firstTable.get(1), t.get(1), "the table keeps the rows of the cases already done");
        assertTrue(value(t, "b-film", "film.k_through_w_mk", 2) != value(firstTable, "b-film",
                "film.k_through_w_mk", 2), "the changed case was fitted again");
    }

    /** A run stopped in its second case (as by Ctrl-C) keeps the first, leaves no partial file, and resumes. */
    @Test
    void anInterruptedRunResumesAndLosesNothing() throws Exception {
        Path in = dir.resolve("cases");
        for (int i = 0; i < 4; i++) {
            sample(in, "s" + i, 1.0 + i, 10 + i);
        }
        AtomicInteger calls = new AtomicInteger();
        FitService stopsInItsSecondFit = new FitService() {
            @Override
            public FitOutcome fit(CaseDocument doc, FitSettings settings, Progress progress) throws InputException {
                if (calls.incrementAndGet() == 2) {
                    Thread.currentThread().interrupt();
                }
                return fitter.fit(doc, settings, progress);
            }

            @Override
            public SensitivityTable sensitivity(CaseDocument doc, int dataset, String signal) {
                throw new UnsupportedOperationException("not used by batch");
            }
        };
        Run stopped = run(stopsInItsSecondFit, "cases", "--out", "out");
        Thread.interrupted();

        assertEquals(1, stopped.status(), stopped.err());
        assertTrue(stopped.err().contains("interrupted; the cases done so far are kept"), stopped.err());
        Path results = dir.resolve("out/results");
        assertEquals(List.of("s0.json"), list(results), "only the finished case, and nothing half-written");
        assertEquals(3, table(dir.resolve("out")).size(), "the table already holds the finished case");

        Run resumed = run("cases", "--out", "out");

        assertEquals(0, resumed.status(), resumed.err());
        assertTrue(resumed.err().contains("batch 1/4 s0: already done"), resumed.err());
        assertTrue(resumed.out().startsWith("4 cases: 3 fitted, 1 already done, 0 failed"), resumed.out());
        assertEquals(List.of("s0.json", "s1.json", "s2.json", "s3.json"), list(results));
        assertEquals(9, table(dir.resolve("out")).size());
    }

    private static List<String> list(Path folder) throws IOException {
        try (Stream<Path> s = Files.list(folder)) {
            return s.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    @Test
    void aManifestNamesAndOverridesItsCases() throws Exception {
        Path in = dir.resolve("cases");
        sample(in, "m", 1.5, 5);
        Files.writeString(dir.resolve("batch.json"), """
                {"batch_manifest": 1,
                 "cases": [
                   {"case": "cases/m.json", "name": "as-measured"},
                   {"case": "cases/m.json", "name": "wider-pump", "set": {"geometry.pump_radius_m": 6e-6}},
                   {"case": "cases/m.json", "name": "typo",
                    "set": {"film.thicknes_m": 4e-7}}
                 ]}
                """);

        Run r = run("batch.json", "--out", "out");

        assertEquals(1, r.status(), r.err());
        List<String> t = table(dir.resolve("out"));
        double plain = value(t, "as-measured", "film.k_through_w_mk", 2);
        double wider = value(t, "wider-pump", "film.k_through_w_mk", 2);
        assertTrue(Math.abs(plain - wider) > 1e-3 * plain, "the override changed the fit: " + plain + " " + wider);
        String typo = t.stream().filter(l -> l.startsWith("typo,")).findFirst().orElseThrow();
        assertTrue(typo.contains("batch.json:6: cases[2].set.film.thicknes_m: unknown layer property 'thicknes_m'"
                + " (did you mean 'thickness_m'?)"), typo);
        assertTrue(Files.readString(dir.resolve("out/results/wider-pump.json")).contains("\"geometry.pump_radius_m\""));
    }

    @Test
    void aBrokenManifestIsBadInputAtItsLine() throws Exception {
        Files.writeString(dir.resolve("dup.json"), """
                {"batch_manifest": 1,
                 "cases": [
                   {"case": "x/case.json"},
                   {"case": "y/case.json"}
                 ]}
                """);
        Run dup = run("dup.json", "--out", "out");
        assertEquals(2, dup.status());
        assertTrue(dup.err().contains("dup.json:4: cases[1].case: the name 'case' is already used by cases[0]"),
                dup.err());

        Files.writeString(dir.resolve("unknown.json"), "{\"batch_manifest\": 1,\n \"case\": []}\n");
        Run unknown = run("unknown.json", "--out", "out");
        assertEquals(2, unknown.status());
        assertTrue(unknown.err().contains("unknown.json:2: case: unknown key in the manifest (did you mean"
                + " 'cases'?)"), unknown.err());

        Path aCase = sample(dir.resolve("cases"), "k", 1.0, 3);
        Run notManifest = run(dir.relativize(aCase).toString(), "--out", "out");
        assertEquals(2, notManifest.status());
        assertTrue(notManifest.err().contains("not a batch manifest"), notManifest.err());

        Run noOut = run("cases");
        assertEquals(2, noOut.status());
        assertTrue(noOut.err().contains("--out DIR is needed"), noOut.err());
        assertFalse(Files.exists(dir.resolve("out")), "nothing was written");
    }

    @Test
    void anOutputThatIsAnInputIsRefused() throws Exception {
        Path in = dir.resolve("cases");
        sample(in, "r", 1.0, 4);
        Run same = run("cases", "--out", "cases/.");
        assertEquals(2, same.status());
        assertTrue(same.err().contains("is the folder of cases itself"), same.err());

        Path results = Files.createDirectories(dir.resolve("out/results"));
        Path caseInResults = Files.copy(in.resolve("r.json"), results.resolve("r.json"));
        Files.copy(in.resolve("r.csv"), results.resolve("r.csv"));
        byte[] before = Files.readAllBytes(caseInResults);
        Files.writeString(dir.resolve("self.json"), "{\"batch_manifest\": 1, \"cases\": [{\"case\": \"out/results/r.json\"}]}");

        Run self = run("self.json", "--out", "out");

        assertEquals(2, self.status());
        assertTrue(self.err().contains("would overwrite its own input"), self.err());
        assertArrayEquals(before, Files.readAllBytes(caseInResults));
        assertFalse(Files.exists(dir.resolve("out/results.csv")));
    }

    @Test
    void theSparkEngineIsRefusedInsideTheRuntimeWithThePointerToTheScriptAndAnUnknownEngineIsBadUsage()
            throws Exception {
        Path in = threeCases();
        Run spark = run(in.toString(), "--out", "out", "--engine", "spark");
        assertEquals(2, spark.status());
        assertTrue(spark.err().contains("with the lamella script"), spark.err());
        Run other = run(in.toString(), "--out", "out", "--engine", "cluster");
        assertEquals(2, other.status());
        assertTrue(other.err().contains("--engine expects local or spark, got 'cluster'"), other.err());
        assertFalse(Files.exists(dir.resolve("out")), "nothing written");
        Run local = run(in.toString(), "--out", "out", "--engine", "local");
        assertEquals(1, local.status(), local.err());
        assertTrue(Files.isRegularFile(dir.resolve("out/results.csv")));
    }
}
