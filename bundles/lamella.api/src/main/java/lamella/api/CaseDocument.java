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
 */
public record CaseDocument(Path file, Stack stack, Block geometry, Block measurement, Block root,
                           Map<String, Integer> lines, List<ValueOrigin> origins) {

    public CaseDocument {
        lines = Map.copyOf(lines);
        origins = List.copyOf(origins);
    }

    /** A document that records no origins (built in code rather than read). */
    public CaseDocument(Path file, Stack stack, Block geometry, Block measurement, Block root,
                        Map<String, Integer> lines) {
        this(file, stack, geometry, measurement, root, lines, List.of());
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
        return origins.stream().filter(o -> o.layer().equals(ref.layer()) && o.key().equals(key)).findFirst();
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
