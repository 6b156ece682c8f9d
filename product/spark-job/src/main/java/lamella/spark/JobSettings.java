package lamella.spark;

import java.io.IOException;
import java.io.Reader;
import java.io.Serializable;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Properties;
import lamella.materials.PlainLibraries;

/**
 * What every task of a job needs to wire Lamella's libraries the way the runtime would: the facility and user
 * material folders (from the runtime's {@code conf/lamella.properties} named by {@code -Dlamella.conf}, then
 * {@code -D} options, which win), the folder relative paths are taken from, and a fault to inject for the tests.
 * Serializable: it travels with each task to the executors.
 *
 * @param facility   the facility library folder setting, or null
 * @param user       the user library folder setting, or null (the default folder if it exists)
 * @param base       the folder relative paths are the user's from
 * @param home       the user's home folder (for the default user library)
 * @param failTask   the tile (map) or case (batch) whose first attempt fails on purpose (tests of Spark's
 *                   retries), or −1
 */
record JobSettings(String facility, String user, String base, String home, int failTask) implements Serializable {

    static final String CONF = "lamella.conf";
    static final String CWD = "lamella.cwd";
    static final String FAIL_TASK = "lamella.spark.fail-first-attempt-of-task";

    /** The settings of this JVM's system properties and the properties file they name. */
    static JobSettings fromSystem() throws IOException {
        Properties p = new Properties();
        String conf = System.getProperty(CONF);
        if (conf != null && !conf.isBlank()) {
            try (Reader r = Files.newBufferedReader(Path.of(conf), StandardCharsets.UTF_8)) {
                p.load(r);
            } catch (IOException e) {
                throw new IOException("cannot read the settings file " + conf + " (-D" + CONF + "): " + e.getMessage(),
                        e);
            }
        }
        String facility = System.getProperty(PlainLibraries.FACILITY_SETTING,
                p.getProperty(PlainLibraries.FACILITY_SETTING));
        String user = System.getProperty(PlainLibraries.USER_SETTING, p.getProperty(PlainLibraries.USER_SETTING));
        String base = System.getProperty(CWD, System.getProperty("user.dir"));
        int failTask = Integer.parseInt(System.getProperty(FAIL_TASK, "-1"));
        return new JobSettings(facility, user, base, System.getProperty("user.home"), failTask);
    }

    JobSettings withFailTask(int tile) {
        return new JobSettings(facility, user, base, home, tile);
    }

    Path resolve(String path) {
        return Path.of(base).resolve(path).toAbsolutePath().normalize();
    }
}
