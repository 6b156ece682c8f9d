package lamella.spark;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

/** One job run in this JVM as the script runs it, from folder {@code dir}: its exit status and what it printed. */
record SparkRun(int status, String out, String err) {

    static SparkRun in(Path dir, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        System.setProperty(JobSettings.CWD, dir.toString());
        try {
            int status = SparkMain.run(List.of(args), new PrintStream(out, true, StandardCharsets.UTF_8),
                    new PrintStream(err, true, StandardCharsets.UTF_8));
            return new SparkRun(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
        } finally {
            System.clearProperty(JobSettings.CWD);
        }
    }
}
