package lamella.ui.workbench;

import java.util.ArrayList;
import java.util.List;

/** Parts side by side (left to right) or stacked (top to bottom), each with a share of the room. */
final class Split extends Part {

    /** The largest share of the room {@link #leadingPixels} may take. */
    static final double LEADING_SHARE_LIMIT = 0.64;

    final boolean sideBySide;
    /**
     * Pixels the first part asks for whatever the window's size (0: none), until the user moves the sash: the
     * standard arrangement's way of keeping a table's columns in view on a small screen. Not saved; a saved
     * arrangement keeps the shares it had.
     */
    int leadingPixels;
    final List<Part> parts = new ArrayList<>();
    final List<Integer> weights = new ArrayList<>();

    Split(boolean sideBySide) {
        this.sideBySide = sideBySide;
    }

    void add(Part part, int weight) {
        insert(parts.size(), part, weight);
    }

    void insert(int index, Part part, int weight) {
        part.parent = this;
        parts.add(index, part);
        weights.add(index, Math.max(1, weight));
    }

    void remove(Part part) {
        int i = parts.indexOf(part);
        parts.remove(i);
        weights.remove(i);
        part.parent = null;
    }

    void replace(Part old, Part with) {
        int i = parts.indexOf(old);
        parts.set(i, with);
        with.parent = this;
        old.parent = null;
    }
}
