package lamella.spark;

import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.spark.SparkConf;
import org.apache.spark.sql.SparkSession;

/**
 * The Spark job's entry point, for {@code spark-submit} and for the {@code lamella} script's {@code --engine spark}:
 * {@code map CASE.json --out DIR [--master URL | --threads N] [--partitions N]} and
 * {@code batch MANIFEST.json|FOLDER --out DIR [--master URL | --threads N] [--partitions N]}. The master is {@code --master}, else
 * {@code local[N]} for {@code --threads N}, else the one spark-submit gives ({@code spark.master}), else
 * {@code local[*]}. Exit status as the runtime's commands: 0
 * done, 1 failed while working, 2 bad input or usage.
 */
public final class SparkMain {

    static final int OK = 0;
    static final int FAILED = 1;
    static final int BAD_INPUT = 2;
    static final String JARS = "lamella.spark.jars";

    static final String USAGE = """
            usage: lamella-spark-job map CASE.json --out DIR [--master URL | --threads N] [--partitions N]
                   lamella-spark-job batch MANIFEST.json|FOLDER --out DIR [--master URL | --threads N] [--partitions N]
            The map or batch command of Lamella as a Spark application (see the README, "On Apache Spark").
            --master: a Spark master URL (default: the one spark-submit gives, else local[*]); --threads N:
            Spark in this process on N threads (local[N]);
            --partitions: how many partitions the map's tiles or the batch's cases are spread over (default:
            four per core of the cluster, at most one per tile or case).""";

    private SparkMain() {
    }

    public static void main(String[] args) {
        System.exit(run(List.of(args), System.out, System.err));
    }

    /** Runs one job and returns its exit status; starts and stops its own Spark session. */
    static int run(List<String> args, PrintStream stdout, PrintStream err) {
        if (args.isEmpty() || !(args.get(0).equals("map") || args.get(0).equals("batch"))) {
            err.println("lamella spark: which job? (map or batch)\n" + USAGE);
            return BAD_INPUT;
        }
        String job = args.get(0);
        Map<String, String> options = new HashMap<>();
        String input = null;
        for (int i = 1; i < args.size(); i++) {
            String a = args.get(i);
            if (a.equals("--out") || a.equals("--master") || a.equals("--partitions") || a.equals("--engine")
                    || a.equals("--threads")) {
                if (i + 1 >= args.size()) {
                    err.println("lamella " + job + ": " + a + " needs a value\n" + USAGE);
                    return BAD_INPUT;
                }
                options.put(a, args.get(++i));
            } else if (a.startsWith("--")) {
                err.println("lamella " + job + ": unknown option " + a + " for the Spark engine\n" + USAGE);
                return BAD_INPUT;
            } else if (input == null) {
                input = a;
            } else {
                err.println("lamella " + job + ": one input at a time; got also " + a + "\n" + USAGE);
                return BAD_INPUT;
            }
        }
        if (options.containsKey("--engine") && !options.get("--engine").equals("spark")) {
            err.println("lamella " + job + ": this is the Spark engine; --engine " + options.get("--engine")
                    + " runs in Lamella's own runtime (./lamella " + job + " without --engine spark)");
            return BAD_INPUT;
        }
        if (input == null) {
            err.println("lamella " + job + ": which " + (job.equals("map") ? "case file" : "manifest or folder")
                    + "?\n" + USAGE);
            return BAD_INPUT;
        }
        if (!options.containsKey("--out")) {
            err.println("lamella " + job + ": --out DIR is needed\n" + USAGE);
            return BAD_INPUT;
        }
        String master = options.get("--master");
        if (options.containsKey("--threads")) {
            if (master != null) {
                err.println("lamella " + job + ": --threads runs Spark in this process; give it or --master, not both");
                return BAD_INPUT;
            }
            String t = options.get("--threads");
            if (!t.matches("[1-9][0-9]{0,3}")) {
                err.println("lamella " + job + ": --threads expects a whole number ≥ 1, got '" + t + "'");
                return BAD_INPUT;
            }
            master = "local[" + t + "]";
        }
        int partitions = 0;
        if (options.containsKey("--partitions")) {
            try {
                partitions = Integer.parseInt(options.get("--partitions"));
            } catch (NumberFormatException e) {
                partitions = -1;
            }
            if (partitions < 1) {
                err.println("lamella " + job + ": --partitions expects a whole number ≥ 1, got '"
                        + options.get("--partitions") + "'");
                return BAD_INPUT;
            }
        }
        JobSettings settings;
        try {
            settings = JobSettings.fromSystem();
        } catch (IOException | NumberFormatException e) {
            err.println("lamella " + job + ": " + e.getMessage());
            return BAD_INPUT;
        }
        Path in = settings.resolve(input);
        Path out = settings.resolve(options.get("--out"));
        long t0 = System.nanoTime();
        SparkSession spark = session("lamella " + job, master);
        double startup = (System.nanoTime() - t0) * 1e-9;
        try {
            err.printf(java.util.Locale.ROOT, "lamella %s: Spark %s on %s, started in %.1f s%n", job,
                    spark.version(), spark.sparkContext().master(), startup);
            for (String left : JobModels.of(settings).services.skipped) {
                err.println("lamella " + job + ": a plug-in component the Spark job cannot wire is left out: " + left);
            }
            return job.equals("map") ? MapJob.run(spark, in, out, partitions, settings, stdout, err)
                    : BatchJob.run(spark, in, out, partitions, settings, stdout, err);
        } finally {
            spark.stop();
        }
    }

    /** A session on the master spark-submit gives, else on {@code master}, else on {@code local[*]}. */
    static SparkSession session(String name, String master) {
        SparkConf conf = new SparkConf().setAppName(name);
        if (master != null) {
            conf.setMaster(master);
        } else if (!conf.contains("spark.master")) {
            conf.setMaster("local[*]");
        }
        if (conf.get("spark.master").startsWith("local")) {
            conf.setIfMissing("spark.ui.enabled", "false");
            conf.setIfMissing("spark.driver.host", "127.0.0.1");
            conf.setIfMissing("spark.driver.bindAddress", "127.0.0.1");
        }
        conf.setIfMissing("spark.sql.shuffle.partitions", "8");
        // The job jar and plug-in jars for a cluster's executors (the lamella script names them).
        String jars = System.getProperty(JARS);
        if (jars != null && !jars.isBlank() && !conf.get("spark.master").startsWith("local")) {
            conf.setIfMissing("spark.jars", jars);
        }
        SparkSession spark = SparkSession.builder().config(conf).getOrCreate();
        spark.sparkContext().setLogLevel("WARN");
        return spark;
    }

    static String firstLine(Throwable e) {
        String m = String.valueOf(e.getMessage());
        int nl = m.indexOf('\n');
        return nl < 0 ? m : m.substring(0, nl);
    }
}
