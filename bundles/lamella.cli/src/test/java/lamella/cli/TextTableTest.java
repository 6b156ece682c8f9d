package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import org.junit.jupiter.api.Test;

class TextTableTest {

    @Test
    void padsEveryColumnButTheLastToItsWidestCell() {
        TextTable table = new TextTable("kind", "name", "summary");
        table.add("geometry", "gaussian", "Gaussian beams.");
        table.add("command", "help", "");

        assertEquals("""
                > kind      name      summary
                > geometry  gaussian  Gaussian beams.
                > command   help
                """, table.render("> "));
    }

    @Test
    void aRowOfTheWrongWidthIsRefused() {
        TextTable table = new TextTable("a", "b");
        assertThrows(IllegalArgumentException.class, () -> table.add("only one"));
    }
}
