package lamella.api;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeFalse;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Each reason of the operating system, from a real file operation where the machine allows it, in words and without
 * the name of any file — above all not of a temporary one.
 */
class FileProblemsTest {

    @TempDir
    Path dir;

    /** Whether this process is root, which reads and writes past permissions: those tests are then skipped. */
    private static boolean root() throws IOException {
        return "root".equals(System.getProperty("user.name"))
                || Files.readAllLines(Path.of("/proc/self/status")).stream()
                        .anyMatch(l -> l.matches("Uid:\\s+0\\s.*"));
    }

    @Test
    void noSuchFile() {
        IOException e = assertThrows(IOException.class, () -> Files.readAllBytes(dir.resolve("missing.csv")));
        assertEquals("no such file or folder", FileProblems.reason(e));
        assertEquals("cannot read the file: no such file or folder", FileProblems.cannotRead(e));
    }

    @Test
    void isADirectory() throws IOException {
        Path folder = Files.createDirectory(dir.resolve("data.csv"));
        IOException read = assertThrows(IOException.class, () -> Files.readAllBytes(folder));
        assertEquals("is a directory", FileProblems.reason(read));
        IOException write = assertThrows(IOException.class, () -> AtomicText.write(folder, "x"));
        assertEquals("is a directory", FileProblems.reason(write));
        assertTrue(Files.isDirectory(folder), "the folder is left as it was");
    }

    @Test
    void permissionDeniedNamesNoTemporaryFile() throws IOException {
        assumeFalse(root(), "skipped: this test runs as root, which writes into a folder without permissions");
        Path locked = Files.createDirectory(dir.resolve("locked"));
        Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("r-xr-xr-x"));
        try {
            IOException e = assertThrows(IOException.class, () -> AtomicText.write(locked.resolve("x.csv"), "x"));
            assertTrue(e.getMessage().contains(".part"), "Java's own message names the temporary file: " + e);
            String reason = FileProblems.reason(e);
            assertEquals("permission denied", reason);
            assertFalse(reason.contains(".part"), reason);
        } finally {
            Files.setPosixFilePermissions(locked, PosixFilePermissions.fromString("rwxr-xr-x"));
        }
    }

    @Test
    void permissionDeniedOnReading() throws IOException {
        assumeFalse(root(), "skipped: this test runs as root, which reads a file without permissions");
        Path f = Files.writeString(dir.resolve("secret.csv"), "x");
        Files.setPosixFilePermissions(f, PosixFilePermissions.fromString("---------"));
        IOException e = assertThrows(IOException.class, () -> Files.readAllBytes(f));
        assertEquals("permission denied", FileProblems.reason(e));
    }

    @Test
    void readOnlyFileSystemFromTheSystemsOwnWords() {
        // The operating system's text for EROFS as Java reports it (a file system this test may not remount).
        FileSystemException e = new FileSystemException("/mnt/x/.r.csv.1234.part", null, "Read-only file system");
        assertEquals("read-only file system", FileProblems.reason(e));
    }

    @Test
    void readOnlyFileSystemForReal() throws IOException {
        List<String> mounts = Files.readAllLines(Path.of("/proc/mounts"));
        boolean sysReadOnly = mounts.stream().anyMatch(l -> l.matches("\\S+ /sys sysfs ro[ ,].*"));
        assumeTrue(sysReadOnly, "skipped: no read-only /sys on this machine to write into");
        IOException e = assertThrows(IOException.class, () -> AtomicText.write(Path.of("/sys/lamella-test"), "x"));
        assertEquals("read-only file system", FileProblems.reason(e));
    }

    @Test
    void aMessageThatNamesAPathIsNotPassedOn() {
        assertEquals("an input/output error", FileProblems.reason(new IOException("/tmp/.x.csv.99.part: gone")));
        assertEquals("an input/output error", FileProblems.reason(new IOException()));
        assertEquals("stream closed", FileProblems.reason(new IOException("Stream closed")));
    }
}
