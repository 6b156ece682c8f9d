package lamella.launcher;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.FileVisitResult;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.SimpleFileVisitor;
import java.nio.file.attribute.BasicFileAttributes;
import java.nio.file.attribute.PosixFilePermission;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.EnumSet;
import java.util.Set;

/**
 * The framework's bundle cache for one process. Each run gets a fresh folder, so no run ever sees bundles cached by
 * another one, and two runs at once never share a cache.
 */
final class StorageArea {

    private static final Set<PosixFilePermission> OWNER_ONLY = EnumSet.of(PosixFilePermission.OWNER_READ,
            PosixFilePermission.OWNER_WRITE, PosixFilePermission.OWNER_EXECUTE);
    private static final int MAX_ATTEMPTS = 100;

    private final Path folder;

    private StorageArea(Path folder) {
        this.folder = folder;
    }

    /**
     * A new folder in the system's temporary directory, readable by this user only. Named after the process and the
     * clock rather than by {@link Files#createTempDirectory}, whose random name seeds a secure random generator: some
     * 25 ms of every start-up. The name need not be unguessable — the folder is created atomically and private — only
     * new, and a name already taken is skipped.
     */
    static StorageArea create() throws IOException {
        Path temp = Path.of(System.getProperty("java.io.tmpdir"));
        String prefix = "lamella-framework-" + ProcessHandle.current().pid() + "-";
        boolean posix = temp.getFileSystem().supportedFileAttributeViews().contains("posix");
        for (int attempt = 0; ; attempt++) {
            Path folder = temp.resolve(prefix + Long.toString(System.nanoTime() & Long.MAX_VALUE, 36));
            try {
                if (posix) {
                    Files.createDirectory(folder, PosixFilePermissions.asFileAttribute(OWNER_ONLY));
                } else {
                    Files.createDirectory(folder);
                }
                return new StorageArea(folder);
            } catch (FileAlreadyExistsException taken) {
                if (attempt >= MAX_ATTEMPTS) {
                    throw taken;
                }
            }
        }
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
