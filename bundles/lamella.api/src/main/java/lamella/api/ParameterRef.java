package lamella.api;

/**
 * One numeric input of a case, addressed the same way in the case file, the fitter, sensitivity tables, reports and
 * the workbench: a layer property ({@code film.k_through_w_mk}), a geometry or measurement key
 * ({@code geometry.pump_radius_m}), optionally of one dataset of a fit whose block overrides the case's
 * ({@code datasets[1].geometry.pump_radius_m}); in a case of several samples, optionally of one sample
 * ({@code samples[thin].film.thickness_m}, {@code samples[thin].geometry.pump_radius_m}); or a fit's named gain, the
 * factor on the signal of every dataset that names it ({@code gains.detector}).
 *
 * @param scope   what holds the value
 * @param layer   the layer's name for {@link Scope#LAYER}, else null
 * @param key     the case-file key, carrying its unit; for {@link Scope#GAIN} the gain's name
 * @param dataset the fit dataset whose own block holds it, or −1 for the case's block
 * @param sample  the one sample whose layer or geometry block holds it, or null: a layer path without a sample
 *                names that layer in every sample that has it
 */
public record ParameterRef(Scope scope, String layer, String key, int dataset, String sample) {

    public enum Scope { LAYER, GEOMETRY, MEASUREMENT, GAIN }

    public ParameterRef {
        if (scope == Scope.LAYER && (layer == null || dataset != -1)) {
            throw new IllegalArgumentException("a layer parameter names its layer and belongs to the shared stack");
        }
        if (scope != Scope.LAYER && layer != null) {
            throw new IllegalArgumentException("only layer parameters name a layer");
        }
        if (sample != null && (dataset != -1 || scope == Scope.MEASUREMENT || scope == Scope.GAIN)) {
            throw new IllegalArgumentException("only a layer or a sample's geometry belongs to one sample");
        }
        if (scope == Scope.GAIN && dataset != -1) {
            throw new IllegalArgumentException("a gain is named by the datasets that share it");
        }
    }

    /** An input of no particular sample. */
    public ParameterRef(Scope scope, String layer, String key, int dataset) {
        this(scope, layer, key, dataset, null);
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

    /** The named gain of a fit: a dimensionless factor on the signal of every dataset that names it. */
    public static ParameterRef gain(String name) {
        return new ParameterRef(Scope.GAIN, null, name, -1);
    }

    /** The same parameter in one dataset's own block. */
    public ParameterRef inDataset(int index) {
        return new ParameterRef(scope, layer, key, index);
    }

    /** The same layer property or geometry key of one sample only. */
    public ParameterRef inSample(String name) {
        return new ParameterRef(scope, layer, key, dataset, name);
    }

    /** The same key as the one model that holds it reads it: without dataset or sample. */
    public ParameterRef local() {
        return dataset < 0 && sample == null ? this : new ParameterRef(scope, layer, key, -1);
    }

    /** The value's unit, read from the key's suffix, for labels: {@code W/(m K)}, {@code m}; a gain's is 1. */
    public String unit() {
        return scope == Scope.GAIN ? "1" : Units.ofKey(key);
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
        String prefix = dataset >= 0 ? "datasets[" + dataset + "]." : sample != null ? "samples[" + sample + "]."
                : "";
        return switch (scope) {
            case LAYER -> prefix + layer + "." + key;
            case GEOMETRY -> prefix + "geometry." + key;
            case MEASUREMENT -> prefix + "measurement." + key;
            case GAIN -> "gains." + key;
        };
    }
}
