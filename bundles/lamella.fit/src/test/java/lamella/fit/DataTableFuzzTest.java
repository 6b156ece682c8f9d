package lamella.fit;

import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Random;
import lamella.api.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The seeded mutation fuzzing of the importers, extended to a fit's data reader: valid normalised data files are
 * damaged in many small ways (bytes flipped, dropped, repeated, cut; tokens parsers trip on spliced in) and read
 * again, x checked as a fit checks it. Reading either succeeds or fails with an InputException that names the file;
 * nothing else escapes. Fixed seeds, so a failure reproduces.
 */
class DataTableFuzzTest {

    private static final int ROUNDS_PER_SAMPLE = 1500;
    private static final String[] TOKENS = {"NaN", "-Infinity", "1e999", "1e-400", ",", ";", "\t", "\n", "\r",
        "\r\n", "\n\n", "#", "\u0000", "\u00b5", "\uFFFD", "\uFEFF", "\"", "-", "e", ".", "0", "1,5", "0x1p3",
        "1.5f", "sigma_", "excluded", "9".repeat(400)};

    @TempDir
    Path dir;

    private static final String[] SAMPLES = {
        "# lamella simulate\nfrequency_hz,re_k_per_w,im_k_per_w,amplitude_k_per_w,phase_deg\n"
            + "1.000000000000e+04,1.5e+04,-2.0e+03,1.51e+04,-7.6\n1.000000000000e+05,9.1e+03,-3.2e+03,9.6e+03,-19.4\n"
            + "1.000000000000e+06,4.0e+03,-2.9e+03,4.9e+03,-35.9\n",
        "delay_s,in_phase,out_of_phase,ratio,sigma_ratio\n1e-10,3.1,-1.2,2.58,0.02\n5e-10,2.2,-1.1,2.0,0.02\n"
            + "2e-9,1.5,-1.0,1.5,0.02\n",
        "\uFEFFfrequency_hz,phase_deg,excluded\r\n1e3,-1.5,0\r\n1e4,-4.2,1\r\n1e5,-12.9,0\r\n"};

    @Test
    void theFitDataReaderFailsOnlyWithInputException() throws Exception {
        Path file = dir.resolve("fuzzed.csv");
        int failures = 0;
        int successes = 0;
        for (int s = 0; s < SAMPLES.length; s++) {
            byte[] sample = SAMPLES[s].getBytes(StandardCharsets.UTF_8);
            Random r = new Random(131L * s + 17);
            for (int round = 0; round < ROUNDS_PER_SAMPLE; round++) {
                byte[] mutated = mutate(sample, r);
                Files.write(file, mutated);
                try {
                    DataTable t = DataTable.read(file);
                    t.checkX(t.names().get(0));
                    successes++;
                } catch (InputException e) {
                    assertTrue(e.getMessage().startsWith(file.toString()), "the error names the file: " + e);
                    failures++;
                } catch (RuntimeException | Error e) {
                    fail("sample " + s + ", round " + round + ": " + e + " on input:\n"
                            + new String(mutated, StandardCharsets.UTF_8), e);
                }
            }
        }
        assertTrue(failures > 100 && successes > 100, failures + " failures and " + successes + " successes: the"
                + " mutations must exercise both paths");
    }

    static byte[] mutate(byte[] in, Random r) {
        byte[] b = in;
        int edits = 1 + r.nextInt(3);
        for (int e = 0; e < edits; e++) {
            int at = b.length == 0 ? 0 : r.nextInt(b.length);
            switch (r.nextInt(6)) {
                case 0 -> {
                    if (b.length > 0) {
                        b = b.clone();
                        b[at] = (byte) r.nextInt(256);
                    }
                }
                case 1 -> b = splice(b, at, Math.min(b.length, at + 1 + r.nextInt(20)), new byte[0]);
                case 2 -> {
                    int end = Math.min(b.length, at + 1 + r.nextInt(60));
                    b = splice(b, at, at, Arrays.copyOfRange(b, at, end));
                }
                case 3 -> b = Arrays.copyOf(b, at);
                case 4 -> b = splice(b, at, at, TOKENS[r.nextInt(TOKENS.length)].getBytes(StandardCharsets.UTF_8));
                default -> {
                    byte[] noise = new byte[1 + r.nextInt(6)];
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
}
