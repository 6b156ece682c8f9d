package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.StringReader;
import java.lang.reflect.Field;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.casefile.CaseFileReader;
import lamella.engine.Engine;
import lamella.fit.Fitter;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.technique.fdtr.FrequencyDomain;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.xml.sax.InputSource;

/** {@code plan --out} writes the plan file and its pictures beside it; a bad --map is refused before anything. */
class PlanCommandTest {

    @TempDir
    Path dir;

    private record Run(int status, String out, String err) {
    }

    private Run run(String... args) throws Exception {
        Files.writeString(dir.resolve("case.json"), """
                {"stack": {"layers": [
                   {"name": "cap", "thickness_m": 9e-8, "k_through_w_mk": 200, "heat_capacity_j_m3k": 2.45e6,
                    "conductance_below_w_m2k": 1.2e8},
                   {"name": "base", "k_through_w_mk": 1.4, "heat_capacity_j_m3k": 1.6e6}]},
                 "geometry": {"type": "gaussian", "pump_radius_m": 6e-6, "probe_radius_m": 4e-6},
                 "measurement": {"type": "fdtr", "frequencies_hz": [1e4, 3e4, 1e5, 3e5, 1e6, 3e6, 1e7]},
                 "fit": {"free": [{"layer": "base", "property": "k_through_w_mk"},
                                  {"layer": "cap", "property": "conductance_below_w_m2k"}],
                         "uncertain": [{"geometry": "pump_radius_m", "sigma_relative": 0.04}]},
                 "plan": {"vary": [{"geometry": "pump_radius_m", "min": 3e-6, "max": 2e-5, "steps": 3},
                                   {"layer": "cap", "property": "thickness_m", "values": [6e-8, 9e-8, 1.2e-7]}]}}
                """);
        PlanCommand c = new PlanCommand();
        set(c, "caseFormat", new CaseFileReader());
        set(c, "planner", new Fitter(new Engine(), List.of(new GaussianBeams()), List.of(new FrequencyDomain())));
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = c.run(List.of(args), new CommandIO(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir));
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    private static void set(Object o, String field, Object value) throws ReflectiveOperationException {
        Field f = o.getClass().getDeclaredField(field);
        f.setAccessible(true);
        f.set(o, value);
    }

    @Test
    void thePlanFileGetsItsMapAndCurvesBesideIt() throws Exception {
        Run r = run("case.json", "--out", "plans/p.json", "--map", "layers.cap.thickness_m,geometry.pump_radius_m");
        assertEquals(Command.BAD_INPUT, r.status(), "the key is named as the table heads it: " + r.err());
        assertTrue(r.err().contains("--map: the plan varies no key 'layers.cap.thickness_m'; a map can show"
                + " geometry.pump_radius_m, cap.thickness_m"), r.err());
        assertFalse(Files.exists(dir.resolve("plans/p.json")), "nothing written");

        Run ok = run("case.json", "--out", "plans/p.json", "--map", "cap.thickness_m,geometry.pump_radius_m");
        assertEquals(Command.OK, ok.status(), ok.err());
        for (String name : List.of("p.json", "p-objective.png", "p-objective.svg", "p-sensitivity.png",
                "p-sensitivity.svg")) {
            Path f = dir.resolve("plans").resolve(name);
            assertTrue(Files.isRegularFile(f), name);
            assertTrue(ok.err().contains("wrote " + f), ok.err());
        }
        assertEquals(PlanFigures.WIDTH, ImageIO.read(dir.resolve("plans/p-objective.png").toFile()).getWidth());
        String svg = Files.readString(dir.resolve("plans/p-objective.svg"));
        DocumentBuilderFactory.newInstance().newDocumentBuilder().parse(new InputSource(new StringReader(svg)));
        assertTrue(svg.contains("cap.thickness_m (nm)") && svg.contains("geometry.pump_radius_m (µm)"), "axes");
        String plan = Files.readString(dir.resolve("plans/p.json"));
        assertTrue(plan.contains("\"geometry.pump_radius_m\" : 6.0E-6"), "the case's own values as the baseline's");
    }

    @Test
    void mapWithoutOutIsRefused() throws Exception {
        Run r = run("case.json", "--map", "cap.thickness_m,geometry.pump_radius_m");
        assertEquals(Command.BAD_INPUT, r.status());
        assertTrue(r.err().startsWith("lamella plan: --map chooses the keys of the map that --out writes"), r.err());
        assertEquals("", r.out());
    }
}
