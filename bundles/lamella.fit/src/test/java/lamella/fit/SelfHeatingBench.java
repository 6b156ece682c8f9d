package lamella.fit;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.SelfHeating;
import lamella.api.Simulation;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.Progress;
import lamella.casefile.CaseFileReader;

/**
 * Prints what self-heating costs: the time to build and run one FDTR simulation of 200 frequencies (a metal cap, an
 * oxide film and a library substrate whose conductivity falls with temperature, an invented table) with and without a
 * {@code self_heating} block, the rise and the evaluations of the 0 Hz response it takes to settle, and a two-free
 * fit of 30 points both ways (wall time, model evaluations, values ± σ). A benchmark, not a test: run by
 * bench/self-heating. Arguments: [RUNS].
 */
public final class SelfHeatingBench {

    private static final String CASE = """
            %s"stack": {"layers": [
              {"name": "cap", "thickness_m": 9e-8, "k_through_w_mk": 200, "heat_capacity_j_m3k": 2.45e6,
               "conductance_below_w_m2k": %s},
              {"name": "film", "thickness_m": 3.5e-7, "k_through_w_mk": %s, "heat_capacity_j_m3k": 1.65e6},
              {"name": "base", "material": "falling-crystal"}]},
            "geometry": {"type": "gaussian", "pump_radius_m": 6e-6, "probe_radius_m": 4e-6},
            "measurement": {"type": "fdtr"%s}""";

    private static final String POWER = "\"self_heating\": {\"absorbed_power_w\": 0.02},";
    private static final int WARM_UP = 5;

    private SelfHeatingBench() {
    }

    public static void main(String[] args) throws Exception {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 15;
        Path dir = Files.createTempDirectory("lamella-self-heating-bench");
        try {
            CaseFileReader reader = new CaseFileReader();
            reader.addLibrary(new SelfHeatingTest.Library(SelfHeatingTest.LIBRARY, List.of(
                    SelfHeatingTest.material("falling-crystal", lamella.api.material.TemperatureCurve.table(
                            new double[] {250, 300, 400, 500}, new double[] {190, 150, 105, 80}),
                            lamella.api.material.TemperatureCurve.constant(1.63e6, 250, 500))), List.of()));
            String frequencies = ", \"frequencies_hz\": " + Arrays.toString(Synthetic.logSpaced(1e4, 2e7, 200));
            CaseDocument plain = reader.read(Files.writeString(dir.resolve("plain.json"),
                    "{" + CASE.formatted("", 1.2e8, 1.4, frequencies) + "}"));
            CaseDocument heated = reader.read(Files.writeString(dir.resolve("heated.json"),
                    "{" + CASE.formatted(POWER, 1.2e8, 1.4, frequencies) + "}"));
            SelfHeating.Outcome h = simulation(heated).heating().orElseThrow();
            System.out.printf(Locale.ROOT, "self-heating at 20 mW: rise %.4f K after %d evaluations of the 0 Hz"
                    + " response; substrate Λ %.3f -> %.3f W/(m K)%n", h.riseK(), h.iterations(),
                    plain.stack().layers().get(2).kThrough(), h.stack().layers().get(2).kThrough());
            System.out.printf(Locale.ROOT, "simulate, 200 frequencies, 3 layers: without %s ms, with self-heating %s"
                    + " ms (median, fastest of %d)%n", time(plain, runs), time(heated, runs), runs);
            double[] f = Synthetic.logSpaced(1e4, 2e7, 30);
            for (boolean on : new boolean[] {false, true}) {
                String power = on ? POWER : "";
                CaseDocument truth = reader.read(Files.writeString(dir.resolve("truth.json"),
                        "{" + CASE.formatted(power, 1.2e8, 1.4, "") + "}"));
                double[] clean = simulation(truth).run(f).column("phase_deg");
                Synthetic.data(dir.resolve("fdtr.csv"), "frequency_hz", f, "phase_deg", clean, 0.1, 30, true);
                CaseDocument fit = reader.read(Files.writeString(dir.resolve("fit.json"), "{" + CASE.formatted(power,
                        5e7, 3.0, "") + ", \"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": ["
                        + "{\"layer\": \"film\", \"property\": \"k_through_w_mk\"},"
                        + "{\"layer\": \"cap\", \"property\": \"conductance_below_w_m2k\"}]}}"));
                Fitter fitter = Synthetic.fitter();
                double[] ms = new double[runs];
                FitOutcome o = null;
                for (int i = -WARM_UP; i < runs; i++) {
                    long t0 = System.nanoTime();
                    o = fitter.fit(fit, FitSettings.defaults(), Progress.NONE);
                    if (i >= 0) {
                        ms[i] = (System.nanoTime() - t0) / 1e6;
                    }
                }
                Arrays.sort(ms);
                StringBuilder values = new StringBuilder();
                for (FittedParameter p : o.parameters()) {
                    values.append(String.format(Locale.ROOT, " %s = %.5g ± %.2g", p.ref(), p.value(), p.sigma()));
                }
                System.out.printf(Locale.ROOT, "FDTR 2-free fit, 30 points, %s: %.1f ms median, %.1f ms fastest, %d"
                        + " model evaluations;%s%n", on ? "self-heating at 20 mW" : "without self-heating",
                        ms[runs / 2], ms[0], o.evaluations(), values);
            }
        } finally {
            try (var files = Files.list(dir)) {
                for (Path p : files.toList()) {
                    Files.delete(p);
                }
            }
            Files.delete(dir);
        }
    }

    private static Simulation simulation(CaseDocument doc) throws Exception {
        return new CaseModel(doc.stack(), doc.geometry(), doc.measurement()).simulation(Synthetic.CATALOG);
    }

    private static String time(CaseDocument doc, int runs) throws Exception {
        double[] ms = new double[runs];
        for (int i = -WARM_UP; i < runs; i++) {
            long t0 = System.nanoTime();
            simulation(doc).run();
            if (i >= 0) {
                ms[i] = (System.nanoTime() - t0) / 1e6;
            }
        }
        Arrays.sort(ms);
        return String.format(Locale.ROOT, "%.2f, %.2f", ms[runs / 2], ms[0]);
    }
}
