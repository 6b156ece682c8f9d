package lamella.cli.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import lamella.api.InputException;
import lamella.api.data.DataImporter;
import lamella.casefile.CaseFileReader;
import lamella.cli.data.Runs.Run;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A seeded random-mutation fuzz test: valid files of every shipped importer, and the demo case files, are damaged
 * in many small ways (bytes flipped, dropped, repeated, cut, tokens that parsers trip on spliced in) and read again.
 * Reading must either succeed or fail with the documented {@link InputException}; through the import command the
 * status must be 0 or 2, and a failure must leave no output file. Deterministic seeds, so a failure reproduces.
 */
class MutationFuzzTest {

    private static final int ROUNDS_PER_SAMPLE = 600;
    private static final String[] TOKENS = {"NaN", "-Infinity", "1e999", ",", ";", "\t", "\n", "\r", "\n\n",
        "scan 1\n", "scan 2\n", "end\n", "\u0000", "\u00b5", "\uFFFD", "(kHz)", "[ps]", "((", "#", ":", "=", "\"",
        "{", "}", "[", "]", "-", "e", ".", "0", "1,5", "lamella-exchange 1\n", "sigma_", "\\u0000"};

    @TempDir
    Path dir;

    static List<byte[]> dataSamples() throws IOException {
        List<byte[]> samples = new ArrayList<>();
        for (String name : List.of("oxide-film-tdtr.lamx", "oxide-film-fdtr.csv", "fdtr-reference-phase.csv")) {
            byte[] all = Files.readAllBytes(ImportCommandTest.DEMO_RAW.resolve(name));
            samples.add(java.util.Arrays.copyOf(all, Math.min(all.length, 3000)));
        }
        samples.add(("delay [ps]\tX (mV)\tY (mV)\tsd X (mV)\tsd Y (mV)\n-10\t1\t-2\t0.1\t0.1\n10\t3\t-2\t0.1\t0.1\n"
                + "20\t2.5\t-2\t0.1\t0.1\n").getBytes(StandardCharsets.UTF_8));
        return samples;
    }

    static byte[] mutate(byte[] in, Random r) {
        byte[] b = in;
        int edits = 1 + r.nextInt(4);
        for (int e = 0; e < edits; e++) {
            int at = b.length == 0 ? 0 : r.nextInt(b.length);
            switch (r.nextInt(6)) {
                case 0 -> {
                    if (b.length > 0) {
                        b = b.clone();
                        b[at] = (byte) r.nextInt(256);
                    }
                }
                case 1 -> b = splice(b, at, Math.min(b.length, at + 1 + r.nextInt(40)), new byte[0]);
                case 2 -> {
                    int end = Math.min(b.length, at + 1 + r.nextInt(80));
                    b = splice(b, at, at, java.util.Arrays.copyOfRange(b, at, end));
                }
                case 3 -> b = java.util.Arrays.copyOf(b, at);
                case 4 -> b = splice(b, at, at, TOKENS[r.nextInt(TOKENS.length)].getBytes(StandardCharsets.UTF_8));
                default -> {
                    byte[] noise = new byte[1 + r.nextInt(8)];
                    r.nextBytes(noise);
                    b = splice(b, at, at, noise);
                }
            }
        }
        return b;
    }

    private static byte[] splice(byte[] b, int from, int to, byte[] insert) {
        byte[] out = new byte[b.length - (to - from) + insert.length];
        System.arraycopy(b, 0, out, 0, from);
        System.arraycopy(insert, 0, out, from, insert.length);
        System.arraycopy(b, to, out, from + insert.length, b.length - to);
        return out;
    }

    @Test
    void importersFailOnlyWithInputException() throws IOException {
        Path file = dir.resolve("fuzzed.dat");
        int failures = 0;
        int successes = 0;
        List<byte[]> samples = dataSamples();
        for (int s = 0; s < samples.size(); s++) {
            Random r = new Random(31L * s + 7);
            for (int round = 0; round < ROUNDS_PER_SAMPLE; round++) {
                byte[] mutated = mutate(samples.get(s), r);
                Files.write(file, mutated);
                for (DataImporter importer : Runs.shipped()) {
                    try {
                        importer.confidence(file, mutated);
                        importer.read(file);
                        successes++;
                    } catch (InputException e) {
                        assertTrue(e.getMessage().startsWith(file.toString()), "the error names the file: " + e);
                        failures++;
                    } catch (RuntimeException | Error e) {
                        fail("sample " + s + ", round " + round + ", importer " + importer.id() + ": " + e
                                + " on input:\n" + new String(mutated, StandardCharsets.UTF_8), e);
                    }
                }
            }
        }
        assertTrue(failures > 0 && successes > 0, failures + " failures and " + successes + " successes: the"
                + " mutations must exercise both paths");
    }

    @Test
    void theImportCommandWritesAllOrNothing() throws IOException {
        Path file = dir.resolve("fuzzed.dat");
        Path out = dir.resolve("out.csv");
        ImportCommand command = Runs.importCommand();
        List<byte[]> samples = dataSamples();
        int bad = 0;
        for (int s = 0; s < samples.size(); s++) {
            Random r = new Random(97L * s + 3);
            for (int round = 0; round < ROUNDS_PER_SAMPLE / 3; round++) {
                Files.write(file, mutate(samples.get(s), r));
                Files.deleteIfExists(out);
                Run run = Runs.run(command, dir, "fuzzed.dat", "--out", "out.csv");
                if (run.status() == 2) {
                    bad++;
                    assertFalse(Files.exists(out), "sample " + s + ", round " + round + ": output after " + run.err());
                    assertEquals("", run.out());
                    assertTrue(run.err().startsWith("lamella import: "), run.err());
                } else {
                    assertEquals(0, run.status(), "sample " + s + ", round " + round + ": " + run.err());
                    assertTrue(Files.exists(out));
                }
            }
        }
        assertTrue(bad > 0, "no mutation was bad input");
    }

    @Test
    void theCaseFileReaderFailsOnlyWithInputException() throws IOException {
        List<byte[]> cases = new ArrayList<>();
        try (Stream<Path> files = Files.list(Path.of("../../demo-data/cases"))) {
            for (Path p : files.filter(f -> f.toString().endsWith(".json")).sorted().toList()) {
                cases.add(Files.readAllBytes(p));
            }
        }
        assertFalse(cases.isEmpty());
        Path file = dir.resolve("fuzzed.json");
        CaseFileReader reader = new CaseFileReader();
        int failures = 0;
        for (int s = 0; s < cases.size(); s++) {
            Random r = new Random(13L * s + 1);
            for (int round = 0; round < ROUNDS_PER_SAMPLE; round++) {
                byte[] mutated = mutate(cases.get(s), r);
                Files.write(file, mutated);
                try {
                    reader.read(file);
                } catch (InputException e) {
                    failures++;
                } catch (RuntimeException | Error e) {
                    fail("case " + s + ", round " + round + ": " + e + " on input:\n"
                            + new String(mutated, StandardCharsets.UTF_8), e);
                }
            }
        }
        assertTrue(failures > 0, "no mutation was bad input");
    }
}
