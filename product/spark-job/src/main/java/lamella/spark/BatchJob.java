package lamella.spark;

import java.io.IOException;
import java.io.PrintStream;
import java.io.Serializable;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.stream.IntStream;
import lamella.api.AtomicText;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.OwnInputs;
import lamella.api.fit.FitSettings;
import lamella.cli.BatchCommand;
import lamella.cli.BatchManifest;
import lamella.cli.BatchRun;
import lamella.materials.PlainLibraries;
import org.apache.spark.SparkException;
import org.apache.spark.TaskContext;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.sql.SparkSession;

/**
 * The batch command as a Spark application: the driver reads the manifest or folder and refuses an output that is an
 * input, exactly as the runtime's command does; Spark gets one element per case (its index), and each task does what
 * the local command does for that case ({@link BatchRun#one}: the result read back when one of the same inputs is
 * there, else fitted on one thread and written); the driver then writes results.csv in the cases' order. A killed
 * or failed run resumes from the results already written. Files must be on a file system every executor sees.
 */
final class BatchJob {

    private BatchJob() {
    }

    /** One case done, with its index in the manifest. */
    record CaseDone(int index, BatchRun.Case result, double seconds) implements Serializable {
    }

    static int run(SparkSession spark, Path input, Path out, int partitions, JobSettings settings, PrintStream stdout,
                   PrintStream err) {
        List<BatchManifest.Entry> entries;
        try {
            entries = BatchManifest.read(input);
        } catch (InputException e) {
            err.println("lamella batch: " + e.getMessage());
            return SparkMain.BAD_INPUT;
        }
        List<Path> libraryFiles = new ArrayList<>();
        PlainLibraries.configuredFolders(settings.facility(), settings.user(), Path.of(settings.base()),
                Path.of(settings.home())).forEach(f -> libraryFiles.addAll(OwnInputs.ofLibraryFolder(f)));
        String refused = BatchCommand.refusal(input, out, entries, libraryFiles);
        if (refused != null) {
            err.println(refused);
            return SparkMain.BAD_INPUT;
        }
        long t0 = System.nanoTime();
        List<CaseDone> done;
        try {
            BatchRun.clearPartials(out);
            done = fitAll(spark, input, out, entries.size(), partitions, settings, err);
            done.sort(Comparator.comparingInt(CaseDone::index));
            List<List<BatchRun.Row>> rows = new ArrayList<>();
            done.forEach(d -> rows.add(d.result().rows()));
            AtomicText.write(out.resolve(BatchRun.TABLE), BatchRun.table(rows));
        } catch (IOException e) {
            err.println("lamella batch: cannot write into " + out + ": " + FileProblems.reason(e));
            return SparkMain.FAILED;
        } catch (UncheckedIOException e) {
            err.println("lamella batch: cannot write into " + out + ": " + FileProblems.reason(e.getCause()));
            return SparkMain.FAILED;
        } catch (SparkException e) {
            err.println("lamella batch: the Spark job failed: " + SparkMain.firstLine(e) + "\nthe cases done are kept"
                    + " in " + out.resolve("results") + "; the same command again fits only the rest");
            return SparkMain.FAILED;
        }
        int fitted = 0;
        int before = 0;
        int failed = 0;
        for (CaseDone d : done) {
            BatchManifest.Entry e = entries.get(d.index());
            err.printf(Locale.ROOT, "batch %d/%d %s: %s (%s)%n", d.index() + 1, entries.size(), e.name(),
                    d.result().said(), BatchRun.duration(d.seconds()));
            switch (d.result().status()) {
                case FITTED -> fitted++;
                case DONE_BEFORE -> before++;
                case FAILED -> failed++;
            }
        }
        double seconds = (System.nanoTime() - t0) * 1e-9;
        stdout.printf(Locale.ROOT, "%d cases: %d fitted, %d already done, %d failed (%s on Spark %s, %s)%n",
                entries.size(), fitted, before, failed, BatchRun.duration(seconds), spark.version(),
                spark.sparkContext().master());
        stdout.println("results: " + out.resolve(BatchRun.TABLE));
        return failed > 0 ? SparkMain.FAILED : SparkMain.OK;
    }

    private static List<CaseDone> fitAll(SparkSession spark, Path input, Path out, int cases, int partitions,
                                         JobSettings settings, PrintStream err) throws SparkException {
        if (cases == 0) {
            return new ArrayList<>();
        }
        JavaSparkContext jsc = JavaSparkContext.fromSparkContext(spark.sparkContext());
        int slices = partitions > 0 ? partitions : Math.max(1, Math.min(cases, 4 * jsc.defaultParallelism()));
        MapJob.Progress progress = new MapJob.Progress(err, slices, 0, "batch");
        spark.sparkContext().addSparkListener(progress);
        String manifest = input.toString();
        String folder = out.toString();
        try {
            return new ArrayList<>(jsc.parallelize(IntStream.range(0, cases).boxed().toList(), slices)
                    .map(i -> fitCase(i, manifest, folder, settings)).collect());
        } catch (Exception e) {
            // Spark throws its checked SparkException without declaring it.
            if (e instanceof SparkException s) {
                throw s;
            }
            throw e;
        } finally {
            spark.sparkContext().removeSparkListener(progress);
        }
    }

    /** Runs in a task: one case as the local command does it, its fit on this task's thread. */
    static CaseDone fitCase(int index, String manifest, String out, JobSettings settings) throws Exception {
        TaskContext context = TaskContext.get();
        if (index == settings.failTask() && context != null && context.attemptNumber() == 0) {
            throw new IllegalStateException("fault injected into the first attempt of case " + index);
        }
        long t0 = System.nanoTime();
        // A small file, read by each task rather than shipped: its entries hold paths of this file system.
        List<BatchManifest.Entry> entries;
        try {
            entries = BatchManifest.read(Path.of(manifest));
        } catch (InputException e) {
            throw new IllegalStateException("the manifest changed while the job ran: " + e.getMessage(), e);
        }
        JobModels models = JobModels.of(settings);
        BatchRun.Case c = BatchRun.one(entries.get(index), models.reader, models.fitter,
                FitSettings.defaults().withThreads(1), Path.of(out));
        return new CaseDone(index, c, (System.nanoTime() - t0) * 1e-9);
    }
}
