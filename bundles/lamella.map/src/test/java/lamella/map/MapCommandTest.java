package lamella.map;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Random;
import lamella.api.CaseDocument;
import lamella.api.command.CommandIO;
import lamella.api.fit.CurveFit;
import lamella.api.fit.FitOutcome;
import lamella.casefile.CaseFileReader;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code lamella map} with the real case format and fitter on maps made by Lamella's own model with seeded noise (the
 * values that made them are known, so the fitted maps are checked against them: common practice, no source).
 */
class MapCommandTest {

    static final double[] F = {1e5, 3e5, 1e6, 3e6, 1e7, 2e7};
    static final double NOISE = 0.1;

    @TempDir
    Path dir;

    record Run(int status, String out, String err) {
    }

    /** A case like the demo's, naming map data {@code data}. */
    Path caseFile(String data) throws IOException {
        String json = Files.readString(Path.of("../../demo-data/wafer-map/case.json"))
                .replace("\"data\": \"map.csv\"", "\"data\": \"" + data + "\"");
        return Files.writeString(dir.resolve("case.json"), json);
    }

    /** The film's conductivity rises along x, the conductance along y. */
    static double[] field(double x, double y) {
        return new double[] {1.0 + 2e4 * x, 8e7 + 2e11 * y};
    }

    String gridTable(int nx, int ny) throws Exception {
        CaseDocument doc = SyntheticMap.read(caseFile("grid.csv"));
        return SyntheticMap.table(doc, SyntheticMap.grid(nx, ny, 5e-6, 0, 0), MapCommandTest::field, F, NOISE, 3,
                "# invented test map\n");
    }

    Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        CommandIO io = new CommandIO(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir);
        int status = new MapCommand(new CaseFileReader(), SyntheticMap.fitter()).run(List.of(args), io);
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    static List<String[]> rows(Path mapCsv) throws IOException {
        List<String[]> rows = new ArrayList<>();
        for (String line : Files.readAllLines(mapCsv).subList(1, Files.readAllLines(mapCsv).size())) {
            rows.add(line.split(",", -1));
        }
        return rows;
    }

    @Test
    void fitsEveryPositionOfAGridAndDrawsItsMaps() throws Exception {
        SyntheticMap.write(dir.resolve("grid.csv"), gridTable(6, 5));
        Run r = run("case.json", "--out", "out", "--threads", "2");

        assertEquals(0, r.status(), r.err());
        Path out = dir.resolve("out");
        List<String> lines = Files.readAllLines(out.resolve("map.csv"));
        assertEquals("x_m,y_m,film.k_through_w_mk,sigma_film.k_through_w_mk,transducer.conductance_below_w_m2k,"
                + "sigma_transducer.conductance_below_w_m2k,reduced_chi_square,status,message", lines.get(0));
        List<String[]> rows = rows(out.resolve("map.csv"));
        assertEquals(30, rows.size());
        int within = 0;
        for (String[] c : rows) {
            assertFalse(c[7].equals("failed"), String.join(",", c));
            double[] truth = field(Double.parseDouble(c[0]), Double.parseDouble(c[1]));
            double k = Double.parseDouble(c[2]);
            double sk = Double.parseDouble(c[3]);
            double g = Double.parseDouble(c[4]);
            double sg = Double.parseDouble(c[5]);
            // the data were made with these values: a fit within 4σ of them (common practice, no source)
            assertTrue(Math.abs(k - truth[0]) < 4 * sk, "k " + k + " ± " + sk + " vs " + truth[0]);
            assertTrue(Math.abs(g - truth[1]) < 4 * sg, "G " + g + " ± " + sg + " vs " + truth[1]);
            if (Math.abs(k - truth[0]) < 2 * sk) {
                within++;
            }
        }
        assertTrue(within >= 24, "about 95 % of the positions within 2σ: " + within + " of 30");
        for (String stem : List.of("film.k_through_w_mk", "sigma_film.k_through_w_mk",
                "transducer.conductance_below_w_m2k", "sigma_transducer.conductance_below_w_m2k",
                "reduced_chi_square")) {
            byte[] png = Files.readAllBytes(out.resolve(stem + ".png"));
            assertEquals((byte) 0x89, png[0], stem);
            assertEquals('P', png[1], stem);
            String svg = Files.readString(out.resolve(stem + ".svg"));
            assertTrue(svg.startsWith("<?xml") && svg.contains("<svg"), stem);
            assertTrue(svg.contains(" µm</"), stem + ": a scale bar labelled in µm");
            assertTrue(svg.contains("x (µm)"), stem);
        }
        assertTrue(Files.readString(out.resolve("film.k_through_w_mk.svg")).contains("film.k_through_w_mk (W/(m K))"),
                "the colour bar names the quantity and its unit");
        assertTrue(r.out().contains("30 positions, 6 frequency_hz values each"), r.out());
        assertTrue(r.out().matches("(?s).*ok \\d+, with warnings \\d+, failed 0;.*"), r.out());
        assertTrue(Files.readString(out.resolve("summary.txt")).contains("film.k_through_w_mk"), r.out());
    }

    @Test
    void theResultDoesNotDependOnTheThreadsAndAgreesWithFitsFromTheCaseStart() throws Exception {
        SyntheticMap.write(dir.resolve("grid.csv"), gridTable(9, 9));
        assertEquals(0, run("case.json", "--out", "one", "--threads", "1").status());
        assertEquals(0, run("case.json", "--out", "two", "--threads", "2").status());
        assertArrayEquals(Files.readAllBytes(dir.resolve("one/map.csv")), Files.readAllBytes(dir.resolve("two/map.csv")));

        CaseDocument doc = new CaseFileReader().read(dir.resolve("case.json"));
        CurveFit fit = SyntheticMap.fitter().curves(doc, null);
        MapData data = MapData.read(dir.resolve("grid.csv"), "frequency_hz", "phase_deg");
        List<String[]> rows = rows(dir.resolve("one/map.csv"));
        int fromNeighbour = 0;
        MapEngine.Result[] results = new MapEngine(fit, data.x, 1).run(data.positions, n -> { });
        for (int i = 0; i < data.positions.size(); i++) {
            MapData.Position p = data.positions.get(i);
            FitOutcome plain = fit.fit(data.x, p.y(), p.sigma(), null);
            for (int a = 0; a < 2; a++) {
                double v = Double.parseDouble(rows.get(i)[2 + 2 * a]);
                // a start from the neighbour reaches the minimum a start from the case reaches: within 1 % of σ
                assertTrue(Math.abs(v - plain.parameters().get(a).value()) < 0.01 * plain.parameters().get(a).sigma(),
                        i + ": " + v + " vs " + plain.parameters().get(a).value());
            }
            if (results[i].fromNeighbour()) {
                fromNeighbour++;
            }
        }
        assertTrue(fromNeighbour > data.positions.size() / 2, "most positions start from a neighbour: "
                + fromNeighbour);
    }

    @Test
    void scatteredPositionsInAnyOrder() throws Exception {
        CaseDocument doc = SyntheticMap.read(caseFile("scattered.csv"));
        Random rng = new Random(11);
        List<SyntheticMap.Spot> spots = new ArrayList<>();
        for (int i = 0; i < 25; i++) {
            spots.add(new SyntheticMap.Spot(rng.nextDouble() * 4e-5, rng.nextDouble() * 3e-5));
        }
        String table = SyntheticMap.table(doc, spots, MapCommandTest::field, F, NOISE, 4, "");
        List<String> lines = new ArrayList<>(List.of(table.split("\n")));
        String header = lines.remove(0);
        Collections.shuffle(lines, new Random(5));
        Files.writeString(dir.resolve("scattered.csv"), header + "\n" + String.join("\n", lines) + "\n");

        Run r = run("case.json", "--out", "out");

        assertEquals(0, r.status(), r.err());
        List<String[]> rows = rows(dir.resolve("out/map.csv"));
        assertEquals(25, rows.size());
        for (String[] c : rows) {
            double[] truth = field(Double.parseDouble(c[0]), Double.parseDouble(c[1]));
            assertTrue(Math.abs(Double.parseDouble(c[2]) - truth[0]) < 4 * Double.parseDouble(c[3]),
                    String.join(",", c));
        }
    }

    @Test
    void badPositionsAreReportedAndTheRestGoOn() throws Exception {
        List<String> lines = new ArrayList<>(List.of(gridTable(4, 3).split("\n")));
        // lines: 0 comment, 1 header, then 6 rows per position; file line = index + 1
        String[] c = lines.get(2 + 6 * 1 + 2).split(",");
        lines.set(2 + 6 * 1 + 2, c[0] + "," + c[1] + "," + c[2] + ",NaN," + c[4]);
        lines.set(2 + 6 * 2 + 3, lines.get(2 + 6 * 2 + 2));
        lines.remove(2 + 6 * 3 + 5);
        String[] d = lines.get(2 + 6 * 4 + 4).split(",");
        lines.set(2 + 6 * 4 + 4, d[0] + "," + d[1] + ",4.5e6," + d[3] + "," + d[4]);
        Files.writeString(dir.resolve("grid.csv"), String.join("\n", lines) + "\n");

        Run r = run("case.json", "--out", "out");

        assertEquals(0, r.status(), r.err());
        List<String[]> rows = rows(dir.resolve("out/map.csv"));
        assertEquals(12, rows.size());
        assertEquals("ok", rows.get(0)[7]);
        assertEquals("failed", rows.get(1)[7]);
        assertTrue(rows.get(1)[8].contains("line 11: phase_deg 'NaN' is not a finite number"), rows.get(1)[8]);
        assertEquals("failed", rows.get(2)[7]);
        assertTrue(rows.get(2)[8].contains("appears twice (lines 17 and 18)"), rows.get(2)[8]);
        assertEquals("failed", rows.get(3)[7]);
        assertTrue(rows.get(3)[8].contains("too few points: 5 of the map's 6 frequency_hz values"), rows.get(3)[8]);
        assertEquals("failed", rows.get(4)[7]);
        assertTrue(rows.get(4)[8].contains("values differ from the map's"), rows.get(4)[8]);
        assertEquals("", rows.get(1)[2], "no value for a failed position");
        for (int i = 5; i < 12; i++) {
            assertFalse(rows.get(i)[7].equals("failed"), String.join(",", rows.get(i)));
        }
        assertTrue(r.out().contains("failed 4"), r.out());
        assertTrue(Files.readString(dir.resolve("out/film.k_through_w_mk.svg")).contains("no value (marked ×)"));
    }

    @Test
    void aBrokenFileIsBadInputAtItsLineAndNothingIsWritten() throws Exception {
        caseFile("grid.csv");
        String good = gridTable(3, 2);
        Files.writeString(dir.resolve("grid.csv"), good.replace("x_m,y_m,frequency_hz,phase_deg",
                "x_m,y_m,freq_hz,phase_deg"));
        Run missing = run("case.json", "--out", "out");
        assertEquals(2, missing.status());
        assertTrue(missing.err().contains("grid.csv:2: no column 'frequency_hz'"), missing.err());

        List<String> lines = new ArrayList<>(List.of(good.split("\n")));
        lines.set(4, lines.get(4) + ",7");
        Files.writeString(dir.resolve("grid.csv"), String.join("\n", lines) + "\n");
        Run ragged = run("case.json", "--out", "out");
        assertEquals(2, ragged.status());
        assertTrue(ragged.err().contains("grid.csv:5: the row has 6 cells; the header (line 2) has 5"), ragged.err());

        lines = new ArrayList<>(List.of(good.split("\n")));
        lines.set(6, "abc" + lines.get(6).substring(lines.get(6).indexOf(',')));
        Files.writeString(dir.resolve("grid.csv"), String.join("\n", lines) + "\n");
        Run position = run("case.json", "--out", "out");
        assertEquals(2, position.status());
        assertTrue(position.err().contains("grid.csv:7: column 'x_m': 'abc' is not a finite number"),
                position.err());

        Files.writeString(dir.resolve("case.json"), Files.readString(dir.resolve("case.json"))
                .replace("\"signal\": \"phase_deg\"", "\"signal\": \"phase_deg\", \"dta\": 1"));
        Run typo = run("case.json", "--out", "out");
        assertEquals(2, typo.status());
        assertTrue(typo.err().contains("case.json:24: map.dta: unknown key in the map block (did you mean 'data'?)"),
                typo.err());
        assertFalse(Files.exists(dir.resolve("out")), "nothing was written");
    }

    @Test
    void anOutputThatIsAnInputIsRefused() throws Exception {
        SyntheticMap.write(dir.resolve("map.csv"), gridTable(3, 2));
        caseFile("map.csv");
        byte[] before = Files.readAllBytes(dir.resolve("map.csv"));

        Run r = run("case.json", "--out", ".");

        assertEquals(2, r.status());
        assertTrue(r.err().contains("would overwrite its own input"), r.err());
        assertArrayEquals(before, Files.readAllBytes(dir.resolve("map.csv")));
    }

    @Test
    void anInterruptedMapKeepsItsFinishedTilesAndTheNextRunFitsOnlyTheRest() throws Exception {
        SyntheticMap.write(dir.resolve("grid.csv"), gridTable(16, 8));
        assertEquals(0, run("case.json", "--out", "whole", "--threads", "1").status());

        Path journal = dir.resolve("part/" + MapJournal.FOLDER);
        Thread worker = new Thread(() -> run("case.json", "--out", "part", "--threads", "1"));
        worker.start();
        while (worker.isAlive() && tilesIn(journal) == 0) {
            Thread.sleep(20);
        }
        worker.interrupt();
        worker.join();
        long kept = tilesIn(journal);
        assertTrue(kept >= 1, "the finished tile is kept");
        assertFalse(Files.exists(dir.resolve("part/map.csv")), "no map until every tile is done");

        Run resumed = run("case.json", "--out", "part", "--threads", "2");

        assertEquals(0, resumed.status(), resumed.err());
        assertTrue(resumed.out().matches("(?s).*resumed: \\d+ positions read back from the earlier run's journal.*"),
                resumed.out());
        assertArrayEquals(Files.readAllBytes(dir.resolve("whole/map.csv")),
                Files.readAllBytes(dir.resolve("part/map.csv")), "nothing lost, nothing twice, the same values");
        assertFalse(Files.exists(journal), "the journal goes once the map is written");
    }

    @Test
    void aJournalOfOtherInputsIsNotUsed() throws Exception {
        SyntheticMap.write(dir.resolve("grid.csv"), gridTable(4, 3));
        Path journal = dir.resolve("out/" + MapJournal.FOLDER);
        Files.createDirectories(journal);
        Files.writeString(journal.resolve("inputs.sha256"), "0123\n");
        Files.writeString(journal.resolve("tile-000000.txt"), "# something else\n");

        Run r = run("case.json", "--out", "out");

        assertEquals(0, r.status(), r.err());
        assertFalse(r.out().contains("resumed"), r.out());
        assertEquals(12, rows(dir.resolve("out/map.csv")).size());
        assertFalse(Files.exists(journal));
    }

    @Test
    void parquetDataAreLeftToTheSparkEngine() throws Exception {
        caseFile("map.parquet");
        Files.writeString(dir.resolve("map.parquet"), "PAR1");
        Run r = run("case.json", "--out", "out");
        assertEquals(2, r.status());
        assertTrue(r.err().contains("map.data: 'map.parquet' is Parquet, which the Spark engine reads"), r.err());
        Run spark = run("case.json", "--out", "out", "--engine", "spark");
        assertEquals(2, spark.status());
        assertTrue(spark.err().contains("./lamella map CASE.json --out DIR --engine spark"), spark.err());
        assertFalse(Files.exists(dir.resolve("out")), "nothing was written");
    }

    static long tilesIn(Path journal) throws IOException {
        if (!Files.isDirectory(journal)) {
            return 0;
        }
        try (var files = Files.list(journal)) {
            return files.filter(f -> f.getFileName().toString().matches("tile-\\d+\\.txt")).count();
        }
    }
}
