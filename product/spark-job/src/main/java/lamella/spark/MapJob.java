package lamella.spark;

import java.io.IOException;
import java.io.PrintStream;
import java.io.Serializable;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicInteger;
import lamella.api.CaseDocument;
import lamella.api.InputException;
import lamella.api.OwnInputs;
import lamella.api.fit.CurveFit;
import lamella.map.MapBlock;
import lamella.map.MapData;
import lamella.map.MapEngine;
import lamella.map.MapJournal;
import lamella.map.MapOutputs;
import org.apache.spark.SparkException;
import org.apache.spark.TaskContext;
import org.apache.spark.api.java.JavaSparkContext;
import org.apache.spark.scheduler.SparkListener;
import org.apache.spark.scheduler.SparkListenerTaskEnd;
import org.apache.spark.sql.SparkSession;

/**
 * The map command as a Spark application: the driver reads the case and the map data (CSV or Parquet), cuts the
 * positions into the local engine's tiles and gives Spark one element per tile not yet in the journal; each task fits
 * its tile with {@link MapEngine#fitTile} — the same code, starts and order as the local engine, so the map is the
 * same to the last bit — and writes it into the journal before returning it. A task that fails is retried by Spark;
 * a tile's result is taken once, from the attempt that finished. The driver writes map.csv, map.parquet, the images and
 * the summary when every tile is in. Case file, data, libraries and the output folder must be on a file system every
 * executor sees (always so in local mode).
 */
final class MapJob {

    private MapJob() {
    }

    /** One tile to fit: its index in the tiling and its positions in the order they are fitted. */
    record TileTask(int index, List<MapData.Position> positions) implements Serializable {
    }

    /** A tile fitted. */
    record TileDone(int index, MapEngine.Result[] results) implements Serializable {
    }

    static int run(SparkSession spark, Path caseFile, Path out, int partitions, JobSettings settings, PrintStream stdout,
                   PrintStream err) {
        JobModels models = JobModels.of(settings);
        try {
            CaseDocument doc = models.reader.read(caseFile);
            MapBlock block = MapBlock.read(doc);
            CurveFit fit = models.fitter.curves(doc, block.signal());
            List<Path> inputs = new ArrayList<>(OwnInputs.ofCase(caseFile));
            inputs.add(block.data());
            List<Path> outputs = new ArrayList<>(MapOutputs.files(out, fit));
            outputs.add(out.resolve(ParquetMaps.TABLE));
            for (Path f : outputs) {
                Path clash = OwnInputs.clash(f, inputs);
                if (clash != null) {
                    err.println(OwnInputs.message("map", out, clash));
                    return SparkMain.BAD_INPUT;
                }
            }
            long t0 = System.nanoTime();
            MapData data = MapBlock.isParquet(block.data())
                    ? ParquetMaps.read(spark, block.data(), fit.xColumn(), fit.signal())
                    : MapData.read(block.data(), fit.xColumn(), fit.signal());
            fit.check(data.x, data.hasSigma, "map.data");
            MapJournal journal = MapJournal.open(out, MapJournal.fingerprint(inputs));
            MapEngine.Result[] results = fitAll(spark, caseFile, fit, data, journal, partitions, settings, err);
            double seconds = (System.nanoTime() - t0) * 1e-9;
            String engine = "Spark " + spark.version() + " on " + spark.sparkContext().master();
            String summary = MapOutputs.write(out, doc.file(), data, results, fit, seconds, engine,
                    journal.positionsReadBack());
            ParquetMaps.write(spark, out, data, results, fit);
            journal.remove();
            stdout.print(summary);
            stdout.println("results: " + out.resolve(MapOutputs.TABLE) + " and " + out.resolve(ParquetMaps.TABLE));
            return MapOutputs.anyFitted(results) ? SparkMain.OK : SparkMain.FAILED;
        } catch (InputException e) {
            err.println("lamella map: " + e.getMessage());
            return SparkMain.BAD_INPUT;
        } catch (IOException | UncheckedIOException e) {
            err.println("lamella map: cannot write into " + out + ": " + e.getMessage());
            return SparkMain.FAILED;
        } catch (SparkException e) {
            err.println("lamella map: the Spark job failed: " + SparkMain.firstLine(e) + "\nthe tiles done are kept in "
                    + out.resolve(MapJournal.FOLDER) + " and the same command again fits only the rest");
            return SparkMain.FAILED;
        }
    }

    private static MapEngine.Result[] fitAll(SparkSession spark, Path caseFile, CurveFit fit, MapData data,
                                             MapJournal journal, int partitions, JobSettings settings,
                                             PrintStream err) throws SparkException {
        List<MapData.Position> positions = data.positions;
        MapEngine.Result[] results = new MapEngine.Result[positions.size()];
        List<int[]> tiles = MapEngine.tiles(positions);
        double reach = MapEngine.reach(positions);
        List<TileTask> todo = new ArrayList<>();
        for (int t = 0; t < tiles.size(); t++) {
            int[] tile = tiles.get(t);
            MapEngine.Result[] earlier = journal.read(t, tile.length);
            if (earlier != null) {
                place(results, tile, earlier);
            } else {
                todo.add(new TileTask(t, MapEngine.members(positions, tile)));
            }
        }
        if (todo.isEmpty()) {
            return results;
        }
        JavaSparkContext jsc = JavaSparkContext.fromSparkContext(spark.sparkContext());
        int slices = partitions > 0 ? partitions : Math.max(1, Math.min(todo.size(), 4 * jsc.defaultParallelism()));
        Progress progress = new Progress(err, slices, positions.size() - countTodo(todo), "map");
        spark.sparkContext().addSparkListener(progress);
        String file = caseFile.toString();
        String signal = fit.signal();
        double[] x = data.x;
        List<TileDone> done;
        try {
            done = jsc.parallelize(todo, slices).map(task -> fitTile(task, file, signal, x, reach, journal,
                    settings)).collect();
        } catch (Exception e) {
            // Spark throws its checked SparkException without declaring it.
            if (e instanceof SparkException s) {
                throw s;
            }
            throw e;
        } finally {
            spark.sparkContext().removeSparkListener(progress);
        }
        for (TileDone d : done) {
            place(results, tiles.get(d.index()), d.results());
        }
        return results;
    }

    /** Runs in a task: fits one tile and journals it; the injected fault (tests) fails a tile's first attempt. */
    static TileDone fitTile(TileTask task, String caseFile, String signal, double[] x, double reach,
                            MapJournal journal, JobSettings settings) throws Exception {
        TaskContext context = TaskContext.get();
        if (task.index() == settings.failTask() && context != null && context.attemptNumber() == 0) {
            throw new IllegalStateException("fault injected into the first attempt of tile " + task.index());
        }
        CurveFit fit = JobModels.of(settings).curves(caseFile, signal);
        MapEngine.Result[] r = new MapEngine(fit, x, 1).fitTile(task.positions(), reach);
        journal.write(task.index(), r);
        return new TileDone(task.index(), r);
    }

    private static void place(MapEngine.Result[] results, int[] tile, MapEngine.Result[] r) {
        for (int k = 0; k < tile.length; k++) {
            results[tile[k]] = r[k];
        }
    }

    private static int countTodo(List<TileTask> todo) {
        int n = 0;
        for (TileTask t : todo) {
            n += t.positions().size();
        }
        return n;
    }

    /** Progress on standard error about every two seconds: tasks done, and the time left. */
    static final class Progress extends SparkListener {
        private final PrintStream err;
        private final int tasks;
        private final int readBack;
        private final String job;
        private final long start = System.nanoTime();
        private final AtomicInteger done = new AtomicInteger();
        private volatile long last = start;

        Progress(PrintStream err, int tasks, int readBack, String job) {
            this.err = err;
            this.job = job;
            this.tasks = tasks;
            this.readBack = readBack;
        }

        @Override
        public void onTaskEnd(SparkListenerTaskEnd end) {
            if (!end.taskInfo().successful()) {
                return;
            }
            int n = done.incrementAndGet();
            long now = System.nanoTime();
            if (now - last < 2_000_000_000L && n < tasks) {
                return;
            }
            last = now;
            double seconds = (now - start) * 1e-9;
            String left = n < tasks ? String.format(Locale.ROOT, ", about %.0f s left", (tasks - n) * seconds / n)
                    : "";
            err.printf(Locale.ROOT, "%s: %d/%d partitions done%s%s%n", job, n, tasks,
                    readBack > 0 ? " (" + readBack + " positions read back)" : "", left);
        }
    }
}
