package lamella.ui.api;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Predicate;
import lamella.api.AtomicText;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.ParameterRef;
import lamella.api.fit.FitOutcome;

/**
 * The case being edited: the case-file document itself (stack, geometry, measurement and the fit block with its
 * datasets, free and uncertain inputs), so that what the workbench saves is exactly what the headless commands
 * read. Every edit is checked at once by the live case reader; {@link #current()} is the last document that passed,
 * {@link #problem()} what is wrong with the present one. UI thread only.
 */
public final class Project {

    /** How a fit treats an input. */
    public enum Role { FIXED, FREE, UNCERTAIN }

    /** What changed, for listeners. */
    public enum Change { INPUTS, FIT_SETUP, RESULT, FILE }

    @FunctionalInterface
    public interface Listener {
        void changed(Change change);
    }

    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private final CaseReader reader;
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private ObjectNode document;
    private Path file;
    private Path folder;
    private boolean dirty;
    private CaseDocument current;
    private InputException problem;
    private FitOutcome lastFit;

    private Project(ObjectNode document, Path file, Path folder, CaseReader reader) {
        this.document = document;
        this.file = file;
        this.folder = folder;
        this.reader = reader;
        revalidate();
    }

    /** Opens a case file. */
    public static Project open(Path file, CaseReader reader) throws IOException, InputException {
        Path abs = file.toAbsolutePath().normalize();
        reader.read(abs);
        JsonNode tree = JSON.readTree(Files.readString(abs, StandardCharsets.UTF_8));
        return new Project((ObjectNode) tree, abs, abs.getParent(), reader);
    }

    /** A new, unsaved project from case-file text; relative data paths resolve against folder. */
    public static Project of(String json, Path folder, CaseReader reader) throws IOException {
        JsonNode tree = JSON.readTree(json);
        if (!(tree instanceof ObjectNode o)) {
            throw new IOException("a case document is a JSON object");
        }
        return new Project(o, null, folder.toAbsolutePath().normalize(), reader);
    }

    public void addListener(Listener l) {
        listeners.add(l);
    }

    public void removeListener(Listener l) {
        listeners.remove(l);
    }

    /** The file it was opened from or last saved to; empty while untitled. */
    public Optional<Path> file() {
        return Optional.ofNullable(file);
    }

    /** The folder relative data paths resolve against. */
    public Path folder() {
        return folder;
    }

    public boolean dirty() {
        return dirty;
    }

    /** The last version of the document that the case reader accepted. */
    public Optional<CaseDocument> current() {
        return Optional.ofNullable(current);
    }

    /** What is wrong with the document as it is now, if anything. */
    public Optional<InputException> problem() {
        return Optional.ofNullable(problem);
    }

    /** The model inputs of the last accepted version. */
    public Optional<CaseModel> model() {
        return current().map(d -> new CaseModel(d.stack(), d.geometry(), d.measurement()));
    }

    /** The document as case-file text. */
    public String json() {
        try {
            return JSON.writeValueAsString(document) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a JSON tree always serialises", e);
        }
    }

    /** A copy of the document's tree, for panels that show more than values. */
    public ObjectNode tree() {
        return document.deepCopy();
    }

    // ------------------------------------------------------------------ inputs

    /** Sets a numeric input (a layer property, or a key of the case's or a dataset's geometry/measurement block). */
    public void set(ParameterRef ref, double value) {
        ObjectNode holder = holder(ref);
        holder.put(ref.key(), value);
        if (ref.scope() == ParameterRef.Scope.LAYER && ref.key().equals("k_in_plane_w_mk")) {
            holder.remove("k_in_plane_x_w_mk");
            holder.remove("k_in_plane_y_w_mk");
        }
        edited(Change.INPUTS);
    }

    /** Removes a key from a layer (to fall back on its default or its material's value). */
    public void clearLayerKey(String layer, String key) {
        layerNode(layer).remove(key);
        edited(Change.INPUTS);
    }

    /** Sets a layer's text key, such as its material. */
    public void setLayerText(String layer, String key, String text) {
        layerNode(layer).put(key, text);
        edited(Change.INPUTS);
    }

    /** Replaces the whole layer list's entry at index with a copy of the given layer object. */
    public void putLayer(int index, ObjectNode layer) {
        layers().set(index, layer.deepCopy());
        edited(Change.INPUTS);
    }

    public void addLayer(int index, ObjectNode layer) {
        layers().insert(index, layer.deepCopy());
        edited(Change.INPUTS);
    }

    public void removeLayer(int index) {
        String name = layers().get(index).path("name").asText();
        layers().remove(index);
        dropRoles(r -> r.scope() == ParameterRef.Scope.LAYER && r.layer().equals(name));
        edited(Change.INPUTS);
    }

    public void moveLayer(int from, int to) {
        ArrayNode l = layers();
        JsonNode n = l.remove(from);
        l.insert(to, n);
        edited(Change.INPUTS);
    }

    public void setBottom(String bottom) {
        stackNode().put("bottom", bottom);
        edited(Change.INPUTS);
    }

    /** Replaces the case's geometry or measurement block. */
    public void setBlock(String name, ObjectNode block) {
        if (!name.equals("geometry") && !name.equals("measurement")) {
            throw new IllegalArgumentException("geometry or measurement, not " + name);
        }
        document.set(name, block.deepCopy());
        edited(Change.INPUTS);
    }

    // ------------------------------------------------------------------ fit set-up

    public Role role(ParameterRef ref) {
        if (find(fitArray("free"), ref) >= 0) {
            return Role.FREE;
        }
        return find(fitArray("uncertain"), ref) >= 0 ? Role.UNCERTAIN : Role.FIXED;
    }

    /** The σ of an uncertain input as a fraction of its value, or NaN if it is not uncertain or given absolutely. */
    public double relativeSigma(ParameterRef ref) {
        int i = find(fitArray("uncertain"), ref);
        return i < 0 ? Double.NaN : fitArray("uncertain").get(i).path("sigma_relative").asDouble(Double.NaN);
    }

    /** Makes an input free, with optional bounds (NaN: none). */
    public void setFree(ParameterRef ref, double min, double max) {
        setFixedQuietly(ref);
        ObjectNode e = entry(ref);
        if (!Double.isNaN(min)) {
            e.put("min", min);
        }
        if (!Double.isNaN(max)) {
            e.put("max", max);
        }
        fitArray("free").add(e);
        edited(Change.FIT_SETUP);
    }

    /** Makes an input uncertain by a fraction of its value. */
    public void setUncertain(ParameterRef ref, double sigmaRelative) {
        setFixedQuietly(ref);
        fitArray("uncertain").add(entry(ref).put("sigma_relative", sigmaRelative));
        edited(Change.FIT_SETUP);
    }

    public void setFixed(ParameterRef ref) {
        setFixedQuietly(ref);
        edited(Change.FIT_SETUP);
    }

    /** The fit block's datasets, as objects with data, signal, and optional measurement and geometry blocks. */
    public List<ObjectNode> datasets() {
        List<ObjectNode> out = new ArrayList<>();
        JsonNode fit = document.path("fit").path("datasets");
        fit.forEach(n -> out.add(((ObjectNode) n).deepCopy()));
        return out;
    }

    /** Adds a dataset; a path inside the project's folder is stored relative to it. */
    public void addDataset(Path data, String signal, ObjectNode measurement, ObjectNode geometry) {
        ObjectNode d = JSON.createObjectNode();
        Path abs = data.toAbsolutePath().normalize();
        d.put("data", abs.startsWith(folder) ? folder.relativize(abs).toString() : abs.toString());
        if (signal != null) {
            d.put("signal", signal);
        }
        if (measurement != null) {
            d.set("measurement", measurement.deepCopy());
        }
        if (geometry != null) {
            d.set("geometry", geometry.deepCopy());
        }
        fitArray("datasets").add(d);
        edited(Change.FIT_SETUP);
    }

    public void removeDataset(int index) {
        fitArray("datasets").remove(index);
        edited(Change.FIT_SETUP);
    }

    /** The data file of a dataset, resolved against the project's folder. */
    public Path dataFile(int index) {
        return folder.resolve(fitArray("datasets").get(index).path("data").asText()).normalize();
    }

    // ------------------------------------------------------------------ results and files

    public Optional<FitOutcome> lastFit() {
        return Optional.ofNullable(lastFit);
    }

    public void setLastFit(FitOutcome outcome) {
        lastFit = outcome;
        fire(Change.RESULT);
    }

    /** Saves atomically (temporary file, then move); the project then belongs to that file. */
    public void save(Path target) throws IOException {
        Path abs = target.toAbsolutePath().normalize();
        Path newFolder = abs.getParent();
        if (!newFolder.equals(folder)) {
            rebaseDataPaths(newFolder);
        }
        AtomicText.write(abs, json());
        file = abs;
        folder = newFolder;
        dirty = false;
        fire(Change.FILE);
    }

    /** Writes the document to a recovery file without changing where the project belongs. */
    public void writeRecovery(Path target) throws IOException {
        AtomicText.write(target, json());
    }

    // ------------------------------------------------------------------ internals

    private void edited(Change change) {
        dirty = true;
        revalidate();
        fire(change);
        fire(Change.FILE);
    }

    private void fire(Change change) {
        for (Listener l : listeners) {
            l.changed(change);
        }
    }

    /** Checks the document with the live reader; data paths made absolute so the check can run anywhere. */
    private void revalidate() {
        ObjectNode copy = document.deepCopy();
        JsonNode ds = copy.path("fit").path("datasets");
        for (JsonNode d : ds) {
            if (d instanceof ObjectNode o && o.path("data").isTextual()) {
                o.put("data", folder.resolve(o.get("data").asText()).normalize().toString());
            }
        }
        Path tmp = null;
        try {
            tmp = Files.createTempFile("lamella-project", ".json");
            Files.writeString(tmp, JSON.writeValueAsString(copy), StandardCharsets.UTF_8);
            CaseDocument d = reader.read(tmp);
            Path asFile = file != null ? file : folder.resolve("untitled.json");
            current = new CaseDocument(asFile, d.stack(), d.geometry(), d.measurement(), d.root(), d.lines());
            problem = null;
        } catch (InputException e) {
            problem = new InputException(file, e.path(), e.line(), e.problem());
        } catch (IOException e) {
            problem = new InputException(file, null, -1, "cannot check the case: " + e.getMessage());
        } finally {
            if (tmp != null) {
                try {
                    Files.deleteIfExists(tmp);
                } catch (IOException ignored) {
                    // a stale temporary file is harmless; the system's temporary folder is cleaned
                }
            }
        }
    }

    private void rebaseDataPaths(Path newFolder) {
        for (JsonNode d : document.path("fit").path("datasets")) {
            if (d instanceof ObjectNode o && o.path("data").isTextual()) {
                Path abs = folder.resolve(o.get("data").asText()).normalize();
                o.put("data", abs.startsWith(newFolder) ? newFolder.relativize(abs).toString() : abs.toString());
            }
        }
    }

    private ObjectNode holder(ParameterRef ref) {
        switch (ref.scope()) {
            case LAYER:
                return layerNode(ref.layer());
            default: {
                String block = ref.scope() == ParameterRef.Scope.GEOMETRY ? "geometry" : "measurement";
                if (ref.dataset() < 0) {
                    return objectAt(document, block);
                }
                ObjectNode d = (ObjectNode) fitArray("datasets").get(ref.dataset());
                return objectAt(d, block);
            }
        }
    }

    private ObjectNode stackNode() {
        return objectAt(document, "stack");
    }

    private ArrayNode layers() {
        ObjectNode s = stackNode();
        if (!(s.get("layers") instanceof ArrayNode a)) {
            return s.putArray("layers");
        }
        return a;
    }

    private ObjectNode layerNode(String name) {
        for (JsonNode l : layers()) {
            if (l.path("name").asText().equals(name) && l instanceof ObjectNode o) {
                return o;
            }
        }
        throw new IllegalArgumentException("no layer '" + name + "'");
    }

    private ArrayNode fitArray(String key) {
        ObjectNode fit = objectAt(document, "fit");
        if (!(fit.get(key) instanceof ArrayNode a)) {
            return fit.putArray(key);
        }
        return a;
    }

    private static ObjectNode objectAt(ObjectNode parent, String key) {
        if (!(parent.get(key) instanceof ObjectNode o)) {
            return parent.putObject(key);
        }
        return o;
    }

    private static ObjectNode entry(ParameterRef ref) {
        ObjectNode e = JSON.createObjectNode();
        switch (ref.scope()) {
            case LAYER -> e.put("layer", ref.layer()).put("property", ref.key());
            case GEOMETRY -> e.put("geometry", ref.key());
            case MEASUREMENT -> e.put("measurement", ref.key());
        }
        if (ref.dataset() >= 0) {
            e.put("dataset", ref.dataset());
        }
        return e;
    }

    private static int find(ArrayNode entries, ParameterRef ref) {
        for (int i = 0; i < entries.size(); i++) {
            if (refOf(entries.get(i)).filter(ref::equals).isPresent()) {
                return i;
            }
        }
        return -1;
    }

    private static Optional<ParameterRef> refOf(JsonNode e) {
        int dataset = e.path("dataset").asInt(-1);
        if (e.has("layer")) {
            return Optional.of(ParameterRef.layer(e.path("layer").asText(), e.path("property").asText()));
        }
        if (e.has("geometry")) {
            ParameterRef r = ParameterRef.geometry(e.path("geometry").asText());
            return Optional.of(dataset >= 0 ? r.inDataset(dataset) : r);
        }
        if (e.has("measurement")) {
            ParameterRef r = ParameterRef.measurement(e.path("measurement").asText());
            return Optional.of(dataset >= 0 ? r.inDataset(dataset) : r);
        }
        return Optional.empty();
    }

    private void setFixedQuietly(ParameterRef ref) {
        for (String key : List.of("free", "uncertain")) {
            ArrayNode a = fitArray(key);
            int i = find(a, ref);
            if (i >= 0) {
                a.remove(i);
            }
        }
    }

    private void dropRoles(Predicate<ParameterRef> which) {
        for (String key : List.of("free", "uncertain")) {
            Iterator<JsonNode> it = fitArray(key).elements();
            while (it.hasNext()) {
                if (refOf(it.next()).filter(which).isPresent()) {
                    it.remove();
                }
            }
        }
    }
}
