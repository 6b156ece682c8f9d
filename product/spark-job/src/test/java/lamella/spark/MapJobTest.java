package lamella.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.stream.Stream;
import lamella.api.CaseDocument;
import lamella.api.fit.CurveFit;
import lamella.map.MapBlock;
import lamella.map.MapData;
import lamella.map.MapEngine;
import lamella.map.MapJournal;
import lamella.map.MapOutputs;
import org.apache.spark.sql.Row;
import org.apache.spark.sql.SparkSession;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The map job on Spark in local mode inside this JVM, against the local engine on the same data: the invented demo
 * wafer map's first positions (made by Lamella's own model with noise; see demo-data/README.md). The two engines fit
 * the same tiles in the same order from the same starts, so the maps must agree to 1e-9 — in fact bit for bit
 * (common practice, no source).
 */
class MapJobTest {

    static final int POSITIONS = 160;

    @TempDir
    Path dir;

    @AfterEach
    void clearFault() {
        System.clearProperty(JobSettings.FAIL_TASK);
    }

    /** The demo case beside the first {@link #POSITIONS} positions of its map. */
    Path demoCase() throws IOException {
        Path demo = Path.of("../../demo-data/wafer-map");
        Files.copy(demo.resolve("case.json"), dir.resolve("case.json"));
        List<String> lines = Files.readAllLines(demo.resolve("map.csv"));
        List<String> kept = new ArrayList<>();
        Set<String> positions = new HashSet<>();
        for (String line : lines) {
            if (line.startsWith("#") || line.startsWith("x_m")) {
                kept.add(line);
                continue;
            }
            String[] c = line.split(",", -1);
            String key = c[0] + "," + c[1];
            if (positions.contains(key) || positions.size() < POSITIONS) {
                positions.add(key);
                kept.add(line);
            }
        }
        Files.write(dir.resolve("map.csv"), kept);
        return dir.resolve("case.json");
    }

    SparkRun spark(String... args) {
        return SparkRun.in(dir, args);
    }

    /** The same map with the local engine (2 threads), written by the same writer into {@code local}. */
    MapEngine.Result[] local(Path caseFile, Path local) throws Exception {
        JobModels models = JobModels.of(JobSettings.fromSystem());
        CaseDocument doc = models.reader.read(caseFile);
        MapBlock block = MapBlock.read(doc);
        CurveFit fit = models.fitter.curves(doc, block.signal());
        MapData data = MapData.read(block.data(), fit.xColumn(), fit.signal());
        MapEngine.Result[] r = new MapEngine(fit, data.x, 2).run(data.positions, n -> { }, MapJournal.NONE);
        Files.createDirectories(local);
        MapOutputs.write(local, caseFile, data, r, fit, 1.0, "2 threads", 0);
        return r;
    }

    static List<String[]> rows(Path csv) throws IOException {
        List<String> lines = Files.readAllLines(csv);
        List<String[]> rows = new ArrayList<>();
        for (String line : lines.subList(1, lines.size())) {
            rows.add(line.split(",", -1));
        }
        return rows;
    }

    static void assertSameMaps(Path expected, Path actual) throws IOException {
        List<String[]> e = rows(expected);
        List<String[]> a = rows(actual);
        assertEquals(e.size(), a.size());
        for (int i = 0; i < e.size(); i++) {
            assertEquals(e.get(i).length, a.get(i).length);
            for (int c = 0; c < e.get(i).length; c++) {
                String want = e.get(i)[c];
                String got = a.get(i)[c];
                try {
                    double w = Double.parseDouble(want);
                    double g = Double.parseDouble(got);
                    assertEquals(w, g, 1e-9 * Math.max(1, Math.abs(w)), "row " + (i + 1) + " column " + c);
                } catch (NumberFormatException text) {
                    assertEquals(want, got, "row " + (i + 1) + " column " + c);
                }
            }
        }
    }

    @Test
    void equalsTheLocalEngineToTheLastBitAndWritesParquetToo() throws Exception {
        Path caseFile = demoCase();
        local(caseFile, dir.resolve("local"));
        SparkRun r = spark("map", "case.json", "--out", "spark", "--master", "local[2]");
        assertEquals(0, r.status(), r.err());
        assertSameMaps(dir.resolve("local/map.csv"), dir.resolve("spark/map.csv"));
        assertEquals(Files.readString(dir.resolve("local/map.csv")), Files.readString(dir.resolve("spark/map.csv")));
        assertTrue(r.out().contains("Spark 4."), r.out());
        assertTrue(r.out().contains(POSITIONS + " positions"), r.out());
        assertFalse(Files.exists(dir.resolve("spark").resolve(MapJournal.FOLDER)), "journal removed when done");
        for (String image : List.of("film.k_through_w_mk.png", "sigma_film.k_through_w_mk.svg",
                "reduced_chi_square.png")) {
            assertTrue(Files.size(dir.resolve("spark").resolve(image)) > 1000, image);
        }
        // map.parquet holds the table of map.csv.
        List<String[]> csv = rows(dir.resolve("spark/map.csv"));
        SparkSession s = SparkMain.session("read back", "local[1]");
        try {
            List<Row> parquet = s.read().parquet(dir.resolve("spark/map.parquet").toString()).collectAsList();
            assertEquals(csv.size(), parquet.size());
            Row first = parquet.get(0);
            assertEquals(Double.parseDouble(csv.get(0)[0]), first.getDouble(0));
            // map.csv rounds to 12 significant digits; map.parquet keeps every bit.
            assertEquals(Double.parseDouble(csv.get(0)[2]), first.getDouble(2), 1e-11 * first.getDouble(2));
            assertEquals(csv.get(0)[7], first.getString(7));
        } finally {
            s.stop();
        }
    }

    @Test
    void aTaskThatFailsItsFirstAttemptIsRetriedAndEveryPositionAppearsOnce() throws Exception {
        Path caseFile = demoCase();
        local(caseFile, dir.resolve("local"));
        System.setProperty(JobSettings.FAIL_TASK, "1");
        // local[2,3]: two threads, a task may fail three times before the job does.
        SparkRun r = spark("map", "case.json", "--out", "spark", "--master", "local[2,3]");
        assertEquals(0, r.status(), r.err());
        assertSameMaps(dir.resolve("local/map.csv"), dir.resolve("spark/map.csv"));
        Set<String> seen = new HashSet<>();
        for (String[] row : rows(dir.resolve("spark/map.csv"))) {
            assertTrue(seen.add(row[0] + "," + row[1]), "position " + row[0] + "," + row[1] + " twice");
        }
        assertEquals(POSITIONS, seen.size());
    }

    @Test
    void aRunThatFailedResumesFromItsJournalAndEqualsOneRunInOneGo() throws Exception {
        Path caseFile = demoCase();
        local(caseFile, dir.resolve("local"));
        List<int[]> tiles;
        {
            JobModels models = JobModels.of(JobSettings.fromSystem());
            CaseDocument doc = models.reader.read(caseFile);
            CurveFit fit = models.fitter.curves(doc, "phase_deg");
            tiles = MapEngine.tiles(MapData.read(dir.resolve("map.csv"), fit.xColumn(), fit.signal()).positions);
        }
        assertTrue(tiles.size() >= 3, "the test map needs several tiles, has " + tiles.size());
        // No retries (local[1]): the last tile fails, the job fails after the tiles before it are journaled.
        System.setProperty(JobSettings.FAIL_TASK, Integer.toString(tiles.size() - 1));
        SparkRun failed = spark("map", "case.json", "--out", "spark", "--master", "local[1]", "--partitions",
                Integer.toString(tiles.size()));
        assertEquals(1, failed.status(), failed.err());
        assertTrue(failed.err().contains("the same command again fits only the rest"), failed.err());
        assertFalse(Files.exists(dir.resolve("spark/map.csv")), "no map before every tile is done");
        long journaled;
        try (Stream<Path> s = Files.list(dir.resolve("spark").resolve(MapJournal.FOLDER))) {
            journaled = s.filter(p -> p.getFileName().toString().startsWith("tile-")).count();
        }
        assertEquals(tiles.size() - 1, journaled);
        System.clearProperty(JobSettings.FAIL_TASK);
        SparkRun resumed = spark("map", "case.json", "--out", "spark", "--master", "local[2]");
        assertEquals(0, resumed.status(), resumed.err());
        assertTrue(resumed.out().contains("read back"), resumed.out());
        assertEquals(Files.readString(dir.resolve("local/map.csv")), Files.readString(dir.resolve("spark/map.csv")));
    }

    @Test
    void aJobKilledOutrightResumesAndEqualsOneRunInOneGo() throws Exception {
        Path caseFile = demoCase();
        local(caseFile, dir.resolve("local"));
        // The job in a JVM of its own on one thread, killed (SIGKILL) once its first tile is journaled.
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java")
                .toString()));
        command.addAll(List.of(System.getProperty("lamella.test.spark-opens", "").split(" ")));
        command.removeIf(String::isBlank);
        command.addAll(List.of("-cp", System.getProperty("java.class.path"), "-D" + JobSettings.CWD + "=" + dir,
                "lamella.spark.SparkMain", "map", "case.json", "--out", "spark", "--threads", "1", "--partitions",
                "64"));
        Process job = new ProcessBuilder(command).directory(dir.toFile()).redirectErrorStream(true)
                .redirectOutput(dir.resolve("killed.log").toFile()).start();
        Path journal = dir.resolve("spark").resolve(MapJournal.FOLDER);
        long deadline = System.nanoTime() + 240_000_000_000L;
        while (tiles(journal) == 0 && job.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(50);
        }
        assertTrue(job.isAlive(), "the job ended before it could be killed: " + Files.readString(
                dir.resolve("killed.log")));
        job.destroyForcibly().waitFor();
        long kept = tiles(journal);
        assertTrue(kept >= 1, "a tile journaled before the kill");
        assertFalse(Files.exists(dir.resolve("spark/map.csv")), "no map from a killed run");
        SparkRun resumed = spark("map", "case.json", "--out", "spark", "--master", "local[2]");
        assertEquals(0, resumed.status(), resumed.err());
        assertTrue(resumed.out().contains("read back"), resumed.out());
        assertEquals(Files.readString(dir.resolve("local/map.csv")), Files.readString(dir.resolve("spark/map.csv")));
    }

    static long tiles(Path journal) throws IOException {
        if (!Files.isDirectory(journal)) {
            return 0;
        }
        try (Stream<Path> s = Files.list(journal)) {
            return s.filter(p -> p.getFileName().toString().startsWith("tile-")
                    && p.getFileName().toString().endsWith(".txt")).count();
        }
    }

    @Test
    void parquetMapDataGiveTheSameMapAsTheirCsv() throws Exception {
        Path caseFile = demoCase();
        local(caseFile, dir.resolve("local"));
        SparkSession s = SparkMain.session("write parquet", "local[1]");
        try {
            s.read().option("header", "true").option("comment", "#").option("inferSchema", "true")
                    .csv(dir.resolve("map.csv").toString()).write().parquet(dir.resolve("map.parquet").toString());
        } finally {
            s.stop();
        }
        Files.writeString(caseFile, Files.readString(caseFile).replace("\"data\": \"map.csv\"",
                "\"data\": \"map.parquet\""));
        SparkRun r = spark("map", "case.json", "--out", "spark", "--master", "local[2]");
        assertEquals(0, r.status(), r.err());
        assertEquals(Files.readString(dir.resolve("local/map.csv")), Files.readString(dir.resolve("spark/map.csv")));
    }

    @Test
    void parquetWithoutTheSignalColumnIsRefusedAtTheFile() throws Exception {
        Path caseFile = demoCase();
        SparkSession s = SparkMain.session("write parquet", "local[1]");
        try {
            s.read().option("header", "true").option("comment", "#").option("inferSchema", "true")
                    .csv(dir.resolve("map.csv").toString()).drop("phase_deg")
                    .write().parquet(dir.resolve("map.parquet").toString());
        } finally {
            s.stop();
        }
        Files.writeString(caseFile, Files.readString(caseFile).replace("\"data\": \"map.csv\"",
                "\"data\": \"map.parquet\""));
        SparkRun r = spark("map", "case.json", "--out", "spark", "--master", "local[1]");
        assertEquals(2, r.status(), r.err());
        assertTrue(r.err().contains("map.parquet") && r.err().contains("phase_deg"), r.err());
        assertFalse(Files.exists(dir.resolve("spark/map.csv")));
    }

    @Test
    void aLayerFromTheFacilityLibraryIsReadWhereTheRuntimeWouldReadIt() throws Exception {
        Path caseFile = demoCase();
        String film = "{\"name\": \"film\", \"thickness_m\": 4.0e-7, \"k_through_w_mk\": 1.3, \"heat_capacity_j_m3k\": 1.9e6}";
        String json = Files.readString(caseFile);
        assertTrue(json.contains(film), "the demo case's film layer changed");
        Files.writeString(caseFile, json.replace(film,
                "{\"name\": \"film\", \"thickness_m\": 4.0e-7, \"material\": \"fh-pecvd-oxide\"}"));
        SparkRun missing = spark("map", "case.json", "--out", "spark", "--master", "local[1]");
        assertEquals(2, missing.status(), missing.err());
        assertTrue(missing.err().contains("fh-pecvd-oxide"), missing.err());
        // The invented demo facility library, configured as the runtime's setting would configure it.
        System.setProperty("lamella.materials.facility",
                Path.of("../../demo-data/materials/fenwick-hall").toAbsolutePath().toString());
        try {
            SparkRun r = spark("map", "case.json", "--out", "spark", "--master", "local[2]");
            assertEquals(0, r.status(), r.err());
            assertTrue(Files.readAllLines(dir.resolve("spark/map.csv")).size() == POSITIONS + 1);
        } finally {
            System.clearProperty("lamella.materials.facility");
        }
    }

    @Test
    void badUsageIsRefusedBeforeSparkStarts() {
        SparkRun none = spark("map", "case.json");
        assertEquals(2, none.status());
        assertTrue(none.err().contains("--out DIR is needed"), none.err());
        SparkRun parts = spark("map", "case.json", "--out", "o", "--partitions", "0");
        assertEquals(2, parts.status());
        assertTrue(parts.err().contains("--partitions expects a whole number"), parts.err());
        SparkRun job = spark("unmix", "x");
        assertEquals(2, job.status());
        assertTrue(job.err().contains("which job?"), job.err());
    }
}
