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
import java.util.Collection;
import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Consumer;
import java.util.function.Predicate;
import lamella.api.AtomicText;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.ParameterRef;
import lamella.api.Sample;
import lamella.api.fit.FitOutcome;
import lamella.api.fit.FittedParameter;

/**
 * The case being edited: the case-file document itself (stack, geometry, measurement and the fit block with its
 * datasets, free and uncertain inputs), so that what the workbench saves is exactly what the headless commands
 * read. Every edit is checked at once by the live case reader; {@link #current()} is the last document that passed,
 * {@link #problem()} what is wrong with the present one.
 *
 * <p>The document changes only through {@link #edit}: one named, undoable step each, kept in a deep history
 * ({@link #undo}, {@link #redo}). The convenience methods ({@link #set}, {@link #removeLayer}, …) are edits too.
 * Saving marks the clean point: undoing or redoing back to it makes the project clean again. UI thread only.
 */
public final class Project {

    /** How a fit treats an input. */
    public enum Role { FIXED, FREE, UNCERTAIN }

    /**
     * What changed, for listeners: model inputs (stack, geometry, measurement), the fit block, a fit result, or the
     * project's file state (saved, dirty, history).
     */
    public enum Change { INPUTS, FIT_SETUP, RESULT, FILE }

    @FunctionalInterface
    public interface Listener {
        void changed(Change change);
    }

    /**
     * The top-level key of the workbench's own settings in a case file (values of techniques and geometries switched
     * away from); the case reader accepts it and nothing in it affects the model.
     */
    public static final String WORKBENCH_KEY = "workbench";

    private static final String REMEMBERED = "remembered";
    private static final String REMEMBERED_ROLES = "remembered_roles";
    private static final List<String> ROLE_LISTS = List.of("free", "uncertain");
    private static final ObjectMapper JSON = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private final CaseReader reader;
    private final List<Listener> listeners = new CopyOnWriteArrayList<>();
    private int shownSample;
    private final EditHistory history = new EditHistory();
    private final Map<String, String> relocated = new HashMap<>();
    private final DataDigests dataDigests = new DataDigests();
    private ObjectNode document;
    private ObjectNode clean;
    private boolean dirty;
    private Path file;
    private Path folder;
    private CaseDocument current;
    private InputException problem;
    private FitRecord lastFit;
    private boolean fitUnsaved;
    private String lastFitProblem;

    private Project(ObjectNode document, boolean saved, Path file, Path folder, CaseReader reader) {
        takeKeptFit(document);
        absoluteDataPaths(document, folder);
        this.document = document;
        this.clean = saved ? document : null;
        this.dirty = !saved;
        this.file = file;
        this.folder = folder;
        this.reader = reader;
        revalidate();
    }

    /**
     * Opens a case file. A case with a problem opens too, to be mended in the workbench, with the problem in
     * {@link #problem()}; only a file that is not a JSON object at all is refused, with the reader's words.
     */
    public static Project open(Path file, CaseReader reader) throws IOException, InputException {
        Path abs = file.toAbsolutePath().normalize();
        InputException invalid = null;
        try {
            reader.read(abs);
        } catch (InputException e) {
            invalid = e;
        }
        JsonNode tree;
        try {
            tree = JsonFiles.read(abs);
        } catch (IOException e) {
            if (invalid != null) {
                throw invalid;
            }
            throw e;
        }
        if (!(tree instanceof ObjectNode o)) {
            throw invalid != null ? invalid : new InputException(abs, null, -1, "a case file holds a JSON object");
        }
        return new Project(o, true, abs, abs.getParent(), reader);
    }

    /** A new, unsaved project from case-file text; relative data paths resolve against folder. */
    public static Project of(String json, Path folder, CaseReader reader) throws IOException {
        return new Project(object(json), true, null, folder.toAbsolutePath().normalize(), reader);
    }

    /**
     * A project restored from a recovery copy: untitled, and unsaved from the start, so that closing asks before the
     * recovered changes are lost again.
     */
    public static Project recovered(String json, Path folder, CaseReader reader) throws IOException {
        return new Project(object(json), false, null, folder.toAbsolutePath().normalize(), reader);
    }

    private static ObjectNode object(String json) throws IOException {
        JsonNode tree = JsonFiles.parse(json);
        if (!(tree instanceof ObjectNode o)) {
            throw new IOException("a case document is a JSON object");
        }
        return o;
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

    /** True when the document differs from what was last opened or saved, or a fit has not been saved yet. */
    public boolean dirty() {
        return dirty || fitUnsaved;
    }

    /** The last version of the document that the case reader accepted. */
    public Optional<CaseDocument> current() {
        return Optional.ofNullable(current);
    }

    /** What is wrong with the document as it is now, if anything. */
    public Optional<InputException> problem() {
        return Optional.ofNullable(problem);
    }

    /** The model inputs of the last accepted version: of the sample shown, in a case of several. */
    public Optional<CaseModel> model() {
        return current().map(d -> {
            Sample s = d.samples().get(Math.min(shownSample, d.samples().size() - 1));
            return new CaseModel(s.stack(), s.geometryOr(d.geometry()), d.measurement());
        });
    }

    /** The names of the case's samples, in file order; empty for a case of one stack. */
    public List<String> sampleNames() {
        List<String> out = new ArrayList<>();
        if (document.get("samples") instanceof ArrayNode a) {
            a.forEach(s -> out.add(s.path("name").asText()));
        }
        return out;
    }

    /** Which sample the stack edits and the model show (its index in {@code samples}; 0 for a case of one stack). */
    public int shownSample() {
        return shownSample;
    }

    /** Shows another sample: the Stack panel then edits its layers, and the model curves are its own. */
    public void showSample(int index) {
        if (index < 0 || index >= Math.max(1, sampleNames().size())) {
            throw new IllegalArgumentException("there is no sample " + index);
        }
        if (index != shownSample) {
            shownSample = index;
            fire(Change.INPUTS);
        }
    }

    /**
     * Why a name cannot name a new or renamed sample, in the case reader's terms, or empty when it can; except is
     * the index of the sample being renamed (-1 for a new one).
     */
    public Optional<String> sampleNameProblem(String name, int except) {
        if (name.isBlank() || name.chars().anyMatch(c -> c == '[' || c == ']' || Character.isISOControl(c))) {
            return Optional.of("a sample name is not blank and holds no '[', ']' or control character (outputs"
                    + " name a sample's inputs as samples[NAME].…)");
        }
        List<String> names = sampleNames();
        int at = names.indexOf(name);
        if (at >= 0 && at != except || names.isEmpty() && name.equals(FIRST_SAMPLE)) {
            return Optional.of("the name '" + name + "' is already used by a sample; every sample needs its own");
        }
        return Optional.empty();
    }

    /** The name the stack of a one-stack case takes when a second sample is added. */
    public static final String FIRST_SAMPLE = "sample 1";

    /**
     * Adds a sample, a copy of the shown one (its stack, own geometry and temperature) under a new name, and shows
     * it; a case of one stack becomes a case of samples first, its stack the sample {@value #FIRST_SAMPLE}. One step.
     *
     * @throws IllegalArgumentException when the name cannot be used ({@link #sampleNameProblem})
     */
    public void addSample(String name) {
        sampleNameProblem(name, -1).ifPresent(p -> {
            throw new IllegalArgumentException(p);
        });
        boolean convert = sampleNames().isEmpty();
        int from = shownSample;
        edit("add sample '" + name + "'" + (convert ? " (the stack becomes sample '" + FIRST_SAMPLE + "')" : ""),
                d -> {
                    ArrayNode samples;
                    if (convert) {
                        ObjectNode first = JSON.createObjectNode();
                        first.put("name", FIRST_SAMPLE);
                        first.set("stack", d.get("stack") instanceof ObjectNode s ? s : JSON.createObjectNode());
                        d.remove("stack");
                        samples = JSON.createArrayNode().add(first);
                        d.set("samples", samples);
                        // With several samples every dataset names its own; the data so far were of this stack.
                        for (JsonNode ds : d.path("fit").path("datasets")) {
                            if (ds instanceof ObjectNode o) {
                                o.put("sample", FIRST_SAMPLE);
                            }
                        }
                    } else {
                        samples = (ArrayNode) d.get("samples");
                    }
                    ObjectNode copy = ((ObjectNode) samples.get(convert ? 0 : from)).deepCopy();
                    copy.put("name", name);
                    copy.remove("description");
                    samples.add(copy);
                });
        shownSample = sampleNames().size() - 1;
        fire(Change.INPUTS);
    }

    /** Renames a sample, and every dataset and fit entry that names it, as one step. */
    public void renameSample(int index, String name) {
        sampleNameProblem(name, index).ifPresent(p -> {
            throw new IllegalArgumentException(p);
        });
        String old = sampleNames().get(index);
        edit("rename sample '" + old + "' to '" + name + "'", d -> {
            ((ObjectNode) d.get("samples").get(index)).put("name", name);
            for (String list : List.of("datasets", "free", "uncertain")) {
                for (JsonNode e : d.path("fit").path(list)) {
                    if (e instanceof ObjectNode o && o.path("sample").asText().equals(old) && o.has("sample")) {
                        o.put("sample", name);
                    }
                }
            }
        });
    }

    /** The datasets (their indices) that name a sample; a sample they name cannot be removed. */
    public List<Integer> datasetsOf(String sample) {
        List<Integer> out = new ArrayList<>();
        JsonNode ds = document.path("fit").path("datasets");
        for (int i = 0; i < ds.size(); i++) {
            if (ds.get(i).path("sample").asText().equals(sample) && ds.get(i).has("sample")) {
                out.add(i);
            }
        }
        return out;
    }

    /**
     * Removes a sample and the fit entries that name it, as one step; a layer path of no sample whose layer no
     * sample has any more goes too. The last sample stays (a case needs one).
     *
     * @throws IllegalStateException when datasets still name the sample, or it is the only one
     */
    public void removeSample(int index) {
        List<String> names = sampleNames();
        String name = names.get(index);
        if (names.size() < 2) {
            throw new IllegalStateException("sample '" + name + "' is the case's only sample; a case needs one");
        }
        if (!datasetsOf(name).isEmpty()) {
            throw new IllegalStateException("datasets " + datasetsOf(name) + " are measurements of sample '" + name
                    + "'; remove them or let them name another sample first");
        }
        edit("remove sample '" + name + "'", d -> {
            ((ArrayNode) d.get("samples")).remove(index);
            dropRoles(d, r -> name.equals(r.sample()) || r.scope() == ParameterRef.Scope.LAYER && r.sample() == null
                    && samplesWithLayer(d, r.layer()) == 0);
        });
        if (shownSample >= sampleNames().size() || shownSample > index) {
            shownSample = Math.max(0, shownSample - 1);
        }
        fire(Change.INPUTS);
    }

    /** A copy of the stack object the Stack panel edits: the case's, or the shown sample's. */
    public ObjectNode stackTree() {
        return stackNode(document.deepCopy()).deepCopy();
    }

    /** The document as case-file text. */
    public String json() {
        try {
            return JSON.writeValueAsString(document) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a JSON tree always serialises", e);
        }
    }

    /** A copy of the document's tree, for panels that show more than values; data paths in it are absolute. */
    public ObjectNode tree() {
        return document.deepCopy();
    }

    // ------------------------------------------------------------------ edits and their history

    /**
     * Changes the document: the mutation gets a working copy of the whole document, which becomes the project's
     * document when it returns, as one undoable step of the given name ("remove layer 'film'"). A mutation that
     * leaves the document as it was records nothing. Do not keep the node after the mutation returns.
     */
    public void edit(String name, Consumer<ObjectNode> mutation) {
        edit(name, null, mutation);
    }

    /**
     * An edit that merges with the step just before when both carry equal merge keys, so that the keystrokes of one
     * visit to a field undo as one step. Use a key that is new for every visit (a field's focus, for example).
     */
    public void edit(String name, Object mergeKey, Consumer<ObjectNode> mutation) {
        ObjectNode before = document;
        ObjectNode after = before.deepCopy();
        mutation.accept(after);
        if (after.equals(before)) {
            return;
        }
        history.record(name, before, after, mergeKey);
        document = after;
        changed(before, after);
    }

    /** The name of the edit {@link #undo} would take back, such as "remove layer 'film'". */
    public Optional<String> undoName() {
        return history.undoStep().map(EditHistory.Step::name);
    }

    /** The name of the edit {@link #redo} would make again. */
    public Optional<String> redoName() {
        return history.redoStep().map(EditHistory.Step::name);
    }

    /** Takes back the newest edit; false when there is none. */
    public boolean undo() {
        if (history.undoStep().isEmpty()) {
            return false;
        }
        ObjectNode before = document;
        document = relocate(history.undo().before());
        changed(before, document);
        return true;
    }

    /** Makes the newest undone edit again; false when there is none. */
    public boolean redo() {
        if (history.redoStep().isEmpty()) {
            return false;
        }
        ObjectNode before = document;
        document = relocate(history.redo().after());
        changed(before, document);
        return true;
    }

    /** The number of steps that can be undone now. */
    public int undoSteps() {
        return history.undoable();
    }

    // ------------------------------------------------------------------ inputs

    /** Sets a numeric input (a layer property, or a key of the case's or a dataset's geometry/measurement block). */
    public void set(ParameterRef ref, double value) {
        set(ref, value, null);
    }

    /** Sets a numeric input as part of typing: edits with the same merge key become one step. */
    public void set(ParameterRef ref, double value, Object mergeKey) {
        edit("change " + InputNames.of(ref), mergeKey, d -> {
            ObjectNode holder = holder(d, ref);
            holder.put(ref.key(), value);
            if (ref.scope() == ParameterRef.Scope.LAYER && ref.key().equals("k_in_plane_w_mk")) {
                holder.remove("k_in_plane_x_w_mk");
                holder.remove("k_in_plane_y_w_mk");
            }
        });
    }

    /**
     * Sets any value of a layer or block — a number, a list such as {@code frequencies_hz}, or, with null, no value
     * (the key is removed, for its default) — as one step, merged with the step before when the keys are equal.
     */
    public void put(ParameterRef ref, JsonNode value, Object mergeKey) {
        edit((value == null ? "clear " : "change ") + InputNames.of(ref), mergeKey, d -> {
            ObjectNode holder = holder(d, ref);
            if (value == null) {
                holder.remove(ref.key());
            } else {
                holder.set(ref.key(), value.deepCopy());
            }
        });
    }

    /** Removes a key from a layer (to fall back on its default or its material's value). */
    public void clearLayerKey(String layer, String key) {
        edit("clear " + InputNames.of(ParameterRef.layer(layer, key)), d -> layerNode(d, layer).remove(key));
    }

    /** Sets a layer's text key, such as its material. */
    public void setLayerText(String layer, String key, String text) {
        edit("set " + InputNames.key(key) + " of layer '" + layer + "' to '" + text + "'",
                d -> layerNode(d, layer).put(key, text));
    }

    /** Replaces the whole layer list's entry at index with a copy of the given layer object. */
    public void putLayer(int index, ObjectNode layer) {
        edit("change layer '" + layer.path("name").asText() + "'", d -> layers(d).set(index, layer.deepCopy()));
    }

    public void addLayer(int index, ObjectNode layer) {
        edit("add layer '" + layer.path("name").asText() + "'", d -> layers(d).insert(index, layer.deepCopy()));
    }

    /**
     * Adds a layer above the heated plane at index of {@code stack.above} (0: next to the plane), making the list
     * when the stack has none, as one step.
     */
    public void addLayerAbove(int index, ObjectNode layer) {
        edit("add layer '" + layer.path("name").asText() + "' above the heated plane", d -> {
            ObjectNode stack = stackNode(d);
            ArrayNode above = stack.get(ABOVE) instanceof ArrayNode a ? a : stack.putArray(ABOVE);
            above.insert(index, layer.deepCopy());
        });
    }

    /**
     * Removes a layer above the heated plane and the fit's references to it as {@link #removeLayer} does; the last
     * one takes {@code above} and {@code top} with it (the reader refuses a top without layers above).
     */
    public void removeLayerAbove(int index) {
        String name = stackNode(document).path(ABOVE).get(index).path("name").asText();
        List<String> samples = sampleNames();
        String sample = samples.isEmpty() ? null : samples.get(Math.min(shownSample, samples.size() - 1));
        edit("remove layer '" + name + "' above the heated plane", d -> {
            ObjectNode stack = stackNode(d);
            ((ArrayNode) stack.get(ABOVE)).remove(index);
            if (stack.get(ABOVE).isEmpty()) {
                stack.remove(ABOVE);
                stack.remove("top");
            }
            boolean usedElsewhere = sample != null && samplesWithLayer(d, name) > 0;
            dropRoles(d, r -> r.scope() == ParameterRef.Scope.LAYER && r.layer().equals(name)
                    && (r.sample() == null ? !usedElsewhere : r.sample().equals(sample)));
        });
    }

    public void moveLayerAbove(int from, int to) {
        ArrayNode above = (ArrayNode) stackNode(document).get(ABOVE);
        String name = above.get(from).path("name").asText();
        edit("move layer '" + name + "' " + (to > from ? "up, away from" : "down, toward") + " the heated plane",
                d -> {
                    ArrayNode l = (ArrayNode) stackNode(d).get(ABOVE);
                    JsonNode n = l.remove(from);
                    l.insert(to, n);
                });
    }

    /** Sets the condition beyond the outermost layer above ({@code stack.top}), or with null removes it. */
    public void setTop(String top) {
        edit(top == null ? "let the top be semi-infinite" : "set the top to " + top, d -> {
            if (top == null) {
                stackNode(d).remove("top");
            } else {
                stackNode(d).put("top", top);
            }
        });
    }

    /**
     * Removes a layer of the stack shown, and the fit's references to its values with it: those naming this sample,
     * and those naming no sample unless another sample still has a layer of that name (its input they remain).
     */
    public void removeLayer(int index) {
        String name = layers(document).get(index).path("name").asText();
        List<String> samples = sampleNames();
        String sample = samples.isEmpty() ? null : samples.get(Math.min(shownSample, samples.size() - 1));
        edit("remove layer '" + name + "'" + (sample == null ? "" : " from sample '" + sample + "'"), d -> {
            layers(d).remove(index);
            boolean usedElsewhere = sample != null && samplesWithLayer(d, name) > 0;
            dropRoles(d, r -> r.scope() == ParameterRef.Scope.LAYER && r.layer().equals(name)
                    && (r.sample() == null ? !usedElsewhere : r.sample().equals(sample)));
        });
    }

    /** How many samples of a {@code samples} case have a layer of this name (0 for a case of one stack). */
    private static int samplesWithLayer(ObjectNode d, String layer) {
        int n = 0;
        if (d.get("samples") instanceof ArrayNode a) {
            for (int i = 0; i < a.size(); i++) {
                ObjectNode stack = stackNode(d, i);
                boolean has = false;
                for (String side : SIDES) {
                    for (JsonNode l : stack.path(side)) {
                        has |= l.path("name").asText().equals(layer);
                    }
                }
                n += has ? 1 : 0;
            }
        }
        return n;
    }

    public void moveLayer(int from, int to) {
        String name = layers(document).get(from).path("name").asText();
        edit("move layer '" + name + "' " + (to < from ? "up" : "down"), d -> {
            ArrayNode l = layers(d);
            JsonNode n = l.remove(from);
            l.insert(to, n);
        });
    }

    public void setBottom(String bottom) {
        edit("set the stack's bottom to " + bottom, d -> stackNode(d).put("bottom", bottom));
    }

    /** Replaces the case's geometry or measurement block. */
    public void setBlock(String name, ObjectNode block) {
        if (!name.equals("geometry") && !name.equals("measurement")) {
            throw new IllegalArgumentException("geometry or measurement, not " + name);
        }
        edit("change the " + blockWords(name), d -> d.set(name, block.deepCopy()));
    }

    /**
     * Switches a geometry or measurement block (the case's, or dataset's own when dataset ≥ 0) to another type. The
     * values of the type left are remembered with the project; the new block takes the values it remembers for its
     * type, and then every value of the old block that the new type also reads (keys: the new type's parameters).
     * The fit block's free and uncertain entries of keys the new type lacks go with the remembered values and come
     * back with them.
     */
    public void switchType(String block, int dataset, String type, Collection<String> keys) {
        if (!block.equals("geometry") && !block.equals("measurement")) {
            throw new IllegalArgumentException("geometry or measurement, not " + block);
        }
        String where = dataset >= 0 ? " of dataset " + dataset : "";
        edit("switch the " + blockWords(block) + where + " to " + type, d -> {
            ObjectNode holder = dataset >= 0 ? (ObjectNode) fitArray(d, "datasets").get(dataset) : d;
            ObjectNode old = holder.get(block) instanceof ObjectNode o ? o : holder.objectNode();
            ObjectNode memory = objectAt(objectAt(objectAt(d, WORKBENCH_KEY), REMEMBERED), block);
            String oldType = old.path("type").asText("");
            if (!oldType.isEmpty()) {
                ObjectNode kept = old.deepCopy();
                kept.remove("type");
                memory.set(oldType, kept);
            }
            ObjectNode fresh = holder.objectNode();
            fresh.put("type", type);
            JsonNode remembered = memory.path(type);
            for (String key : keys) {
                if (old.has(key) && !oldType.equals(type)) {
                    fresh.set(key, old.get(key).deepCopy());
                } else if (remembered.has(key)) {
                    fresh.set(key, remembered.get(key).deepCopy());
                } else if (old.has(key)) {
                    fresh.set(key, old.get(key).deepCopy());
                }
            }
            holder.set(block, fresh);
            keepRolesAside(d, block, dataset, oldType, type, keys);
        });
    }

    /**
     * Fit entries (free or uncertain) of the type switched away from that the new type has no key for are kept
     * under {@code workbench.remembered_roles.BLOCK.TYPE} with the values, so that the fit block never names a key
     * the case lacks, and come back when that type is chosen again.
     */
    private static void keepRolesAside(ObjectNode d, String block, int dataset, String oldType, String type,
            Collection<String> keys) {
        if (oldType.equals(type)) {
            return;
        }
        ObjectNode memory = objectAt(objectAt(objectAt(d, WORKBENCH_KEY), REMEMBERED_ROLES), block);
        if (!oldType.isEmpty()) {
            ArrayNode kept = memory.get(oldType) instanceof ArrayNode a ? a : memory.putArray(oldType);
            dropEntriesOf(d, kept, block, dataset);
            for (String list : ROLE_LISTS) {
                if (!(d.path("fit").get(list) instanceof ArrayNode entries)) {
                    continue;
                }
                for (int i = 0; i < entries.size(); i++) {
                    JsonNode e = entries.get(i);
                    if (addresses(d, e, block, dataset) && !keys.contains(e.path(block).asText())) {
                        kept.add(JSON.createObjectNode().set(list, e.deepCopy()));
                        entries.remove(i--);
                    }
                }
            }
            if (kept.isEmpty()) {
                memory.remove(oldType);
            }
        }
        if (memory.get(type) instanceof ArrayNode remembered) {
            for (JsonNode r : remembered) {
                String list = r.fieldNames().next();
                JsonNode e = r.get(list);
                if (addresses(d, e, block, dataset) && keys.contains(e.path(block).asText())
                        && refOf(e).filter(ref -> roleIn(d, ref) == Role.FIXED).isPresent()) {
                    fitArray(d, list).add(e.deepCopy());
                }
            }
            dropEntriesOf(d, remembered, block, dataset);
            if (remembered.isEmpty()) {
                memory.remove(type);
            }
        }
        if (memory.isEmpty()) {
            ((ObjectNode) d.get(WORKBENCH_KEY).get(REMEMBERED_ROLES)).remove(block);
        }
        if (d.get(WORKBENCH_KEY).get(REMEMBERED_ROLES).isEmpty()) {
            ((ObjectNode) d.get(WORKBENCH_KEY)).remove(REMEMBERED_ROLES);
        }
    }

    private static void dropEntriesOf(ObjectNode d, ArrayNode remembered, String block, int dataset) {
        for (int i = remembered.size() - 1; i >= 0; i--) {
            JsonNode r = remembered.get(i);
            if (addresses(d, r.get(r.fieldNames().next()), block, dataset)) {
                remembered.remove(i);
            }
        }
    }

    /**
     * Whether a fit entry names a key of the block being switched: a dataset's own block for its dataset's entries,
     * the case's block for entries without a dataset and for those of datasets that have no block of their own.
     */
    private static boolean addresses(ObjectNode d, JsonNode entry, String block, int dataset) {
        if (!entry.has(block)) {
            return false;
        }
        int of = entry.path("dataset").asInt(-1);
        if (dataset >= 0) {
            return of == dataset;
        }
        return of < 0 || !d.path("fit").path("datasets").path(of).has(block);
    }

    private static Role roleIn(ObjectNode d, ParameterRef ref) {
        for (String list : ROLE_LISTS) {
            if (d.path("fit").get(list) instanceof ArrayNode a && find(a, ref) >= 0) {
                return list.equals("free") ? Role.FREE : Role.UNCERTAIN;
            }
        }
        return Role.FIXED;
    }

    private static String blockWords(String block) {
        return block.equals("geometry") ? "heating geometry" : "technique";
    }

    // ------------------------------------------------------------------ fit set-up

    public Role role(ParameterRef ref) {
        if (find(fitArrayOrEmpty("free"), ref) >= 0) {
            return Role.FREE;
        }
        return find(fitArrayOrEmpty("uncertain"), ref) >= 0 ? Role.UNCERTAIN : Role.FIXED;
    }

    /** The σ of an uncertain input as a fraction of its value, or NaN if it is not uncertain or given absolutely. */
    public double relativeSigma(ParameterRef ref) {
        ArrayNode uncertain = fitArrayOrEmpty("uncertain");
        int i = find(uncertain, ref);
        return i < 0 ? Double.NaN : uncertain.get(i).path("sigma_relative").asDouble(Double.NaN);
    }

    /** Makes an input free, with optional bounds (NaN: none). */
    public void setFree(ParameterRef ref, double min, double max) {
        edit("make " + InputNames.of(ref) + " free", d -> {
            setFixedQuietly(d, ref);
            ObjectNode e = entry(ref);
            if (!Double.isNaN(min)) {
                e.put("min", min);
            }
            if (!Double.isNaN(max)) {
                e.put("max", max);
            }
            fitArray(d, "free").add(e);
        });
    }

    /** Makes an input uncertain by a fraction of its value. */
    public void setUncertain(ParameterRef ref, double sigmaRelative) {
        edit("make " + InputNames.of(ref) + " uncertain", d -> {
            setFixedQuietly(d, ref);
            fitArray(d, "uncertain").add(entry(ref).put("sigma_relative", sigmaRelative));
        });
    }

    public void setFixed(ParameterRef ref) {
        edit("fix " + InputNames.of(ref), d -> setFixedQuietly(d, ref));
    }

    /** The fit's named gains and their values, in file order ({@code fit.gains}); empty when it has none. */
    public Map<String, Double> gains() {
        Map<String, Double> out = new java.util.LinkedHashMap<>();
        document.path("fit").path("gains").fields()
                .forEachRemaining(e -> out.put(e.getKey(), e.getValue().asDouble(Double.NaN)));
        return out;
    }

    /** Why a name cannot name a new or renamed gain, or empty when it can; except: the gain being renamed. */
    public Optional<String> gainNameProblem(String name, String except) {
        if (name.isBlank() || name.chars().anyMatch(Character::isISOControl)) {
            return Optional.of("a gain's name is not blank and holds no control character");
        }
        if (gains().containsKey(name) && !name.equals(except)) {
            return Optional.of("the name '" + name + "' is already used by a gain; every gain needs its own");
        }
        return Optional.empty();
    }

    /**
     * Adds a named gain of the given value to {@code fit.gains}, as one step. The case reader wants a dataset to
     * name it ({@code datasets[].gain}) before the case is valid again.
     */
    public void addGain(String name, double value) {
        gainNameProblem(name, null).ifPresent(p -> {
            throw new IllegalArgumentException(p);
        });
        edit("add gain '" + name + "'", d -> objectAt(objectAt(d, "fit"), "gains").put(name, value));
    }

    /** Renames a gain where it stands, and every dataset and fit entry that names it, as one step. */
    public void renameGain(String old, String name) {
        gainNameProblem(name, old).ifPresent(p -> {
            throw new IllegalArgumentException(p);
        });
        edit("rename gain '" + old + "' to '" + name + "'", d -> {
            ObjectNode gains = objectAt(objectAt(d, "fit"), "gains");
            ObjectNode renamed = JSON.createObjectNode();
            gains.fields().forEachRemaining(e -> renamed.set(e.getKey().equals(old) ? name : e.getKey(),
                    e.getValue()));
            ((ObjectNode) d.get("fit")).set("gains", renamed);
            for (String list : List.of("datasets", "free", "uncertain")) {
                for (JsonNode e : d.path("fit").path(list)) {
                    if (e instanceof ObjectNode o && o.has("gain") && o.path("gain").asText().equals(old)) {
                        o.put("gain", name);
                    }
                }
            }
        });
    }

    /**
     * Removes a gain, the datasets' naming of it and its free or uncertain entry, as one step; {@code gains} goes
     * when it is left empty (the reader refuses an empty one).
     */
    public void removeGain(String name) {
        edit("remove gain '" + name + "'", d -> {
            ObjectNode fit = objectAt(d, "fit");
            objectAt(fit, "gains").remove(name);
            if (fit.path("gains").isEmpty()) {
                fit.remove("gains");
            }
            for (JsonNode e : fit.path("datasets")) {
                if (e instanceof ObjectNode o && o.path("gain").asText().equals(name) && o.has("gain")) {
                    o.remove("gain");
                }
            }
            dropRoles(d, r -> r.scope() == ParameterRef.Scope.GAIN && r.key().equals(name));
        });
    }

    /** The fit block's datasets, as objects with data, signal, and optional measurement and geometry blocks. */
    public List<ObjectNode> datasets() {
        List<ObjectNode> out = new ArrayList<>();
        JsonNode fit = document.path("fit").path("datasets");
        fit.forEach(n -> out.add(((ObjectNode) n).deepCopy()));
        return out;
    }

    /** Adds a dataset; saving writes its path relative to the case file, copying the file beside it if needed. */
    public void addDataset(Path data, String signal, ObjectNode measurement, ObjectNode geometry) {
        Path abs = data.toAbsolutePath().normalize();
        edit("add dataset " + abs.getFileName(), d -> {
            ObjectNode ds = d.objectNode();
            ds.put("data", abs.toString());
            if (signal != null) {
                ds.put("signal", signal);
            }
            if (measurement != null) {
                ds.set("measurement", measurement.deepCopy());
            }
            if (geometry != null) {
                ds.set("geometry", geometry.deepCopy());
            }
            fitArray(d, "datasets").add(ds);
        });
    }

    /**
     * Gives a dataset a measurement or geometry block of its own, a copy of the case's to change there, or (own
     * false) takes its own away so that it uses the case's again.
     */
    public void setDatasetBlock(int index, String block, boolean own) {
        if (!block.equals("geometry") && !block.equals("measurement")) {
            throw new IllegalArgumentException("geometry or measurement, not " + block);
        }
        String words = own ? "give dataset " + index + " its own " + blockWords(block)
                : "let dataset " + index + " take the case's " + blockWords(block);
        edit(words, d -> {
            ObjectNode ds = (ObjectNode) fitArray(d, "datasets").get(index);
            if (!own) {
                ds.remove(block);
            } else if (!ds.has(block)) {
                ds.set(block, d.get(block) instanceof ObjectNode o ? o.deepCopy() : ds.objectNode());
            }
        });
    }

    /**
     * Sets a key of a dataset itself ({@code signal}, {@code x_range}, {@code exclude}, {@code weights}), or
     * removes it with null, as one step named in words ("set the fitted x range").
     */
    public void setDatasetKey(int index, String key, JsonNode value, String words) {
        if (key.equals("data") || key.equals("measurement") || key.equals("geometry")) {
            throw new IllegalArgumentException(key + " is not changed this way");
        }
        edit(words + " of dataset " + index, d -> {
            ObjectNode ds = (ObjectNode) fitArray(d, "datasets").get(index);
            if (value == null) {
                ds.remove(key);
            } else {
                ds.set(key, value.deepCopy());
            }
        });
    }

    public void removeDataset(int index) {
        String data = Path.of(fitArrayOrEmpty("datasets").get(index).path("data").asText("?")).getFileName()
                .toString();
        edit("remove dataset " + index + " (" + data + ")", d -> fitArray(d, "datasets").remove(index));
    }

    /** The data file of a dataset, resolved against the project's folder. */
    public Path dataFile(int index) {
        return folder.resolve(fitArrayOrEmpty("datasets").get(index).path("data").asText()).normalize();
    }

    // ------------------------------------------------------------------ results and files

    /** The last fit: of this session, or kept with the project when it was saved. */
    public Optional<FitOutcome> lastFit() {
        return Optional.ofNullable(lastFit).map(FitRecord::outcome);
    }

    /** A fit of the document as it is now. */
    public void setLastFit(FitOutcome outcome) {
        setLastFit(outcome, document);
    }

    /**
     * A fit of the document as it was when the fit started (from {@link #tree()} then): edits made while it ran make
     * it out of date at once. Saving keeps it with the project.
     */
    public void setLastFit(FitOutcome outcome, ObjectNode fitted) {
        lastFit = new FitRecord(outcome, FitRecord.fingerprint(fitted, dataDigests), null);
        lastFitProblem = null;
        fitUnsaved = true;
        fire(Change.RESULT);
        fire(Change.FILE);
    }

    /**
     * Whether the last fit belongs to the inputs as they are now: those it was fitted to, or those with its fitted
     * values taken in. False after any other edit (the results are out of date), and without a fit.
     */
    public boolean lastFitCurrent() {
        return lastFit != null && lastFit.belongsTo(FitRecord.fingerprint(document, dataDigests));
    }

    /** Whether the case holds the last fit's values, taken in with {@link #useFittedValues()}. */
    public boolean fittedValuesInUse() {
        return lastFit != null && lastFit.applied() != null
                && lastFit.applied().equals(FitRecord.fingerprint(document, dataDigests));
    }

    /** Why a fit kept with the project could not be shown again, if that happened when it was opened. */
    public Optional<String> lastFitProblem() {
        return Optional.ofNullable(lastFitProblem);
    }

    /**
     * Takes the last fit's values into the case as one undoable step, "use fitted values": each fitted input gets
     * its best-fit value, and a free input's start value in the fit block moves there too, so that the next fit
     * starts from it.
     */
    public void useFittedValues() {
        FitRecord r = lastFit;
        if (r == null) {
            return;
        }
        edit("use fitted values", d -> {
            for (FittedParameter p : r.outcome().parameters()) {
                for (ObjectNode holder : fittedHolders(d, p.ref())) {
                    holder.put(p.ref().key(), p.value());
                }
                if (d.path("fit").get("free") instanceof ArrayNode free) {
                    int i = find(free, p.ref());
                    if (i >= 0 && free.get(i) instanceof ObjectNode e && e.has("initial")) {
                        e.put("initial", p.value());
                    }
                }
            }
        });
        lastFit = r.withApplied(FitRecord.fingerprint(document, dataDigests));
        fitUnsaved = true;
        fire(Change.RESULT);
    }

    /**
     * Saves atomically (temporary file, then move), self-contained: every data file outside the case's folder is
     * copied beside the case first, and data paths are written relative to the case file. The project then belongs
     * to that file, and this state of the document is the clean point.
     */
    public void save(Path target) throws IOException {
        Path abs = target.toAbsolutePath().normalize();
        Path dir = abs.getParent();
        Map<String, String> copies = DataCopies.besides(dir, dataPaths(document));
        ObjectNode saved = document.deepCopy();
        if (lastFit != null) {
            objectAt(saved, WORKBENCH_KEY).set(FitRecord.KEY, lastFit.toJson());
        }
        for (JsonNode ds : saved.path("fit").path("datasets")) {
            if (ds instanceof ObjectNode o && o.path("data").isTextual()) {
                Path p = Path.of(copies.getOrDefault(o.get("data").asText(), o.get("data").asText()));
                o.put("data", dir.relativize(p).toString().replace('\\', '/'));
            }
        }
        AtomicText.write(abs, text(saved));
        relocated.putAll(copies);
        document = relocate(document);
        file = abs;
        folder = dir;
        clean = document;
        dirty = false;
        fitUnsaved = false;
        history.seal();
        revalidate();
        fire(Change.FILE);
    }

    /** Writes the document to a recovery file without changing where the project belongs. */
    public void writeRecovery(Path target) throws IOException {
        AtomicText.write(target, json());
    }

    // ------------------------------------------------------------------ internals

    private void changed(ObjectNode before, ObjectNode after) {
        // Undoing an added sample leaves fewer samples than the one shown.
        shownSample = Math.min(shownSample, Math.max(0, sampleNames().size() - 1));
        dirty = clean == null || !after.equals(clean);
        revalidate();
        if (!without(before, "fit").equals(without(after, "fit"))) {
            fire(Change.INPUTS);
        }
        if (!before.path("fit").equals(after.path("fit"))) {
            fire(Change.FIT_SETUP);
        }
        fire(Change.FILE);
    }

    private static ObjectNode without(ObjectNode d, String key) {
        ObjectNode c = d.deepCopy();
        c.remove(key);
        c.remove(WORKBENCH_KEY);
        return c;
    }

    private void fire(Change change) {
        for (Listener l : listeners) {
            l.changed(change);
        }
    }

    private static String text(ObjectNode d) {
        try {
            return JSON.writeValueAsString(d) + "\n";
        } catch (JsonProcessingException e) {
            throw new IllegalStateException("a JSON tree always serialises", e);
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
            current = new CaseDocument(asFile, d.stack(), d.geometry(), d.measurement(), d.root(), d.lines(),
                    d.origins(), d.samples());
            problem = null;
        } catch (InputException e) {
            problem = new InputException(file, e.path(), e.line(), e.problem());
        } catch (IOException e) {
            problem = new InputException(file, null, -1, "cannot check the case: " + FileProblems.reason(e));
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

    /**
     * A fit kept in the case file's {@code workbench} object is taken out of the document (the project holds it
     * apart, and a save writes it back); one that cannot be read is dropped with the reason kept for the Fit panel.
     */
    private void takeKeptFit(ObjectNode d) {
        if (!(d.get(WORKBENCH_KEY) instanceof ObjectNode wb) || !wb.has(FitRecord.KEY)) {
            return;
        }
        try {
            lastFit = FitRecord.of(wb.get(FitRecord.KEY));
        } catch (IllegalArgumentException e) {
            lastFitProblem = "the last fit kept with the project at " + WORKBENCH_KEY + "." + FitRecord.KEY
                    + " could not be read (" + e.getMessage() + "); it is dropped at the next save";
        }
        wb.remove(FitRecord.KEY);
        if (wb.isEmpty()) {
            d.remove(WORKBENCH_KEY);
        }
    }

    /** Data paths are held absolute, so that they mean the same files wherever the project is saved. */
    private static void absoluteDataPaths(ObjectNode d, Path folder) {
        for (JsonNode ds : d.path("fit").path("datasets")) {
            if (ds instanceof ObjectNode o && o.path("data").isTextual()) {
                o.put("data", folder.resolve(o.get("data").asText()).normalize().toString());
            }
        }
    }

    private static List<String> dataPaths(ObjectNode d) {
        List<String> out = new ArrayList<>();
        for (JsonNode ds : d.path("fit").path("datasets")) {
            if (ds.path("data").isTextual()) {
                out.add(ds.get("data").asText());
            }
        }
        return out;
    }

    /**
     * The document with data files that a save copied beside the case replaced by their copies: undoing past a
     * save must not bring back a path outside the project.
     */
    private ObjectNode relocate(ObjectNode d) {
        if (dataPaths(d).stream().noneMatch(relocated::containsKey)) {
            return d;
        }
        ObjectNode c = d.deepCopy();
        for (JsonNode ds : c.path("fit").path("datasets")) {
            if (ds instanceof ObjectNode o && relocated.containsKey(o.path("data").asText())) {
                o.put("data", relocated.get(o.get("data").asText()));
            }
        }
        return c;
    }

    /**
     * The object that holds an input the panels edit: a layer of the shown sample (or of the one the path names), a
     * geometry block (a sample's own where the path names one), a measurement block, or the fit's gains.
     */
    private ObjectNode holder(ObjectNode d, ParameterRef ref) {
        if (ref.scope() == ParameterRef.Scope.GAIN) {
            return objectAt(objectAt(d, "fit"), "gains");
        }
        int sample = ref.sample() == null ? shownSample : sampleNames().indexOf(ref.sample());
        if (ref.scope() == ParameterRef.Scope.LAYER) {
            return layerNode(d, ref.layer(), sample);
        }
        String block = ref.scope() == ParameterRef.Scope.GEOMETRY ? "geometry" : "measurement";
        if (ref.sample() != null && d.get("samples") instanceof ArrayNode a && sample >= 0) {
            return objectAt((ObjectNode) a.get(sample), block);
        }
        if (ref.dataset() < 0) {
            return objectAt(d, block);
        }
        return objectAt((ObjectNode) fitArray(d, "datasets").get(ref.dataset()), block);
    }

    /** Where a fitted value goes: a layer path without a sample into every sample that has the layer. */
    private List<ObjectNode> fittedHolders(ObjectNode d, ParameterRef ref) {
        if (ref.scope() != ParameterRef.Scope.LAYER || ref.sample() != null
                || !(d.get("samples") instanceof ArrayNode a)) {
            return List.of(holder(d, ref));
        }
        List<ObjectNode> out = new ArrayList<>();
        for (int i = 0; i < a.size(); i++) {
            for (String side : SIDES) {
                for (JsonNode l : stackNode(d, i).path(side)) {
                    if (l.path("name").asText().equals(ref.layer()) && l instanceof ObjectNode o) {
                        out.add(o);
                    }
                }
            }
        }
        return out;
    }

    private ObjectNode stackNode(ObjectNode d) {
        return stackNode(d, shownSample);
    }

    /** The stack object of sample {@code index} of a {@code samples} case, else the case's {@code stack}. */
    private static ObjectNode stackNode(ObjectNode d, int index) {
        if (d.get("samples") instanceof ArrayNode a && !a.isEmpty()
                && a.get(index >= 0 && index < a.size() ? index : 0) instanceof ObjectNode s) {
            return objectAt(s, "stack");
        }
        return objectAt(d, "stack");
    }

    private ArrayNode layers(ObjectNode d) {
        return layersOf(stackNode(d));
    }

    private ObjectNode layerNode(ObjectNode d, String name) {
        return layerNode(d, name, shownSample);
    }

    /** A layer of the sample's stack by name, in {@code layers} or in {@code above} (names are unique over both). */
    private static ObjectNode layerNode(ObjectNode d, String name, int sample) {
        ObjectNode stack = stackNode(d, sample);
        for (String side : SIDES) {
            for (JsonNode l : stack.path(side)) {
                if (l.path("name").asText().equals(name) && l instanceof ObjectNode o) {
                    return o;
                }
            }
        }
        throw new IllegalArgumentException("no layer '" + name + "'");
    }

    /** The stack's two lists of layers: below the heated plane, and above it from the plane upward. */
    public static final String LAYERS = "layers";
    public static final String ABOVE = "above";
    private static final List<String> SIDES = List.of(LAYERS, ABOVE);

    private static ArrayNode layersOf(ObjectNode s) {
        if (!(s.get("layers") instanceof ArrayNode a)) {
            return s.putArray("layers");
        }
        return a;
    }

    private static ArrayNode fitArray(ObjectNode d, String key) {
        ObjectNode fit = objectAt(d, "fit");
        if (!(fit.get(key) instanceof ArrayNode a)) {
            return fit.putArray(key);
        }
        return a;
    }

    /** A fit array of the present document for reading; empty (and not added) when the document has none. */
    private ArrayNode fitArrayOrEmpty(String key) {
        return document.path("fit").get(key) instanceof ArrayNode a ? a : JSON.createArrayNode();
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
            case GAIN -> e.put("gain", ref.key());
        }
        if (ref.dataset() >= 0) {
            e.put("dataset", ref.dataset());
        }
        if (ref.sample() != null) {
            e.put("sample", ref.sample());
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
        String sample = e.has("sample") ? e.path("sample").asText() : null;
        if (e.has("gain")) {
            return Optional.of(ParameterRef.gain(e.path("gain").asText()));
        }
        if (e.has("layer")) {
            ParameterRef r = ParameterRef.layer(e.path("layer").asText(), e.path("property").asText());
            return Optional.of(sample != null ? r.inSample(sample) : r);
        }
        if (e.has("geometry")) {
            ParameterRef r = ParameterRef.geometry(e.path("geometry").asText());
            return Optional.of(dataset >= 0 ? r.inDataset(dataset) : sample != null ? r.inSample(sample) : r);
        }
        if (e.has("measurement")) {
            ParameterRef r = ParameterRef.measurement(e.path("measurement").asText());
            return Optional.of(dataset >= 0 ? r.inDataset(dataset) : r);
        }
        return Optional.empty();
    }

    private static void setFixedQuietly(ObjectNode d, ParameterRef ref) {
        for (String key : List.of("free", "uncertain")) {
            if (d.path("fit").get(key) instanceof ArrayNode a) {
                int i = find(a, ref);
                if (i >= 0) {
                    a.remove(i);
                }
            }
        }
    }

    private static void dropRoles(ObjectNode d, Predicate<ParameterRef> which) {
        for (String key : List.of("free", "uncertain")) {
            if (!(d.path("fit").get(key) instanceof ArrayNode a)) {
                continue;
            }
            Iterator<JsonNode> it = a.elements();
            while (it.hasNext()) {
                if (refOf(it.next()).filter(which).isPresent()) {
                    it.remove();
                }
            }
        }
    }
}
