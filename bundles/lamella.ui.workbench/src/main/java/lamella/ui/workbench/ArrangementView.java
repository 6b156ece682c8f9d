package lamella.ui.workbench;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Stream;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.CTabFolder;
import org.eclipse.swt.custom.CTabFolder2Adapter;
import org.eclipse.swt.custom.CTabFolderEvent;
import org.eclipse.swt.custom.CTabItem;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Sash;

/**
 * Shows an {@link Arrangement} as widgets — splits as sash forms, areas as tab folders — and rebuilds them from the
 * arrangement after every change, so that the arrangement stays the one truth that is saved. Panel controls survive
 * a rebuild: they wait in the shelf's parking composite while the areas are replaced.
 */
final class ArrangementView {

    /** What the view asks of the window when the user acts on a tab. */
    interface Actions {
        void close(String panelId);

        void changed();
    }

    private final Composite host;
    private final PanelShelf shelf;
    private final Actions actions;
    private static final String USER_DRAG = "lamella.userDrag";
    private final Map<SashForm, Drawn> sashes = new LinkedHashMap<>();
    private final Map<CTabFolder, TabArea> folders = new LinkedHashMap<>();
    private Arrangement arrangement;
    private Control top;

    ArrangementView(Composite host, PanelShelf shelf, Arrangement arrangement, Actions actions) {
        this.host = host;
        this.shelf = shelf;
        this.arrangement = arrangement;
        this.actions = actions;
    }

    Arrangement arrangement() {
        captureWeights();
        return arrangement;
    }

    void replace(Arrangement with) {
        arrangement = with;
        rebuild();
    }

    /** Takes the arrangement to show at the next {@link #rebuild}, leaving the widgets as they are until then. */
    void take(Arrangement with) {
        arrangement = with;
    }

    boolean shows(String panelId) {
        return shelf.isLive(panelId) && !arrangement.closed.contains(panelId)
                && arrangement.areaOf(panelId).isPresent();
    }

    /** Moves a panel as a drop on an area would; the public face of a tab drag. */
    boolean move(String panelId, String targetPanelId, Zone zone) {
        captureWeights();
        boolean moved = arrangement.move(panelId, targetPanelId, zone);
        if (moved) {
            rebuild();
            actions.changed();
        }
        return moved;
    }

    /** Enlarges the area holding the panel to fill the window, or restores every area if it is enlarged already. */
    void toggleEnlarged(String panelId) {
        edit(() -> arrangement.enlarged = arrangement.enlarged != null ? null : panelId);
        actions.changed();
    }

    boolean enlarged() {
        return arrangement.enlarged != null;
    }

    /** Brings a shown panel's tab to the front. */
    void bringToFront(String panelId) {
        arrangement.areaOf(panelId).ifPresent(a -> a.front = panelId);
        for (Map.Entry<CTabFolder, TabArea> e : folders.entrySet()) {
            for (CTabItem item : e.getKey().getItems()) {
                if (panelId.equals(item.getData(PANEL))) {
                    e.getKey().setSelection(item);
                }
            }
        }
    }

    /**
     * Moves the sash beside the panel's area (or beside the row or column holding it) so that it has the given
     * width or height, as a drag of that sash would; answers the pixels it had, or -1 when no split of that
     * direction holds the area.
     */
    int resizeArea(String panelId, boolean wide, int pixels) {
        for (CTabFolder folder : folders.keySet()) {
            if (Stream.of(folder.getItems()).noneMatch(i -> panelId.equals(i.getData(PANEL)))) {
                continue;
            }
            Control part = folder;
            Composite p = folder.getParent();
            while (p != null && !(p instanceof SashForm s && ((s.getStyle() & SWT.HORIZONTAL) != 0) == wide)) {
                part = p;
                p = p.getParent();
            }
            if (p == null) {
                return -1;
            }
            Control holding = part;
            List<Control> parts = Stream.of(p.getChildren()).filter(c -> !(c instanceof Sash)).toList();
            int total = parts.stream().mapToInt(c -> extent(c, wide)).sum();
            int had = extent(holding, wide);
            int[] weights = new int[parts.size()];
            for (int k = 0; k < weights.length; k++) {
                weights[k] = parts.get(k) == holding ? pixels : Math.max(1,
                        (int) Math.round((double) extent(parts.get(k), wide) * (total - pixels) / Math.max(1, total - had)));
            }
            for (Control c : p.getChildren()) {
                if (c instanceof Sash bar) {
                    bar.setData(USER_DRAG, Boolean.TRUE);
                }
            }
            ((SashForm) p).setWeights(weights);
            p.layout(true, true);
            return had;
        }
        return -1;
    }

    private static int extent(Control c, boolean wide) {
        return wide ? c.getSize().x : c.getSize().y;
    }

    /** The area under a point of the display and the zone of it the point is in, for a tab being dragged. */
    Optional<DropTarget> dropAt(Point onDisplay) {
        for (Map.Entry<CTabFolder, TabArea> e : folders.entrySet()) {
            CTabFolder folder = e.getKey();
            Point origin = folder.toDisplay(0, 0);
            Point size = folder.getSize();
            Rectangle r = new Rectangle(origin.x, origin.y, size.x, size.y);
            if (r.contains(onDisplay) && folder.getSelection() != null) {
                Zone zone = DropTarget.zoneOf(r, folder.getTabHeight(), onDisplay);
                return Optional.of(new DropTarget((String) folder.getSelection().getData(PANEL), zone,
                        DropTarget.highlight(r, zone)));
            }
        }
        return Optional.empty();
    }

    /** Panels shown, with their area's position in the tree (such as {@code 0/1/0}) and whether it is in front. */
    List<String> placements() {
        List<String> out = new ArrayList<>();
        describe(arrangement.root, "0", out);
        return out;
    }

    /** Applies a change to the arrangement and redraws; sash positions are taken in first, while they still match. */
    void edit(Runnable change) {
        captureWeights();
        change.run();
        rebuild();
    }

    void rebuild() {
        shelf.park();
        if (top != null && !top.isDisposed()) {
            top.dispose();
        }
        sashes.clear();
        folders.clear();
        Optional<TabArea> enlarged = Optional.ofNullable(arrangement.enlarged).flatMap(arrangement::areaOf);
        top = enlarged.isPresent() ? area(host, enlarged.get(), true) : part(host, arrangement.root);
        if (top == null) {
            top = emptyNotice(host);
        }
        host.layout(true, true);
    }

    private Control part(Composite parent, Part part) {
        if (part instanceof TabArea a) {
            return area(parent, a, false);
        }
        Split split = (Split) part;
        List<Integer> drawn = new ArrayList<>();
        for (int i = 0; i < split.parts.size(); i++) {
            if (rendersSomething(split.parts.get(i))) {
                drawn.add(i);
            }
        }
        if (drawn.isEmpty()) {
            return null;
        }
        if (drawn.size() == 1) {
            // A split with one part to show is drawn as that part alone; the saved weights stay as they are.
            return part(parent, split.parts.get(drawn.get(0)));
        }
        SashForm sash = new SashForm(parent, (split.sideBySide ? SWT.HORIZONTAL : SWT.VERTICAL) | SWT.SMOOTH);
        sash.setSashWidth(6);
        sash.setBackground(AreaLook.sashColour(sash.getDisplay()));
        int[] weights = new int[drawn.size()];
        for (int k = 0; k < drawn.size(); k++) {
            part(sash, split.parts.get(drawn.get(k)));
            weights[k] = split.weights.get(drawn.get(k));
        }
        sash.setWeights(weights);
        sashes.put(sash, new Drawn(split, drawn));
        if (split.leadingPixels > 0 && drawn.get(0) == 0) {
            sash.addListener(SWT.Resize, e -> keepLeading(sash, split));
        }
        return sash;
    }

    /**
     * Gives the first part the pixels its split asks for, within the share limit, each time the room changes size;
     * the user's first drag of the sash ends that, and the split keeps whatever the user chose.
     */
    private static void keepLeading(SashForm sash, Split split) {
        for (Control c : sash.getChildren()) {
            if (c instanceof org.eclipse.swt.widgets.Sash bar && bar.getData(USER_DRAG) == null) {
                bar.setData(USER_DRAG, Boolean.TRUE);
                bar.addListener(SWT.Selection, e -> split.leadingPixels = 0);
            }
        }
        int total = split.sideBySide ? sash.getClientArea().width : sash.getClientArea().height;
        if (split.leadingPixels <= 0 || total <= 0) {
            return;
        }
        int[] w = sash.getWeights();
        int sum = java.util.Arrays.stream(w).sum();
        int want = (int) Math.min(split.leadingPixels, Split.LEADING_SHARE_LIMIT * total);
        int now = (int) Math.round((double) w[0] * total / sum);
        if (Math.abs(now - want) > 2) {
            int[] next = new int[w.length];
            next[0] = Math.max(1, want);
            int restOld = sum - w[0];
            for (int k = 1; k < w.length; k++) {
                next[k] = Math.max(1, (int) Math.round((double) w[k] / Math.max(1, restOld) * (total - want)));
            }
            sash.setWeights(next);
        }
    }

    private Control area(Composite parent, TabArea area, boolean enlarged) {
        List<String> visible = area.panels.stream().filter(this::shows).toList();
        if (visible.isEmpty()) {
            return null;
        }
        CTabFolder folder = AreaLook.folder(parent);
        folder.setMaximized(enlarged);
        for (String id : visible) {
            Optional<Control> control = shelf.control(id);
            if (control.isEmpty()) {
                continue;
            }
            CTabItem item = new CTabItem(folder, SWT.CLOSE);
            item.setText(shelf.title(id));
            item.setData(PANEL, id);
            item.setControl(PanelHolder.around(folder, control.get()));
            if (id.equals(area.front)) {
                folder.setSelection(item);
            }
        }
        if (folder.getItemCount() == 0) {
            folder.dispose();
            return null;
        }
        if (folder.getSelection() == null) {
            folder.setSelection(0);
            area.front = (String) folder.getItem(0).getData(PANEL);
        }
        folders.put(folder, area);
        folder.addListener(SWT.Selection, e -> {
            if (e.item != null) {
                area.front = (String) e.item.getData(PANEL);
                actions.changed();
            }
        });
        folder.addCTabFolder2Listener(new CTabFolder2Adapter() {
            @Override
            public void close(CTabFolderEvent e) {
                e.doit = false;
                actions.close((String) e.item.getData(PANEL));
            }

            @Override
            public void maximize(CTabFolderEvent e) {
                toggleEnlarged(frontOf(folder));
            }

            @Override
            public void restore(CTabFolderEvent e) {
                toggleEnlarged(frontOf(folder));
            }
        });
        folder.addListener(SWT.MouseDoubleClick, e -> {
            CTabItem item = folder.getItem(new Point(e.x, e.y));
            if (item != null) {
                toggleEnlarged((String) item.getData(PANEL));
            }
        });
        folder.addListener(SWT.Resize, e -> sizeTabsBehind(folder));
        TabDrag.attach(folder, this);
        return folder;
    }

    /**
     * Gives the panels behind the front tab the room the front one has: a folder sizes only its selected control, and
     * GTK warns about a negative size when the tables and scroll bars of a panel left at no size are drawn.
     */
    private static void sizeTabsBehind(CTabFolder folder) {
        Rectangle room = folder.getClientArea();
        if (room.width <= 0 || room.height <= 0) {
            return;
        }
        for (CTabItem item : folder.getItems()) {
            Control c = item.getControl();
            if (c != null && !c.isDisposed() && item != folder.getSelection() && !c.getBounds().equals(room)) {
                c.setBounds(room);
            }
        }
    }

    private static String frontOf(CTabFolder folder) {
        return (String) folder.getSelection().getData(PANEL);
    }

    /** Stands in for the panels while the window opens, until the first {@link #rebuild()}. */
    void showOpening() {
        if (top != null && !top.isDisposed()) {
            top.dispose();
        }
        Composite box = new Composite(host, SWT.NONE);
        box.setLayout(new GridLayout());
        Label l = new Label(box, SWT.CENTER);
        l.setText("Opening the panels…");
        l.setLayoutData(new GridData(SWT.CENTER, SWT.CENTER, true, true));
        top = box;
        host.layout(true, true);
    }

    private static Control emptyNotice(Composite parent) {
        Composite box = new Composite(parent, SWT.NONE);
        box.setLayout(new GridLayout());
        Label l = new Label(box, SWT.CENTER | SWT.WRAP);
        l.setText("No panel is open. Choose panels from the View menu, or View ▸ Arrangements ▸ Reset to default.");
        l.setLayoutData(new GridData(SWT.CENTER, SWT.CENTER, true, true));
        return box;
    }

    /** Copies the sash positions the user dragged into the arrangement; parts not drawn keep their weights. */
    private void captureWeights() {
        sashes.forEach((sash, drawn) -> {
            if (!sash.isDisposed()) {
                int[] w = sash.getWeights();
                for (int k = 0; k < w.length && k < drawn.parts().size(); k++) {
                    drawn.split().weights.set(drawn.parts().get(k), Math.max(1, w[k]));
                }
            }
        });
    }

    private boolean rendersSomething(Part p) {
        if (p instanceof TabArea a) {
            return a.panels.stream().anyMatch(this::shows);
        }
        return ((Split) p).parts.stream().anyMatch(this::rendersSomething);
    }

    private void describe(Part p, String path, List<String> out) {
        if (p instanceof TabArea a) {
            for (String id : a.panels) {
                if (shows(id)) {
                    out.add(id + " " + path + (id.equals(a.front) ? " front" : ""));
                }
            }
            return;
        }
        Split s = (Split) p;
        for (int i = 0; i < s.parts.size(); i++) {
            describe(s.parts.get(i), path + "/" + i, out);
        }
    }

    static final String PANEL = "lamella.panel";

    /** A split as drawn: which of its parts have a place in the sash form, in order. */
    private record Drawn(Split split, List<Integer> parts) {
    }
}
