package lamella.fit;

import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import lamella.api.CaseDocument;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.Progress;

/**
 * Prints the time of the two fits {@code lamella benchmark} times — a two-parameter FDTR fit of 30 points and a joint
 * three-parameter TDTR fit at two modulation frequencies, on synthetic data the model makes — with the number of
 * model evaluations each takes and its fitted values, outside OSGi. A benchmark, not a test: run by bench/fit-speed.
 * Arguments: [RUNS [THREADS]].
 */
public final class FitBench {

    private static final String STACK = """
            "stack": {"layers": [
              {"name": "cap", "thickness_m": 9e-8, "k_through_w_mk": 200, "heat_capacity_j_m3k": 2.45e6,
               "conductance_below_w_m2k": %s},
              {"name": "film", "thickness_m": 3.5e-7, "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.65e6},
              {"name": "base", "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.63e6}]},
            "geometry": {"type": "gaussian", "pump_radius_m": 6e-6, "probe_radius_m": 4e-6}""";

    /**
     * Warm-up before timing: at least this many runs and this long, so that the JIT has compiled the model's hot
     * loops (with 5 runs only, the median of 15 still included partly compiled code and read 40 % slow).
     */
    private static final int WARM_UP = 5;
    private static final long WARM_UP_NANOS = 3_000_000_000L;

    private FitBench() {
    }

    public static void main(String[] args) throws Exception {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 15;
        int threads = args.length > 1 ? Integer.parseInt(args[1]) : Runtime.getRuntime().availableProcessors();
        Path dir = Files.createTempDirectory("lamella-fit-bench");
        try {
            String truth = STACK.formatted(1.2e8, 1.4, 140);
            data(dir, truth, "\"measurement\": {\"type\": \"fdtr\"}", "fdtr.csv", "frequency_hz",
                    Synthetic.logSpaced(1e4, 2e7, 30), "phase_deg", 0.1, 30);
            data(dir, truth, tdtr(9e6), "tdtr-9mhz.csv", "delay_s", Synthetic.logSpaced(1e-10, 4e-9, 40), "ratio",
                    0.01, 49);
            data(dir, truth, tdtr(1e6), "tdtr-1mhz.csv", "delay_s", Synthetic.logSpaced(1e-10, 4e-9, 40), "ratio",
                    0.01, 53);
            String start = STACK.formatted(5e7, 3.0, 100);
            CaseDocument fdtr = Synthetic.readExisting(Files.writeString(dir.resolve("fdtr-case.json"), "{" + start
                    + ", \"measurement\": {\"type\": \"fdtr\"}, \"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}],"
                    + " \"free\": [{\"layer\": \"film\", \"property\": \"k_through_w_mk\"},"
                    + "{\"layer\": \"cap\", \"property\": \"conductance_below_w_m2k\"}]}}"));
            CaseDocument joint = Synthetic.readExisting(Files.writeString(dir.resolve("tdtr-case.json"), "{" + start
                    + ", " + tdtr(9e6) + ", \"fit\": {\"datasets\": [{\"data\": \"tdtr-9mhz.csv\"},"
                    + " {\"data\": \"tdtr-1mhz.csv\", \"measurement\": {"
                    + tdtr(1e6).substring(tdtr(1e6).indexOf('{') + 1) + "}], \"free\": ["
                    + "{\"layer\": \"film\", \"property\": \"k_through_w_mk\"},"
                    + "{\"layer\": \"cap\", \"property\": \"conductance_below_w_m2k\"},"
                    + "{\"layer\": \"base\", \"property\": \"k_through_w_mk\"}]}}"));
            FitSettings settings = FitSettings.defaults().withThreads(threads);
            Fitter fitter = Synthetic.fitter();
            System.out.println("fits outside OSGi, " + threads + " thread(s), " + runs + " runs after at least " + WARM_UP
                    + " warm-up runs and " + WARM_UP_NANOS / 1_000_000_000L + " s"
                    + "; load average " + load());
            time("FDTR fit, 2 free, 30 points", runs, () -> fitter.fit(fdtr, settings, Progress.NONE));
            time("joint TDTR fit, 2 frequencies, 3 free, 80 points", Math.max(3, runs / 3),
                    () -> fitter.fit(joint, settings, Progress.NONE));
        } finally {
            try (var files = Files.walk(dir)) {
                for (Path p : files.sorted(java.util.Comparator.reverseOrder()).toList()) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    private interface Fit {
        FitOutcome run() throws Exception;
    }

    private static void time(String label, int runs, Fit fit) throws Exception {
        FitOutcome o = null;
        long warmUpStart = System.nanoTime();
        for (int i = 0; i < WARM_UP || System.nanoTime() - warmUpStart < WARM_UP_NANOS; i++) {
            o = fit.run();
        }
        double[] ms = new double[runs];
        double[] cpu = new double[runs];
        for (int i = 0; i < runs; i++) {
            long c0 = cpuTime();
            long t0 = System.nanoTime();
            o = fit.run();
            ms[i] = (System.nanoTime() - t0) / 1e6;
            cpu[i] = (cpuTime() - c0) / 1e6;
        }
        Arrays.sort(ms);
        Arrays.sort(cpu);
        StringBuilder values = new StringBuilder();
        for (FittedParameter p : o.parameters()) {
            values.append(String.format(Locale.ROOT, "  %s = %.6g ± %.3g", p.label(), p.value(), p.sigma()));
        }
        System.out.println(String.format(Locale.ROOT, "  %-50s median %7.1f ms   fastest %7.1f ms   process CPU:"
                + " median %7.1f ms   %d model evaluations", label, ms[runs / 2], ms[0], cpu[runs / 2],
                o.evaluations()));
        System.out.println("   " + values);
    }

    private static String tdtr(double modulation) {
        return "\"measurement\": {\"type\": \"tdtr\", \"modulation_hz\": " + modulation + ", \"repetition_hz\": 7.6e7}";
    }

    private static void data(Path dir, String stackAndGeometry, String measurement, String file, String xColumn,
                             double[] x, String signal, double noise, long seed) throws Exception {
        double[] y = Synthetic.model(dir, "{" + stackAndGeometry + ", " + measurement + "}", x, signal);
        java.util.Random rng = new java.util.Random(seed);
        StringBuilder sb = new StringBuilder(xColumn + "," + signal + "\n");
        for (int i = 0; i < x.length; i++) {
            double s = signal.equals("ratio") ? noise * y[i] : noise;
            sb.append(String.format(Locale.ROOT, "%.12e,%.12e%n", x[i], y[i] + s * rng.nextGaussian()));
        }
        Files.writeString(dir.resolve(file), sb.toString());
    }

    /**
     * CPU time of this process, ns: less disturbed than wall time by other work on the machine (includes the JIT
     * compiler's and the collector's, small once warm).
     */
    private static long cpuTime() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    private static String load() {
        try {
            return Files.readString(Path.of("/proc/loadavg")).split(" ")[0];
        } catch (Exception e) {
            return "unknown";
        }
    }
}
