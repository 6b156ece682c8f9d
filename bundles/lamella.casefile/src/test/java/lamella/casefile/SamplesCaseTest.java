package lamella.casefile;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.ParameterRef;
import lamella.api.Sample;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code samples}: several samples in one case, each with its own stack and optionally its own geometry. */
class SamplesCaseTest {

    @TempDir
    Path dir;

    private final CaseFileReader reader = new CaseFileReader();

    static final String STACK = "{\"layers\": [" + CaseFileReaderTest.TRANSDUCER + ", "
            + CaseFileReaderTest.SUBSTRATE + "]}";
    static final String THIN = "{\"name\": \"thin\", \"stack\": " + STACK + "}";

    private Path write(String json) throws IOException {
        Path f = dir.resolve("case.json");
        Files.writeString(f, json, StandardCharsets.UTF_8);
        return f;
    }

    private static String doc(String samples) {
        return "{\n  \"samples\": " + samples + ",\n  " + CaseFileReaderTest.GEOMETRY + ",\n  "
                + CaseFileReaderTest.MEASUREMENT + "\n}";
    }

    private InputException fail(String json, String path, String... words) throws IOException {
        Path f = write(json);
        InputException e = assertThrows(InputException.class, () -> reader.read(f));
        assertEquals(path, e.path(), e.getMessage());
        assertTrue(e.getMessage().startsWith(f.toString()) && e.line() > 0, e.getMessage());
        for (String w : words) {
            assertTrue(e.getMessage().contains(w), "expected '" + w + "' in: " + e.getMessage());
        }
        return e;
    }

    @Test
    void samplesAreReadInOrderWithTheirOwnGeometry() throws Exception {
        CaseDocument d = reader.read(write(doc("[" + THIN + ",\n {\"name\": \"thick\", \"stack\": " + STACK
                + ", \"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 9e-6, \"probe_radius_m\": 7e-6},"
                + " \"temperature_k\": 80}]")));
        assertEquals(2, d.samples().size());
        assertTrue(d.severalSamples());
        assertEquals("thin", d.samples().get(0).name());
        assertNull(d.samples().get(0).geometry());
        Sample thick = d.sample("thick").orElseThrow();
        assertEquals("samples[1]", thick.path());
        assertEquals(9e-6, thick.geometry().get("pump_radius_m"));
        assertEquals(d.stack(), d.samples().get(0).stack(), "the case's stack is its first sample's");
        assertEquals("samples[1].stack.layers[0].k_through_w_mk",
                d.origin(ParameterRef.layer("transducer", "k_through_w_mk").inSample("thick")).orElseThrow().path());
        assertThrows(InputException.class, () -> d.requireOneSample("a plan"));
    }

    @Test
    void aCaseOfOneStackIsOneUnnamedSample() throws Exception {
        CaseDocument d = reader.read(write(CaseFileReaderTest.withStack("\"layers\": ["
                + CaseFileReaderTest.TRANSDUCER + ", " + CaseFileReaderTest.SUBSTRATE + "]")));
        assertEquals(1, d.samples().size());
        assertFalse(d.samples().get(0).named());
        assertFalse(d.severalSamples());
    }

    @Test
    void oneSampleWithItsOwnGeometryIsTheCasesGeometry() throws Exception {
        CaseDocument d = reader.read(write("{\"samples\": [{\"name\": \"only\", \"stack\": " + STACK
                + ", \"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 9e-6, \"probe_radius_m\": 7e-6}}],"
                + CaseFileReaderTest.MEASUREMENT + "}"));
        assertEquals(9e-6, d.geometry().get("pump_radius_m"));
        assertNull(d.samples().get(0).geometry(), "one block, addressed as geometry.KEY");
    }

    @Test
    void duplicateNamesAreRefusedAtTheSecond() throws Exception {
        fail(doc("[" + THIN + ",\n" + THIN + "]"), "samples[1].name", "the sample name 'thin' is already used by"
                + " samples[0].name");
    }

    @Test
    void anEmptyOrMistypedListIsRefused() throws Exception {
        fail(doc("[]"), "samples", "expected a non-empty list of samples");
        fail(doc("{}"), "samples", "expected a non-empty list of samples");
        fail(doc("[3]"), "samples[0]", "expected a sample object");
    }

    @Test
    void aSampleNeedsANameAndAStackAndKnowsItsKeys() throws Exception {
        fail(doc("[{\"stack\": " + STACK + "}]"), "samples[0].name", "missing");
        fail(doc("[{\"name\": \"a\"}]"), "samples[0].stack", "missing");
        fail(doc("[{\"name\": \"a\", \"stak\": " + STACK + "}]"), "samples[0].stak", "did you mean 'stack'");
        fail(doc("[{\"name\": \"a[1]\", \"stack\": " + STACK + "}]"), "samples[0].name", "'['");
        fail(doc("[{\"name\": \" \", \"stack\": " + STACK + "}]"), "samples[0].name", "not blank");
    }

    @Test
    void aCaseHoldsEitherAStackOrSamples() throws Exception {
        fail("{\"stack\": " + STACK + ",\n \"samples\": [" + THIN + "], " + CaseFileReaderTest.GEOMETRY + ", "
                + CaseFileReaderTest.MEASUREMENT + "}", "stack", "either one stack or a list of samples");
    }

    @Test
    void layerErrorsNameTheSamplesPath() throws Exception {
        fail(doc("[" + THIN + ",\n {\"name\": \"b\", \"stack\": {\"layers\": [{\"name\": \"x\","
                + " \"thickness_m\": -1, \"k_through_w_mk\": 1, \"heat_capacity_j_m3k\": 1e6},"
                + CaseFileReaderTest.SUBSTRATE + "]}}]"), "samples[1].stack.layers[0].thickness_m");
    }

    @Test
    void withoutACaseGeometryEverySampleNeedsItsOwn() throws Exception {
        Path f = write("{\"samples\": [" + THIN + "],\n " + CaseFileReaderTest.MEASUREMENT + "}");
        InputException e = assertThrows(InputException.class, () -> reader.read(f));
        assertEquals("geometry", e.path());
        assertTrue(e.getMessage().contains("or in every sample"), e.getMessage());
    }
}
