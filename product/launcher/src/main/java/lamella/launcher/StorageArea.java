package lamella.launcher;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;

/**
 * The framework's bundle cache for one process. Each run gets a fresh folder, so no run ever sees bundles cached by
 * another one, and two runs at once never share a cache.
 */
final class StorageArea {

    private final Path folder;

    private StorageArea(Path folder) {
        this.folder = folder;
    }

    static StorageArea create() throws IOException {
        return new StorageArea(Files.createTempDirectory("lamella-framework-"));
    }

    Path folder() {
        return folder;
    }

    void delete() {
        if (!Files.exists(folder)) {
            return;
        }
        try {
            Files.walkFileTree(folder, new SimpleFileVisitor<>() {
                @Override
                public FileVisitResult visitFile(Path file, BasicFileAttributes attributes) throws IOException {
                    Files.delete(file);
                    return FileVisitResult.CONTINUE;
                }

                @Override
                public FileVisitResult postVisitDirectory(Path dir, IOException failure) throws IOException {
                    Files.delete(dir);
                    return FileVisitResult.CONTINUE;
                }
            });
        } catch (IOException e) {
            throw new UncheckedIOException("could not delete the framework storage " + folder, e);
        }
    }
}
