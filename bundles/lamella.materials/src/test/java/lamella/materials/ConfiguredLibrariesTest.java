package lamella.materials;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Which folders the runtime's settings name. */
class ConfiguredLibrariesTest {

    @TempDir
    Path dir;

    @Test
    void relativeFoldersAreTheUsersAndBlankMeansNone() {
        assertEquals(Optional.of(dir.resolve("lib")), ConfiguredLibraries.folder("lib", dir));
        assertEquals(Optional.of(Path.of("/srv/lab/materials")), ConfiguredLibraries.folder("/srv/lab/materials", dir));
        assertEquals(Optional.empty(), ConfiguredLibraries.folder(null, dir));
        assertEquals(Optional.empty(), ConfiguredLibraries.folder("  ", dir));
    }

    @Test
    void theDefaultUserFolderIsUsedOnlyWhenItExists() throws Exception {
        Path home = dir.resolve("home");
        assertEquals(Optional.empty(), ConfiguredLibraries.userFolder(null, dir, home));
        Path standard = Files.createDirectories(home.resolve(".lamella/materials"));
        assertEquals(Optional.of(standard), ConfiguredLibraries.userFolder(null, dir, home));
        assertEquals(Optional.empty(), ConfiguredLibraries.userFolder("", dir, home), "set but blank: no user library");
        assertEquals(Optional.of(dir.resolve("mine")), ConfiguredLibraries.userFolder("mine", dir, home));
    }
}
