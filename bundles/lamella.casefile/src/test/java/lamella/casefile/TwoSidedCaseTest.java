package lamella.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.BottomBoundary;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.ParameterRef;
import lamella.api.Stack;
import lamella.api.ValueOrigin;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** stack.above and stack.top: layers above the heated plane and the condition beyond them. */
class TwoSidedCaseTest {

    @TempDir
    Path dir;

    private final CaseFileReader reader = new CaseFileReader();

    static final String BELOW = "    \"layers\": [\n"
            + "      " + CaseFileReaderTest.TRANSDUCER + ",\n"
            + "      " + CaseFileReaderTest.SUBSTRATE + "\n"
            + "    ]";

    private Path write(String json) throws IOException {
        Path f = dir.resolve("case.json");
        Files.writeString(f, json, StandardCharsets.UTF_8);
        return f;
    }

    private InputException fail(String json, String path, String... words) throws IOException {
        Path f = write(json);
        InputException e = assertThrows(InputException.class, () -> reader.read(f));
        assertEquals(path, e.path(), e.getMessage());
        assertTrue(e.getMessage().startsWith(f.toString()), e.getMessage());
        for (String w : words) {
            assertTrue(e.getMessage().contains(w), "expected '" + w + "' in: " + e.getMessage());
        }
        return e;
    }

    @Test
    void layersAboveAreReadWithTheirConductanceTowardThePlane() throws Exception {
        String json = CaseFileReaderTest.withStack(BELOW + ",\n"
                + "    \"above\": [\n"
                + "      {\"name\": \"window\", \"thickness_m\": 5e-7, \"k_through_w_mk\": 1.3,"
                + " \"heat_capacity_j_m3k\": 1.9e6, \"conductance_below_w_m2k\": 8e7},\n"
                + "      {\"name\": \"liquid\", \"k_through_w_mk\": 0.6, \"heat_capacity_j_m3k\": 4.2e6,"
                + " \"conductance_below_w_m2k\": 5e7}\n"
                + "    ]");
        CaseDocument doc = reader.read(write(json));
        Stack s = doc.stack();
        assertTrue(s.heatsBothWays());
        assertEquals(BottomBoundary.SEMI_INFINITE, s.top(), "semi-infinite is the default top");
        assertEquals(2, s.above().size());
        Layer liquid = s.above().get(1);
        assertTrue(liquid.isSemiInfinite());
        assertEquals(5e7, liquid.conductanceBelow(), "the outermost layer above may have a G toward the plane");
        assertEquals(8e7, s.above().get(0).conductanceBelow());
        assertTrue(doc.origins().stream().anyMatch(o -> o.path().equals("stack.above[1].k_through_w_mk")
                && o.kind() == ValueOrigin.Kind.EXPLICIT), "explain lists the values above too");
        assertTrue(s.heatFlowInWords().contains("up through 2 layers above ('window', 'liquid')"),
                s.heatFlowInWords());
        // fits and studies address layers above by name, as every layer
        CaseModel m = new CaseModel(s, doc.geometry(), doc.measurement());
        ParameterRef k = ParameterRef.layer("liquid", "k_through_w_mk");
        assertEquals(0.6, m.value(k, "x"));
        assertEquals(0.9, m.with(k, 0.9).stack().above().get(1).kThrough());
        assertTrue(m.numericInputs().contains(ParameterRef.layer("window", "conductance_below_w_m2k")));
        assertTrue(m.numericInputs().contains(ParameterRef.layer("liquid", "k_w_mk")));
        assertFalse(m.numericInputs().contains(ParameterRef.layer("liquid", "thickness_m")));
    }

    @Test
    void finiteTopsNeedTheOutermostThickness() throws Exception {
        String above = ",\n    \"above\": [{\"name\": \"cover\", \"k_through_w_mk\": 0.2,"
                + " \"heat_capacity_j_m3k\": 1.5e6}],\n";
        fail(CaseFileReaderTest.withStack(BELOW + above + "    \"top\": \"isothermal\""),
                "stack.above[0].thickness_m", "missing", "the top is isothermal");
        CaseDocument doc = reader.read(write(CaseFileReaderTest.withStack(BELOW + ",\n    \"above\": [{\"name\":"
                + " \"cover\", \"thickness_m\": 2e-6, \"k_through_w_mk\": 0.2, \"heat_capacity_j_m3k\": 1.5e6}],\n"
                + "    \"top\": \"adiabatic\"")));
        assertEquals(BottomBoundary.ADIABATIC, doc.stack().top());
        assertEquals(2e-6, doc.stack().above().get(0).thickness());
    }

    @Test
    void badSidesAboveStopAtTheirPaths() throws Exception {
        fail(CaseFileReaderTest.withStack(BELOW + ",\n    \"top\": \"isothermal\""), "stack.top",
                "needs layers above the heated plane");
        fail(CaseFileReaderTest.withStack(BELOW + ",\n    \"above\": []"), "stack.above", "non-empty list");
        fail(CaseFileReaderTest.withStack(BELOW + ",\n    \"above\": [{\"name\": \"cover\", \"k_through_w_mk\": 0.2,"
                + " \"heat_capacity_j_m3k\": 1.5e6}],\n    \"top\": \"open\""), "stack.top", "unknown top 'open'",
                "semi-infinite, adiabatic, isothermal");
        fail(CaseFileReaderTest.withStack(BELOW + ",\n    \"above\": [{\"name\": \"cover\", \"thickness_m\": 1e-6,"
                + " \"k_through_w_mk\": 0.2, \"heat_capacity_j_m3k\": 1.5e6}]"), "stack.above[0].thickness_m",
                "semi-infinite top", "stack.top");
        fail(CaseFileReaderTest.withStack(BELOW + ",\n    \"above\": [{\"name\": \"substrate\", \"k_through_w_mk\":"
                + " 0.2, \"heat_capacity_j_m3k\": 1.5e6}]"), "stack.above[0].name", "already used by stack.layers[1]");
        fail(CaseFileReaderTest.withStack(BELOW + ",\n    \"above\": [{\"name\": \"cover\", \"k_through_w_mk\": 0.2,"
                + " \"heat_capacity_j_m3k\": 1.5e6, \"conductance_below_w_m2k\": 1e20}]"),
                "stack.above[0].conductance_below_w_m2k");
        fail(CaseFileReaderTest.withStack(BELOW + ",\n    \"above\": [{\"name\": \"cover\", \"k_through_w_mk\": 0.2,"
                + " \"heat_capacity_j_m3k\": 1.5e6, \"absorbs\": 1}]"), "stack.above[0].absorbs", "unknown key");
    }
}
