package lamella.cli;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import lamella.api.Block;
import lamella.api.BottomBoundary;
import lamella.api.CaseFormat;
import lamella.api.FileProblems;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.ModelEvaluationException;
import lamella.api.Simulation;
import lamella.api.Stack;
import lamella.api.StackKernels;
import lamella.api.Technique;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.fit.FitService;
import lamella.api.plan.PlanService;
import lamella.api.guard.LiveModels;
import org.osgi.framework.ServiceReference;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;

/**
 * {@code lamella benchmark}: times the model on one thread through the live services — an FDTR curve of 200
 * frequencies and a TDTR curve of 50 delays on a three-layer stack — and prints the figures. Speed is measured here,
 * never asserted in a unit test.
 */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + BenchmarkCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + BenchmarkCommand.SUMMARY})
public final class BenchmarkCommand implements Command {

    static final String NAME = "benchmark";
    static final String SUMMARY = "Times the model (FDTR and TDTR curves) on one thread and the fits and Monte Carlo on all cores.";

    private static final int WARM_UP = 30;
    private static final int RUNS = 60;

    private final LiveModels models = new LiveModels();

    @Reference
    private StackKernels kernels;

    @Reference
    private CaseFormat caseFormat;

    @Reference
    private FitService fitter;

    @Reference
    private PlanService planner;

    /** With the service's reference, so that a failure can name the bundle that registered it. */
    @Reference(service = HeatingGeometry.class, cardinality = ReferenceCardinality.MULTIPLE,
            policy = ReferencePolicy.DYNAMIC, unbind = "removeGeometry")
    void addGeometry(ServiceReference<HeatingGeometry> reference, HeatingGeometry g) {
        models.add(g, Origins.of(reference));
    }

    void removeGeometry(HeatingGeometry g) {
        models.remove(g);
    }

    @Reference(service = Technique.class, cardinality = ReferenceCardinality.MULTIPLE,
            policy = ReferencePolicy.DYNAMIC, unbind = "removeTechnique")
    void addTechnique(ServiceReference<Technique> reference, Technique t) {
        models.add(t, Origins.of(reference));
    }

    void removeTechnique(Technique t) {
        models.remove(t);
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public String summary() {
        return SUMMARY;
    }

    @Override
    public String usage() {
        return """
                usage: lamella benchmark [plan]

                Times, on the calling thread, an FDTR curve of 200 modulation frequencies (1 kHz-100 MHz) and a
                TDTR curve of 50 delays (100 ps-5 ns, 9 MHz modulation, 76 MHz repetition) for a metal transducer
                on an oxide film on a crystalline substrate, with Gaussian beams. Prints the median and fastest
                of %d runs after %d warm-up runs. Then, on synthetic data the model makes, times a two-parameter
                FDTR fit of 30 points, a joint three-parameter fit of TDTR at two modulation frequencies, and 1000
                Monte Carlo refits of the FDTR fit, on all cores. Also times 200 frequencies (1 kHz-10 MHz) on a
                ring of 1 mm radius, thin and 2 um wide, read by a 3 um probe at its centre (median of 5 runs).
                Last, grids of 400 experiment plans (TDTR and FDTR, 3 free and 4 uncertain inputs) on all cores;
                "lamella benchmark plan" times only those.
                """.formatted(RUNS, WARM_UP);
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        boolean plansOnly = args.equals(List.of("plan"));
        if (!args.isEmpty() && !plansOnly) {
            io.err().println("lamella benchmark: takes no arguments, or \"plan\" for the experiment plans alone");
            return BAD_INPUT;
        }
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        try {
            if (plansOnly) {
                PlanBenchmark.run(io, caseFormat, planner, threads);
                return OK;
            }
            Stack stack = new Stack(List.of(
                    Layer.isotropicInPlane("transducer", 9e-8, 200, 200, 2.45e6).withConductanceBelow(1.2e8),
                    Layer.isotropicInPlane("film", 3.5e-7, 1.4, 1.4, 1.65e6),
                    Layer.isotropicInPlane("substrate", Double.POSITIVE_INFINITY, 140, 140, 1.63e6)),
                    BottomBoundary.SEMI_INFINITE);
            Block beams = block("geometry", Map.of("type", "gaussian", "pump_radius_m", 6e-6,
                    "probe_radius_m", 4e-6));
            Block fdtr = block("measurement", Map.of("type", "fdtr", "frequencies_hz", logSpaced(1e3, 1e8, 200)));
            Block tdtr = block("measurement", Map.of("type", "tdtr", "modulation_hz", 9e6, "repetition_hz", 7.6e7,
                    "delays_s", logSpaced(1e-10, 5e-9, 50)));
            io.out().println("lamella benchmark: one thread, " + RUNS + " runs after " + WARM_UP + " warm-up runs");
            report(io, "FDTR curve, 200 frequencies, 3 layers", models.catalog(kernels).simulation(stack, beams, fdtr));
            report(io, "TDTR curve, 50 delays, 3 layers", models.catalog(kernels).simulation(stack, beams, tdtr));
            rings(io);
            FitBenchmark.run(io, caseFormat, fitter, models.catalog(kernels), threads);
            PlanBenchmark.run(io, caseFormat, planner, threads);
            return OK;
        } catch (IOException e) {
            io.err().println("lamella benchmark: cannot write its temporary data: " + FileProblems.reason(e));
            return FAILED;
        } catch (InputException e) {
            io.err().println("lamella benchmark: the built-in cases need the gaussian geometry and the fdtr and tdtr"
                    + " techniques: " + e.getMessage());
            return FAILED;
        } catch (ModelEvaluationException e) {
            io.err().println("lamella benchmark: cannot evaluate the built-in cases: " + e.getMessage());
            return FAILED;
        }
    }

    /** Large rings (annular beams, ring heaters) cost the most per frequency: 200 frequencies at R = 1 mm. */
    private void rings(CommandIO io) throws InputException {
        Stack metalOnGlass = new Stack(List.of(
                Layer.isotropicInPlane("transducer", 8e-8, 180, 180, 2.42e6),
                Layer.isotropicInPlane("glass", Double.POSITIVE_INFINITY, 1.38, 1.38, 1.6e6)),
                BottomBoundary.SEMI_INFINITE);
        Block fdtr = block("measurement", Map.of("type", "fdtr", "frequencies_hz", logSpaced(1e3, 1e7, 200)));
        for (double width : new double[] {0, 2e-6}) {
            Block ring = block("geometry", Map.of("type", "ring", "ring_radius_m", 1e-3, "ring_width_m", width,
                    "probe_radius_m", 3e-6));
            Simulation s = models.catalog(kernels).simulation(metalOnGlass, ring, fdtr);
            s.run();
            double[] ms = new double[5];
            for (int i = 0; i < ms.length; i++) {
                long t0 = System.nanoTime();
                s.run();
                ms[i] = (System.nanoTime() - t0) / 1e6;
            }
            Arrays.sort(ms);
            io.out().println(String.format(Locale.ROOT, "  %-40s median %8.3f ms   fastest %8.3f ms",
                    "ring R 1 mm, width " + (width == 0 ? "0" : "2 um") + ", 200 frequencies", ms[2], ms[0]));
        }
    }

    private static void report(CommandIO io, String label, Simulation s) {
        for (int i = 0; i < WARM_UP; i++) {
            s.run();
        }
        double[] ms = new double[RUNS];
        for (int i = 0; i < RUNS; i++) {
            long t0 = System.nanoTime();
            s.run();
            ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        Arrays.sort(ms);
        io.out().println(String.format(Locale.ROOT, "  %-40s median %8.3f ms   fastest %8.3f ms", label,
                ms[RUNS / 2], ms[0]));
    }

    private static List<Object> logSpaced(double from, double to, int n) {
        List<Object> v = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            v.add(from * Math.pow(to / from, (double) i / (n - 1)));
        }
        return v;
    }

    private static Block block(String path, Map<String, Object> values) {
        return new Block(path, new LinkedHashMap<>(values));
    }
}
