package lamella.api;

/**
 * One numeric input of a case, addressed the same way in the case file, the fitter, sensitivity tables, reports and
 * the workbench: a layer property ({@code film.k_through_w_mk}), a geometry or measurement key
 * ({@code geometry.pump_radius_m}), optionally of one dataset of a fit whose block overrides the case's
 * ({@code datasets[1].geometry.pump_radius_m}).
 *
 * @param scope   what holds the value
 * @param layer   the layer's name for {@link Scope#LAYER}, else null
 * @param key     the case-file key, carrying its unit
 * @param dataset the fit dataset whose own block holds it, or −1 for the case's block
 */
public record ParameterRef(Scope scope, String layer, String key, int dataset) {

    public enum Scope { LAYER, GEOMETRY, MEASUREMENT }

    public ParameterRef {
        if (scope == Scope.LAYER && (layer == null || dataset != -1)) {
            throw new IllegalArgumentException("a layer parameter names its layer and belongs to the shared stack");
        }
        if (scope != Scope.LAYER && layer != null) {
            throw new IllegalArgumentException("only layer parameters name a layer");
        }
    }

    public static ParameterRef layer(String layer, String key) {
        return new ParameterRef(Scope.LAYER, layer, key, -1);
    }

    public static ParameterRef geometry(String key) {
        return new ParameterRef(Scope.GEOMETRY, null, key, -1);
    }

    public static ParameterRef measurement(String key) {
        return new ParameterRef(Scope.MEASUREMENT, null, key, -1);
    }

    /** The same parameter in one dataset's own block. */
    public ParameterRef inDataset(int index) {
        return new ParameterRef(scope, layer, key, index);
    }

    /** The value's unit, read from the key's suffix, for labels: {@code W/(m K)}, {@code m}. */
    public String unit() {
        return Units.ofKey(key);
    }

    /**
     * How outputs name a path: the path, then what it moves in words where its key alone does not say, such as
     * {@code film.k_through_w_mk (isotropic Λ)}.
     *
     * @param quantity the words, from {@link CaseModel#quantity}; empty for none
     */
    public static String label(ParameterRef p, String quantity) {
        return quantity == null || quantity.isEmpty() ? p.toString() : p + " (" + quantity + ")";
    }

    @Override
    public String toString() {
        String prefix = dataset >= 0 ? "datasets[" + dataset + "]." : "";
        return switch (scope) {
            case LAYER -> layer + "." + key;
            case GEOMETRY -> prefix + "geometry." + key;
            case MEASUREMENT -> prefix + "measurement." + key;
        };
    }
}
