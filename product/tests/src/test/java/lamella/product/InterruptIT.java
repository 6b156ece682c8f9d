package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Ctrl-C (SIGINT) or SIGTERM during a long command, sent to a real launcher process: one line "interrupted" on
 * standard error and nothing after it, exit status 128 + the signal's number, nothing on standard output, no output
 * file and no temporary file left, and never the launcher's words for a runtime that did not come up.
 */
class InterruptIT {

    /** A two-layer FDTR case (values invented for the test, not a check of any physics). */
    private static final String CASE = """
            {
              "stack": {"layers": [
                {"name": "cap", "thickness_m": 9e-8, "k_through_w_mk": 200, "heat_capacity_j_m3k": 2.45e6,
                 "conductance_below_w_m2k": 1.2e8},
                {"name": "base", "k_through_w_mk": 140, "heat_capacity_j_m3k": 1.63e6}]},
              "geometry": {"type": "gaussian", "pump_radius_m": 6e-6, "probe_radius_m": 4e-6},
              "measurement": {"type": "fdtr", "frequencies_hz": [1e4, 3e4, 1e5, 3e5, 1e6, 3e6, 1e7]}%s
            }
            """;
    private static final String FIT = """
            ,
              "fit": {"datasets": [{"data": "data.csv", "signal": "phase_deg"}],
                      "free": [{"layer": "base", "property": "k_through_w_mk"}],
                      "uncertain": [{"geometry": "pump_radius_m", "sigma_relative": 0.03}]}""";

    @TempDir
    static Path home;
    @TempDir
    Path work;

    @BeforeAll
    static void copyRuntime() throws IOException {
        RuntimeCopy.into(home);
    }

    @Test
    void sigtermEndsALongFitWithOneLineAndStatus143() throws Exception {
        interrupt("TERM", 143);
    }

    @Test
    void sigintEndsALongFitWithOneLineAndStatus130() throws Exception {
        interrupt("INT", 130);
    }

    private void interrupt(String signal, int status) throws Exception {
        Files.writeString(work.resolve("plain.json"), CASE.formatted(""));
        Process simulate = launch("simulate", "plain.json", "--out", "data.csv");
        assertTrue(simulate.waitFor(60, TimeUnit.SECONDS), "simulate ended");
        assertEquals(0, simulate.exitValue(), Files.readString(work.resolve("err.txt")));
        Files.writeString(work.resolve("fit.json"), CASE.formatted(FIT));

        Process fit = launch("fit", "fit.json", "--out", "result.json", "--monte-carlo", "1000000", "--threads",
                "1");
        awaitWork(fit);
        assumeFalse(ignores(fit.pid(), signal), "the test's process ignores SIG" + signal + " and so does its"
                + " child; a shell's background job starts that way");
        new ProcessBuilder("kill", "-" + signal, Long.toString(fit.pid())).start().waitFor(10, TimeUnit.SECONDS);
        assertTrue(fit.waitFor(30, TimeUnit.SECONDS), "the launcher ended after SIG" + signal);

        String err = Files.readString(work.resolve("err.txt"), StandardCharsets.UTF_8);
        assertEquals(status, fit.exitValue(), err);
        assertTrue(err.endsWith("lamella: interrupted\n"), "the last line is the interruption: " + err);
        assertEquals(1, err.split("interrupted", -1).length - 1, err);
        assertFalse(err.contains("dispatcher"), err);
        assertFalse(err.contains("Exception"), err);
        assertFalse(err.contains("\tat "), "no stack trace: " + err);
        assertEquals("", Files.readString(work.resolve("out.txt"), StandardCharsets.UTF_8));
        assertFalse(Files.exists(work.resolve("result.json")), "no result of a fit that did not end");
        try (Stream<Path> files = Files.list(work)) {
            List<String> left = files.map(f -> f.getFileName().toString()).filter(n -> n.endsWith(".part")).toList();
            assertEquals(List.of(), left, "no temporary file");
        }
    }

    /** Waits until the fit reports progress, or a few seconds: the runtime is up and the command at work. */
    private void awaitWork(Process p) throws Exception {
        Path err = work.resolve("err.txt");
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(8);
        while (System.nanoTime() < deadline && Files.size(err) == 0) {
            Thread.sleep(50);
        }
        Thread.sleep(500);
        assertTrue(p.isAlive(), "the fit is still at work: " + Files.readString(err));
    }

    /** Whether a process ignores a signal (Linux: the SigIgn mask of /proc/PID/status); false where unknown. */
    private static boolean ignores(long pid, String signal) throws IOException {
        Path status = Path.of("/proc/" + pid + "/status");
        if (!Files.isReadable(status)) {
            return false;
        }
        int number = signal.equals("INT") ? 2 : 15;
        for (String line : Files.readAllLines(status)) {
            if (line.startsWith("SigIgn:")) {
                long mask = Long.parseUnsignedLong(line.substring(7).strip(), 16);
                return (mask & (1L << (number - 1))) != 0;
            }
        }
        return false;
    }

    private Process launch(String... args) throws IOException {
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        command.add("-Djava.awt.headless=true");
        command.add("-Dlamella.cwd=" + work);
        command.add("-jar");
        command.add(home.resolve("lib/lamella.launcher.jar").toString());
        command.addAll(List.of(args));
        return new ProcessBuilder(command).directory(work.toFile())
                .redirectOutput(work.resolve("out.txt").toFile()).redirectError(work.resolve("err.txt").toFile())
                .start();
    }
}
