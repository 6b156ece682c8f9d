package lamella.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.function.ToIntFunction;

import lamella.api.command.Command;
import lamella.api.command.CommandIO;

/** A command whose behaviour a test chooses; it remembers the arguments it was given. */
final class FakeCommand implements Command {

    final List<List<String>> calls = new ArrayList<>();
    private final String name;
    private final ToIntFunction<List<String>> behaviour;

    FakeCommand(String name, ToIntFunction<List<String>> behaviour) {
        this.name = name;
        this.behaviour = behaviour;
    }

    @Override
    public String name() {
        return name;
    }

    @Override
    public String summary() {
        return "Summary of " + name + ".";
    }

    @Override
    public String usage() {
        return "usage: lamella " + name + " THING\n\n\n";
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        calls.add(args);
        io.out().print("ran " + name);
        return behaviour.applyAsInt(args);
    }
}
