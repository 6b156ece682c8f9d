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

    private static final ObjectMapper JSON = new ObjectMapper();

    private final Path file;
    private final List<Path> paths = new ArrayList<>();

    RecentProjects(Path file) {
        this.file = file;
    }

    /** Reads the list; an unreadable list is reported and started afresh, since it only saves the user a click. */
    void load(MessageLog messages) {
        paths.clear();
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
        return List.copyOf(paths);
    }

    void opened(Path project, MessageLog messages) {
        Path abs = project.toAbsolutePath().normalize();
        paths.remove(abs);
        paths.add(0, abs);
        while (paths.size() > KEPT) {
            paths.remove(paths.size() - 1);
        }
        ArrayNode list = JSON.createObjectNode().putArray("recent");
        paths.forEach(p -> list.add(p.toString()));
        try {
            AtomicFile.write(file, JSON.writerWithDefaultPrettyPrinter()
                    .writeValueAsString(JSON.createObjectNode().set("recent", list)) + "\n");
        } catch (IOException e) {
            messages.error("Could not update the list of recent projects " + file, e);
        }
    }
}
