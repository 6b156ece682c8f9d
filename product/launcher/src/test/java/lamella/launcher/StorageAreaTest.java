package lamella.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;

import org.junit.jupiter.api.Test;

/** Each run's framework storage is a new folder only its user can enter, and it goes completely. */
class StorageAreaTest {

    @Test
    void twoAreasAreTwoNewPrivateFoldersAndDeleteRemovesEverything() throws Exception {
        StorageArea first = StorageArea.create();
        StorageArea second = StorageArea.create();
        try {
            assertNotEquals(first.folder(), second.folder());
            assertTrue(first.folder().getFileName().toString()
                    .startsWith("lamella-framework-" + ProcessHandle.current().pid() + "-"), first.folder().toString());
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
}
