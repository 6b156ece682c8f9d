package lamella.ui.workbench;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import lamella.ui.api.Area;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class ArrangementTest {

    @TempDir
    Path dir;

    private static Arrangement withPanels() {
        Arrangement a = Arrangement.standard();
        a.place("stack", Area.LEFT);
        a.place("signal", Area.CENTER);
        a.place("fit", Area.RIGHT);
        a.place("messages", Area.BOTTOM);
        return a;
    }

    @Test
    void newPanelsGoToTheAreaStandingForTheirPreferredOne() {
        Arrangement a = withPanels();
        assertEquals("LEFT", a.areaOf("stack").orElseThrow().role);
        assertEquals("BOTTOM", a.areaOf("messages").orElseThrow().role);
    }

    @Test
    void theStackAndTheSignalAreInFrontWhicheverPanelArrivesFirst() {
        Arrangement a = Arrangement.standard();
        for (String id : List.of("map", "datasets", "signal", "plan", "stack", "fit")) {
            a.place(id, List.of("map", "signal", "plan").contains(id) ? Area.CENTER : Area.LEFT);
        }
        assertEquals("stack", a.areaOf("datasets").orElseThrow().front);
        assertEquals("signal", a.areaOf("map").orElseThrow().front);
        a.areaOf("map").orElseThrow().front = "map";
        a.place("signal", Area.CENTER);
        assertEquals("map", a.areaOf("map").orElseThrow().front, "a panel already placed keeps the user's choice");
    }

    @Test
    void droppingOnTheTabsJoinsTheAreaAndAnEmptiedAreaIsRemoved() {
        Arrangement a = withPanels();
        assertTrue(a.move("fit", "signal", Zone.TABS));
        assertSame(a.areaOf("signal").orElseThrow(), a.areaOf("fit").orElseThrow());
        assertEquals("fit", a.areaOf("fit").orElseThrow().front);
        assertEquals(3, a.areas().size());
    }

    @Test
    void droppingOnAnEdgeSplitsTheAreaOnThatSide() {
        Arrangement a = withPanels();
        assertTrue(a.move("stack", "messages", Zone.RIGHT));
        TabArea messages = a.areaOf("messages").orElseThrow();
        Split split = messages.parent;
        assertTrue(split.sideBySide);
        assertEquals(1, split.parts.indexOf(a.areaOf("stack").orElseThrow()));
        // The emptied left area handed its role on, so a new left panel still finds a home.
        a.place("materials", Area.LEFT);
        assertTrue(a.areaOf("materials").isPresent());
    }

    @Test
    void anAreaCannotBeSplitByItsOnlyPanel() {
        Arrangement a = withPanels();
        assertFalse(a.move("messages", "messages", Zone.TOP));
    }

    @Test
    void aSavedArrangementReadsBackTheSameAndKeepsUnknownPanels() throws IOException {
        Arrangement a = withPanels();
        a.move("fit", "messages", Zone.BOTTOM);
        a.closed.add("signal");
        a.place("from-a-missing-bundle", Area.RIGHT);
        a.width = 1280;
        Path file = dir.resolve("arrangement.json");
        ArrangementFile.save(a, file);
        Arrangement b = ArrangementFile.read(file);
        assertEquals(ArrangementFile.write(a), ArrangementFile.write(b));
        assertTrue(b.areaOf("from-a-missing-bundle").isPresent());
    }

    @Test
    void aFileThatIsNotAnArrangementSaysSo() throws IOException {
        Path file = Files.writeString(dir.resolve("x.json"), "{\"layout\": {}}");
        IOException e = assertThrows(IOException.class, () -> ArrangementFile.read(file));
        assertTrue(e.getMessage().contains("not a Lamella arrangement"), e.getMessage());
    }
}
