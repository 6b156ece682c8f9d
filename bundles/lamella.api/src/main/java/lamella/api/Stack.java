package lamella.api;

import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * A layered sample: layers from the heated surface down, and the condition below the last one.
 * Only the last layer may be semi-infinite, and it must be when the bottom is {@link BottomBoundary#SEMI_INFINITE}.
 */
public record Stack(List<Layer> layers, BottomBoundary bottom) {

    public Stack {
        layers = List.copyOf(layers);
        if (layers.isEmpty()) {
            throw new IllegalArgumentException("a stack needs at least one layer");
        }
        Set<String> names = new HashSet<>();
        for (int i = 0; i < layers.size(); i++) {
            Layer l = layers.get(i);
            if (!names.add(l.name())) {
                throw new IllegalArgumentException("layer name '" + l.name() + "' is used twice");
            }
            boolean last = i == layers.size() - 1;
            if (l.isSemiInfinite() && !(last && bottom == BottomBoundary.SEMI_INFINITE)) {
                throw new IllegalArgumentException("layer '" + l.name() + "' has no thickness; only the last layer"
                        + " of a stack with a semi-infinite bottom may");
            }
            if (last && bottom == BottomBoundary.SEMI_INFINITE && !l.isSemiInfinite()) {
                throw new IllegalArgumentException("the last layer '" + l.name()
                        + "' of a semi-infinite stack must have no thickness");
            }
            if (last && !l.hasPerfectContactBelow()) {
                throw new IllegalArgumentException("the last layer '" + l.name()
                        + "' has no layer below it to have a boundary conductance to");
            }
        }
    }

    public Optional<Layer> layer(String name) {
        return layers.stream().filter(l -> l.name().equals(name)).findFirst();
    }

    /** True when every layer conducts equally along x and y (axisymmetric geometries need this). */
    public boolean isInPlaneIsotropic() {
        return layers.stream().allMatch(Layer::isInPlaneIsotropic);
    }
}
