package lamella.materials;

import static lamella.materials.Folders.entries;
import static lamella.materials.Folders.entry;
import static org.junit.jupiter.api.Assertions.assertEquals;

import java.nio.file.Path;
import java.util.List;
import lamella.api.material.LibraryTier;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** A configured library that is missing or has errors gives one line naming it and the command with the details. */
class LibraryNoticesTest {

    @TempDir
    Path dir;

    private static List<String> notices(LibraryTier tier, Path folder) {
        LibraryNotices n = new LibraryNotices();
        n.add(tier, folder, new DeferredLibrary(() -> LibraryFolder.read(folder, tier)));
        return n.notices();
    }

    @Test
    void aMissingFolderIsOneLineWithTheCommandThatShowsWhy() {
        Path nowhere = dir.resolve("nowhere");
        assertEquals(List.of("the facility material library " + nowhere + " cannot be used, so none of its values"
                + " are: the facility library folder does not exist; details: lamella materials check " + nowhere
                + " --tier facility"), notices(LibraryTier.FACILITY, nowhere));
    }

    @Test
    void errorsInsideALibraryAreCountedInOneLine() throws Exception {
        Path lib = Folders.library(dir.resolve("mine"), "mine", "Mine");
        Folders.file(lib, "a.json", entries(entry("ok", 1.0), entry("bad", -1.0), entry("worse", -2.0)));
        assertEquals(List.of("the user material library " + lib + " has 2 errors, and the entries or files they"
                + " concern are left out; details: lamella materials check " + lib + " --tier user"),
                notices(LibraryTier.USER, lib));
    }

    @Test
    void aSoundLibraryOrWarningsOnlySayNothing() throws Exception {
        Path lib = Folders.library(dir.resolve("fine"), "fine", "Fine");
        Folders.file(lib, "a.json", entries(entry("ok", 1.0), entry("odd", 1e9)));
        assertEquals(List.of(), notices(LibraryTier.FACILITY, lib), "an implausible value is a warning only");
    }
}
