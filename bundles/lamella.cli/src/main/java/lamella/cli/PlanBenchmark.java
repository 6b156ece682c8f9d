package lamella.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.Locale;
import java.util.stream.Stream;
import lamella.api.CaseDocument;
import lamella.api.CaseFormat;
import lamella.api.InputException;
import lamella.api.command.CommandIO;
import lamella.api.fit.Progress;
import lamella.api.plan.PlanOutcome;
import lamella.api.plan.PlanService;

/**
 * Plan timings: a grid of 400 plans (20 × 20 values of two design variables) for a three-layer stack with three free
 * and four uncertain inputs, measured by TDTR (30 delays) and by FDTR (30 frequencies). Prints the time of the
 * whole grid (the case read, every plan evaluated and ranked) and per plan, after one warm-up run.
 */
final class PlanBenchmark {

    private static final String CASE = """
            {"stack": {"layers": [
              {"name": "cap", "thickness_m": 9e-8, "k_through_w_mk": 200, "heat_capacity_j_m3k": 2.45e6,
               "conductance_below_w_m2k": 1.2e8},
              {"name": "film", "thickness_m": 3.5e-7, "k_through_w_mk": 1.4, "heat_capacity_j_m3k": 1.65e6},
              {"name": "base", "k_through_w_mk": 140, "heat_capacity_j_m3k": 1.63e6}]},
             "geometry": {"type": "gaussian", "pump_radius_m": 6e-6, "probe_radius_m": 4e-6},
             "measurement": %s,
             "fit": {"free": [{"layer": "film", "property": "k_through_w_mk"},
                              {"layer": "cap", "property": "conductance_below_w_m2k"},
                              {"layer": "base", "property": "k_through_w_mk"}],
                     "uncertain": [{"layer": "cap", "property": "thickness_m", "sigma_relative": 0.03},
                                   {"layer": "cap", "property": "heat_capacity_j_m3k", "sigma_relative": 0.02},
                                   {"layer": "film", "property": "heat_capacity_j_m3k", "sigma_relative": 0.03},
                                   {"geometry": "pump_radius_m", "sigma_relative": 0.04}]},
             "plan": {"vary": [%s, {"geometry": "pump_radius_m", "min": 2e-6, "max": 3e-5, "steps": 20}]}}""";

    private PlanBenchmark() {
    }

    static void run(CommandIO io, CaseFormat format, PlanService planner, int threads)
            throws IOException, InputException {
        Path dir = Files.createTempDirectory("lamella-plan-benchmark");
        try {
            CaseDocument tdtr = format.read(Files.writeString(dir.resolve("tdtr.json"), CASE.formatted(
                    "{\"type\": \"tdtr\", \"modulation_hz\": 9e6, \"repetition_hz\": 7.6e7, \"delays_s\": "
                            + list(logSpaced(1e-10, 4e-9, 30)) + "}",
                    "{\"measurement\": \"modulation_hz\", \"min\": 2e5, \"max\": 2e7, \"steps\": 20}")));
            CaseDocument fdtr = format.read(Files.writeString(dir.resolve("fdtr.json"), CASE.formatted(
                    "{\"type\": \"fdtr\", \"frequencies_hz\": " + list(logSpaced(1e4, 2e7, 30)) + "}",
                    "{\"measurement\": \"frequencies_hz\", \"end\": \"last\", \"min\": 2e6, \"max\": 5e7,"
                            + " \"steps\": 20}")));
            double load = java.lang.management.ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage();
            io.out().println("plans, " + threads + " thread(s), 3 layers, 3 free and 4 uncertain inputs (8 model"
                    + " evaluations per plan)" + (load >= 0 ? String.format(Locale.ROOT, ", system load average %.1f",
                    load) : "") + ":");
            time(io, "TDTR, 400 plans (20 modulations × 20 spots), 30 delays", tdtr, planner, threads);
            time(io, "FDTR, 400 plans (20 sweep ends × 20 spots), 30 frequencies", fdtr, planner, threads);
        } finally {
            try (Stream<Path> files = Files.walk(dir)) {
                for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    private static void time(CommandIO io, String label, CaseDocument doc, PlanService planner, int threads)
            throws InputException {
        planner.plan(doc, threads, Progress.NONE);
        long t0 = System.nanoTime();
        PlanOutcome o = planner.plan(doc, threads, Progress.NONE);
        double s = (System.nanoTime() - t0) / 1e9;
        io.out().println(String.format(Locale.ROOT, "  %-58s %7.2f s  (%.1f ms per plan, %d ranked)", label, s,
                1e3 * s / o.plans().size(), o.plans().stream().filter(p -> p.rank() > 0).count()));
    }

    private static String list(double[] v) {
        StringBuilder sb = new StringBuilder("[");
        for (int i = 0; i < v.length; i++) {
            sb.append(i == 0 ? "" : ", ").append(SignalCsv.number(v[i]));
        }
        return sb.append(']').toString();
    }

    private static double[] logSpaced(double from, double to, int n) {
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            v[i] = from * Math.pow(to / from, (double) i / (n - 1));
        }
        return v;
    }
}
