package lamella.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.List;
import java.util.Map;
import java.util.Set;

import org.junit.jupiter.api.Test;

/** Which runs only show help, and the closure that picks the bundles such a run starts. */
class CommandLayerTest {

    @Test
    void helpIsTheHelpCommandAHelpFlagFirstOrAHelpFlagBeforeTheEndOfOptions() {
        assertEquals(RuntimeScope.HELP, RuntimeScope.of(List.of()));
        assertEquals(RuntimeScope.HELP, RuntimeScope.of(List.of("help")));
        assertEquals(RuntimeScope.HELP, RuntimeScope.of(List.of("help", "simulate")));
        assertEquals(RuntimeScope.HELP, RuntimeScope.of(List.of("--help")));
        assertEquals(RuntimeScope.HELP, RuntimeScope.of(List.of("-h")));
        assertEquals(RuntimeScope.HELP, RuntimeScope.of(List.of("simulate", "case.json", "--help")));
        assertEquals(RuntimeScope.HELP, RuntimeScope.of(List.of("fit", "-h", "--", "x")));
        assertEquals(RuntimeScope.COMMANDS, RuntimeScope.of(List.of("simulate", "case.json")));
        // After "--" a help flag is a file name, and the command runs.
        assertEquals(RuntimeScope.COMMANDS, RuntimeScope.of(List.of("simulate", "--", "--help")));
        // A file called "help" is no help request; nor is a flag that merely starts like one.
        assertEquals(RuntimeScope.COMMANDS, RuntimeScope.of(List.of("simulate", "help")));
        assertEquals(RuntimeScope.COMMANDS, RuntimeScope.of(List.of("simulate", "--helpful")));
    }

    @Test
    void theClosureFollowsNeedsTransitivelyKeepsTheGivenOrderAndLeavesTheRestOut() {
        // a needs b, b needs c, c needs a (a cycle); d needs e; f is needed by no one.
        Map<String, Set<String>> needs = Map.of("a", Set.of("b"), "b", Set.of("c"), "c", Set.of("a"),
                "d", Set.of("e"), "e", Set.of(), "f", Set.of());
        List<String> all = List.of("f", "e", "d", "c", "b", "a");
        assertEquals(List.of("c", "b", "a"),
                CommandLayer.closure(all, "a"::equals, (x, y) -> needs.get(x).contains(y)));
        assertEquals(List.of("e", "d"), CommandLayer.closure(all, "d"::equals, (x, y) -> needs.get(x).contains(y)));
        assertEquals(List.of("e", "d", "c", "b", "a"),
                CommandLayer.closure(all, Set.of("d", "b")::contains, (x, y) -> needs.get(x).contains(y)));
        assertEquals(List.of(), CommandLayer.closure(all, s -> false, (x, y) -> true));
    }
}
