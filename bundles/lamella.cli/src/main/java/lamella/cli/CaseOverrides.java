package lamella.cli;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import lamella.api.CaseDocument;
import lamella.api.CaseModel;
import lamella.api.InputException;
import lamella.api.Layer;
import lamella.api.Names;
import lamella.api.ParameterRef;
import lamella.api.Sample;
import lamella.api.ValueOrigin;
import lamella.api.PhysicalRange;

/**
 * A batch entry's {@code set}: inputs of a case replaced by their parameter paths ({@code film.thickness_m},
 * {@code geometry.pump_radius_m}, {@code measurement.modulation_hz}) before it is fitted — the same paths every
 * output uses. A fit that leaves an input free starts from the replaced value unless its {@code initial} says
 * otherwise.
 */
final class CaseOverrides {

    private CaseOverrides() {
    }

    /** The case with every override applied; a bad path or value is an InputException at {@code set.PATH}. */
    static CaseDocument apply(CaseDocument doc, Map<String, Double> overrides) throws InputException {
        if (overrides.isEmpty()) {
            return doc;
        }
        if (doc.samples().get(0).named()) {
            return applyToSamples(doc, overrides);
        }
        CaseModel model = new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
        List<ValueOrigin> origins = new ArrayList<>(doc.origins());
        for (Map.Entry<String, Double> e : overrides.entrySet()) {
            String at = "set." + e.getKey();
            ParameterRef ref = parse(e.getKey(), at);
            Layer.Tie tie = tieOf(doc, ref);
            origins.removeIf(o -> sets(ref, tie, o));
            PhysicalRange.checkKey(ref.key(), e.getValue(), at);
            try {
                model.value(ref, at);
                model = model.with(ref, e.getValue());
            } catch (InputException problem) {
                throw InputException.at(at, problem.problem());
            }
        }
        return new CaseDocument(doc.file(), model.stack(), model.geometry(), model.measurement(), doc.root(),
                doc.lines(), origins);
    }

    /**
     * Overrides of a case of samples: {@code LAYER.PROPERTY} replaces the value in every sample that has the layer,
     * {@code samples[NAME].LAYER.PROPERTY} (or {@code samples[NAME].geometry.KEY}, of a sample with its own geometry)
     * in that sample only; {@code geometry.KEY} and {@code measurement.KEY} the case's blocks.
     */
    private static CaseDocument applyToSamples(CaseDocument doc, Map<String, Double> overrides)
            throws InputException {
        List<Sample> samples = new ArrayList<>(doc.samples());
        CaseModel shared = new CaseModel(doc.stack(), doc.geometry(), doc.measurement());
        List<ValueOrigin> origins = new ArrayList<>(doc.origins());
        for (Map.Entry<String, Double> e : overrides.entrySet()) {
            String at = "set." + e.getKey();
            String path = e.getKey();
            String only = null;
            if (path.startsWith("samples[")) {
                int close = path.indexOf("].");
                if (close < 0) {
                    throw InputException.at(at, "expected samples[NAME].LAYER.PROPERTY or samples[NAME].geometry.KEY");
                }
                only = path.substring("samples[".length(), close);
                if (doc.sample(only).isEmpty()) {
                    throw InputException.at(at, "there is no sample '" + only + "'; samples: "
                            + String.join(", ", doc.sampleNames()));
                }
                path = path.substring(close + 2);
            }
            ParameterRef ref = parse(path, at);
            PhysicalRange.checkKey(ref.key(), e.getValue(), at);
            if (ref.scope() != ParameterRef.Scope.LAYER && only == null) {
                try {
                    shared.value(ref, at);
                    shared = shared.with(ref, e.getValue());
                } catch (InputException problem) {
                    throw InputException.at(at, problem.problem());
                }
                continue;
            }
            if (ref.scope() == ParameterRef.Scope.MEASUREMENT) {
                throw InputException.at(at, "a sample has no measurement block; override measurement.KEY");
            }
            int changed = 0;
            for (int i = 0; i < samples.size(); i++) {
                Sample s = samples.get(i);
                boolean layer = ref.scope() == ParameterRef.Scope.LAYER;
                if ((only != null && !only.equals(s.name())) || (layer && s.stack().layer(ref.layer()).isEmpty())) {
                    continue;
                }
                if (!layer && s.geometry() == null) {
                    throw InputException.at(at, "sample '" + s.name() + "' has no geometry block of its own;"
                            + " override geometry.KEY");
                }
                CaseModel m = new CaseModel(s.stack(), s.geometryOr(doc.geometry()), doc.measurement());
                try {
                    m.value(ref, at);
                    m = m.with(ref, e.getValue());
                } catch (InputException problem) {
                    throw InputException.at(at, problem.problem());
                }
                String within = s.path() + ".";
                Layer.Tie tie = s.stack().layer(layer ? ref.layer() : "").map(Layer::tie)
                        .orElse(Layer.Tie.of(false, false));
                origins.removeIf(o -> o.path().startsWith(within) && sets(ref, tie, o));
                samples.set(i, new Sample(s.name(), m.stack(), layer ? s.geometry() : m.geometry(), s.path()));
                changed++;
            }
            if (changed == 0) {
                throw InputException.at(at, "no sample has a layer '" + ref.layer() + "'");
            }
        }
        return new CaseDocument(doc.file(), samples.get(0).stack(), shared.geometry(), shared.measurement(),
                doc.root(), doc.lines(), origins, samples);
    }

    /**
     * Whether an override replaces the value an origin describes, so that the library (or case line) it names no
     * longer stands behind the value: the same layer and key, or every direction of a conductivity stated once.
     */
    static boolean sets(ParameterRef ref, Layer.Tie tie, ValueOrigin o) {
        if (ref.scope() != ParameterRef.Scope.LAYER || !ref.layer().equals(o.layer())) {
            return false;
        }
        return switch (ref.key()) {
            case "k_w_mk" -> o.key().startsWith("k_");
            case "k_in_plane_w_mk" -> o.key().startsWith("k_in_plane");
            case "k_through_w_mk" -> o.key().equals("k_through_w_mk")
                    || (o.key().equals("k_in_plane_x_w_mk") && tie.x())
                    || (o.key().equals("k_in_plane_y_w_mk") && tie.y());
            default -> o.key().equals(ref.key());
        };
    }

    /** Which in-plane directions follow Λz in the layer a path names (none for other paths). */
    private static Layer.Tie tieOf(CaseDocument doc, ParameterRef ref) {
        if (ref.scope() == ParameterRef.Scope.LAYER) {
            for (Layer l : doc.stack().allLayers()) {
                if (l.name().equals(ref.layer())) {
                    return l.tie();
                }
            }
        }
        return Layer.Tie.of(false, false);
    }

    static ParameterRef parse(String path, String at) throws InputException {
        if (path.startsWith("datasets[")) {
            throw InputException.at(at, "a dataset's own block is not overridden by a batch; give the case its own"
                    + " file, or override the case's geometry or measurement");
        }
        int dot = path.lastIndexOf('.');
        if (dot <= 0 || dot == path.length() - 1) {
            throw InputException.at(at, "expected a parameter path: LAYER.PROPERTY, geometry.KEY or measurement.KEY");
        }
        String head = path.substring(0, dot);
        String key = path.substring(dot + 1);
        if (head.equals("geometry")) {
            return ParameterRef.geometry(key);
        }
        if (head.equals("measurement")) {
            return ParameterRef.measurement(key);
        }
        if (!CaseModel.LAYER_KEYS.contains(key)) {
            String hint = Names.closest(key, CaseModel.LAYER_KEYS).map(k -> " (did you mean '" + k + "'?)").orElse("");
            throw InputException.at(at, "unknown layer property '" + key + "'" + hint + "; expected one of: "
                    + String.join(", ", CaseModel.LAYER_KEYS));
        }
        return ParameterRef.layer(head, key);
    }
}
