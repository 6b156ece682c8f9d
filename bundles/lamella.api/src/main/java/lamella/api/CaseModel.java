package lamella.api;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The numeric inputs of one simulation — a stack, a geometry block, a measurement block — as values that fitting,
 * sensitivity and the workbench read and replace through {@link ParameterRef}s. Immutable: {@link #with} returns a
 * changed copy.
 */
public final class CaseModel {

    /** Layer keys a parameter may name. {@code k_in_plane_w_mk} sets both in-plane directions. */
    public static final List<String> LAYER_KEYS = List.of("thickness_m", "k_through_w_mk", "k_in_plane_w_mk",
            "k_in_plane_x_w_mk", "k_in_plane_y_w_mk", "heat_capacity_j_m3k", "conductance_below_w_m2k");

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
                double v = switch (p.key()) {
                    case "thickness_m" -> l.thickness();
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
                Layer changed = switch (p.key()) {
                    case "thickness_m" -> l.withThickness(value);
                    case "k_through_w_mk" -> new Layer(l.name(), l.thickness(), value, l.kInPlaneX(), l.kInPlaneY(),
                            l.heatCapacity(), l.conductanceBelow());
                    case "k_in_plane_w_mk" -> new Layer(l.name(), l.thickness(), l.kThrough(), value, value,
                            l.heatCapacity(), l.conductanceBelow());
                    case "k_in_plane_x_w_mk" -> new Layer(l.name(), l.thickness(), l.kThrough(), value, l.kInPlaneY(),
                            l.heatCapacity(), l.conductanceBelow());
                    case "k_in_plane_y_w_mk" -> new Layer(l.name(), l.thickness(), l.kThrough(), l.kInPlaneX(), value,
                            l.heatCapacity(), l.conductanceBelow());
                    case "heat_capacity_j_m3k" -> new Layer(l.name(), l.thickness(), l.kThrough(), l.kInPlaneX(),
                            l.kInPlaneY(), value, l.conductanceBelow());
                    case "conductance_below_w_m2k" -> l.withConductanceBelow(value);
                    default -> throw unknownLayerKey(p, p.toString());
                };
                List<Layer> layers = new ArrayList<>(stack.layers());
                layers.set(layers.indexOf(l), changed);
                try {
                    return new CaseModel(new Stack(layers, stack.bottom()), geometry, measurement);
                } catch (IllegalArgumentException e) {
                    throw InputException.at(p.toString(), e.getMessage());
                }
            }
            case GEOMETRY:
                return new CaseModel(stack, replaced(geometry, p.key(), value), measurement);
            default:
                return new CaseModel(stack, geometry, replaced(measurement, p.key(), value));
        }
    }

    /** Every numeric input this model has: finite layer values and the numbers of its geometry block. */
    public List<ParameterRef> numericInputs() {
        List<ParameterRef> out = new ArrayList<>();
        for (Layer l : stack.layers()) {
            if (!l.isSemiInfinite()) {
                out.add(ParameterRef.layer(l.name(), "thickness_m"));
            }
            out.add(ParameterRef.layer(l.name(), "k_through_w_mk"));
            if (l.isInPlaneIsotropic()) {
                out.add(ParameterRef.layer(l.name(), "k_in_plane_w_mk"));
            } else {
                out.add(ParameterRef.layer(l.name(), "k_in_plane_x_w_mk"));
                out.add(ParameterRef.layer(l.name(), "k_in_plane_y_w_mk"));
            }
            out.add(ParameterRef.layer(l.name(), "heat_capacity_j_m3k"));
            if (!l.hasPerfectContactBelow()) {
                out.add(ParameterRef.layer(l.name(), "conductance_below_w_m2k"));
            }
        }
        for (Map.Entry<String, Object> e : geometry.values().entrySet()) {
            if (e.getValue() instanceof Double d && d != 0) {
                out.add(ParameterRef.geometry(e.getKey()));
            }
        }
        return out;
    }

    private Layer layer(ParameterRef p, String at) throws InputException {
        return stack.layer(p.layer()).orElseThrow(() -> InputException.at(at, "there is no layer '" + p.layer()
                + "'; layers: " + String.join(", ", stack.layers().stream().map(Layer::name).toList())));
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
