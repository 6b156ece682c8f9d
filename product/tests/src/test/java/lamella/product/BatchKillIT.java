package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code lamella batch} killed as a process (no chance to clean up) after its first result, then run again: it skips
 * what was done, fits the rest, and every case has exactly one complete result.
 */
class BatchKillIT {

    private static final int CASES = 10;

    @TempDir
    Path home;
    @TempDir
    Path work;

    @Test
    void aKilledBatchResumesAndLosesNothing() throws Exception {
        RuntimeCopy.into(home);
        Path demo = Path.of("../../demo-data/oxide-film-joint").toAbsolutePath().normalize();
        Path cases = Files.createDirectories(work.resolve("cases"));
        for (String data : List.of("tdtr-9.8mhz.csv", "tdtr-1.1mhz.csv", "fdtr.csv")) {
            Files.copy(demo.resolve(data), cases.resolve(data));
        }
        for (int i = 0; i < CASES; i++) {
            Files.copy(demo.resolve("case.json"), cases.resolve(String.format("sample-%02d.json", i)));
        }
        Path results = work.resolve("out/results");

        Process first = start();
        boolean some = Eventually.within(Duration.ofSeconds(120), () -> count(results) >= 1);
        first.destroyForcibly().waitFor(30, TimeUnit.SECONDS);
        assertTrue(some, "no result within 120 s");
        int doneBefore = count(results);
        assertTrue(doneBefore < CASES, "the kill came before the end (" + doneBefore + " of " + CASES + ")");

        Process second = start();
        assertTrue(second.waitFor(300, TimeUnit.SECONDS), "the resumed run did not finish within 300 s");
        String out = Files.readString(work.resolve("second.out"), StandardCharsets.UTF_8);
        String err = Files.readString(work.resolve("second.err"), StandardCharsets.UTF_8);

        assertEquals(0, second.exitValue(), err);
        assertTrue(out.startsWith(CASES + " cases: " + (CASES - doneBefore) + " fitted, " + doneBefore
                + " already done, 0 failed"), out + err);
        assertEquals(CASES, count(results));
        try (Stream<Path> s = Files.list(results)) {
            assertEquals(List.of(), s.map(p -> p.getFileName().toString()).filter(n -> n.startsWith("."))
                    .toList(), "no partial file is left");
        }
        List<String> table = Files.readAllLines(work.resolve("out/results.csv"));
        assertEquals(1 + 3 * CASES, table.size(), "three free inputs per case: " + table);
    }

    private static int count(Path results) {
        if (!Files.isDirectory(results)) {
            return 0;
        }
        try (Stream<Path> s = Files.list(results)) {
            return (int) s.filter(p -> p.getFileName().toString().matches("sample-\\d+\\.json")).count();
        } catch (IOException e) {
            return 0;
        }
    }

    private int runs;

    private Process start() throws IOException {
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        command.add("-Djava.awt.headless=true");
        command.add("-Dlamella.cwd=" + work);
        command.add("-jar");
        command.add(home.resolve("lib/lamella.launcher.jar").toString());
        command.addAll(List.of("batch", "cases", "--out", "out", "--threads", "1"));
        String name = runs++ == 0 ? "first" : "second";
        return new ProcessBuilder(command).directory(work.toFile())
                .redirectOutput(work.resolve(name + ".out").toFile())
                .redirectError(work.resolve(name + ".err").toFile()).start();
    }
}
