package lamella.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Comparator;
import java.util.Locale;
import java.util.Random;
import java.util.stream.Stream;
import lamella.api.CaseDocument;
import lamella.api.CaseFormat;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ModelCatalog;
import lamella.api.command.CommandIO;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitService;
import lamella.api.fit.FitSettings;
import lamella.api.fit.Progress;

/**
 * Fit timings on synthetic data the model makes (seeded noise, in a temporary folder deleted afterwards): a
 * two-parameter FDTR fit of 30 points, a joint three-parameter fit of TDTR at two modulation frequencies, and 1000
 * Monte Carlo refits of the FDTR case.
 */
final class FitBenchmark {

    private static final String STACK = """
            "stack": {"layers": [
              {"name": "cap", "thickness_m": 9e-8, "k_through_w_mk": 200, "heat_capacity_j_m3k": 2.45e6,
               "conductance_below_w_m2k": %s},
              {"name": "film", "thickness_m": 3.5e-7, "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.65e6},
              {"name": "base", "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.63e6}]},
            "geometry": {"type": "gaussian", "pump_radius_m": 6e-6, "probe_radius_m": 4e-6}""";

    private FitBenchmark() {
    }

    static void run(CommandIO io, CaseFormat format, FitService fitter, ModelCatalog catalog, int threads)
            throws IOException, InputException {
        Path dir = Files.createTempDirectory("lamella-benchmark");
        try {
            String truth = STACK.formatted(1.2e8, 1.4, 140);
            data(dir, truth, "\"measurement\": {\"type\": \"fdtr\"}", "fdtr.csv", "frequency_hz",
                    logSpaced(1e4, 2e7, 30), "phase_deg", 0.1, catalog, format);
            data(dir, truth, tdtr(9e6), "tdtr-9mhz.csv", "delay_s", logSpaced(1e-10, 4e-9, 40), "ratio", 0.01,
                    catalog, format);
            data(dir, truth, tdtr(1e6), "tdtr-1mhz.csv", "delay_s", logSpaced(1e-10, 4e-9, 40), "ratio", 0.01,
                    catalog, format);
            String start = STACK.formatted(5e7, 3.0, 100);
            CaseDocument fdtr = write(dir, "fdtr-case.json", "{" + start + ", \"measurement\": {\"type\": \"fdtr\"},"
                    + " \"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": ["
                    + "{\"layer\": \"film\", \"property\": \"k_through_w_mk\"},"
                    + "{\"layer\": \"cap\", \"property\": \"conductance_below_w_m2k\"}]}}", format);
            CaseDocument joint = write(dir, "tdtr-case.json", "{" + start + ", " + tdtr(9e6) + ","
                    + " \"fit\": {\"datasets\": [{\"data\": \"tdtr-9mhz.csv\"}, {\"data\": \"tdtr-1mhz.csv\","
                    + " \"measurement\": {" + tdtr(1e6).substring(tdtr(1e6).indexOf('{') + 1) + "}], \"free\": ["
                    + "{\"layer\": \"film\", \"property\": \"k_through_w_mk\"},"
                    + "{\"layer\": \"cap\", \"property\": \"conductance_below_w_m2k\"},"
                    + "{\"layer\": \"base\", \"property\": \"k_through_w_mk\"}]}}", format);
            FitSettings settings = FitSettings.defaults().withThreads(threads);
            io.out().println("fits, " + threads + " thread(s):");
            time(io, "FDTR fit, 2 free, 30 points", 15, () -> fitter.fit(fdtr, settings, Progress.NONE));
            time(io, "joint TDTR fit, 2 frequencies, 3 free, 80 points", 5,
                    () -> fitter.fit(joint, settings, Progress.NONE));
            long t0 = System.nanoTime();
            FitOutcome mc = fitter.fit(fdtr, settings.withMonteCarlo(1000).withSeed(7), Progress.NONE);
            double s = (System.nanoTime() - t0) / 1e9;
            io.out().println(String.format(Locale.ROOT, "  %-52s %8.2f s  (σ MC / σ linear: %.2f, %.2f)",
                    "1000 Monte Carlo refits of the FDTR fit", s, mc.monteCarlo().orElseThrow().stdOverLinearised()[0],
                    mc.monteCarlo().orElseThrow().stdOverLinearised()[1]));
        } finally {
            try (Stream<Path> files = Files.walk(dir)) {
                for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    private interface Fit {
        FitOutcome run() throws InputException;
    }

    private static void time(CommandIO io, String label, int runs, Fit fit) throws InputException {
        fit.run();
        double[] ms = new double[runs];
        for (int i = 0; i < runs; i++) {
            long t0 = System.nanoTime();
            fit.run();
            ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        Arrays.sort(ms);
        io.out().println(String.format(Locale.ROOT, "  %-52s median %8.1f ms   fastest %8.1f ms", label,
                ms[runs / 2], ms[0]));
    }

    private static String tdtr(double modulation) {
        return "\"measurement\": {\"type\": \"tdtr\", \"modulation_hz\": " + modulation + ", \"repetition_hz\": 7.6e7}";
    }

    private static void data(Path dir, String stackAndGeometry, String measurement, String file, String xColumn,
                             double[] x, String signal, double noise, ModelCatalog catalog, CaseFormat format)
            throws IOException, InputException {
        CaseDocument doc = write(dir, "truth.json", "{" + stackAndGeometry + ", " + measurement + "}", format);
        double[] y = new CaseModel(doc.stack(), doc.geometry(), doc.measurement()).simulation(catalog).run(x)
                .column(signal);
        Random rng = new Random(x.length * 31L + file.length());
        StringBuilder sb = new StringBuilder(xColumn + "," + signal + "\n");
        for (int i = 0; i < x.length; i++) {
            double s = signal.equals("ratio") ? noise * y[i] : noise;
            sb.append(SignalCsv.number(x[i])).append(',').append(SignalCsv.number(y[i] + s * rng.nextGaussian()))
                    .append('\n');
        }
        Files.writeString(dir.resolve(file), sb.toString());
    }

    private static CaseDocument write(Path dir, String name, String json, CaseFormat format)
            throws IOException, InputException {
        return format.read(Files.writeString(dir.resolve(name), json));
    }

    private static double[] logSpaced(double from, double to, int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = from * Math.pow(to / from, (double) i / (n - 1));
        }
        return v;
    }
}
