package lamella.ui.workbench;

/** Where a dragged panel lands on an area: among its tabs, or against one of its edges (which splits it). */
enum Zone {
    TABS, LEFT, RIGHT, TOP, BOTTOM;

    boolean splits() {
        return this != TABS;
    }

    /** Whether the new area sits beside the old one (left, right) rather than above or below it. */
    boolean sideBySide() {
        return this == LEFT || this == RIGHT;
    }

    /** Whether the new area comes before the old one. */
    boolean before() {
        return this == LEFT || this == TOP;
    }
}
