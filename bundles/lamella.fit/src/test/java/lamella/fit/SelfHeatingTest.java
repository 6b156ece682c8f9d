package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.RoundingMode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.SelfHeating;
import lamella.api.Simulation;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FitSettings;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.Progress;
import lamella.api.material.Curation;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryInfo;
import lamella.api.material.LibraryTier;
import lamella.api.material.Material;
import lamella.api.material.MaterialLibrary;
import lamella.api.material.MaterialProperty;
import lamella.api.material.MaterialQuantity;
import lamella.api.material.TemperatureCurve;
import lamella.casefile.CaseFileReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Self-heating: library values taken at the case's temperature plus the steady rise of the absorbed power, iterated
 * to consistency. The materials are invented for the test (a glass-like solid whose conductivity is linear in T);
 * they serve as known truth, not as material data.
 */
class SelfHeatingTest {

    static final LibraryInfo LIBRARY = new LibraryInfo("test", "Test library", LibraryTier.FACILITY, "memory", "");
    static final double K300 = 1.4;
    static final double BETA = 0.002;
    static final double W0 = 5e-6;
    static final double W1 = 4e-6;

    @TempDir
    Path dir;

    static Material material(String id, TemperatureCurve k, TemperatureCurve c) {
        Map<MaterialQuantity, MaterialProperty> map = new LinkedHashMap<>();
        map.put(MaterialQuantity.K, new MaterialProperty(MaterialQuantity.K, k, OptionalDouble.of(0.05), "invented",
                ""));
        map.put(MaterialQuantity.HEAT_CAPACITY, new MaterialProperty(MaterialQuantity.HEAT_CAPACITY, c,
                OptionalDouble.of(0.05), "invented", ""));
        return new Material(id, id, List.of(), map, new Curation(1, Optional.empty(), Optional.empty()), "", LIBRARY,
                "memory:1");
    }

    static double linear(double t) {
        return K300 * (1 + BETA * (t - 300));
    }

    /** Λ(T) = 1.4 (1 + 0.002 (T − 300)) W/(m K): linear, so the table's interpolation is exact. */
    static final Material LINEAR = material("linear-glass", TemperatureCurve.table(new double[] {250, 700},
            new double[] {linear(250), linear(700)}), TemperatureCurve.table(new double[] {250, 700},
            new double[] {1.6e6, 1.9e6}));
    static final Material CONSTANT = material("flat-glass", TemperatureCurve.table(new double[] {250, 700},
            new double[] {K300, K300}), TemperatureCurve.constant(1.6e6, 250, 700));
    static final Material NARROW = material("narrow-glass", TemperatureCurve.table(new double[] {250, 310},
            new double[] {linear(250), linear(310)}), TemperatureCurve.constant(1.6e6, 250, 310));
    /** Conductivity that jumps by 1000× over 1 K: the fixed point exists but repels the iteration. */
    static final Material STEEP = material("steep-glass", TemperatureCurve.table(new double[] {300, 301, 302, 2000},
            new double[] {0.1, 0.1, 100, 100}), TemperatureCurve.constant(1.6e6, 300, 2000));

    record Library(LibraryInfo info, List<Material> materials, List<LibraryFinding> findings)
            implements MaterialLibrary {
    }

    private CaseDocument read(String material, String extra) throws Exception {
        CaseFileReader r = new CaseFileReader();
        r.addLibrary(new Library(LIBRARY, List.of(LINEAR, CONSTANT, NARROW, STEEP), List.of()));
        Path f = Files.writeString(dir.resolve("case.json"), "{" + extra + "\"stack\": {\"layers\": ["
                + "{\"name\": \"bulk\", \"material\": \"" + material + "\"}]},"
                + "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": " + W0 + ", \"probe_radius_m\": " + W1
                + "}, \"measurement\": {\"type\": \"fdtr\", \"frequencies_hz\": [1e3, 1e4, 1e5, 1e6, 1e7]}}");
        return r.read(f);
    }

    private static Simulation simulation(CaseDocument doc) throws InputException {
        return new CaseModel(doc.stack(), doc.geometry(), doc.measurement()).simulation(Synthetic.CATALOG);
    }

    private static double[][] signals(Simulation s) {
        return new double[][] {s.run().column("re_k_per_w"), s.run().column("phase_deg")};
    }

    /**
     * The probe-averaged steady rise of a half-space under a Gaussian pump, both radii 1/e²: P / (√(2π) Λ a) with
     * a = √(w0² + w1²). Lax, J. Appl. Phys. 48, 3919 (1977) gives the centre rise P / (2√π Λ w) for intensity
     * exp(−r²/w²) (w the 1/e radius); with w = w0/√2 that is P / (√(2π) Λ w0), and averaging over a Gaussian probe
     * replaces w0² by w0² + w1² (the Hankel transforms of the two Gaussians multiply; derived here).
     */
    static double laxRise(double power, double k) {
        return power / (Math.sqrt(2 * Math.PI) * k * Math.hypot(W0, W1));
    }

    @Test
    void zeroPowerGivesTodaysValuesExactly() throws Exception {
        Simulation without = simulation(read("linear-glass", ""));
        Simulation zero = simulation(read("linear-glass", "\"self_heating\": {\"absorbed_power_w\": 0},"));
        assertArrayEquals(signals(without)[0], signals(zero)[0], 0.0);
        assertArrayEquals(signals(without)[1], signals(zero)[1], 0.0);
        assertEquals(0.0, zero.heating().orElseThrow().riseK());
        assertTrue(without.heating().isEmpty());
    }

    @Test
    void aConstantTableGivesTheSameAsWithoutTheOption() throws Exception {
        Simulation without = simulation(read("flat-glass", ""));
        Simulation heated = simulation(read("flat-glass", "\"self_heating\": {\"absorbed_power_w\": 5e-4},"));
        assertArrayEquals(signals(without)[0], signals(heated)[0], 0.0);
        assertArrayEquals(signals(without)[1], signals(heated)[1], 0.0);
        SelfHeating.Outcome o = heated.heating().orElseThrow();
        assertEquals(laxRise(5e-4, K300), o.riseK(), 1e-6 * o.riseK(), "Lax 1977, probe-averaged (see laxRise)");
        assertTrue(o.warnings().isEmpty());
    }

    /**
     * A half-space whose Λ is linear in T: the consistent rise solves ΔT = P / (√(2π) a Λ0 (1 + β ΔT)), a quadratic
     * solved here in closed form, independently of the model's iteration; its steady response is Lax's (1977).
     */
    @Test
    void theConsistentRiseOfAHalfSpaceWithLinearConductivityMatchesItsClosedForm() throws Exception {
        double power = 5e-4;
        double c = laxRise(power, 1.0);
        double expected = (-1 + Math.sqrt(1 + 4 * BETA * c / K300)) / (2 * BETA);
        CaseDocument doc = read("linear-glass", "\"self_heating\": {\"absorbed_power_w\": 5e-4},");
        Simulation s = simulation(doc);
        SelfHeating.Outcome o = s.heating().orElseThrow();
        assertEquals(expected, o.riseK(), 1e-6 * expected, "closed form of the fixed point on Lax's rise");
        assertTrue(expected > 15 && expected < 25, "a rise of the size labs keep below ~10-20 K: " + expected);
        assertEquals(o.riseK(), s.steadyRisePerWatt() * power, 1e-8 * expected,
                "the simulation's own steady response is taken with the shifted Λ: consistent");
        double k = o.stack().layers().get(0).kThrough();
        assertEquals(linear(300 + expected), k, 1e-6 * k);
        assertEquals(1.6e6 + 0.3e6 * (50 + o.riseK()) / 450, o.stack().layers().get(0).heatCapacity(), 1e-3,
                "the heat capacity is shifted by its own table");
        SelfHeating.ShiftedValue kz = o.values().stream().filter(v -> v.key().equals("k_through_w_mk")).findFirst()
                .orElseThrow();
        assertEquals(300 + expected, kz.temperatureK(), 1e-6 * expected);
        assertEquals(K300, kz.baseValue(), 1e-12);
        assertTrue(o.iterations() > 2 && o.iterations() < 20, "iterations " + o.iterations());
        assertNotEquals(signals(simulation(read("linear-glass", "")))[1][4], signals(s)[1][4],
                "the heated sample answers differently");
        assertTrue(doc.stack().layers().get(0).kThrough() == K300, "the stack as read keeps the 300 K value");
    }

    @Test
    void leavingATablesRangeIsWarnedWithTheMaterialTheRangeAndTheTemperature() throws Exception {
        SelfHeating.Outcome o = simulation(read("narrow-glass", "\"self_heating\": {\"absorbed_power_w\": 5e-4},"))
                .heating().orElseThrow();
        assertTrue(o.riseK() > 10, "the rise leaves the 250-310 K table: " + o.riseK());
        assertEquals(linear(310), o.stack().layers().get(0).kThrough(), 1e-12, "held at the range's end");
        assertEquals(laxRise(5e-4, linear(310)), o.riseK(), 1e-6 * o.riseK());
        String w = String.join("\n", o.warnings());
        for (String part : List.of("layer 'bulk'", "material 'narrow-glass'", "k_w_mk for 250–310 K only",
                BigDecimal.valueOf(300 + o.riseK()).setScale(2, RoundingMode.HALF_EVEN).stripTrailingZeros().toPlainString() + " K", "its value at 310 K", "never extrapolated")) {
            assertTrue(w.contains(part), "expected '" + part + "' in: " + w);
        }
    }

    @Test
    void aRiseThatDoesNotSettleIsAnErrorInWords() throws Exception {
        CaseDocument doc = read("steep-glass", "\"self_heating\": {\"absorbed_power_w\": 8.9e-4},");
        InputException e = assertThrows(InputException.class, () -> simulation(doc));
        assertEquals("self_heating.absorbed_power_w", e.path());
        assertTrue(e.getMessage().contains("does not settle") && e.getMessage().contains("60 iterations"),
                e.getMessage());
    }

    @Test
    void valuesTheCaseWritesAreNotShifted() throws Exception {
        CaseFileReader r = new CaseFileReader();
        r.addLibrary(new Library(LIBRARY, List.of(LINEAR), List.of()));
        Path f = Files.writeString(dir.resolve("own.json"), "{\"self_heating\": {\"absorbed_power_w\": 5e-4},"
                + "\"stack\": {\"layers\": [{\"name\": \"bulk\", \"material\": \"linear-glass\","
                + " \"k_through_w_mk\": 1.4, \"k_in_plane_w_mk\": 1.4}]}, \"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": " + W0
                + ", \"probe_radius_m\": " + W1 + "}, \"measurement\": {\"type\": \"sstr\"}}");
        SelfHeating.Outcome o = simulation(r.read(f)).heating().orElseThrow();
        assertEquals(1.4, o.stack().layers().get(0).kThrough());
        assertEquals(laxRise(5e-4, 1.4), o.riseK(), 1e-6 * o.riseK());
        assertTrue(o.values().stream().noneMatch(v -> v.key().startsWith("k_")), "only the heat capacity is bound");
    }

    /**
     * A fit of a cap's boundary conductance over a library substrate under self-heating: the rise depends on the
     * fitted conductance, so the iteration is redone at every evaluation; data made by the heated model are
     * recovered. Common practice, no source: the truth lies within 3σ.
     */
    @Test
    void aFitRedoesTheIterationAtEveryEvaluation() throws Exception {
        String stack = "\"self_heating\": {\"absorbed_power_w\": 2e-3},\"stack\": {\"layers\": ["
                + "{\"name\": \"cap\", \"thickness_m\": 8e-8, \"k_through_w_mk\": 150, \"heat_capacity_j_m3k\": 2.4e6,"
                + " \"conductance_below_w_m2k\": %s}, {\"name\": \"bulk\", \"material\": \"linear-glass\"}]},"
                + "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 1e-5, \"probe_radius_m\": 1e-5},"
                + "\"measurement\": {\"type\": \"fdtr\"}";
        double[] f = Synthetic.logSpaced(1e4, 2e7, 30);
        CaseFileReader r = new CaseFileReader();
        r.addLibrary(new Library(LIBRARY, List.of(LINEAR), List.of()));
        CaseDocument truth = r.read(Files.writeString(dir.resolve("truth.json"), "{" + stack.formatted("5e7") + "}"));
        double[] clean = simulation(truth).run(f).column("phase_deg");
        Synthetic.data(dir.resolve("fdtr.csv"), "frequency_hz", f, "phase_deg", clean, 0.02, 7, true);
        Fitter fitter = Synthetic.fitter();
        CaseDocument doc = r.read(Files.writeString(dir.resolve("case.json"), "{" + stack.formatted("2e8")
                + ", \"fit\": {\"datasets\": [{\"data\": \"fdtr.csv\"}], \"free\": [{\"layer\": \"cap\","
                + " \"property\": \"conductance_below_w_m2k\", \"min\": 1e6, \"max\": 1e10}]}}"));
        FitOutcome o = fitter.fit(doc, FitSettings.defaults(), Progress.NONE);
        FittedParameter g = o.parameters().get(0);
        assertTrue(o.converged());
        assertEquals(5e7, g.value(), 3 * g.sigma(), "conductance " + g);
        assertTrue(g.sigma() < 0.05 * 5e7, "the data pin it: " + g);
    }

    @Test
    void selfHeatingNeedsAPerWattGeometryASteadyStateAndAPowerOfZeroOrMore() throws Exception {
        CaseFileReader r = new CaseFileReader();
        r.addLibrary(new Library(LIBRARY, List.of(LINEAR), List.of()));
        String layers = "\"stack\": {\"layers\": [{\"name\": \"cap\", \"thickness_m\": 1e-7,"
                + " \"k_through_w_mk\": 100, \"heat_capacity_j_m3k\": 2.4e6}, {\"name\": \"bulk\","
                + " \"material\": \"linear-glass\"%s}]%s},";
        Path line = Files.writeString(dir.resolve("line.json"), "{\"self_heating\": {\"absorbed_power_w\": 1e-3},"
                + layers.formatted("", "") + "\"geometry\": {\"type\": \"line\", \"half_width_m\": 5e-6},"
                + " \"measurement\": {\"type\": \"3omega\", \"drive_frequencies_hz\": [100, 1000]}}");
        InputException perLength = assertThrows(InputException.class, () -> simulation(r.read(line)));
        assertEquals("self_heating.absorbed_power_w", perLength.path());
        assertTrue(perLength.getMessage().contains("per unit length"), perLength.getMessage());
        Path insulated = Files.writeString(dir.resolve("insulated.json"), "{\"self_heating\":"
                + " {\"absorbed_power_w\": 1e-3}," + layers.formatted(", \"thickness_m\": 1e-3",
                ", \"bottom\": \"adiabatic\"") + "\"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 5e-6,"
                + " \"probe_radius_m\": 5e-6}, \"measurement\": {\"type\": \"fdtr\", \"frequencies_hz\": [1e5]}}");
        InputException noSink = assertThrows(InputException.class, () -> simulation(r.read(insulated)));
        assertTrue(noSink.getMessage().contains("no heat leaves this stack"), noSink.getMessage());
        Path negative = Files.writeString(dir.resolve("negative.json"), "{\"self_heating\":"
                + " {\"absorbed_power_w\": -1e-3}," + layers.formatted("", "") + "\"geometry\": {\"type\":"
                + " \"gaussian\", \"pump_radius_m\": 5e-6, \"probe_radius_m\": 5e-6}, \"measurement\":"
                + " {\"type\": \"sstr\"}}");
        InputException below = assertThrows(InputException.class, () -> r.read(negative));
        assertEquals("self_heating.absorbed_power_w", below.path());
        assertTrue(below.getMessage().contains("negative.json:1:") && below.getMessage().contains("-0.001"),
                below.getMessage());
    }
}
