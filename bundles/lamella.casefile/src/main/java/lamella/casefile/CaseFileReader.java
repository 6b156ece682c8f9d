package lamella.casefile;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.TreeSet;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.Supplier;
import lamella.api.Block;
import lamella.api.BottomBoundary;
import lamella.api.CaseDocument;
import lamella.api.CaseFormat;
import lamella.api.CaseModel;
import lamella.api.ExplainedCase;
import lamella.api.ExplainingCaseFormat;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.Names;
import lamella.api.OpticalDepths;
import lamella.api.PhysicalRange;
import lamella.api.SelfHeating;
import lamella.api.Sample;
import lamella.api.Stack;
import lamella.api.ValueOrigin;
import lamella.api.material.MaterialCatalog;
import lamella.api.material.MaterialLibrary;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;

/**
 * Case files, version 1: {@code stack} (layers from the heated plane down and the bottom condition; optionally
 * layers above that plane and the top condition), {@code geometry}
 * and {@code measurement}, each naming its service by {@code type}. Unknown keys are errors so that a typo never
 * goes unnoticed; the stack is checked here, the other blocks by the services they name. A layer may name a
 * {@code material} of the live material libraries for the values it does not write itself; {@code self_heating}
 * takes those values at the temperature the absorbed power raises the sample to.
 */
@Component(service = {CaseFormat.class, ExplainingCaseFormat.class})
public final class CaseFileReader implements ExplainingCaseFormat {

    static final String WORKBENCH = "workbench";
    /**
     * {@code fit} and {@code plan} are read by the fitting service and {@code map} by the map command; this reader
     * only lets them through. {@code workbench} holds what the workbench remembers with a project (settings of techniques and geometries switched away from); no model reads
     * it, so any object is accepted there.
     */
    static final Set<String> TOP_KEYS = Set.of("description", "stack", "samples", "geometry", "measurement",
            LayerReading.TEMPERATURE, "fit", "plan", "map", WORKBENCH, SelfHeatingReading.BLOCK);
    /** The keys of one entry of {@code samples}. */
    static final Set<String> SAMPLE_KEYS = Set.of("name", "stack", "geometry", LayerReading.TEMPERATURE,
            "description");
    static final Set<String> STACK_KEYS = Set.of("layers", "bottom", "above", "top");
    static final String NAME = "name";
    static final String THICKNESS = "thickness_m";
    static final String K_THROUGH = "k_through_w_mk";
    static final String K_IN_PLANE = "k_in_plane_w_mk";
    static final String K_IN_PLANE_X = "k_in_plane_x_w_mk";
    static final String K_IN_PLANE_Y = "k_in_plane_y_w_mk";
    static final String HEAT_CAPACITY = "heat_capacity_j_m3k";
    static final String CONDUCTANCE = "conductance_below_w_m2k";
    static final String ABSORPTION = CaseModel.ABSORPTION_DEPTH;
    static final String SENSING = CaseModel.SENSING_DEPTH;
    static final Set<String> LAYER_KEYS = Set.of(NAME, THICKNESS, K_THROUGH, K_IN_PLANE, K_IN_PLANE_X, K_IN_PLANE_Y,
            HEAT_CAPACITY, CONDUCTANCE, LayerReading.MATERIAL, LayerReading.TEMPERATURE, LayerReading.C_AXIS,
            ABSORPTION, SENSING);

    /** The live libraries; the reader also works without any, as long as no layer names a material. */
    private final List<MaterialLibrary> libraries = new CopyOnWriteArrayList<>();

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeLibrary")
    public void addLibrary(MaterialLibrary library) {
        libraries.add(library);
    }

    public void removeLibrary(MaterialLibrary library) {
        libraries.remove(library);
    }

    @Override
    public CaseDocument read(Path file) throws InputException {
        return readExplained(file).document();
    }

    @Override
    public ExplainedCase readExplained(Path file) throws InputException {
        JsonTree tree = new JsonTree();
        Block root = tree.read(file);
        Map<String, Integer> lines = tree.lines();
        try {
            onlyKnownKeys(root, TOP_KEYS, "a case file");
            if (root.has("description")) {
                root.requireString("description");
            }
            if (root.has(WORKBENCH) && !(root.get(WORKBENCH) instanceof Block)) {
                throw InputException.at(root.pathOf(WORKBENCH), "expected an object of workbench settings, got "
                        + Block.describe(root.get(WORKBENCH)));
            }
            double temperature = root.has(LayerReading.TEMPERATURE)
                    ? positive(root, LayerReading.TEMPERATURE, "the sample's temperature in K")
                    : LayerReading.DEFAULT_TEMPERATURE_K;
            Supplier<MaterialCatalog> catalog = () -> new MaterialCatalog(libraries);
            List<ValueOrigin> origins = new ArrayList<>();
            String temperaturePath = root.has(LayerReading.TEMPERATURE) ? LayerReading.TEMPERATURE : null;
            Block heating = root.has(SelfHeatingReading.BLOCK) ? object(root, SelfHeatingReading.BLOCK) : null;
            List<Sample> samples;
            if (root.has("samples")) {
                samples = samples(root, temperature, temperaturePath, catalog, lines, origins, heating);
            } else {
                List<SelfHeating.LibraryBinding> bindings = new ArrayList<>();
                Stack stack = stack(object(root, "stack"), temperature, temperaturePath, catalog, lines, origins,
                        bindings);
                if (heating != null) {
                    stack = stack.withHeating(SelfHeatingReading.read(heating, bindings));
                }
                samples = List.of(new Sample("", stack, null, "stack"));
            }
            boolean allOwn = samples.stream().allMatch(x -> x.geometry() != null);
            Block geometry = allOwn && !root.has("geometry") ? new Block("geometry", Map.of())
                    : block(root, "geometry");
            if (samples.size() == 1 && samples.get(0).geometry() != null) {
                // one sample's own geometry is the case's: one block, addressed as geometry.KEY
                Sample only = samples.get(0);
                geometry = only.geometry();
                samples = List.of(new Sample(only.name(), only.stack(), null, only.path()));
            }
            Block measurement = block(root, "measurement");
            return new ExplainedCase(new CaseDocument(file, samples.get(0).stack(), geometry, measurement, root,
                    lines, origins, samples), origins);
        } catch (InputException e) {
            throw new CaseDocument(file, null, null, null, root, lines).locate(e);
        }
    }

    /**
     * {@code samples}: a non-empty list of objects, each with a unique {@code name}, its own {@code stack} and
     * optionally its own {@code geometry} and {@code temperature_k}. A case holds either {@code stack} or
     * {@code samples}; a {@code self_heating} block heats each sample's stack.
     */
    private static List<Sample> samples(Block root, double temperature, String temperaturePath,
                                        Supplier<MaterialCatalog> catalog, Map<String, Integer> lines,
                                        List<ValueOrigin> origins, Block heating) throws InputException {
        if (root.has("stack")) {
            throw InputException.at("stack", "a case holds either one stack or a list of samples, each with its own"
                    + " stack; move this stack into an entry of samples, or leave samples out");
        }
        if (!(root.get("samples") instanceof List<?> list) || list.isEmpty()) {
            throw InputException.at("samples", "expected a non-empty list of samples, each {\"name\": …,"
                    + " \"stack\": {…}}, got " + Block.describe(root.get("samples")));
        }
        List<Sample> out = new ArrayList<>();
        Map<String, String> seen = new HashMap<>();
        for (int i = 0; i < list.size(); i++) {
            String at = "samples[" + i + "]";
            if (!(list.get(i) instanceof Block b)) {
                throw InputException.at(at, "expected a sample object {\"name\": …, \"stack\": {…}}, got "
                        + Block.describe(list.get(i)));
            }
            onlyKnownKeys(b, SAMPLE_KEYS, "a sample");
            String name = b.requireString("name");
            if (name.isBlank() || name.chars().anyMatch(c -> c == '[' || c == ']' || Character.isISOControl(c))) {
                throw InputException.at(b.pathOf("name"), "expected a sample name that is not blank and holds no"
                        + " '[', ']' or control character (outputs name a sample's inputs as samples[NAME].…),"
                        + " got \"" + name + "\"");
            }
            String before = seen.put(name, b.pathOf("name"));
            if (before != null) {
                throw InputException.at(b.pathOf("name"), "the sample name '" + name + "' is already used by "
                        + before + "; every sample needs its own name");
            }
            if (b.has("description")) {
                b.requireString("description");
            }
            boolean own = b.has(LayerReading.TEMPERATURE);
            double t = own ? positive(b, LayerReading.TEMPERATURE, "the sample's temperature in K") : temperature;
            List<SelfHeating.LibraryBinding> bindings = new ArrayList<>();
            Stack stack = stack(object(b, "stack"), t, own ? b.pathOf(LayerReading.TEMPERATURE) : temperaturePath,
                    catalog, lines, origins, bindings);
            if (heating != null) {
                // the case's absorbed power heats every sample, each through its own stack
                stack = stack.withHeating(SelfHeatingReading.read(heating, bindings));
            }
            Block geometry = b.has("geometry") ? object(b, "geometry") : null;
            out.add(new Sample(name, stack, geometry, at));
        }
        return out;
    }

    static Stack stack(Block s, double temperature, String temperaturePath, Supplier<MaterialCatalog> catalog,
                       Map<String, Integer> lines, List<ValueOrigin> origins,
                       List<SelfHeating.LibraryBinding> bindings) throws InputException {
        onlyKnownKeys(s, STACK_KEYS, "the stack");
        BottomBoundary bottom = boundary(s, "bottom", BottomBoundary.SEMI_INFINITE);
        Object raw = s.get("layers");
        if (raw == null) {
            throw InputException.at(s.pathOf("layers"), "missing; expected a list of layers from the surface down");
        }
        if (!(raw instanceof List<?> list) || list.isEmpty()) {
            throw InputException.at(s.pathOf("layers"), "expected a non-empty list of layers, got "
                    + Block.describe(raw));
        }
        Map<String, String> seen = new HashMap<>();
        List<Layer> layers = side(s, "layers", list, bottom, false, temperature, temperaturePath, catalog, lines,
                origins, bindings, seen);
        OpticalDepths optics = optics((Block) list.get(0), layers.get(0), lines, origins);
        if (!s.has("above")) {
            if (s.has("top")) {
                throw InputException.at(s.pathOf("top"), "a top condition needs layers above the heated plane;"
                        + " add stack.above (layers from the top of layers[0] upward), or leave top out (with no"
                        + " layers above, no heat leaves through the surface)");
            }
            return new Stack(layers, bottom).withOptics(optics);
        }
        if (!(s.get("above") instanceof List<?> up) || up.isEmpty()) {
            throw InputException.at(s.pathOf("above"), "expected a non-empty list of layers from the heated plane"
                    + " upward, got " + Block.describe(s.get("above")) + " (leave above out for a stack heated at"
                    + " its surface)");
        }
        BottomBoundary top = boundary(s, "top", BottomBoundary.SEMI_INFINITE);
        List<Layer> above = side(s, "above", up, top, true, temperature, temperaturePath, catalog, lines, origins,
                bindings, seen);
        return new Stack(layers, bottom, above, top, optics);
    }

    /**
     * How deep {@code layers[0]} is heated and read: {@code absorption_depth_m} (default 0, at the plane) and
     * {@code sensing_depth_m} (default: the absorption depth, one quantity with it).
     */
    private static OpticalDepths optics(Block first, Layer layer, Map<String, Integer> lines,
                                        List<ValueOrigin> origins) throws InputException {
        double absorption = 0;
        if (first.has(ABSORPTION)) {
            absorption = positive(first, ABSORPTION, "the depth over which the layer absorbs the pump, in m");
            origins.add(new ValueOrigin(first.pathOf(ABSORPTION), layer.name(), ABSORPTION, absorption,
                    ValueOrigin.Kind.EXPLICIT, lines.getOrDefault(first.pathOf(ABSORPTION), -1), "",
                    Optional.empty()));
        }
        if (!first.has(SENSING)) {
            if (absorption > 0) {
                origins.add(new ValueOrigin(first.pathOf(SENSING), layer.name(), SENSING, absorption,
                        ValueOrigin.Kind.DEFAULT, -1, "equal to " + ABSORPTION, Optional.empty()));
            }
            return OpticalDepths.absorbing(absorption);
        }
        double sensing = positive(first, SENSING, "the depth over which the probe reads the temperature, in m");
        origins.add(new ValueOrigin(first.pathOf(SENSING), layer.name(), SENSING, sensing, ValueOrigin.Kind.EXPLICIT,
                lines.getOrDefault(first.pathOf(SENSING), -1), "", Optional.empty()));
        return new OpticalDepths(absorption, sensing, false);
    }

    /** Only the layer under the heated plane is heated and read in depth. */
    private static void onlyFirstIsOptical(Block l, String at) throws InputException {
        for (String key : List.of(ABSORPTION, SENSING)) {
            if (l.has(key)) {
                throw InputException.at(l.pathOf(key), "only layers[0], the layer under the heated plane, is heated"
                        + " and read over a depth; leave " + key + " out of " + at);
            }
        }
    }

    /** {@code stack.bottom} or {@code stack.top}: one of the boundary names, or the default when not written. */
    private static BottomBoundary boundary(Block s, String key, BottomBoundary absent) throws InputException {
        if (!s.has(key)) {
            return absent;
        }
        String b = s.requireString(key);
        List<String> names = new ArrayList<>();
        for (BottomBoundary v : BottomBoundary.values()) {
            names.add(v.caseName());
        }
        return BottomBoundary.fromCaseName(b).orElseThrow(() -> InputException.at(s.pathOf(key),
                "unknown " + key + " '" + b + "'; expected one of: " + String.join(", ", names)));
    }

    /** One side's layers; names are unique over both sides ({@code seen}: name to the path that used it). */
    private static List<Layer> side(Block s, String key, List<?> list, BottomBoundary end, boolean above,
                                    double temperature, String temperaturePath, Supplier<MaterialCatalog> catalog,
                                    Map<String, Integer> lines, List<ValueOrigin> origins,
                                    List<SelfHeating.LibraryBinding> bindings, Map<String, String> seen)
            throws InputException {
        List<Layer> layers = new ArrayList<>();
        for (int i = 0; i < list.size(); i++) {
            String at = s.pathOf(key) + "[" + i + "]";
            if (!(list.get(i) instanceof Block l)) {
                throw InputException.at(at, "expected a layer object, got " + Block.describe(list.get(i)));
            }
            if (above || i > 0) {
                onlyFirstIsOptical(l, at);
            }
            boolean last = i == list.size() - 1;
            Layer layer = LayerReading.read(l, last, end, above, temperature, temperaturePath, catalog, lines,
                    origins, bindings);
            String before = seen.put(layer.name(), at);
            if (before != null) {
                throw InputException.at(l.pathOf(NAME), "the name '" + layer.name() + "' is already used by "
                        + before);
            }
            layers.add(layer);
        }
        return layers;
    }

    static double positive(Block b, String key, String what) throws InputException {
        Object v = b.get(key);
        if (v == null) {
            throw InputException.at(b.pathOf(key), "missing; expected " + what);
        }
        if (!(v instanceof Double d)) {
            throw InputException.at(b.pathOf(key), "expected " + what + " as a number, got " + Block.describe(v));
        }
        if (!(d > 0)) {
            throw InputException.at(b.pathOf(key), "expected a positive number (" + what + "), got " + d);
        }
        PhysicalRange.checkKey(key, d, b.pathOf(key));
        return d;
    }

    /**
     * The case's geometry or measurement block. A fit whose every dataset has its own needs none: it is then an
     * empty block at its path, and whatever needs the case's own says so there.
     */
    private static Block block(Block root, String key) throws InputException {
        if (root.get(key) == null && everyDatasetHasOwn(root, key)) {
            return new Block(key, Map.of());
        }
        if (root.get(key) == null) {
            throw InputException.at(key, "missing; expected an object naming its type (or one in every dataset of"
                    + " the fit block" + (key.equals("geometry") ? ", or in every sample" : "") + ")");
        }
        return object(root, key);
    }

    private static boolean everyDatasetHasOwn(Block root, String key) {
        return root.get("fit") instanceof Block fit && fit.get("datasets") instanceof List<?> list && !list.isEmpty()
                && list.stream().allMatch(d -> d instanceof Block b && b.get(key) instanceof Block);
    }

    private static Block object(Block parent, String key) throws InputException {
        Object v = parent.get(key);
        if (v == null) {
            throw InputException.at(parent.pathOf(key), "missing; expected an object");
        }
        if (!(v instanceof Block b)) {
            throw InputException.at(parent.pathOf(key), "expected an object, got " + Block.describe(v));
        }
        return b;
    }

    static void onlyKnownKeys(Block b, Set<String> known, String what) throws InputException {
        for (String key : b.values().keySet()) {
            if (!known.contains(key)) {
                Optional<String> hint = Names.closest(key, known);
                throw InputException.at(b.pathOf(key), "unknown key in " + what
                        + hint.map(h -> " (did you mean '" + h + "'?)").orElse("") + "; expected one of: "
                        + String.join(", ", new TreeSet<>(known)));
            }
        }
    }
}
