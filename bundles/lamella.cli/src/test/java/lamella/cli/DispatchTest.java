package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.time.Duration;
import java.util.List;

import org.junit.jupiter.api.Test;

import lamella.api.command.Command;
import lamella.api.command.StartupNotice;

class DispatchTest {

    private final CommandShelf shelf = new CommandShelf();
    private final Dispatch dispatch = new Dispatch(shelf, Duration.ofSeconds(5), Duration.ofMillis(50), false);
    private final Capture capture = new Capture();

    @Test
    void runsTheNamedCommandWithTheRestOfTheLineAndReturnsItsStatus() {
        FakeCommand simulate = new FakeCommand("simulate", args -> 7);
        shelf.add(new FakeCommand("plugins", args -> 0));
        shelf.add(simulate);

        int status = dispatch.run(List.of("simulate", "case.json", "--out", "x.csv"), capture.io);

        assertEquals(7, status);
        assertEquals(List.of(List.of("case.json", "--out", "x.csv")), simulate.calls);
    }

    @Test
    void everyStartUpNoticeIsPrintedOnceBeforeTheCommandRunsAndAFailingOneDoesNotStopIt() {
        shelf.add(new FakeCommand("plugins", args -> {
            capture.io.err().println("running");
            return 0;
        }));
        StartupNotice broken = () -> List.of("the facility material library /srv/x cannot be used; details: lamella"
                + " materials check /srv/x --tier facility");
        StartupNotice failing = () -> {
            throw new IllegalStateException("disk gone");
        };
        Dispatch noticing = new Dispatch(shelf, Duration.ofSeconds(5), Duration.ofMillis(50), false,
                () -> List.of(broken, failing, List::of), List::of);

        assertEquals(0, noticing.run(List.of("plugins"), capture.io));

        assertEquals("lamella: the facility material library /srv/x cannot be used; details: lamella materials check"
                + " /srv/x --tier facility\nlamella: a start-up check failed: java.lang.IllegalStateException: disk"
                + " gone\nrunning\n", capture.err());
    }

    @Test
    void theRuntimesInputsReachTheCommandAsFilesItsOutputsMustNotReplace() {
        List<List<java.nio.file.Path>> seen = new java.util.ArrayList<>();
        shelf.add(new Command() {
            public String name() {
                return "export";
            }

            public String summary() {
                return "";
            }

            public String usage() {
                return "";
            }

            public int run(List<String> args, lamella.api.command.CommandIO io) {
                seen.add(io.runtimeInputs());
                return 0;
            }
        });
        java.nio.file.Path library = java.nio.file.Path.of("/srv/lab/materials/films.json");
        Dispatch guarded = new Dispatch(shelf, Duration.ofSeconds(5), Duration.ofMillis(50), false, List::of,
                () -> List.of(() -> List.of(library)));
        assertEquals(0, guarded.run(List.of("export"), capture.io));
        assertEquals(List.of(List.of(library)), seen);
    }

    @Test
    void unknownCommandIsBadInputWithASuggestionAndTheList() {
        shelf.add(new FakeCommand("plugins", args -> 0));
        shelf.add(new FakeCommand("help", args -> 0));

        int status = dispatch.run(List.of("plugin"), capture.io);

        assertEquals(Command.BAD_INPUT, status);
        assertEquals("lamella: there is no command 'plugin'; did you mean 'plugins'?\ncommands: help, plugins\n",
                capture.err());
    }

    @Test
    void helpFlagAnywhereAfterTheCommandShowsItsUsageInsteadOfRunningIt() {
        FakeCommand simulate = new FakeCommand("simulate", args -> 1);
        shelf.add(simulate);

        int status = dispatch.run(List.of("simulate", "case.json", "-h"), capture.io);

        assertEquals(Command.OK, status);
        assertEquals("usage: lamella simulate THING\n", capture.out());
        assertTrue(simulate.calls.isEmpty());
    }

    @Test
    void aHelpFlagAfterDoubleDashIsAnOrdinaryArgument() {
        FakeCommand simulate = new FakeCommand("simulate", args -> 0);
        shelf.add(simulate);

        dispatch.run(List.of("simulate", "--", "--help"), capture.io);

        assertEquals(List.of(List.of("--", "--help")), simulate.calls);
    }

    @Test
    void helpFlagAloneListsTheCommands() {
        shelf.add(new FakeCommand("simulate", args -> 0));

        int status = dispatch.run(List.of("--help"), capture.io);

        assertEquals(Command.OK, status);
        assertTrue(capture.out().contains("simulate  Summary of simulate."), capture.out());
    }

    @Test
    void aThrowingCommandGivesOneLineAndStatusOneWithoutAStackTrace() {
        shelf.add(new FakeCommand("simulate", args -> {
            throw new IllegalStateException("no kernel");
        }));

        int status = dispatch.run(List.of("simulate"), capture.io);

        assertEquals(Command.FAILED, status);
        assertTrue(capture.err().startsWith(
                "lamella: internal error in command simulate: java.lang.IllegalStateException: no kernel\n"),
                capture.err());
        assertTrue(!capture.err().contains("\tat "), capture.err());
    }

    @Test
    void inDebugModeTheStackTraceIsShown() {
        Dispatch debugging = new Dispatch(shelf, Duration.ofSeconds(5), Duration.ofMillis(50), true);
        shelf.add(new FakeCommand("simulate", args -> {
            throw new IllegalStateException("no kernel");
        }));

        debugging.run(List.of("simulate"), capture.io);

        assertTrue(capture.err().contains("\tat lamella.cli.DispatchTest"), capture.err());
    }

    @Test
    void waitsForACommandThatRegistersLate() throws InterruptedException {
        Dispatch patient = new Dispatch(shelf, Duration.ofSeconds(5), Duration.ofSeconds(2), false);
        Thread late = new Thread(() -> {
            sleep(200);
            shelf.add(new FakeCommand("simulate", args -> 3));
        });
        late.start();

        int status = patient.run(List.of("simulate"), capture.io);

        late.join();
        assertEquals(3, status);
    }

    private static void sleep(long ms) {
        try {
            Thread.sleep(ms);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }
}
