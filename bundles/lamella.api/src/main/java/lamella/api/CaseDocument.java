package lamella.api;

import java.nio.file.Path;
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
 */
public record CaseDocument(Path file, Stack stack, Block geometry, Block measurement, Block root,
                           Map<String, Integer> lines) {

    public CaseDocument {
        lines = Map.copyOf(lines);
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
