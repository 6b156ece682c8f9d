package lamella.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import lamella.api.CaseDocument;
import lamella.api.ValueOrigin;
import lamella.api.material.Curation;
import lamella.api.material.LibraryInfo;
import lamella.api.material.LibraryTier;
import lamella.api.material.Material;
import lamella.api.material.MaterialProperty;
import lamella.api.material.MaterialQuantity;
import lamella.api.material.PropertyValue;
import lamella.api.material.TemperatureCurve;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The report names every library value it used — library, tier, entry version, source — on the page and in
 * result.json. The library entry is invented for this test of the records.
 */
class LibraryProvenanceTest {

    @TempDir
    Path dir;

    private static CaseDocument withLibraryValue() {
        CaseDocument d = SyntheticFit.caseDocument();
        LibraryInfo info = new LibraryInfo("lab", "Lab substrates", LibraryTier.USER, "/home/a/.lamella/materials", "");
        MaterialProperty k = new MaterialProperty(MaterialQuantity.K, TemperatureCurve.constant(140, 290, 310),
                OptionalDouble.of(0.05), "invented test source, table 3", "");
        Material m = new Material("wafer", "Wafer", List.of(), Map.of(MaterialQuantity.K, k),
                new Curation(3, Optional.empty(), Optional.empty()), "", info, "/home/a/.lamella/materials/s.json:2");
        PropertyValue v = new PropertyValue(MaterialQuantity.K, 140, 300, m, List.of(k), OptionalDouble.of(0.05));
        ValueOrigin o = new ValueOrigin("stack.layers[2].k_through_w_mk", "substrate", "k_through_w_mk", 140,
                ValueOrigin.Kind.LIBRARY, 12, "", Optional.of(v));
        ValueOrigin explicit = new ValueOrigin("stack.layers[2].heat_capacity_j_m3k", "substrate",
                "heat_capacity_j_m3k", 1.63e6, ValueOrigin.Kind.EXPLICIT, 13, "", Optional.empty());
        return new CaseDocument(d.file(), d.stack(), d.geometry(), d.measurement(), d.root(), d.lines(),
                List.of(o, explicit));
    }

    private Path write(CaseDocument doc) throws Exception {
        return new FitReportWriter("0.1.0.test", Clock.fixed(Instant.parse("2026-01-02T03:04:05Z"), ZoneOffset.UTC))
                .write(doc, SyntheticFit.outcome(), SyntheticFit.sensitivities(), dir.resolve("report"));
    }

    @Test
    void resultJsonRecordsTheLibraryTierEntryVersionAndSourceOfEachLibraryValue() throws Exception {
        write(withLibraryValue());
        JsonNode values = new ObjectMapper().readTree(dir.resolve("report/result.json").toFile())
                .at("/case/library_values");
        assertEquals(1, values.size(), "only the library value, not the one the case writes: " + values);
        JsonNode v = values.get(0);
        assertEquals("stack.layers[2].k_through_w_mk", v.get("path").asText());
        assertEquals(140.0, v.get("value").asDouble());
        assertEquals("lab", v.at("/library/id").asText());
        assertEquals("user", v.at("/library/tier").asText());
        assertEquals("wafer", v.at("/entry/id").asText());
        assertEquals(3, v.at("/entry/version").asInt());
        assertEquals("/home/a/.lamella/materials/s.json:2", v.at("/entry/read_from").asText());
        assertEquals("invented test source, table 3", v.get("source").asText());
        assertEquals(300.0, v.get("temperature_k").asDouble());
        assertEquals(0.05, v.get("uncertainty_rel").asDouble());
    }

    @Test
    void thePageListsEachLibraryValueAndSaysWhenThereIsNone() throws Exception {
        String html = Files.readString(write(withLibraryValue()));
        assertTrue(html.contains("<h3>Values from material libraries</h3>"), html);
        assertTrue(html.contains("<tr><th scope=\"row\">substrate</th><td>k_through_w_mk</td><td>140.0</td>"
                + "<td>W/(m K)</td><td>Lab substrates (user), lab</td><td>wafer v3</td>"
                + "<td>/home/a/.lamella/materials/s.json:2</td><td>invented test source, table 3</td><td>300 K</td>"
                + "<td>5.0 %</td></tr>"), html);

        Files.walk(dir.resolve("report")).sorted(java.util.Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        String none = Files.readString(write(SyntheticFit.caseDocument()));
        assertTrue(none.contains("No layer value came from a material library."), none);
    }
}
