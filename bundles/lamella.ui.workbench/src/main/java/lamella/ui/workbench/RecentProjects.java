package lamella.ui.workbench;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import lamella.ui.api.JsonFiles;

/** The projects opened lately, newest first, kept as {@code {"recent": [path, …]}}. */
final class RecentProjects {

    static final int KEPT = 10;

    /** Made on first use, not as the window opens. */
    private static final class Json {
        static final ObjectMapper MAPPER = new ObjectMapper();
    }

    private final Path file;
    private final MessageLog messages;
    private final List<Path> paths = new ArrayList<>();
    private boolean loaded;

    /** The list in {@code file}, read when it is first asked for (reading JSON is slow the first time in a run). */
    RecentProjects(Path file, MessageLog messages) {
        this.file = file;
        this.messages = messages;
    }

    /** Reads the list; an unreadable list is reported and started afresh, since it only saves the user a click. */
    private void load() {
        if (loaded) {
            return;
        }
        loaded = true;
        if (!Files.isRegularFile(file)) {
            return;
        }
        try {
            JsonNode root = JsonFiles.read(file);
            root.path("recent").forEach(p -> paths.add(Path.of(p.asText())));
        } catch (IOException | RuntimeException e) {
            messages.warning("The list of recent projects " + file + " is unreadable and starts afresh: "
                    + e.getMessage());
        }
    }

    List<Path> paths() {
        load();
        return List.copyOf(paths);
    }

    void opened(Path project) {
        load();
        Path abs = project.toAbsolutePath().normalize();
        paths.remove(abs);
        paths.add(0, abs);
        while (paths.size() > KEPT) {
            paths.remove(paths.size() - 1);
        }
        ArrayNode list = Json.MAPPER.createObjectNode().putArray("recent");
        paths.forEach(p -> list.add(p.toString()));
        try {
            AtomicFile.write(file, Json.MAPPER.writerWithDefaultPrettyPrinter()
                    .writeValueAsString(Json.MAPPER.createObjectNode().set("recent", list)) + "\n");
        } catch (IOException e) {
            messages.error("Could not update the list of recent projects " + file, e);
        }
    }
}
