package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import lamella.api.CaseDocument;
import lamella.api.ParameterRef;
import lamella.api.fit.DatasetFit;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;
import lamella.api.fit.SensitivityTable;
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
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every library value a fit used is recorded in the result file and named beside the sensitivity ranking with its
 * library, tier, entry version and source. The library and its values are invented for this test of the records.
 */
class ProvenanceTest {

    record Library(LibraryInfo info, List<Material> materials, List<LibraryFinding> findings)
            implements MaterialLibrary {
    }

    @TempDir
    Path dir;

    private CaseDocument doc;

    @BeforeEach
    void read() throws Exception {
        LibraryInfo info = new LibraryInfo("lab", "Lab films", LibraryTier.FACILITY, "/srv/lab-films", "");
        Material oxide = new Material("oxide", "Oxide film", List.of(), Map.of(
                MaterialQuantity.K, new MaterialProperty(MaterialQuantity.K, TemperatureCurve.constant(1.2, 250, 350),
                        OptionalDouble.of(0.08), "invented test value", ""),
                MaterialQuantity.HEAT_CAPACITY, new MaterialProperty(MaterialQuantity.HEAT_CAPACITY,
                        TemperatureCurve.constant(1.6e6, 250, 350), OptionalDouble.empty(), "invented test value", "")),
                new Curation(4, Optional.of("A. Curator (invented)"), Optional.of(LocalDate.of(2025, 3, 1))), "", info,
                "/srv/lab-films/films.json:7");
        CaseFileReader reader = new CaseFileReader();
        reader.addLibrary(new Library(info, List.of(oxide), List.of()));
        Path c = Files.writeString(dir.resolve("case.json"), """
                {"temperature_k": 310,
                 "stack": {"layers": [
                   {"name": "transducer", "thickness_m": 8e-8, "k_through_w_mk": 150, "heat_capacity_j_m3k": 2.4e6,
                    "conductance_below_w_m2k": 1e8},
                   {"name": "film", "material": "oxide"}
                 ]},
                 "geometry": {"type": "gaussian", "pump_radius_m": 5e-6, "probe_radius_m": 5e-6},
                 "measurement": {"type": "sstr"}}
                """);
        doc = reader.read(c);
    }

    @Test
    void theResultFileRecordsEveryLibraryValueWithLibraryTierVersionAndSource() throws Exception {
        FitOutcome o = new FitOutcome(List.of(new FittedParameter(ParameterRef.layer("transducer",
                "conductance_below_w_m2k"), "", 1e8, 1.1e8, 1e7, 5e6, false, true)), new double[][] {{1}},
                List.of(new DatasetFit(0, "data.csv", "sstr", "k_per_w", "x", new double[] {1}, new double[] {1},
                        new double[] {0.1}, new double[] {1}, true, 1)), List.of(), Optional.empty(), List.of(), 10,
                1, true);
        JsonNode root = new ObjectMapper().readTree(FitResultJson.format(doc, o));
        JsonNode values = root.get("library_values");
        assertEquals(4, values.size(), "Λz, Λx, Λy and C of the film: " + values);
        JsonNode kz = values.get(0);
        assertEquals("stack.layers[1].k_through_w_mk", kz.get("path").asText());
        assertEquals("film", kz.get("layer").asText());
        assertEquals(1.2, kz.get("value").asDouble());
        assertEquals("W/(m K)", kz.get("unit").asText());
        assertEquals("lab", kz.at("/library/id").asText());
        assertEquals("Lab films", kz.at("/library/name").asText());
        assertEquals("facility", kz.at("/library/tier").asText());
        assertEquals("/srv/lab-films", kz.at("/library/location").asText());
        assertEquals("oxide", kz.at("/entry/id").asText());
        assertEquals(4, kz.at("/entry/version").asInt());
        assertEquals("/srv/lab-films/films.json:7", kz.at("/entry/read_from").asText());
        assertEquals("A. Curator (invented)", kz.at("/entry/reviewed_by").asText());
        assertEquals("2025-03-01", kz.at("/entry/reviewed_on").asText());
        assertEquals("invented test value", kz.get("source").asText());
        assertEquals("k_w_mk", kz.at("/stated/0/key").asText());
        assertEquals(310.0, kz.get("temperature_k").asDouble());
        assertEquals(0.08, kz.get("uncertainty_rel").asDouble());
        JsonNode c = values.get(3);
        assertEquals("heat_capacity_j_m3k", c.get("key").asText());
        assertTrue(c.get("uncertainty_rel") == null, "no uncertainty stated, none written: " + c);
    }

    @Test
    void theSensitivityRankingNamesTheLibraryBehindEachInput() {
        SensitivityTable t = new SensitivityTable("x", new double[] {1, 2}, "k_per_w", false,
                List.of(ParameterRef.layer("film", "k_w_mk"), ParameterRef.layer("transducer", "thickness_m")),
                List.of("isotropic Λ", ""), new double[][] {{-0.5, -0.6}, {0.1, 0.2}});
        String ranking = SensitivityCommand.ranking(t, doc);
        assertTrue(ranking.matches("(?s).*\\n  film\\.k_w_mk \\(isotropic Λ\\) +0\\.600 +library Lab films \\(facility\\),"
                + " entry oxide v4, invented test value, at 310 K, ±8 %\\n.*"), ranking);
        assertTrue(ranking.matches("(?s).*\\n  transducer\\.thickness_m +0\\.200 +explicit in case file \\(line 3\\)\\n.*"),
                ranking);
    }
}
