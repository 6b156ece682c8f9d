package lamella.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.Names;
import lamella.api.json.JsonProblem;
import lamella.api.json.StrictJson;

/**
 * The cases of a batch: every {@code *.json} file directly inside a folder (by name), or the list of a manifest file
 * with optional per-case names and overrides. Manifest, version 1:
 *
 * <pre>
 * {"batch_manifest": 1,
 *  "cases": [{"case": "FH-117/case.json"},
 *            {"case": "FH-118/case.json", "name": "FH-118-thin", "set": {"transducer.thickness_m": 8.1e-8}}]}
 * </pre>
 *
 * Case paths are relative to the manifest's folder; {@code name} (default: the case file's name without
 * {@code .json}) names the result file and must be unique; {@code set} replaces inputs of the case by their parameter
 * paths before it is fitted. Every problem is an InputException at the manifest's line and JSON path.
 */
public final class BatchManifest {

    static final String VERSION_KEY = "batch_manifest";
    static final Set<String> TOP_KEYS = Set.of(VERSION_KEY, "description", "cases");
    static final Set<String> CASE_KEYS = Set.of("case", "name", "set");
    /** A name becomes a file name in the output folder: nothing that could leave it or hide there. */
    private static final String NAME_PATTERN = "[A-Za-z0-9][A-Za-z0-9._+-]*";

    /**
     * One case of the batch.
     *
     * @param name      unique in the batch; its result is {@code results/NAME.json}
     * @param file      the case file
     * @param overrides parameter path to value, in the order written
     * @param manifest  the manifest that lists it, or null for a case of a folder
     * @param path      its JSON path in the manifest ({@code cases[2]}), or null
     * @param lines     the manifest's line of every JSON path
     */
    public record Entry(String name, Path file, Map<String, Double> overrides, Path manifest, String path,
                 Map<String, Integer> lines) {

        /** A problem of this entry's key {@code sub} ({@code set.film.thickness_m}) at its manifest line. */
        InputException problem(String sub, String problem) {
            if (manifest == null) {
                return new InputException(file, null, -1, problem);
            }
            String at = path + "." + sub;
            Integer line = lines.get(at);
            return new InputException(manifest, at, line == null ? lines.getOrDefault(path, -1) : line, problem);
        }
    }

    private BatchManifest() {
    }

    /** A folder's cases, or a manifest's. */
    public static List<Entry> read(Path input) throws InputException {
        if (Files.isDirectory(input)) {
            return folder(input);
        }
        if (!Files.isRegularFile(input)) {
            throw new InputException(input, null, -1, "no such manifest file or folder of case files");
        }
        return manifest(input);
    }

    private static List<Entry> folder(Path dir) throws InputException {
        List<Path> files = new ArrayList<>();
        try (DirectoryStream<Path> s = Files.newDirectoryStream(dir, "*.json")) {
            for (Path p : s) {
                if (Files.isRegularFile(p)) {
                    files.add(p);
                }
            }
        } catch (IOException e) {
            throw new InputException(dir, null, -1, "cannot list the folder: " + FileProblems.reason(e));
        }
        if (files.isEmpty()) {
            throw new InputException(dir, null, -1, "the folder holds no case files (*.json)");
        }
        files.sort(null);
        List<Entry> out = new ArrayList<>();
        for (Path f : files) {
            out.add(new Entry(stem(f), f, Map.of(), null, null, Map.of()));
        }
        return out;
    }

    private static List<Entry> manifest(Path file) throws InputException {
        byte[] bytes;
        try {
            if (Files.size(file) > 64L * 1024 * 1024) {
                throw new InputException(file, null, -1, "the file is larger than 64 MiB; not a batch manifest");
            }
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new InputException(file, null, -1, FileProblems.cannotRead(e));
        }
        Map<String, Integer> lines;
        JsonNode root;
        try {
            String text = StrictJson.decode(bytes);
            lines = StrictJson.read(text).lines();
            root = new ObjectMapper().readTree(text.startsWith("\uFEFF") ? text.substring(1) : text);
        } catch (JsonProblem e) {
            throw new InputException(file, e.path(), e.line(), e.problem());
        } catch (IOException e) {
            throw new InputException(file, null, -1, FileProblems.cannotRead(e));
        }
        Located at = new Located(file, lines);
        if (!root.isObject()) {
            throw at.problem("", "expected a manifest object {\"" + VERSION_KEY + "\": 1, \"cases\": […]}");
        }
        if (!root.has(VERSION_KEY)) {
            throw at.problem("", "not a batch manifest: it has no \"" + VERSION_KEY + "\": 1 (a folder of case files"
                    + " is given as the folder itself)");
        }
        only(root, TOP_KEYS, "", "the manifest", at);
        JsonNode version = root.get(VERSION_KEY);
        if (!version.isIntegralNumber() || version.asInt() != 1) {
            throw at.problem(VERSION_KEY, "this Lamella reads manifest version 1, got " + version);
        }
        JsonNode cases = root.get("cases");
        if (cases == null || !cases.isArray() || cases.isEmpty()) {
            throw at.problem(cases == null ? "" : "cases", "expected \"cases\": a non-empty list of"
                    + " {\"case\": FILE} objects");
        }
        Path folder = file.toAbsolutePath().getParent();
        List<Entry> out = new ArrayList<>();
        Map<String, String> names = new HashMap<>();
        for (int i = 0; i < cases.size(); i++) {
            String path = "cases[" + i + "]";
            JsonNode c = cases.get(i);
            if (!c.isObject()) {
                throw at.problem(path, "expected an object {\"case\": FILE}, got " + c);
            }
            only(c, CASE_KEYS, path, "a case entry", at);
            JsonNode caseFile = c.get("case");
            if (caseFile == null || !caseFile.isTextual() || caseFile.asText().isBlank()) {
                throw at.problem(caseFile == null ? path : path + ".case", "expected the case file's path as text");
            }
            Path f = folder.resolve(caseFile.asText()).normalize();
            String name = stem(f);
            if (c.has("name")) {
                JsonNode n = c.get("name");
                if (!n.isTextual() || !n.asText().matches(NAME_PATTERN)) {
                    throw at.problem(path + ".name", "expected a name of letters, digits and . _ + - (starting with"
                            + " a letter or digit), got " + n);
                }
                name = n.asText();
            }
            String before = names.put(name, path);
            if (before != null) {
                throw at.problem(c.has("name") ? path + ".name" : path + ".case", "the name '" + name
                        + "' is already used by " + before + "; give one of them a \"name\"");
            }
            Map<String, Double> overrides = new LinkedHashMap<>();
            JsonNode set = c.get("set");
            if (set != null) {
                if (!set.isObject()) {
                    throw at.problem(path + ".set", "expected an object of parameter paths and values, such as"
                            + " {\"film.thickness_m\": 3.1e-7}");
                }
                for (Iterator<Map.Entry<String, JsonNode>> it = set.fields(); it.hasNext(); ) {
                    Map.Entry<String, JsonNode> e = it.next();
                    if (!e.getValue().isNumber() || !Double.isFinite(e.getValue().asDouble())) {
                        throw at.problem(path + ".set." + e.getKey(), "expected a number in SI units, got "
                                + e.getValue());
                    }
                    overrides.put(e.getKey(), e.getValue().asDouble());
                }
            }
            out.add(new Entry(name, f, overrides, file, path, lines));
        }
        return out;
    }

    private static void only(JsonNode node, Set<String> known, String path, String what, Located at)
            throws InputException {
        for (Iterator<String> it = node.fieldNames(); it.hasNext(); ) {
            String key = it.next();
            if (!known.contains(key)) {
                String hint = Names.closest(key, known).map(h -> " (did you mean '" + h + "'?)").orElse("");
                throw at.problem(path.isEmpty() ? key : path + "." + key, "unknown key in " + what + hint
                        + "; expected one of: " + String.join(", ", new TreeSet<>(known)));
            }
        }
    }

    static String stem(Path f) {
        String n = f.getFileName().toString();
        return n.endsWith(".json") ? n.substring(0, n.length() - 5) : n;
    }

    /** The manifest's file and lines, for messages. */
    private record Located(Path file, Map<String, Integer> lines) {

        InputException problem(String path, String problem) {
            return new InputException(file, path, lines.getOrDefault(path, -1), problem);
        }
    }
}
