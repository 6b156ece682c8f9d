package lamella.ui.workbench;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.file.Path;
import lamella.ui.api.JsonFiles;

/**
 * Arrangements as JSON: {@code {"lamella_arrangement": 1, "window": {…}, "closed": […], "enlarged": id,
 * "layout": part}} where a part is {@code {"split": "across"|"down", "weights": […], "parts": […]}} or
 * {@code {"area": role|null, "panels": […], "front": id}}.
 */
final class ArrangementFile {

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);
    private static final String VERSION_KEY = "lamella_arrangement";
    private static final int VERSION = 1;

    private ArrangementFile() {
    }

    static String write(Arrangement a) {
        ObjectNode root = JSON.createObjectNode();
        root.put(VERSION_KEY, VERSION);
        ObjectNode w = root.putObject("window");
        w.put("x", a.x).put("y", a.y).put("width", a.width).put("height", a.height).put("maximised",
                a.windowMaximised);
        ArrayNode closed = root.putArray("closed");
        a.closed.forEach(closed::add);
        if (a.enlarged != null) {
            root.put("enlarged", a.enlarged);
        }
        root.set("layout", part(a.root));
        try {
            return JSON.writeValueAsString(root) + "\n";
        } catch (IOException e) {
            throw new IllegalStateException("a JSON tree always serialises", e);
        }
    }

    static void save(Arrangement a, Path file) throws IOException {
        AtomicFile.write(file, write(a));
    }

    /** Reads an arrangement; a file that is not one is an IOException saying what is wrong. */
    static Arrangement read(Path file) throws IOException {
        JsonNode root = JsonFiles.read(file);
        if (root == null || root.path(VERSION_KEY).asInt() != VERSION) {
            throw new IOException(file + ": not a Lamella arrangement (expected \"" + VERSION_KEY + "\": " + VERSION
                    + ")");
        }
        Arrangement a = new Arrangement(part(root.path("layout"), file, "layout"));
        JsonNode w = root.path("window");
        a.x = w.path("x").asInt();
        a.y = w.path("y").asInt();
        a.width = w.path("width").asInt();
        a.height = w.path("height").asInt();
        a.windowMaximised = w.path("maximised").asBoolean();
        root.path("closed").forEach(id -> a.closed.add(id.asText()));
        String enlarged = root.path("enlarged").asText(null);
        a.enlarged = enlarged != null && a.areaOf(enlarged).isPresent() ? enlarged : null;
        return a;
    }

    private static ObjectNode part(Part p) {
        ObjectNode n = JSON.createObjectNode();
        if (p instanceof TabArea area) {
            n.put("area", area.role);
            ArrayNode panels = n.putArray("panels");
            area.panels.forEach(panels::add);
            n.put("front", area.front);
            return n;
        }
        Split s = (Split) p;
        n.put("split", s.sideBySide ? "across" : "down");
        ArrayNode weights = n.putArray("weights");
        s.weights.forEach(weights::add);
        ArrayNode parts = n.putArray("parts");
        s.parts.forEach(c -> parts.add(part(c)));
        return n;
    }

    private static Part part(JsonNode n, Path file, String where) throws IOException {
        if (n.has("area")) {
            TabArea area = new TabArea(n.get("area").isTextual() ? n.get("area").asText() : null);
            n.path("panels").forEach(id -> area.panels.add(id.asText()));
            String front = n.path("front").asText(null);
            area.front = area.panels.contains(front) ? front : area.panels.isEmpty() ? null : area.panels.get(0);
            return area;
        }
        String dir = n.path("split").asText("");
        if (!dir.equals("across") && !dir.equals("down")) {
            throw new IOException(file + ": " + where + " is neither an area nor a split (\"split\": \"across\" or"
                    + " \"down\")");
        }
        JsonNode parts = n.path("parts");
        if (!parts.isArray() || parts.isEmpty()) {
            throw new IOException(file + ": " + where + ".parts must list at least one part");
        }
        Split s = new Split(dir.equals("across"));
        for (int i = 0; i < parts.size(); i++) {
            s.add(part(parts.get(i), file, where + ".parts[" + i + "]"), n.path("weights").path(i).asInt(1));
        }
        return s;
    }
}
