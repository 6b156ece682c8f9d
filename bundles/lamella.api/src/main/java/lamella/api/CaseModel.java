package lamella.api;

import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The numeric inputs of one simulation — a stack, a geometry block, a measurement block — as values that fitting,
 * sensitivity and the workbench read and replace through {@link ParameterRef}s. Immutable: {@link #with} returns a
 * changed copy.
 */
public final class CaseModel {

    /** How every output names a conductivity stated once. */
    public static final String ISOTROPIC = "isotropic Λ";

    /**
     * Layer keys a parameter may name. {@code k_w_mk} is the isotropic Λ (every direction at once);
     * {@code k_through_w_mk} is Λz with the in-plane directions that follow it (see {@link Layer.Tie});
     * {@code k_in_plane_w_mk} sets both in-plane directions.
     */
    /** The optical depths, keys of {@code layers[0]} only (see {@link OpticalDepths}). */
    public static final String ABSORPTION_DEPTH = "absorption_depth_m";
    public static final String SENSING_DEPTH = "sensing_depth_m";

    public static final List<String> LAYER_KEYS = List.of("thickness_m", "k_w_mk", "k_through_w_mk",
            "k_in_plane_w_mk", "k_in_plane_x_w_mk", "k_in_plane_y_w_mk", "heat_capacity_j_m3k",
            "conductance_below_w_m2k", ABSORPTION_DEPTH, SENSING_DEPTH);

    /** The layer keys that name a conductivity. */
    public static final List<String> CONDUCTIVITY_KEYS = List.of("k_w_mk", "k_through_w_mk", "k_in_plane_w_mk",
            "k_in_plane_x_w_mk", "k_in_plane_y_w_mk");

    private final Stack stack;
    private final Block geometry;
    private final Block measurement;

    public CaseModel(Stack stack, Block geometry, Block measurement) {
        this.stack = stack;
        this.geometry = geometry;
        this.measurement = measurement;
    }

    public Stack stack() {
        return stack;
    }

    public Block geometry() {
        return geometry;
    }

    public Block measurement() {
        return measurement;
    }

    /** The simulation these inputs describe. */
    public Simulation simulation(ModelCatalog catalog) throws InputException {
        return catalog.simulation(stack, geometry, measurement);
    }

    /** The current value; throws InputException (at {@code at}) when the case has no such value. */
    public double value(ParameterRef p, String at) throws InputException {
        switch (p.scope()) {
            case LAYER: {
                Layer l = layer(p, at);
                if (isOptical(p.key())) {
                    return optical(l, p, at);
                }
                double v = switch (p.key()) {
                    case "thickness_m" -> l.thickness();
                    case "k_w_mk" -> isotropic(l, at);
                    case "k_through_w_mk" -> l.kThrough();
                    case "k_in_plane_w_mk" -> inPlane(l, at);
                    case "k_in_plane_x_w_mk" -> l.kInPlaneX();
                    case "k_in_plane_y_w_mk" -> l.kInPlaneY();
                    case "heat_capacity_j_m3k" -> l.heatCapacity();
                    case "conductance_below_w_m2k" -> l.conductanceBelow();
                    default -> throw unknownLayerKey(p, at);
                };
                if (!Double.isFinite(v)) {
                    throw InputException.at(at, "layer '" + l.name() + "' has no finite " + p.key()
                            + (p.key().equals("thickness_m") ? " (it is semi-infinite)" : " (perfect contact)")
                            + "; give it a value in the stack first");
                }
                return v;
            }
            default: {
                Object v = block(p).get(p.key());
                if (!(v instanceof Double d)) {
                    throw InputException.at(at, "the " + p.scope().name().toLowerCase() + " block has no number '"
                            + p.key() + "'" + (v == null ? "" : ", it holds " + Block.describe(v)));
                }
                return d;
            }
        }
    }

    /** A copy with one value replaced. Positive quantities must stay positive: the caller transforms as needed. */
    public CaseModel with(ParameterRef p, double value) throws InputException {
        switch (p.scope()) {
            case LAYER: {
                Layer l = layer(p, p.toString());
                if (isOptical(p.key())) {
                    optical(l, p, p.toString());
                    try {
                        OpticalDepths o = stack.optics();
                        OpticalDepths changed = p.key().equals(ABSORPTION_DEPTH) ? o.withAbsorption(value)
                                : o.withSensing(value);
                        return new CaseModel(stack.withOptics(changed), geometry, measurement);
                    } catch (IllegalArgumentException e) {
                        throw InputException.at(p.toString(), "layer '" + l.name() + "' cannot take " + p.key()
                                + " = " + value + ": " + e.getMessage());
                    }
                }
                Layer changed;
                try {
                    changed = switch (p.key()) {
                        case "thickness_m" -> l.withThickness(value);
                        case "k_w_mk" -> l.withIsotropic(value);
                        case "k_through_w_mk" -> l.withThroughPlane(value);
                        case "k_in_plane_w_mk" -> l.withInPlane(value);
                        case "k_in_plane_x_w_mk" -> l.withInPlaneX(value);
                        case "k_in_plane_y_w_mk" -> l.withInPlaneY(value);
                        case "heat_capacity_j_m3k" -> l.withHeatCapacity(value);
                        case "conductance_below_w_m2k" -> l.withConductanceBelow(value);
                        default -> throw unknownLayerKey(p, p.toString());
                    };
                } catch (IllegalArgumentException e) {
                    throw InputException.at(p.toString(), "layer '" + l.name() + "' cannot take " + p.key() + " = "
                            + value + ": " + e.getMessage());
                }
                return withLayer(l, changed, p);
            }
            case GEOMETRY:
                return new CaseModel(stack, replaced(geometry, p.key(), value), measurement);
            default:
                return new CaseModel(stack, geometry, replaced(measurement, p.key(), value));
        }
    }

    /**
     * The same values, with every in-plane direction that one of the given paths names stated apart from Λz: where
     * a fit or a study names the in-plane conductivity itself, {@code k_through_w_mk} moves Λz alone, whatever the
     * order of the paths. Likewise a named {@code sensing_depth_m} no longer follows the absorption depth.
     */
    public CaseModel apartFor(Collection<ParameterRef> named) {
        Stack changed = stack;
        for (ParameterRef p : named) {
            if (p.scope() != ParameterRef.Scope.LAYER) {
                continue;
            }
            if (p.key().equals(SENSING_DEPTH)) {
                changed = changed.withOptics(changed.optics().withSensing(changed.optics().sensing()));
            }
            boolean x = p.key().equals("k_in_plane_w_mk") || p.key().equals("k_in_plane_x_w_mk");
            boolean y = p.key().equals("k_in_plane_w_mk") || p.key().equals("k_in_plane_y_w_mk");
            if (x || y) {
                Stack s = changed;
                changed = s.layer(p.layer()).map(l -> s.withLayer(l.name(), l.apart(x, y))).orElse(s);
            }
        }
        return new CaseModel(changed, geometry, measurement);
    }

    /**
     * What a path moves in this case, in words for every output's labels: "isotropic Λ" for a conductivity stated
     * once, "through-plane Λz" where Λz is stated apart, "in-plane Λr"; empty where the key says it all.
     */
    public String quantity(ParameterRef p) {
        if (p.scope() != ParameterRef.Scope.LAYER) {
            return "";
        }
        Layer.Tie tie = stack.layer(p.layer()).map(Layer::tie).orElse(Layer.Tie.APART);
        return switch (p.key()) {
            case "k_w_mk" -> ISOTROPIC;
            case "k_through_w_mk" -> switch (tie) {
                case ISOTROPIC -> ISOTROPIC;
                case X_FOLLOWS -> "Λz with Λx";
                case Y_FOLLOWS -> "Λz with Λy";
                case APART -> "through-plane Λz";
            };
            case "k_in_plane_w_mk" -> "in-plane Λr";
            case "k_in_plane_x_w_mk" -> "in-plane Λx";
            case "k_in_plane_y_w_mk" -> "in-plane Λy";
            default -> "";
        };
    }

    /** The label of a path in every output: the path, and what it moves where the key alone does not say. */
    public String label(ParameterRef p) {
        return ParameterRef.label(p, quantity(p));
    }

    /**
     * Every numeric input this model has, one per quantity the case states: finite layer values (a layer stated
     * isotropic has one conductivity, {@code k_w_mk}), those of the layers above the heated plane too, and the
     * numbers of its geometry block.
     */
    public List<ParameterRef> numericInputs() {
        List<ParameterRef> out = new ArrayList<>();
        for (Layer l : stack.allLayers()) {
            if (!l.isSemiInfinite()) {
                out.add(ParameterRef.layer(l.name(), "thickness_m"));
            }
            if (l.tie() == Layer.Tie.ISOTROPIC) {
                out.add(ParameterRef.layer(l.name(), "k_w_mk"));
            } else {
                out.add(ParameterRef.layer(l.name(), "k_through_w_mk"));
                if (l.tie() == Layer.Tie.APART && l.isInPlaneIsotropic()) {
                    out.add(ParameterRef.layer(l.name(), "k_in_plane_w_mk"));
                } else {
                    if (!l.tie().x()) {
                        out.add(ParameterRef.layer(l.name(), "k_in_plane_x_w_mk"));
                    }
                    if (!l.tie().y()) {
                        out.add(ParameterRef.layer(l.name(), "k_in_plane_y_w_mk"));
                    }
                }
            }
            out.add(ParameterRef.layer(l.name(), "heat_capacity_j_m3k"));
            if (!l.hasPerfectContactBelow()) {
                out.add(ParameterRef.layer(l.name(), "conductance_below_w_m2k"));
            }
        }
        String first = stack.layers().get(0).name();
        if (stack.optics().absorption() > 0) {
            out.add(ParameterRef.layer(first, ABSORPTION_DEPTH));
        }
        if (!stack.optics().sensingFollows() && stack.optics().sensing() > 0) {
            out.add(ParameterRef.layer(first, SENSING_DEPTH));
        }
        for (Map.Entry<String, Object> e : geometry.values().entrySet()) {
            if (e.getValue() instanceof Double d && d != 0) {
                out.add(ParameterRef.geometry(e.getKey()));
            }
        }
        return out;
    }

    private CaseModel withLayer(Layer old, Layer changed, ParameterRef p) throws InputException {
        try {
            return new CaseModel(stack.withLayer(old.name(), changed), geometry, measurement);
        } catch (IllegalArgumentException e) {
            throw InputException.at(p.toString(), e.getMessage());
        }
    }

    private Layer layer(ParameterRef p, String at) throws InputException {
        return stack.layer(p.layer()).orElseThrow(() -> InputException.at(at, "there is no layer '" + p.layer()
                + "'; layers: " + String.join(", ", stack.allLayers().stream().map(Layer::name).toList())));
    }

    private static boolean isOptical(String key) {
        return key.equals(ABSORPTION_DEPTH) || key.equals(SENSING_DEPTH);
    }

    /** An optical depth: a value of the layer under the heated plane only, and only where it reaches below it. */
    private double optical(Layer l, ParameterRef p, String at) throws InputException {
        if (!l.name().equals(stack.layers().get(0).name())) {
            throw InputException.at(at, "only the layer under the heated plane ('" + stack.layers().get(0).name()
                    + "', layers[0]) absorbs and is read in depth; layer '" + l.name() + "' has no " + p.key());
        }
        double v = p.key().equals(ABSORPTION_DEPTH) ? stack.optics().absorption() : stack.optics().sensing();
        if (v == 0) {
            throw InputException.at(at, "layer '" + l.name() + "' is " + (p.key().equals(ABSORPTION_DEPTH)
                    ? "heated" : "read") + " at the plane itself (no " + p.key() + "); give it a value in the stack"
                    + " first");
        }
        return v;
    }

    private Block block(ParameterRef p) {
        return p.scope() == ParameterRef.Scope.GEOMETRY ? geometry : measurement;
    }

    private static double inPlane(Layer l, String at) throws InputException {
        if (!l.isInPlaneIsotropic()) {
            throw InputException.at(at, "layer '" + l.name() + "' differs along x and y; name k_in_plane_x_w_mk or"
                    + " k_in_plane_y_w_mk");
        }
        return l.kInPlaneX();
    }

    private static double isotropic(Layer l, String at) throws InputException {
        if (!l.isIsotropic()) {
            throw InputException.at(at, "layer '" + l.name() + "' conducts differently through the plane (Λz "
                    + l.kThrough() + " W/(m K)) and along it (Λx " + l.kInPlaneX() + ", Λy " + l.kInPlaneY()
                    + " W/(m K)), so it has no one isotropic Λ; name k_through_w_mk and k_in_plane_w_mk instead");
        }
        return l.kThrough();
    }

    private static InputException unknownLayerKey(ParameterRef p, String at) {
        String hint = Names.closest(p.key(), LAYER_KEYS).map(k -> " (did you mean '" + k + "'?)").orElse("");
        return InputException.at(at, "unknown layer property '" + p.key() + "'" + hint + "; expected one of: "
                + String.join(", ", LAYER_KEYS));
    }

    private static Block replaced(Block b, String key, double value) {
        Map<String, Object> v = new LinkedHashMap<>(b.values());
        v.put(key, value);
        return new Block(b.path(), v);
    }
}
