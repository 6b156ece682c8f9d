package lamella.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.Collectors;
import java.util.stream.Stream;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Atomic writes: whole files only, no part file left behind, however many write at once. Common practice, no source. */
class AtomicTextWriteTest {

    @TempDir
    Path dir;

    /** Eight threads write 50 times each into the same file: every part file has its own name, none is left. */
    @Test
    void writersAtOnceEachSeeTheirWholeFileAndLeaveNoPartFile() throws Exception {
        Path target = dir.resolve("out.csv");
        ExecutorService pool = Executors.newFixedThreadPool(8);
        List<Future<?>> done = new ArrayList<>();
        Set<String> written = java.util.concurrent.ConcurrentHashMap.newKeySet();
        try {
            for (int t = 0; t < 8; t++) {
                int thread = t;
                done.add(pool.submit(() -> {
                    for (int i = 0; i < 50; i++) {
                        String text = ("thread " + thread + " write " + i + "\n").repeat(200);
                        AtomicText.write(target, text);
                        written.add(text);
                    }
                    return null;
                }));
            }
            for (Future<?> f : done) {
                f.get();
            }
        } finally {
            pool.shutdownNow();
        }
        assertTrue(written.contains(Files.readString(target)), "the file is one whole write");
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(List.of("out.csv"), files.map(f -> f.getFileName().toString()).collect(Collectors.toList()));
        }
    }

    /** A replaced file keeps its permissions; a folder in the target's place is refused and nothing is left. */
    @Test
    void aReplacedFileKeepsItsPermissionsAndAFolderIsRefused() throws IOException {
        Path target = Files.writeString(dir.resolve("kept.txt"), "old");
        boolean posix = dir.getFileSystem().supportedFileAttributeViews().contains("posix");
        if (posix) {
            Files.setPosixFilePermissions(target, PosixFilePermissions.fromString("rw-r-----"));
        }
        AtomicText.write(target, "new");
        assertEquals("new", Files.readString(target));
        if (posix) {
            assertEquals("rw-r-----", PosixFilePermissions.toString(Files.getPosixFilePermissions(target)));
        }
        Path folder = Files.createDirectory(dir.resolve("folder"));
        assertThrows(IOException.class, () -> AtomicText.write(folder, "x"));
        try (Stream<Path> files = Files.list(dir)) {
            assertEquals(Set.of("kept.txt", "folder"), files.map(f -> f.getFileName().toString())
                    .collect(Collectors.toSet()));
        }
    }
}
