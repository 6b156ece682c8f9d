package lamella.cli.data;

import java.io.BufferedWriter;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import lamella.api.data.Dataset;
import lamella.conditioning.ConditionedTable;
import lamella.conditioning.Conditioner;
import lamella.conditioning.ConditioningOptions;
import lamella.conditioning.PhaseCorrection;
import lamella.io.delimited.DelimitedImporter;

/**
 * Prints how fast a 100 000-row delimited TDTR table is read, conditioned and formatted, and the heap it takes: one thread,
 * median of 7 runs after 3 warm-up runs. Not a test (timings are not pass or fail): after {@code mvn test-compile}
 * in this module, run {@code java -cp target/test-classes:target/classes:CLASSPATH lamella.cli.data.ImportBenchmark}
 * with CLASSPATH from {@code mvn dependency:build-classpath -Dmdep.includeScope=test}.
 */
public final class ImportBenchmark {

    private static final int ROWS = 100_000;

    private ImportBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        Path file = Files.createTempFile("lamella-benchmark", ".csv");
        try {
            write(file);
            DelimitedImporter importer = new DelimitedImporter();
            ConditioningOptions options = new ConditioningOptions(PhaseCorrection.fromStep(20e-12),
                    java.util.Optional.empty(), java.util.List.of(), ConditioningOptions.DEFAULT_OUTLIER_LIMIT);
            double[] read = new double[7];
            double[] condition = new double[7];
            double[] csv = new double[7];
            for (int run = -3; run < read.length; run++) {
                long t0 = System.nanoTime();
                Dataset d = importer.read(file);
                long t1 = System.nanoTime();
                ConditionedTable t = Conditioner.condition(d, options);
                long t2 = System.nanoTime();
                DataCsv.format(t);
                long t3 = System.nanoTime();
                if (run >= 0) {
                    read[run] = (t1 - t0) / 1e9;
                    condition[run] = (t2 - t1) / 1e9;
                    csv[run] = (t3 - t2) / 1e9;
                }
            }
            Arrays.sort(read);
            Arrays.sort(condition);
            Arrays.sort(csv);
            Runtime rt = Runtime.getRuntime();
            System.gc();
            long before = rt.totalMemory() - rt.freeMemory();
            Dataset kept = importer.read(file);
            System.gc();
            long after = rt.totalMemory() - rt.freeMemory();
            System.out.printf(Locale.ROOT, "file: %d rows, %.1f MiB%n", kept.scans().get(0).rows(),
                    Files.size(file) / 1048576.0);
            System.out.printf(Locale.ROOT, "read:      median %.3f s  (%.0f rows/s, %.1f MiB/s)%n", read[3],
                    ROWS / read[3], Files.size(file) / 1048576.0 / read[3]);
            System.out.printf(Locale.ROOT, "condition: median %.3f s%n", condition[3]);
            System.out.printf(Locale.ROOT, "CSV text:  median %.3f s%n", csv[3]);
            System.out.printf(Locale.ROOT, "heap held by the dataset: %.1f MiB (%.0f bytes per row)%n",
                    (after - before) / 1048576.0, (double) (after - before) / ROWS);
        } finally {
            Files.delete(file);
        }
    }

    private static void write(Path file) throws IOException {
        try (BufferedWriter w = Files.newBufferedWriter(file, StandardCharsets.UTF_8)) {
            w.write("# benchmark table, invented\ndelay (ps),X (uV),Y (uV),sd X (uV),sd Y (uV)\n");
            for (int i = 0; i < ROWS; i++) {
                double t = -50 + i * 0.05;
                double x = t > 0 ? 10 * Math.exp(-t / 1000) : 0.5;
                w.write(String.format(Locale.ROOT, "%.3f,%.6f,%.6f,0.01,0.01%n", t, x, -7 - 1e-4 * t));
            }
        }
    }
}
