package lamella.report;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Base64;
import java.util.List;
import java.util.Set;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.xml.XMLConstants;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Document;

/** The report folder of an invented outcome ({@link SyntheticFit}): files, images, page, tables and failures. */
class FitReportWriterTest {

    private static final Instant WRITTEN = Instant.parse("2026-01-02T03:04:05Z");
    private static final Set<String> EXPECTED_FILES = Set.of(
            "index.html", "result.json", "parameters.csv", "correlation.csv", "budget.csv", "montecarlo.csv",
            "dataset-0-fit.csv", "dataset-1-fit.csv",
            "dataset-0-fit.png", "dataset-0-fit.svg", "dataset-0-residuals.png", "dataset-0-residuals.svg",
            "dataset-1-fit.png", "dataset-1-fit.svg", "dataset-1-residuals.png", "dataset-1-residuals.svg",
            "sensitivity-0.png", "sensitivity-0.svg", "sensitivity-1.png", "sensitivity-1.svg",
            "budget.png", "budget.svg");

    @TempDir
    static Path shared;
    private static Path report;
    private static Path page;

    @BeforeAll
    static void writeOnce() throws IOException {
        report = shared.resolve("new-folder").resolve("report");
        page = writer(WRITTEN).write(SyntheticFit.caseDocument(), SyntheticFit.outcome(),
                SyntheticFit.sensitivities(), report);
    }

    @Test
    void theWriterNamesEveryFileItWritesSoThatCommandsCanGuardTheirInputs() throws IOException {
        FitReportWriter w = writer(WRITTEN);
        for (String name : names(report)) {
            assertTrue(w.writes(name), name);
        }
        for (String other : List.of("case.json", "tdtr-9.8mhz.csv", "dataset-x-fit.csv", "index.htm", "budget.json")) {
            assertFalse(w.writes(other), other);
        }
    }

    @Test
    void theFolderIsCreatedAndHoldsEveryFileAndNothingElse() throws IOException {
        assertEquals(report.resolve("index.html"), page);
        assertEquals(new TreeSet<>(EXPECTED_FILES), names(report));
    }

    @Test
    void everyPngDecodesAtThePlotSize() throws IOException {
        for (String name : names(report)) {
            if (name.endsWith(".png")) {
                BufferedImage image = ImageIO.read(report.resolve(name).toFile());
                assertEquals(960, image.getWidth(), name);
                assertEquals(600, image.getHeight(), name);
            }
        }
    }

    @Test
    void everySvgIsWellFormedXmlAndCarriesItsAxisLabels() throws Exception {
        for (String name : names(report)) {
            if (name.endsWith(".svg")) {
                assertEquals("svg", svg(name).getDocumentElement().getLocalName(), name);
            }
        }
        assertSvgText("dataset-0-fit.svg", "modulation frequency (Hz)", "phase (°)", "model at the best fit");
        assertSvgText("dataset-1-fit.svg", "pump–probe delay (s)", "ratio −V_in/V_out (dimensionless)");
        assertSvgText("dataset-1-residuals.svg", "pump–probe delay (s)",
                "normalised residual (data − model)/σ (dimensionless)");
        assertSvgText("sensitivity-0.svg", "∂φ/∂ln p (°)", "film.k_through_w_mk (through-plane Λz)",
                "transducer.thickness_m");
        assertSvgText("sensitivity-1.svg", "S = ∂ln(signal)/∂ln p (dimensionless)", "pump–probe delay (s)");
        assertSvgText("budget.svg", "1σ contribution relative to the fitted value (%)", "noise of the data",
                "transducer.thickness_m", "total");
    }

    @Test
    void thePageNamesEveryParameterWithValueAndUnitAndShowsTheWarning() throws IOException {
        String html = Files.readString(page);
        assertTrue(html.contains("film.k_through_w_mk (through-plane Λz)"), "says which conductivity it was");
        // values and units are joined by no-break spaces (U+00A0) so that a unit never wraps
        assertTrue(html.contains("1.400 ± 0.070\u00a0W/(m\u00a0K)"), "film conductivity with σ and unit");
        assertTrue(html.contains("(1.20 ± 0.15) × 10⁸\u00a0W/(m²\u00a0K)"), "boundary conductance with σ and unit");
        assertTrue(html.contains("(6.00 ± 0.25) × 10⁻⁶\u00a0m"), "pump radius with σ and unit");
        assertTrue(html.contains("at a bound"), "the pump radius's flag");
        int warnings = html.indexOf("class=\"warnings\"");
        assertTrue(warnings > 0 && html.indexOf(SyntheticFit.WARNING) > warnings, "warning inside its box");
        assertTrue(html.indexOf(SyntheticFit.WARNING) < html.indexOf("Fitted parameters"), "warning comes first");
        assertTrue(html.contains("Monte Carlo") && html.contains("97.5 % percentile"));
        assertTrue(html.contains("Written by Lamella 0.1.0.test on 2026-01-02 03:04:05 UTC"));
        assertTrue(html.contains("laser safety programme"));
    }

    @Test
    void thePageShowsTheInputsAndEscapesTheCaseText() throws IOException {
        String html = Files.readString(page);
        assertTrue(html.contains("Invented film &lt;test&gt; on an invented substrate"));
        assertFalse(html.contains("<test>"));
        assertTrue(html.contains("G to the layer below (W/(m² K))"));
        assertTrue(html.contains("semi-infinite"));
        assertTrue(html.contains("1.630 × 10⁶"), "substrate heat capacity");
        assertTrue(html.contains("fit.datasets[1].measurement.modulation_hz"), "a nested fit key by its path");
    }

    @Test
    void thePageNeedsNoOtherFileAndNoScript() throws IOException {
        String html = Files.readString(page);
        assertFalse(html.contains("<script"));
        assertFalse(html.contains("http://") || html.contains("https://"));
        assertFalse(html.contains("<link"));
        Matcher src = Pattern.compile("src=\"([^\"]*)\"").matcher(html);
        int images = 0;
        while (src.find()) {
            String prefix = "data:image/png;base64,";
            assertTrue(src.group(1).startsWith(prefix), "embedded image");
            BufferedImage image = ImageIO.read(new ByteArrayInputStream(
                    Base64.getDecoder().decode(src.group(1).substring(prefix.length()))));
            assertEquals(960, image.getWidth());
            images++;
        }
        assertEquals(7, images, "fit and residuals of two datasets, two sensitivity plots, the budget");
    }

    @Test
    void theCsvFilesStartWithTheirHeaders() throws IOException {
        assertEquals("parameter,quantity,unit,initial,value,sigma_total,sigma_noise,at_bound,identifiable",
                firstLine("parameters.csv"));
        assertEquals("parameter,film.k_through_w_mk,transducer.conductance_below_w_m2k,geometry.pump_radius_m",
                firstLine("correlation.csv"));
        assertEquals("source,input_sigma,input_unit,parameter,sigma_contribution,parameter_unit,variance_share",
                firstLine("budget.csv"));
        assertEquals("frequency_hz,data_phase_deg,sigma_phase_deg,model_phase_deg,residual_phase_deg,"
                + "normalised_residual", firstLine("dataset-0-fit.csv"));
        assertEquals("delay_s,data_ratio,sigma_ratio,model_ratio,residual_ratio,normalised_residual",
                firstLine("dataset-1-fit.csv"));
        assertEquals("parameter,unit,mean,std,percentile_2_5,percentile_16,percentile_50,percentile_84,"
                + "percentile_97_5,std_over_linearised_sigma", firstLine("montecarlo.csv"));
        assertEquals(1 + SyntheticFit.PHASE_POINTS, lines("dataset-0-fit.csv").size());
        assertEquals(1 + SyntheticFit.RATIO_POINTS, lines("dataset-1-fit.csv").size());
        assertEquals(1 + 3 * 3 + 3, lines("budget.csv").size(), "three sources by three parameters, three totals");
        assertEquals("film.k_through_w_mk,through-plane Λz,W/(m K),1.000000000000e+00,1.400000000000e+00,7.000000000000e-02,"
                + "3.100000000000e-02,false,true", lines("parameters.csv").get(1));
    }

    @Test
    void theJsonRecordHoldsInputsResultsAndSensitivities() throws IOException {
        JsonNode json = new ObjectMapper().readTree(report.resolve("result.json").toFile());
        assertEquals("0.1.0.test", json.at("/written_by/version").asText());
        assertEquals(SyntheticFit.DESCRIPTION, json.at("/case/description").asText());
        assertTrue(json.at("/case/stack/layers/2/semi_infinite").asBoolean());
        assertTrue(json.at("/case/stack/layers/2/thickness_m").isNull(), "no thickness for a semi-infinite layer");
        assertEquals(6.0e-6, json.at("/case/geometry/pump_radius_m").asDouble());
        assertEquals("film.k_through_w_mk", json.at("/fit/parameters/0/name").asText());
        assertEquals("through-plane Λz", json.at("/fit/parameters/0/quantity").asText());
        assertTrue(json.at("/fit/parameters/1/quantity").isMissingNode(), "a boundary conductance needs no words");
        assertEquals("through-plane Λz", json.at("/sensitivities/0/quantities/film.k_through_w_mk").asText());
        assertEquals(1.2e8, json.at("/fit/parameters/1/value").asDouble());
        assertEquals(SyntheticFit.WARNING, json.at("/fit/warnings/0").asText());
        assertEquals(SyntheticFit.RATIO_POINTS, json.at("/fit/datasets/1/model").size());
        assertTrue(json.at("/fit/budget/0/source").isNull(), "the noise line has no source");
        assertEquals(200, json.at("/fit/monte_carlo/samples").asInt());
        assertEquals(2, json.at("/sensitivities").size());
        assertEquals(SyntheticFit.PHASE_POINTS, json.at("/sensitivities/0/values/transducer.thickness_m").size());
    }

    @Test
    void aFolderThatCannotBeMadeGivesAnIOExceptionAndNoFiles(@TempDir Path dir) throws IOException {
        Path occupied = Files.writeString(dir.resolve("occupied"), "a file where the report's parent should be");
        Path folder = occupied.resolve("report");
        assertThrows(IOException.class, () -> writer(WRITTEN).write(SyntheticFit.caseDocument(),
                SyntheticFit.outcome(), SyntheticFit.sensitivities(), folder));
        assertEquals(Set.of("occupied"), names(dir));
    }

    @Test
    void aFailureWhileMovingIntoPlaceLeavesNoTemporaryFile(@TempDir Path folder) throws IOException {
        // A directory with content where the page should go: every file is written, the last move fails.
        Files.createDirectories(folder.resolve("index.html"));
        Files.writeString(folder.resolve("index.html").resolve("keep.txt"), "in the way");
        assertThrows(IOException.class, () -> writer(WRITTEN).write(SyntheticFit.caseDocument(),
                SyntheticFit.outcome(), SyntheticFit.sensitivities(), folder));
        for (String name : names(folder)) {
            assertFalse(name.startsWith(".") || name.endsWith(ReportFiles.TEMPORARY_SUFFIX), name);
        }
        assertTrue(Files.isRegularFile(folder.resolve("index.html").resolve("keep.txt")));
    }

    @Test
    void writingAgainReplacesTheReport(@TempDir Path folder) throws IOException {
        writer(WRITTEN).write(SyntheticFit.caseDocument(), SyntheticFit.outcome(), List.of(), folder);
        Path again = writer(WRITTEN.plusSeconds(3600)).write(SyntheticFit.caseDocument(), SyntheticFit.outcome(),
                List.of(), folder);
        assertTrue(Files.readString(again).contains("2026-01-02 04:04:05 UTC"));
        assertFalse(names(folder).stream().anyMatch(n -> n.startsWith("sensitivity")), "no tables, no plots");
    }

    private static FitReportWriter writer(Instant at) {
        return new FitReportWriter("0.1.0.test", Clock.fixed(at, ZoneOffset.UTC));
    }

    private static Set<String> names(Path dir) throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(p -> p.getFileName().toString()).collect(TreeSet::new, Set::add, Set::addAll);
        }
    }

    private static Document svg(String name) throws Exception {
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setNamespaceAware(true);
        f.setAttribute(XMLConstants.ACCESS_EXTERNAL_DTD, "");
        return f.newDocumentBuilder().parse(report.resolve(name).toFile());
    }

    private static void assertSvgText(String name, String... texts) throws Exception {
        String shown = svg(name).getDocumentElement().getTextContent();
        List<String> missing = new ArrayList<>();
        for (String t : texts) {
            if (!shown.contains(t)) {
                missing.add(t);
            }
        }
        assertEquals(List.of(), missing, name + " lacks text");
    }

    private static String firstLine(String name) throws IOException {
        return lines(name).get(0);
    }

    private static List<String> lines(String name) throws IOException {
        return Files.readAllLines(report.resolve(name), StandardCharsets.UTF_8);
    }
}
