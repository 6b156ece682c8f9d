package lamella.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.OpticalDepths;
import lamella.api.ParameterRef;
import lamella.api.ValueOrigin;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** absorption_depth_m and sensing_depth_m on layers[0]. */
class OpticalDepthCaseTest {

    @TempDir
    Path dir;

    private final CaseFileReader reader = new CaseFileReader();

    static final String ABSORBING = "{\"name\": \"transducer\", \"thickness_m\": 9e-8, \"k_through_w_mk\": 200,"
            + " \"heat_capacity_j_m3k\": 2.45e6, \"absorption_depth_m\": 1.5e-8%s}";

    private Path write(String json) throws IOException {
        return Files.writeString(dir.resolve("case.json"), json, StandardCharsets.UTF_8);
    }

    private void fail(String json, String path, String... words) throws IOException {
        Path f = write(json);
        InputException e = assertThrows(InputException.class, () -> reader.read(f));
        assertEquals(path, e.path(), e.getMessage());
        for (String w : words) {
            assertTrue(e.getMessage().contains(w), "expected '" + w + "' in: " + e.getMessage());
        }
    }

    @Test
    void aSensingDepthNotStatedFollowsTheAbsorptionDepth() throws Exception {
        CaseDocument doc = reader.read(write(CaseFileReaderTest.withLayers(ABSORBING.formatted(""),
                CaseFileReaderTest.SUBSTRATE)));
        assertEquals(OpticalDepths.absorbing(1.5e-8), doc.stack().optics());
        assertTrue(doc.origins().stream().anyMatch(o -> o.key().equals("sensing_depth_m")
                && o.kind() == ValueOrigin.Kind.DEFAULT && o.how().equals("equal to absorption_depth_m")));
        CaseModel m = new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
        ParameterRef depth = ParameterRef.layer("transducer", "absorption_depth_m");
        assertEquals(1.5e-8, m.value(depth, "x"));
        assertTrue(m.numericInputs().contains(depth));
        assertFalse(m.numericInputs().contains(ParameterRef.layer("transducer", "sensing_depth_m")));
        assertEquals(3e-8, m.with(depth, 3e-8).stack().optics().sensing(), "δₛ stated once moves with δ");
        assertTrue(doc.stack().heatFlowInWords().contains("spread as exp(−z/δ) through layer 'transducer', δ = 1.5E-8 m"
                + " (absorption depth), and the probe reads the temperature weighted the same way."),
                doc.stack().heatFlowInWords());
    }

    @Test
    void aSensingDepthStatedIsItsOwn() throws Exception {
        CaseDocument doc = reader.read(write(CaseFileReaderTest.withLayers(
                ABSORBING.formatted(", \"sensing_depth_m\": 4e-8"), CaseFileReaderTest.SUBSTRATE)));
        assertEquals(new OpticalDepths(1.5e-8, 4e-8, false), doc.stack().optics());
        CaseModel m = new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
        assertEquals(4e-8, m.with(ParameterRef.layer("transducer", "absorption_depth_m"), 3e-8).stack().optics()
                .sensing());
        assertTrue(m.numericInputs().contains(ParameterRef.layer("transducer", "sensing_depth_m")));
        InputException e = assertThrows(InputException.class,
                () -> m.value(ParameterRef.layer("substrate", "absorption_depth_m"), "fit.free[0]"));
        assertTrue(e.getMessage().contains("only the layer under the heated plane"), e.getMessage());
    }

    @Test
    void depthsStopAtTheirPathsAnywhereButTheFirstLayer() throws Exception {
        fail(CaseFileReaderTest.withLayers(CaseFileReaderTest.TRANSDUCER, "{\"name\": \"substrate\","
                + " \"k_through_w_mk\": 140, \"heat_capacity_j_m3k\": 1.63e6, \"absorption_depth_m\": 1e-7}"),
                "stack.layers[1].absorption_depth_m", "only layers[0]");
        fail(CaseFileReaderTest.withLayers(ABSORBING.formatted(", \"sensing_depth_m\": 0"),
                CaseFileReaderTest.SUBSTRATE), "stack.layers[0].sensing_depth_m", "positive");
        fail(CaseFileReaderTest.withLayers(ABSORBING.formatted(", \"sensing_depth_m\": 1e-300"),
                CaseFileReaderTest.SUBSTRATE), "stack.layers[0].sensing_depth_m");
        fail(CaseFileReaderTest.withStack(TwoSidedCaseTest.BELOW + ",\n    \"above\": [{\"name\": \"cover\","
                + " \"k_through_w_mk\": 0.2, \"heat_capacity_j_m3k\": 1.5e6, \"sensing_depth_m\": 1e-7}]"),
                "stack.above[0].sensing_depth_m", "only layers[0]");
    }
}
