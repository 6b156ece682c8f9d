package lamella.ui.workbench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.stream.Stream;
import lamella.ui.api.Messages;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The window's last place, kept beside the arrangement so that the window is placed before any JSON is read. */
class WindowPlaceTest {

    @TempDir
    Path dir;

    private Path write(String text) throws IOException {
        Path f = dir.resolve("window.properties");
        Files.writeString(f, text);
        return f;
    }

    @Test
    void aPlaceSurvivesItsFile() throws IOException {
        WindowPlace p = new WindowPlace(-12, 40, 1280, 800, false);
        Path f = dir.resolve("window.properties");
        p.save(f);
        assertEquals(p, WindowPlace.read(f));
        WindowPlace max = new WindowPlace(0, 0, 1920, 1080, true);
        max.save(f);
        assertEquals(max, WindowPlace.read(f));
        assertEquals(List.of("window.properties"), listing(), "no part file is left behind");
    }

    @Test
    void aFileThatIsNotAPlaceSaysWhichKeyIsWrong() throws IOException {
        assertMessage(write("x=1\ny=2\nwidth=300\nmaximised=false\n"), "height is missing");
        assertMessage(write("x=1\ny=2\nwidth=wide\nheight=300\nmaximised=false\n"),
                "width must be a whole number of pixels, not 'wide'");
        assertMessage(write("x=1\ny=2\nwidth=-300\nheight=300\nmaximised=false\n"),
                "width must be a positive number of pixels, not -300");
        assertMessage(write("x=1\ny=2\nwidth=300\nheight=300\nmaximised=yes\n"),
                "maximised must be true or false, not 'yes'");
        assertMessage(write("x=1\ny=2\nwidth=300\nheight=300\nmaximised=false\nbad=\\u12\n"), "not a window place");
    }

    private static void assertMessage(Path file, String expected) {
        IOException e = assertThrows(IOException.class, () -> WindowPlace.read(file));
        assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
        assertTrue(e.getMessage().contains(expected), e.getMessage());
    }

    @Test
    void theStoreSavesThePlaceWithTheArrangementAndReadsItBackOnlyBesideOne() throws IOException {
        UserFolder user = new UserFolder(dir);
        MessageLog messages = new MessageLog();
        ArrangementStore store = new ArrangementStore(user, messages);
        assertEquals(Optional.empty(), store.lastPlace(), "nothing saved yet");

        Arrangement a = Arrangement.standard();
        a.x = 30;
        a.y = 20;
        a.width = 1200;
        a.height = 700;
        a.windowMaximised = false;
        store.saveLast(a);
        assertEquals(Optional.of(new WindowPlace(30, 20, 1200, 700, false)), store.lastPlace());
        assertEquals(List.of("arrangement.json", "window.properties"), listing());

        // Deleting the arrangement to start afresh forgets the place too: the window opens on the whole screen.
        Files.delete(user.arrangement());
        assertEquals(Optional.empty(), store.lastPlace());
        assertEquals(List.of(), messages.all());
    }

    @Test
    void anUnreadablePlaceIsReportedAndTheWindowOpensAsTheFirstTime() throws IOException {
        UserFolder user = new UserFolder(dir);
        MessageLog messages = new MessageLog();
        ArrangementStore store = new ArrangementStore(user, messages);
        store.saveLast(Arrangement.standard());
        Files.writeString(user.windowPlace(), "x=1\ny=2\nwidth=300\nheight=300\nmaximised=perhaps\n");
        assertEquals(Optional.empty(), store.lastPlace());
        assertEquals(1, messages.all().size(), messages.all().toString());
        Messages.Message m = messages.all().get(0);
        assertEquals(Messages.Level.WARNING, m.level());
        assertTrue(m.text().contains(user.windowPlace().toString()), m.text());
        assertTrue(m.text().contains("maximised"), m.text());
    }

    @Test
    void anArrangementWithoutBoundsLeavesNoPlace() throws IOException {
        UserFolder user = new UserFolder(dir);
        ArrangementStore store = new ArrangementStore(user, new MessageLog());
        Arrangement a = Arrangement.standard();
        a.width = 1000;
        a.height = 600;
        store.saveLast(a);
        assertTrue(Files.exists(user.windowPlace()));
        store.saveLast(Arrangement.standard());
        assertFalse(Files.exists(user.windowPlace()), "a stale place is not kept beside a new arrangement");
        assertTrue(Files.exists(user.arrangement()));
    }

    private List<String> listing() throws IOException {
        try (Stream<Path> files = Files.list(dir)) {
            return files.map(f -> f.getFileName().toString()).sorted().toList();
        }
    }
}
