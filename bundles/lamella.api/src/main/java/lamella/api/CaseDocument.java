package lamella.api;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

/**
 * A case file as read and checked by a {@link CaseFormat}: the stack fully validated, the geometry and measurement
 * blocks kept raw until the services they name interpret them.
 *
 * @param file        where it was read from (relative data paths resolve against its folder)
 * @param stack       the layered sample
 * @param geometry    the {@code geometry} block, with its {@code type}; empty when every fit dataset has its own
 * @param measurement the {@code measurement} block, with its {@code type}; empty when every fit dataset has its own
 * @param root        the whole document, for blocks other bundles define (such as {@code fit})
 * @param lines       the 1-based line of every JSON path's key (or list element), for error messages
 * @param origins     where every value of the stack came from, in layer order (empty when not recorded), so that
 *                    every result can name the library, tier, entry version and source of each library value
 * @param samples     every sample of the case, in file order: the one unnamed sample of {@code stack}, or the named
 *                    ones of {@code samples} ({@code stack} is then the first one's, {@code geometry} the case's
 *                    own, empty where every sample or dataset has its own)
 */
public record CaseDocument(Path file, Stack stack, Block geometry, Block measurement, Block root,
                           Map<String, Integer> lines, List<ValueOrigin> origins, List<Sample> samples) {

    public CaseDocument {
        lines = Map.copyOf(lines);
        origins = List.copyOf(origins);
        samples = samples.isEmpty() && stack != null ? List.of(new Sample("", stack, null, "stack"))
                : List.copyOf(samples);
    }

    /** A document of one stack, the case's only sample. */
    public CaseDocument(Path file, Stack stack, Block geometry, Block measurement, Block root,
                        Map<String, Integer> lines, List<ValueOrigin> origins) {
        this(file, stack, geometry, measurement, root, lines, origins, List.of());
    }

    /** A document that records no origins (built in code rather than read). */
    public CaseDocument(Path file, Stack stack, Block geometry, Block measurement, Block root,
                        Map<String, Integer> lines) {
        this(file, stack, geometry, measurement, root, lines, List.of(), List.of());
    }

    /** Whether the case holds several samples (a {@code samples} list of more than one). */
    public boolean severalSamples() {
        return samples.size() > 1;
    }

    /** The sample of this name, if the case has it. */
    public java.util.Optional<Sample> sample(String name) {
        return samples.stream().filter(s -> s.name().equals(name)).findFirst();
    }

    /** The names of the samples, in file order, for messages. */
    public List<String> sampleNames() {
        return samples.stream().map(Sample::name).toList();
    }

    /**
     * The case as one of its samples alone: that sample's stack and geometry (its own, else the case's), for a
     * command that simulates one stack. Unknown names are an error at {@code at} with the list of names.
     */
    public CaseDocument only(String name, String at) throws InputException {
        Sample s = sample(name).filter(Sample::named).orElseThrow(() -> InputException.at(at, samples.get(0).named()
                ? "there is no sample '" + name + "'" + Names.closest(name, sampleNames())
                .map(n -> " (did you mean '" + n + "'?)").orElse("") + "; samples: " + String.join(", ", sampleNames())
                : "the case has one stack and no samples list; leave " + at + " out"));
        return new CaseDocument(file, s.stack(), s.geometryOr(geometry), measurement, root, lines, origins,
                List.of(s));
    }

    /**
     * Refuses a case of several samples where only one stack can be used ({@code what}: the command or block), with
     * the names to choose from.
     */
    public void requireOneSample(String what) throws InputException {
        if (severalSamples()) {
            throw InputException.at("samples", what + " works on one sample at a time, and this case has "
                    + samples.size() + ": " + String.join(", ", sampleNames()));
        }
    }

    /** The stack values taken from material libraries, in layer order. */
    public List<ValueOrigin> libraryValues() {
        return origins.stream().filter(o -> o.kind() == ValueOrigin.Kind.LIBRARY).toList();
    }

    /**
     * Where a layer input's value came from: the layer's value of that key, or for a conductivity stated once
     * ({@code k_w_mk}, {@code k_in_plane_w_mk}) the value of its first direction. Empty for other inputs and when
     * origins were not recorded.
     */
    public java.util.Optional<ValueOrigin> origin(ParameterRef ref) {
        if (ref.scope() != ParameterRef.Scope.LAYER) {
            return java.util.Optional.empty();
        }
        String key = switch (ref.key()) {
            case "k_w_mk" -> "k_through_w_mk";
            case "k_in_plane_w_mk" -> "k_in_plane_x_w_mk";
            default -> ref.key();
        };
        String within = ref.sample() == null ? "" : sample(ref.sample()).map(s -> s.path() + ".").orElse("");
        return origins.stream().filter(o -> o.layer().equals(ref.layer()) && o.key().equals(key)
                && o.path().startsWith(within)).findFirst();
    }

    /** Whether the case states a top-level block of this name itself ({@code geometry}, {@code measurement}). */
    public boolean states(String block) {
        return root.get(block) instanceof Block;
    }

    /** The problem located in this file, at the line of its JSON path (or of the nearest enclosing path). */
    public InputException locate(InputException e) {
        if (e.file() != null) {
            return e;
        }
        String p = e.path();
        while (p != null && !p.isEmpty()) {
            Integer line = lines.get(p);
            if (line != null) {
                return new InputException(file, e.path(), line, e.problem());
            }
            int cut = Math.max(p.lastIndexOf('.'), p.lastIndexOf('['));
            p = cut > 0 ? p.substring(0, cut) : "";
        }
        return e.inFile(file);
    }
}
