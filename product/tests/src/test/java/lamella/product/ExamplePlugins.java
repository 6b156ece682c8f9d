package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;

/** The jars the build copied from the example modules of examples/ (see this module's pom). */
final class ExamplePlugins {

    private ExamplePlugins() {
    }

    /** The one jar of an example, by its artifact id. */
    static Path jar(String artifactId) throws IOException {
        String folder = System.getProperty("lamella.example.plugins");
        if (folder == null) {
            throw new IllegalStateException("system property lamella.example.plugins is not set; run through Maven");
        }
        try (Stream<Path> files = Files.list(Path.of(folder))) {
            List<Path> jars = files.filter(f -> {
                String name = f.getFileName().toString();
                return name.startsWith(artifactId + "-") && name.endsWith(".jar");
            }).toList();
            assertEquals(1, jars.size(), "expected one jar of " + artifactId + " in " + folder + ": " + jars);
            return jars.get(0);
        }
    }
}
