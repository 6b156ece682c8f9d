package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.lang.reflect.Field;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.ParameterRef;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.casefile.CaseFileReader;
import lamella.engine.Engine;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.technique.fdtr.FrequencyDomain;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Commands on a case of several samples: simulate one, explain all, override them in a batch. */
class SampleCommandsTest {

    static final String LAYERS = "{\"layers\": [{\"name\": \"transducer\", \"thickness_m\": 8e-8,"
            + " \"k_through_w_mk\": 180, \"heat_capacity_j_m3k\": 2.42e6, \"conductance_below_w_m2k\": 2e8},"
            + " {\"name\": \"film\", \"thickness_m\": %s, \"k_through_w_mk\": 2.6, \"heat_capacity_j_m3k\": 2.1e6,"
            + " \"conductance_below_w_m2k\": 1.6e8}, {\"name\": \"substrate\", \"k_through_w_mk\": 140,"
            + " \"heat_capacity_j_m3k\": 1.63e6}]}";
    static final String CASE = "{\"samples\": [\n"
            + " {\"name\": \"thin\", \"stack\": " + LAYERS.formatted("2.5e-8") + "},\n"
            + " {\"name\": \"thick\", \"stack\": " + LAYERS.formatted("2e-7") + ", \"geometry\": {\"type\":"
            + " \"gaussian\", \"pump_radius_m\": 9e-6, \"probe_radius_m\": 7e-6}}],\n"
            + " \"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 5e-6, \"probe_radius_m\": 4e-6},\n"
            + " \"measurement\": {\"type\": \"fdtr\", \"frequencies_hz\": [1e4, 1e6]}}";

    @TempDir
    Path dir;

    private final SimulateCommand simulate = new SimulateCommand();

    record Run(int status, String out, String err) {
    }

    @BeforeEach
    void wire() throws Exception {
        Field f = SimulateCommand.class.getDeclaredField("caseFormat");
        f.setAccessible(true);
        f.set(simulate, new CaseFileReader());
        Field k = SimulateCommand.class.getDeclaredField("kernels");
        k.setAccessible(true);
        k.set(simulate, new Engine());
        simulate.addGeometry(Registrations.shipped("lamella.geometry.gaussian"), new GaussianBeams());
        simulate.addTechnique(Registrations.shipped("lamella.technique.fdtr"), new FrequencyDomain());
        Files.writeString(dir.resolve("series.json"), CASE);
    }

    private Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        CommandIO io = new CommandIO(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir);
        int status = simulate.run(List.of(args), io);
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void aCaseOfSeveralSamplesSimulatesTheOneNamed() {
        Run none = run("series.json");
        assertEquals(Command.BAD_INPUT, none.status());
        assertTrue(none.err().contains("samples: a simulation (name one with --sample) works on one sample at a"
                + " time, and this case has 2: thin, thick"), none.err());
        Run unknown = run("series.json", "--sample", "thickk");
        assertEquals(Command.BAD_INPUT, unknown.status());
        assertTrue(unknown.err().contains("there is no sample 'thickk' (did you mean 'thick'?); samples: thin, thick"),
                unknown.err());
        Run thin = run("series.json", "--sample", "thin");
        Run thick = run("series.json", "--sample", "thick");
        assertEquals(Command.OK, thin.status(), thin.err());
        assertEquals(3, thin.out().split("\n").length, "a header and two frequencies");
        assertTrue(!thin.out().equals(thick.out()), "each sample its own stack and geometry");
    }

    @Test
    void explainListsEverySamplesValues() {
        Run r = run("series.json", "--sample", "thick", "--explain");
        assertEquals(Command.OK, r.status(), r.err());
        assertTrue(r.err().contains("sample"), r.err());
        assertTrue(r.err().lines().anyMatch(l -> l.contains("thin") && l.contains("film") && l.toLowerCase().contains("2.5e-8")),
                r.err());
        assertTrue(r.err().lines().anyMatch(l -> l.contains("thick") && l.contains("film") && l.toLowerCase().contains("2e-7")),
                r.err());
        assertTrue(r.err().contains("sample thick: Heated and read at the surface") && r.err().contains("Its own"
                + " geometry: gaussian."), r.err());
    }

    @Test
    void batchOverridesNameEverySampleWithTheLayerOrOne() throws Exception {
        CaseDocument doc = new CaseFileReader().read(dir.resolve("series.json"));
        CaseDocument all = CaseOverrides.apply(doc, Map.of("film.heat_capacity_j_m3k", 1.8e6));
        all.samples().forEach(s -> assertEquals(1.8e6, s.stack().layer("film").orElseThrow().heatCapacity()));
        CaseDocument one = CaseOverrides.apply(doc, Map.of("samples[thin].film.thickness_m", 3e-8,
                "samples[thick].geometry.pump_radius_m", 8e-6));
        assertEquals(3e-8, one.sample("thin").orElseThrow().stack().layer("film").orElseThrow().thickness());
        assertEquals(2e-7, one.sample("thick").orElseThrow().stack().layer("film").orElseThrow().thickness());
        assertEquals(8e-6, one.sample("thick").orElseThrow().geometry().get("pump_radius_m"));
        assertEquals(5e-6, one.geometry().get("pump_radius_m"), "the case's geometry stays");
        assertEquals(2, one.samples().size());
        InputException bad = assertThrows(InputException.class, () -> CaseOverrides.apply(doc,
                Map.of("samples[thin].geometry.pump_radius_m", 8e-6)));
        assertTrue(bad.getMessage().contains("sample 'thin' has no geometry block of its own"), bad.getMessage());
        InputException none = assertThrows(InputException.class, () -> CaseOverrides.apply(doc,
                Map.of("samples[other].film.thickness_m", 3e-8)));
        assertTrue(none.getMessage().contains("samples: thin, thick"), none.getMessage());
        assertEquals("samples[thin].film.thickness_m",
                ParameterRef.layer("film", "thickness_m").inSample("thin").toString());
    }
}
