package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import lamella.api.command.Command;

class PluginsListingTest {

    /** Stands in for an implementation class that its bundle keeps private. */
    private static final class HiddenCommand extends Object {
    }

    @Test
    void describesAServiceThroughItsInterface() {
        ServiceKind kind = new ServiceKind("command", Command.class.getName(), "name");

        ServiceRow row = kind.describe(new FakeCommand("simulate", a -> 0), Command.class, "lamella.cli", "0.1.0");

        assertEquals(new ServiceRow("command", "simulate", "Summary of simulate.", "lamella.cli", "0.1.0"), row);
    }

    @Test
    void aServiceThatCannotBeDescribedStillGetsARowSayingWhy() {
        ServiceKind kind = new ServiceKind("command", Command.class.getName(), "name");

        ServiceRow row = kind.describe(new HiddenCommand(), Command.class, "x", "1.0.0");

        assertEquals("?", row.name());
        assertTrue(row.summary().startsWith("(cannot describe it: "), row.summary());
    }

    @Test
    void rendersAlignedColumnsAndThePluginsFolder() {
        String text = PluginsCommand.render(List.of(
                new ServiceRow("geometry", "gaussian", "Gaussian beams.", "lamella.geometry.gaussian", "0.1.0"),
                new ServiceRow("command", "help", "Lists the commands.", "lamella.cli", "0.1.0")), "/opt/x/plugins");

        assertEquals("""
                kind      name      bundle                     version  summary
                geometry  gaussian  lamella.geometry.gaussian  0.1.0    Gaussian beams.
                command   help      lamella.cli                0.1.0    Lists the commands.

                plugins folder: /opt/x/plugins
                """, text);
    }

    @Test
    void everyListedKindNamesAnInterfaceOfTheApi() {
        for (ServiceKind kind : PluginsCommand.KINDS) {
            assertTrue(kind.interfaceName().startsWith("lamella.api."), kind.interfaceName());
        }
    }
}
