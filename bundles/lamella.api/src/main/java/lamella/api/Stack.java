package lamella.api;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * A layered sample heated and read at one plane, the top of {@code layers[0]}: {@code layers} from that plane
 * down and the condition below the last one, and {@code above} from that plane up and the condition beyond the last
 * of those ({@code top}). With no layers above, the heated plane is the sample's surface and no heat leaves
 * through it ({@code top} is then {@link BottomBoundary#ADIABATIC}); with layers above, heat flows both ways.
 * An above layer's {@link Layer#conductanceBelow()} is its boundary conductance toward the heated plane.
 * Only the outermost layer of each side may be semi-infinite, and it must be when that side ends
 * {@link BottomBoundary#SEMI_INFINITE}. Layer names are unique over both sides. {@code optics} says how deep the
 * heating and the reading reach into {@code layers[0]} ({@link OpticalDepths#SURFACE}: at the plane itself).
 * {@code heating} says whether the library values are taken at the temperature the absorbed power raises the sample
 * to ({@link SelfHeating#OFF}: at the temperatures as read); the layers hold the values as read.
 */
public record Stack(List<Layer> layers, BottomBoundary bottom, List<Layer> above, BottomBoundary top,
                    OpticalDepths optics, SelfHeating heating) {

    public Stack {
        layers = List.copyOf(layers);
        above = List.copyOf(above);
        if (layers.isEmpty()) {
            throw new IllegalArgumentException("a stack needs at least one layer");
        }
        if (bottom == null || top == null || optics == null || heating == null) {
            throw new IllegalArgumentException("a stack needs its bottom and top conditions, its optical depths and"
                    + " its self-heating");
        }
        if (above.isEmpty() && top != BottomBoundary.ADIABATIC) {
            throw new IllegalArgumentException("a stack with no layers above the heated plane has an adiabatic top,"
                    + " not " + top.caseName());
        }
        Set<String> names = new HashSet<>();
        check(layers, bottom, "the last layer", names);
        check(above, top, "the outermost layer above", names);
        Layer last = layers.get(layers.size() - 1);
        if (!last.hasPerfectContactBelow()) {
            throw new IllegalArgumentException("the last layer '" + last.name()
                    + "' has no layer below it to have a boundary conductance to");
        }
    }

    /** A stack without self-heating. */
    public Stack(List<Layer> layers, BottomBoundary bottom, List<Layer> above, BottomBoundary top,
                 OpticalDepths optics) {
        this(layers, bottom, above, top, optics, SelfHeating.OFF);
    }

    /** A stack heated and read at the plane itself, with or without layers above it. */
    public Stack(List<Layer> layers, BottomBoundary bottom, List<Layer> above, BottomBoundary top) {
        this(layers, bottom, above, top, OpticalDepths.SURFACE);
    }

    /** A stack heated at its surface: no layers above, no heat leaving through the top. */
    public Stack(List<Layer> layers, BottomBoundary bottom) {
        this(layers, bottom, List.of(), BottomBoundary.ADIABATIC);
    }

    /** The same stack, heated and read to other depths in {@code layers[0]}. */
    public Stack withOptics(OpticalDepths o) {
        return new Stack(layers, bottom, above, top, o, heating);
    }

    /** The same stack, its library values taken under another self-heating. */
    public Stack withHeating(SelfHeating h) {
        return new Stack(layers, bottom, above, top, optics, h);
    }

    private static void check(List<Layer> side, BottomBoundary end, String outermost, Set<String> names) {
        for (int i = 0; i < side.size(); i++) {
            Layer l = side.get(i);
            if (!names.add(l.name())) {
                throw new IllegalArgumentException("layer name '" + l.name() + "' is used twice");
            }
            boolean last = i == side.size() - 1;
            if (l.isSemiInfinite() && !(last && end == BottomBoundary.SEMI_INFINITE)) {
                throw new IllegalArgumentException("layer '" + l.name() + "' has no thickness; only " + outermost
                        + " of a side that ends semi-infinite may");
            }
            if (last && end == BottomBoundary.SEMI_INFINITE && !l.isSemiInfinite()) {
                throw new IllegalArgumentException(outermost + " '" + l.name()
                        + "' of a semi-infinite side must have no thickness");
            }
        }
    }

    /** The layer of this name, below or above the heated plane. */
    public Optional<Layer> layer(String name) {
        return allLayers().stream().filter(l -> l.name().equals(name)).findFirst();
    }

    /** Whether the named layer lies above the heated plane. */
    public boolean isAbove(String name) {
        return above.stream().anyMatch(l -> l.name().equals(name));
    }

    /** True when heat also flows upward from the heated plane, into layers above it. */
    public boolean heatsBothWays() {
        return !above.isEmpty();
    }

    /** Every layer: those below the heated plane from it down, then those above it from it up. */
    public List<Layer> allLayers() {
        List<Layer> all = new ArrayList<>(layers);
        all.addAll(above);
        return all;
    }

    /** The same stack with one layer (found by name, on either side) replaced. */
    public Stack withLayer(String name, Layer changed) {
        List<Layer> below = new ArrayList<>(layers);
        List<Layer> up = new ArrayList<>(above);
        for (List<Layer> side : List.of(below, up)) {
            for (int i = 0; i < side.size(); i++) {
                if (side.get(i).name().equals(name)) {
                    side.set(i, changed);
                }
            }
        }
        return new Stack(below, bottom, up, top, optics, heating);
    }

    /** True when every layer conducts equally along x and y (axisymmetric geometries need this). */
    public boolean isInPlaneIsotropic() {
        return allLayers().stream().allMatch(Layer::isInPlaneIsotropic);
    }

    /**
     * The heat-flow model in words, for every output that describes it: where the plane heated and read lies,
     * and where the heat goes on each side.
     */
    public String heatFlowInWords() {
        String first = "'" + layers.get(0).name() + "'";
        String down = "down through " + count(layers.size()) + " to " + article(bottom) + " bottom";
        if (!heatsBothWays()) {
            return "Heated and read at the surface (the top of layer " + first + "); heat flows " + down
                    + "; none leaves through the surface." + depths();
        }
        String names = String.join(", ", above.stream().map(l -> "'" + l.name() + "'").toList());
        return "Heated and read inside the stack, at the top of layer " + first + ": heat flows " + down
                + " and up through " + count(above.size()) + " above (" + names + ") to " + article(top)
                + " top; the plane's temperature is shared by both sides and their admittances add." + depths();
    }

    private String depths() {
        if (!optics.inDepth()) {
            return "";
        }
        String layer = "layer '" + layers.get(0).name() + "'";
        String heat = optics.absorption() > 0 ? " The pump's heat is spread as exp(−z/δ) through " + layer
                + ", δ = " + metres(optics.absorption()) + " (absorption depth)" : " The pump heats at the plane";
        String read = optics.sensingFollows() ? ", and the probe reads the temperature weighted the same way."
                : optics.sensing() > 0 ? "; the probe reads the temperature weighted by exp(−z/δₛ), δₛ = "
                + metres(optics.sensing()) + " (sensing depth)." : "; the probe reads the temperature at the plane.";
        return heat + read;
    }

    private static String metres(double v) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(4)).stripTrailingZeros().toString()
                + " m";
    }

    private static String count(int n) {
        return n == 1 ? "1 layer" : n + " layers";
    }

    private static String article(BottomBoundary b) {
        return (b == BottomBoundary.ADIABATIC || b == BottomBoundary.ISOTHERMAL ? "an " : "a ") + b.caseName();
    }

    /** No steady temperature exists when heat can leave through neither side. */
    public boolean hasHeatSink() {
        return bottom != BottomBoundary.ADIABATIC || (heatsBothWays() && top != BottomBoundary.ADIABATIC);
    }
}
