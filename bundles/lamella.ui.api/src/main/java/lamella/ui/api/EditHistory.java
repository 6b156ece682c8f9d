package lamella.ui.api;

import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Objects;
import java.util.Optional;

/**
 * The undo and redo stacks of one project. A step keeps the whole document before and after the edit: case
 * documents are a few kilobytes, so a deep history costs little, and a step restores exactly what any edit — present
 * or future — changed. Snapshots are never modified once recorded. Plain Java; UI thread only.
 */
final class EditHistory {

    /** How many steps are kept; the oldest are forgotten first. */
    static final int DEPTH = 1000;

    /** One undoable edit: its name in words, the documents around it, and the key that lets typing merge into it. */
    record Step(String name, ObjectNode before, ObjectNode after, Object mergeKey) {
    }

    private final Deque<Step> undo = new ArrayDeque<>();
    private final Deque<Step> redo = new ArrayDeque<>();
    private Step open;

    /**
     * Records an edit. When it carries the same merge key as the step recorded just before (and nothing was undone,
     * redone or saved in between), the two become one step; a merged step that ends where it began is dropped.
     */
    void record(String name, ObjectNode before, ObjectNode after, Object mergeKey) {
        redo.clear();
        Step top = undo.peek();
        if (mergeKey != null && top != null && top == open && Objects.equals(top.mergeKey(), mergeKey)) {
            undo.pop();
            if (top.before().equals(after)) {
                open = null;
                return;
            }
            open = new Step(name, top.before(), after, mergeKey);
        } else {
            open = new Step(name, before, after, mergeKey);
        }
        undo.push(open);
        while (undo.size() > DEPTH) {
            undo.removeLast();
        }
    }

    /** Ends merging, as saving does: the next edit starts a step of its own. */
    void seal() {
        open = null;
    }

    Optional<Step> undoStep() {
        return Optional.ofNullable(undo.peek());
    }

    Optional<Step> redoStep() {
        return Optional.ofNullable(redo.peek());
    }

    /** Moves the newest step to the redo stack and returns it. */
    Step undo() {
        Step s = undo.pop();
        redo.push(s);
        open = null;
        return s;
    }

    /** Moves the newest undone step back and returns it. */
    Step redo() {
        Step s = redo.pop();
        undo.push(s);
        open = null;
        return s;
    }

    int undoable() {
        return undo.size();
    }

    int redoable() {
        return redo.size();
    }
}
