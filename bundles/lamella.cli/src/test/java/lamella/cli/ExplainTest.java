package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.lang.reflect.Field;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
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
import lamella.engine.Engine;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.technique.sstr.SteadyState;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code simulate --explain}: the table of values and their origins goes to standard error, the CSV on standard
 * output is the same as without it. The library is built here with invented values.
 */
class ExplainTest {

    @TempDir
    Path dir;

    record Library(LibraryInfo info, List<Material> materials, List<LibraryFinding> findings)
            implements MaterialLibrary {
    }

    record Run(int status, String out, String err) {
    }

    private Run run(String... args) throws Exception {
        CaseFileReader reader = new CaseFileReader();
        LibraryInfo info = new LibraryInfo("lab", "Lab films", LibraryTier.FACILITY, "memory", "");
        reader.addLibrary(new Library(info, List.of(new Material("oxide", "Oxide film", List.of(), Map.of(
                MaterialQuantity.K, new MaterialProperty(MaterialQuantity.K, TemperatureCurve.constant(1.2, 300, 300),
                        OptionalDouble.of(0.08), "invented test value", "")),
                new Curation(2, Optional.empty(), Optional.empty()), "", info, "memory:1")), List.of()));
        SimulateCommand command = new SimulateCommand();
        inject(command, "caseFormat", reader);
        inject(command, "kernels", new Engine());
        command.addGeometry(Registrations.shipped("lamella.geometry.gaussian"), new GaussianBeams());
        command.addTechnique(Registrations.shipped("lamella.technique.sstr"), new SteadyState());
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = command.run(List.of(args), new CommandIO(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir));
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private static void inject(Object target, String field, Object value) throws ReflectiveOperationException {
        Field f = target.getClass().getDeclaredField(field);
        f.setAccessible(true);
        f.set(target, value);
    }

    @Test
    void explainListsEveryValueWithItsOriginAndLeavesTheCsvAlone() throws Exception {
        Files.writeString(dir.resolve("case.json"), """
                {
                  "stack": {"layers": [
                    {"name": "film", "material": "oxide", "heat_capacity_j_m3k": 1.6e6}
                  ]},
                  "geometry": {"type": "gaussian", "pump_radius_m": 5e-6, "probe_radius_m": 5e-6},
                  "measurement": {"type": "sstr"}
                }
                """);
        Run plain = run("case.json");
        Run explained = run("case.json", "--explain");
        assertEquals(Command.OK, explained.status(), explained.err());
        assertEquals(plain.out(), explained.out(), "stdout is the CSV either way");
        assertEquals("", plain.err());
        String err = explained.err();
        assertTrue(err.startsWith("values used by " + dir.resolve("case.json") + ":\n"), err);
        assertTrue(err.matches("(?s).*\\n  film +k_through_w_mk +1\\.2 +W/\\(m K\\) +library Lab films \\(facility\\),"
                + " entry oxide v2, invented test value, at 300 K, ±8 %\\n.*"), err);
        assertTrue(err.matches("(?s).*\\n  film +heat_capacity_j_m3k +1600000 +J/\\(m³ K\\) +explicit in case file"
                + " \\(line 3\\)\\n.*"), err);
        assertTrue(err.matches("(?s).*\\n  film +thickness_m +∞ +m +default: semi-infinite.*"), err);
        assertTrue(err.matches("(?s).*\\n  geometry +pump_radius_m +0\\.000005 +m +explicit in case file"
                + " \\(line 5\\)\\n.*"), err);
    }

    @Test
    void explainSaysWhereTheHeatGoesAndListsTheLayersAbove() throws Exception {
        Files.writeString(dir.resolve("case.json"), """
                {
                  "stack": {"layers": [
                    {"name": "film", "thickness_m": 1e-7, "k_through_w_mk": 90, "heat_capacity_j_m3k": 2.4e6},
                    {"name": "base", "k_through_w_mk": 1.3, "heat_capacity_j_m3k": 1.6e6}
                  ],
                  "above": [
                    {"name": "cover", "k_through_w_mk": 0.6, "heat_capacity_j_m3k": 4.2e6,
                     "conductance_below_w_m2k": 5e7}
                  ]},
                  "geometry": {"type": "gaussian", "pump_radius_m": 5e-6, "probe_radius_m": 5e-6},
                  "measurement": {"type": "sstr"}
                }
                """);
        Run explained = run("case.json", "--explain");
        assertEquals(Command.OK, explained.status(), explained.err());
        String err = explained.err();
        assertTrue(err.matches("(?s).*\\n  cover +conductance_below_w_m2k +50000000 +W/\\(m² K\\) +explicit in case"
                + " file \\(line 8\\)\\n.*"), err);
        assertTrue(err.matches("(?s).*\\n  cover +thickness_m +∞ +m +default: semi-infinite \\(outermost layer above,"
                + " semi-infinite top\\)\\n.*"), err);
        assertTrue(err.endsWith("model: Heated and read inside the stack, at the top of layer 'film': heat flows"
                + " down through 2 layers to a semi-infinite bottom and up through 1 layer above ('cover') to a"
                + " semi-infinite top; the plane's temperature is shared by both sides and their admittances add.\n"),
                err);
    }

    /**
     * Self-heating: the rise and the temperature of every library value go to standard error with --explain, and a
     * value stated at 300 K only is warned about with or without it. The rise is Lax's probe-averaged steady rise of a
     * half-space, P / (√(2π) Λ √(w0² + w1²)) (Lax, J. Appl. Phys. 48, 3919, 1977, for 1/e² radii and a Gaussian
     * probe); the held value keeps it unchanged.
     */
    @Test
    void explainShowsTheSelfHeatingRiseAndWarnsWhereAnEntrysRangeIsLeft() throws Exception {
        Files.writeString(dir.resolve("case.json"), """
                {
                  "self_heating": {"absorbed_power_w": 1e-3},
                  "stack": {"layers": [
                    {"name": "film", "material": "oxide", "heat_capacity_j_m3k": 1.6e6}
                  ]},
                  "geometry": {"type": "gaussian", "pump_radius_m": 5e-6, "probe_radius_m": 5e-6},
                  "measurement": {"type": "sstr"}
                }
                """);
        double rise = 1e-3 / (Math.sqrt(2 * Math.PI) * 1.2 * Math.hypot(5e-6, 5e-6));
        String riseText = new java.math.BigDecimal(rise).round(new java.math.MathContext(4)).toPlainString();
        String heated = java.math.BigDecimal.valueOf(300 + rise).setScale(2, java.math.RoundingMode.HALF_EVEN)
                .stripTrailingZeros().toPlainString();
        Run plain = run("case.json");
        assertEquals(Command.OK, plain.status(), plain.err());
        assertTrue(plain.err().contains("lamella simulate: warning: layer 'film': material 'oxide' (library Lab films"
                + " (facility), entry oxide v2) states k_w_mk at 300 K only, but under self-heating the layer is at "
                + heated + " K (300 K + the steady rise " + riseText + " K); its value at 300 K is used"), plain.err());
        assertTrue(!plain.err().contains("Self-heating:"), "the explanation only with --explain: " + plain.err());
        Run explained = run("case.json", "--explain");
        assertEquals(plain.out(), explained.out());
        String err = explained.err();
        assertTrue(err.contains("Self-heating: 1 mW absorbed raise the heated plane by " + riseText + " K"), err);
        assertTrue(err.matches("(?s).*\\n  film +k_through_w_mk +" + java.util.regex.Pattern.quote(
                new java.math.BigDecimal(300 + rise).round(new java.math.MathContext(6)).toPlainString())
                + " +1\\.2 +1\\.2 +W/\\(m K\\)\\n.*"), err);
    }
}
