package lamella.ui.workbench;

/** A node of an arrangement: a {@link Split} of parts or a {@link TabArea} of panels. */
abstract class Part {

    /** The split holding this part; null for the root. */
    Split parent;
}
