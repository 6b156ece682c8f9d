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
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.Set;

/**
 * The framework's bundle cache for one process. Each run gets a fresh folder, so no run ever sees bundles cached by
 * another one, and two runs at once never share a cache.
 */
final class StorageArea {

    private static final Set<PosixFilePermission> OWNER_ONLY = EnumSet.of(PosixFilePermission.OWNER_READ,
            PosixFilePermission.OWNER_WRITE, PosixFilePermission.OWNER_EXECUTE);
    private static final int MAX_ATTEMPTS = 100;
    /** The start of every storage folder's name. */
    static final String PREFIX = "lamella-framework-";

    private final Path folder;

    private StorageArea(Path folder) {
        this.folder = folder;
    }

    /** A folder that, when set, is tried first as the storage's parent (tests use it). */
    static final String PARENT_PROPERTY = "lamella.storage.parent";

    /**
     * A new folder readable by this user only, in the first of these that takes it: the folder {@value
     * #PARENT_PROPERTY} names, the user's runtime folder ({@code $XDG_RUNTIME_DIR}), {@code /dev/shm}, the system's
     * temporary directory. The first three are in memory on most Linux systems: Felix writes a few small files per
     * bundle at every start, which there cost no disk writes (measured, some 50 ms of a command on this kind of
     * machine). A parent that is missing, not a folder, or refuses the new folder passes on to the next.
     */
    static StorageArea create() throws IOException {
        return create(parents(System.getProperty(PARENT_PROPERTY), System.getenv("XDG_RUNTIME_DIR"),
                Path.of(System.getProperty("java.io.tmpdir"))));
    }

    static List<Path> parents(String given, String runtimeDir, Path temp) {
        List<Path> parents = new ArrayList<>();
        if (given != null && !given.isBlank()) {
            parents.add(Path.of(given));
        }
        if (runtimeDir != null && !runtimeDir.isBlank()) {
            parents.add(Path.of(runtimeDir));
        }
        parents.add(Path.of("/dev/shm"));
        parents.add(temp);
        return parents;
    }

    /** A new folder in the first parent of {@code parents} that takes it; the last one's failure if none does. */
    static StorageArea create(List<Path> parents) throws IOException {
        IOException last = null;
        for (Path parent : parents) {
            if (!Files.isDirectory(parent)) {
                continue;
            }
            try {
                return createIn(parent);
            } catch (IOException refused) {
                last = refused;
            }
        }
        if (last == null) {
            throw new IOException("no folder for the framework storage: none of " + parents + " is a folder");
        }
        throw last;
    }

    /**
     * A new folder in {@code parent}. Named after the clock rather than by {@link Files#createTempDirectory}, whose
     * random name seeds a secure random generator (some 25 ms of every start-up), or after the process, whose handle
     * sets up a reaper thread pool at first use (some 15 ms on Java 17). The name need not be unguessable — the
     * folder is created atomically and private — only new, and a name already taken is skipped.
     */
    private static StorageArea createIn(Path parent) throws IOException {
        String prefix = PREFIX;
        boolean posix = parent.getFileSystem().supportedFileAttributeViews().contains("posix");
        for (int attempt = 0; ; attempt++) {
            Path folder = parent.resolve(prefix + Long.toString(System.nanoTime() & Long.MAX_VALUE, 36));
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
