package lamella.materials;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Library folders written by tests. */
final class Folders {

    /** The shipped library's JSON in its module; surefire runs in this module's folder. */
    static final Path SHIPPED = Path.of("../lamella.materials.shipped/src/main/resources/materials");
    /** The invented demo facility library. */
    static final Path DEMO_FACILITY = Path.of("../../demo-data/materials/fenwick-hall");

    private Folders() {
    }

    static Path library(Path dir, String id, String name) throws IOException {
        Files.createDirectories(dir);
        Files.writeString(dir.resolve("library.json"), "{\"library_format\": 1, \"id\": \"" + id + "\", \"name\": \""
                + name + "\"}\n", StandardCharsets.UTF_8);
        return dir;
    }

    static Path file(Path dir, String name, String json) throws IOException {
        Path f = dir.resolve(name);
        Files.writeString(f, json, StandardCharsets.UTF_8);
        return f;
    }

    /** A library file holding the given entries, one JSON object per argument. */
    static String entries(String... entries) {
        return "{\n  \"materials\": [\n    " + String.join(",\n    ", entries) + "\n  ]\n}\n";
    }

    /** {@code entry} with {@code "replaces": [names]}. */
    static String replacing(String entry, String... names) {
        return withList(entry, "replaces", names);
    }

    /** {@code entry} with {@code "aliases": [names]}. */
    static String aliased(String entry, String... names) {
        return withList(entry, "aliases", names);
    }

    private static String withList(String entry, String key, String... names) {
        StringBuilder list = new StringBuilder();
        for (String n : names) {
            list.append(list.length() == 0 ? "" : ", ").append('"').append(n).append('"');
        }
        return entry.replaceFirst("\"version\"", "\"" + key + "\": [" + list + "], \"version\"");
    }

    /** A valid isotropic entry (values invented for tests of the format, not of any material). */
    static String entry(String id, double k) {
        return "{\"id\": \"" + id + "\", \"name\": \"test " + id + "\", \"version\": 1, \"source\": \"test value,"
                + " invented\",\n     \"properties\": {\"k_w_mk\": {\"value\": " + k + ", \"at_k\": 300,"
                + " \"uncertainty_rel\": 0.05},\n       \"heat_capacity_j_m3k\": {\"value\": 2e6, \"at_k\": 300,"
                + " \"uncertainty_rel\": 0.05}}}";
    }
}
