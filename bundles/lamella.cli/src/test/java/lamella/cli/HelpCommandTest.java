package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;

import org.junit.jupiter.api.Test;

import lamella.api.command.Command;

class HelpCommandTest {

    private final List<Command> commands = List.of(new FakeCommand("simulate", a -> 0),
            new FakeCommand("help", a -> 0));
    private final Capture capture = new Capture();

    @Test
    void withoutArgumentsListsTheCommandsByName() {
        assertEquals(Command.OK, HelpCommand.answer(List.of(), commands, capture.io));
        assertEquals("""
                usage: lamella COMMAND [ARGUMENTS]

                  command   what it does
                  help      Summary of help.
                  simulate  Summary of simulate.

                lamella help COMMAND, or lamella COMMAND --help, shows how to use a command.
                """, capture.out());
    }

    @Test
    void withACommandNamePrintsItsUsage() {
        assertEquals(Command.OK, HelpCommand.answer(List.of("simulate"), commands, capture.io));
        assertEquals("usage: lamella simulate THING\n", capture.out());
    }

    @Test
    void anUnknownNameIsBadInputWithASuggestion() {
        assertEquals(Command.BAD_INPUT, HelpCommand.answer(List.of("simulat"), commands, capture.io));
        assertTrue(capture.err().contains("did you mean 'simulate'?"), capture.err());
    }

    @Test
    void twoNamesAreBadInput() {
        assertEquals(Command.BAD_INPUT, HelpCommand.answer(List.of("help", "simulate"), commands, capture.io));
        assertTrue(capture.err().contains("at most one command name"), capture.err());
    }
}
