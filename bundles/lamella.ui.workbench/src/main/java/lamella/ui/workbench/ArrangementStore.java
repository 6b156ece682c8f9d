package lamella.ui.workbench;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/** The user's saved arrangements: the one restored at start and the named ones. */
final class ArrangementStore {

    /** Names become file names, so they keep to letters, digits, spaces, dots, dashes and underscores. */
    private static final Pattern NAME = Pattern.compile("[\\p{L}\\p{N} ._-]{1,60}");

    private final UserFolder user;
    private final MessageLog messages;

    ArrangementStore(UserFolder user, MessageLog messages) {
        this.user = user;
        this.messages = messages;
    }

    /** The arrangement of the last session, or the standard one (saying why, when the saved one is unreadable). */
    Arrangement last() {
        Path file = user.arrangement();
        if (!Files.isRegularFile(file)) {
            return Arrangement.standard();
        }
        try {
            return ArrangementFile.read(file);
        } catch (IOException | RuntimeException e) {
            messages.error("The saved arrangement could not be read; the standard one is used instead", e);
            return Arrangement.standard();
        }
    }

    /**
     * Where the window was when it was last closed, if it was saved with the arrangement (without an arrangement —
     * the user deleted it to start afresh — the window opens on the whole screen, as the first time). An unreadable
     * place is reported and ignored.
     */
    Optional<WindowPlace> lastPlace() {
        Path file = user.windowPlace();
        if (!Files.isRegularFile(user.arrangement()) || !Files.isRegularFile(file)) {
            return Optional.empty();
        }
        try {
            return Optional.of(WindowPlace.read(file));
        } catch (IOException | RuntimeException e) {
            messages.warning("The window's last place could not be read (" + e.getMessage() + "); it opens on the"
                    + " whole screen instead.");
            return Optional.empty();
        }
    }

    /** Saves the arrangement and, beside it, the window's place that it records. */
    void saveLast(Arrangement a) {
        try {
            ArrangementFile.save(a, user.arrangement());
        } catch (IOException e) {
            messages.error("Could not save the arrangement to " + user.arrangement(), e);
            return;
        }
        Optional<WindowPlace> place = WindowPlace.of(a);
        try {
            if (place.isPresent()) {
                place.get().save(user.windowPlace());
            } else {
                Files.deleteIfExists(user.windowPlace());
            }
        } catch (IOException e) {
            messages.error("Could not save the window's place to " + user.windowPlace(), e);
        }
    }

    List<String> names() {
        List<String> out = new ArrayList<>();
        if (!Files.isDirectory(user.namedArrangements())) {
            return out;
        }
        try (Stream<Path> files = Files.list(user.namedArrangements())) {
            files.map(f -> f.getFileName().toString()).filter(n -> n.endsWith(".json"))
                    .map(n -> n.substring(0, n.length() - ".json".length())).sorted().forEach(out::add);
        } catch (IOException e) {
            messages.error("Could not list the named arrangements in " + user.namedArrangements(), e);
        }
        return out;
    }

    /** @return false (with a message saying why) when the name is not usable or the file cannot be written */
    boolean saveNamed(String name, Arrangement a) {
        if (!NAME.matcher(name).matches() || name.startsWith(".")) {
            messages.warning("'" + name + "' cannot name an arrangement: use up to 60 letters, digits, spaces, dots,"
                    + " dashes or underscores, not starting with a dot.");
            return false;
        }
        Path file = user.namedArrangements().resolve(name + ".json");
        try {
            ArrangementFile.save(a, file);
            messages.info("Saved the arrangement '" + name + "'.");
            return true;
        } catch (IOException e) {
            messages.error("Could not save the arrangement '" + name + "' to " + file, e);
            return false;
        }
    }

    Arrangement named(String name) throws IOException {
        return ArrangementFile.read(user.namedArrangements().resolve(name + ".json"));
    }
}
