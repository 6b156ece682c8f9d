package lamella.ui.workbench;

import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import lamella.ui.api.Area;

/**
 * The user's arrangement of the window: a tree of splits whose leaves are tabbed areas, the panels closed by the
 * user, the area enlarged to fill the window (if any) and the window's bounds. Plain data, edited on the UI thread.
 */
final class Arrangement {

    /** Window bounds in pixels; width 0 means "not known yet". */
    int x;
    int y;
    int width;
    int height;
    boolean windowMaximised;

    Part root;
    /** Panels the user closed; they keep their place for when they are shown again. */
    final Set<String> closed = new LinkedHashSet<>();
    /** A panel of the area that fills the window, or null when every area is shown. */
    String enlarged;

    Arrangement(Part root) {
        this.root = root;
    }

    /**
     * The inputs and their tables on the left (the Stack in front), the plots beside them (the Signal in front),
     * messages and the project's files in a strip along the bottom. The left column asks for {@link #INPUT_COLUMN_PX} (as much as a stack table with all its
     * columns needs), up to {@link Split#LEADING_SHARE_LIMIT} of the window, until the user moves its sash.
     */
    static Arrangement standard() {
        Split top = new Split(true);
        TabArea inputs = new TabArea(Area.LEFT.name());
        inputs.opening = "stack";
        TabArea plots = new TabArea(Area.CENTER.name());
        plots.opening = "signal";
        top.add(inputs, 55);
        top.add(plots, 45);
        top.leadingPixels = INPUT_COLUMN_PX;
        Split bottom = new Split(true);
        bottom.add(new TabArea(Area.BOTTOM.name()), 62);
        bottom.add(new TabArea(Area.RIGHT.name()), 38);
        Split rows = new Split(false);
        rows.add(top, 74);
        rows.add(bottom, 26);
        return new Arrangement(rows);
    }

    /** Width the left column of the standard arrangement asks for, in pixels. */
    static final int INPUT_COLUMN_PX = 830;

    List<TabArea> areas() {
        List<TabArea> out = new ArrayList<>();
        collect(root, out);
        return out;
    }

    Optional<TabArea> areaOf(String panelId) {
        return areas().stream().filter(a -> a.panels.contains(panelId)).findFirst();
    }

    /** Gives a panel that has no place yet the area standing for its preferred one. */
    void place(String panelId, Area preferred) {
        if (areaOf(panelId).isPresent()) {
            return;
        }
        List<TabArea> areas = areas();
        TabArea target = areas.stream().filter(a -> preferred.name().equals(a.role)).findFirst()
                .or(() -> areas.stream().filter(a -> a.role != null).findFirst())
                .orElse(areas.get(0));
        target.panels.add(panelId);
        if (target.front == null || panelId.equals(target.opening)) {
            target.front = panelId;
        }
    }

    /**
     * Moves a panel next to another: among its tabs, or into a new area against one of its edges.
     *
     * @return false when nothing changes (a panel dropped on itself, or an area split by its only panel)
     */
    boolean move(String panelId, String targetPanelId, Zone zone) {
        Optional<TabArea> from = areaOf(panelId);
        Optional<TabArea> to = areaOf(targetPanelId);
        if (from.isEmpty() || to.isEmpty()) {
            return false;
        }
        TabArea source = from.get();
        TabArea target = to.get();
        if (source == target && (!zone.splits() || source.panels.size() == 1)) {
            return false;
        }
        detach(source, panelId);
        if (zone.splits()) {
            TabArea fresh = new TabArea(null);
            fresh.panels.add(panelId);
            fresh.front = panelId;
            splitBeside(target, fresh, zone);
        } else {
            target.panels.add(panelId);
            target.front = panelId;
        }
        if (source.panels.isEmpty()) {
            prune(source);
        }
        return true;
    }

    private void detach(TabArea area, String panelId) {
        area.panels.remove(panelId);
        if (panelId.equals(area.front)) {
            area.front = area.panels.isEmpty() ? null : area.panels.get(0);
        }
        if (panelId.equals(enlarged)) {
            enlarged = null;
        }
    }

    private void splitBeside(TabArea target, TabArea fresh, Zone zone) {
        Split parent = target.parent;
        if (parent != null && parent.sideBySide == zone.sideBySide()) {
            int i = parent.parts.indexOf(target);
            int half = Math.max(1, parent.weights.get(i) / 2);
            parent.weights.set(i, half);
            parent.insert(zone.before() ? i : i + 1, fresh, half);
            return;
        }
        Split split = new Split(zone.sideBySide());
        if (parent == null) {
            root = split;
        } else {
            parent.replace(target, split);
        }
        split.add(zone.before() ? fresh : target, 50);
        split.add(zone.before() ? target : fresh, 50);
    }

    /** Removes an empty area, handing its role on, and folds splits left with one part into their parent. */
    private void prune(TabArea empty) {
        Split parent = empty.parent;
        if (parent == null) {
            return;
        }
        parent.remove(empty);
        if (empty.role != null) {
            areas().stream().filter(a -> a.role == null).findFirst().ifPresent(a -> a.role = empty.role);
        }
        if (parent.parts.size() == 1) {
            Part only = parent.parts.get(0);
            Split grand = parent.parent;
            if (grand == null) {
                parent.remove(only);
                root = only;
            } else {
                grand.replace(parent, only);
            }
        }
    }

    private static void collect(Part part, List<TabArea> out) {
        if (part instanceof TabArea a) {
            out.add(a);
        } else {
            for (Part p : ((Split) part).parts) {
                collect(p, out);
            }
        }
    }
}
