package lamella.product;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

/**
 * A private copy of the assembled runtime folder, so that a test never touches the plugins of the one a developer
 * runs. Its plugins folder starts empty.
 */
final class RuntimeCopy {

    private RuntimeCopy() {
    }

    static Path assembled() {
        String home = System.getProperty("lamella.runtime.home");
        if (home == null) {
            throw new IllegalStateException("system property lamella.runtime.home is not set; run through Maven");
        }
        Path path = Path.of(home).toAbsolutePath().normalize();
        if (!Files.isRegularFile(path.resolve("lib/lamella.launcher.jar"))) {
            throw new IllegalStateException("no assembled runtime in " + path + "; build product/runtime first");
        }
        return path;
    }

    static Path into(Path target) throws IOException {
        Path source = assembled();
        for (String folder : new String[] {"lib", "bundle", "conf"}) {
            copyTree(source.resolve(folder), target.resolve(folder));
        }
        Files.createDirectories(target.resolve("plugins"));
        return target;
    }

    private static void copyTree(Path from, Path to) throws IOException {
        try (Stream<Path> files = Files.walk(from)) {
            files.forEach(f -> {
                try {
                    Path copy = to.resolve(from.relativize(f).toString());
                    if (Files.isDirectory(f)) {
                        Files.createDirectories(copy);
                    } else {
                        Files.copy(f, copy);
                    }
                } catch (IOException e) {
                    throw new UncheckedIOException(e);
                }
            });
        }
    }
}
