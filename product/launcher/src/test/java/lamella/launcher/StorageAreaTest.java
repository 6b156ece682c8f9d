package lamella.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;

import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Each run's framework storage is a new folder only its user can enter, and it goes completely. */
class StorageAreaTest {

    @Test
    void twoAreasAreTwoNewPrivateFoldersAndDeleteRemovesEverything() throws Exception {
        StorageArea first = StorageArea.create();
        StorageArea second = StorageArea.create();
        try {
            assertNotEquals(first.folder(), second.folder());
            assertTrue(first.folder().getFileName().toString()
                    .startsWith(StorageArea.PREFIX), first.folder().toString());
            if (first.folder().getFileSystem().supportedFileAttributeViews().contains("posix")) {
                assertEquals("rwx------", PosixFilePermissions.toString(Files.getPosixFilePermissions(first.folder())));
            }
            Path nested = Files.createDirectories(first.folder().resolve("bundle3/version0.0"));
            Files.writeString(nested.resolve("revision.location"), "reference:file:/x.jar");
        } finally {
            first.delete();
            second.delete();
        }
        assertFalse(Files.exists(first.folder()));
        assertFalse(Files.exists(second.folder()));
    }

    /** The order is the given folder, the user's runtime folder, /dev/shm, the temporary directory. */
    @Test
    void theParentsAreTriedInOrderAndBlankOnesAreLeftOut() {
        Path temp = Path.of("tmp-x");
        assertEquals(List.of(Path.of("given"), Path.of("run-user"), Path.of("/dev/shm"), temp),
                StorageArea.parents("given", "run-user", temp));
        assertEquals(List.of(Path.of("/dev/shm"), temp), StorageArea.parents(" ", null, temp));
    }

    @Test
    void aMissingParentAndAParentThatIsAFilePassOnToTheNext(@TempDir Path dir) throws Exception {
        Path file = Files.writeString(dir.resolve("not-a-folder"), "x");
        Path good = Files.createDirectory(dir.resolve("good"));
        StorageArea area = StorageArea.create(List.of(dir.resolve("missing"), file, good));
        try {
            assertEquals(good, area.folder().getParent());
        } finally {
            area.delete();
        }
    }

    /** /proc is a folder no one, not even root, may create a folder in (Linux; skipped elsewhere). */
    @Test
    void aParentThatRefusesTheFolderPassesOnAndNoneLeftIsAnError(@TempDir Path dir) throws Exception {
        Path refusing = Path.of("/proc");
        Assumptions.assumeTrue(Files.isDirectory(refusing.resolve("self")), "no /proc here");
        Path good = Files.createDirectory(dir.resolve("good"));
        StorageArea area = StorageArea.create(List.of(refusing, good));
        try {
            assertEquals(good, area.folder().getParent());
        } finally {
            area.delete();
        }
        assertThrows(IOException.class, () -> StorageArea.create(List.of(refusing)));
        IOException none = assertThrows(IOException.class, () -> StorageArea.create(List.of(dir.resolve("missing"))));
        assertTrue(none.getMessage().contains("missing"), none.getMessage());
    }
}
