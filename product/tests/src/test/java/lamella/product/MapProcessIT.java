package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code lamella map} through the launcher on the first positions of the demo wafer map: the map bundle, the fitter
 * and the charts bundle work together in the assembled runtime and write the table, every image and the summary.
 */
class MapProcessIT {

    private static final int POSITIONS = 24;

    @TempDir
    Path home;
    @TempDir
    Path work;

    @Test
    void mapsTheFirstPositionsOfTheDemoWafer() throws Exception {
        RuntimeCopy.into(home);
        Path demo = Path.of("../../demo-data/wafer-map").toAbsolutePath().normalize();
        Files.copy(demo.resolve("case.json"), work.resolve("case.json"));
        List<String> kept = new ArrayList<>();
        Set<String> positions = new LinkedHashSet<>();
        for (String line : Files.readAllLines(demo.resolve("map.csv"))) {
            if (line.startsWith("#") || line.startsWith("x_m")) {
                kept.add(line);
                continue;
            }
            String[] c = line.split(",");
            positions.add(c[0] + "," + c[1]);
            if (positions.size() > POSITIONS) {
                break;
            }
            kept.add(line);
        }
        Files.write(work.resolve("map.csv"), kept);

        List<String> command = List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Djava.awt.headless=true", "-Dlamella.cwd=" + work, "-jar",
                home.resolve("lib/lamella.launcher.jar").toString(), "map", "case.json", "--out", "out");
        Process p = new ProcessBuilder(command).directory(work.toFile())
                .redirectOutput(work.resolve("out.txt").toFile()).redirectError(work.resolve("err.txt").toFile())
                .start();
        assertTrue(p.waitFor(240, TimeUnit.SECONDS), "the map did not finish within 240 s");
        String out = Files.readString(work.resolve("out.txt"), StandardCharsets.UTF_8);
        String err = Files.readString(work.resolve("err.txt"), StandardCharsets.UTF_8);

        assertEquals(0, p.exitValue(), err);
        assertTrue(out.contains(POSITIONS + " positions, 6 frequency_hz values each"), out);
        assertEquals(POSITIONS + 1, Files.readAllLines(work.resolve("out/map.csv")).size());
        for (String stem : List.of("film.k_through_w_mk", "sigma_film.k_through_w_mk",
                "transducer.conductance_below_w_m2k", "sigma_transducer.conductance_below_w_m2k",
                "reduced_chi_square")) {
            assertTrue(Files.size(work.resolve("out/" + stem + ".png")) > 1000, stem);
            assertTrue(Files.readString(work.resolve("out/" + stem + ".svg")).contains("µm"), stem);
        }
        assertTrue(Files.readString(work.resolve("out/summary.txt")).contains("film.k_through_w_mk"));
    }
}
