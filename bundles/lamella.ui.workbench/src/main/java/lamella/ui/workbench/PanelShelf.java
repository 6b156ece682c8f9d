package lamella.ui.workbench;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;

/**
 * The live panels and the open ones' controls. A panel is opened the first time it is shown, into a hidden parking
 * composite from which the arrangement moves its control into a tab; closing it releases and disposes it. UI
 * thread only.
 */
final class PanelShelf {

    private static final int OPENING_WIDTH = 800;
    private static final int OPENING_HEIGHT = 500;

    private final Map<String, WorkbenchPanel> live = new LinkedHashMap<>();
    private final Map<String, PanelView> open = new LinkedHashMap<>();
    private final Composite parking;
    private final Workbench workbench;
    private final MessageLog messages;

    PanelShelf(Composite parking, Workbench workbench, MessageLog messages) {
        this.parking = parking;
        this.workbench = workbench;
        this.messages = messages;
    }

    void arrived(WorkbenchPanel panel) {
        live.put(panel.id(), panel);
    }

    /** Forgets a panel whose service went away, releasing its controls. */
    void left(String id) {
        live.remove(id);
        release(id);
    }

    boolean isLive(String id) {
        return live.containsKey(id);
    }

    Optional<WorkbenchPanel> panel(String id) {
        return Optional.ofNullable(live.get(id));
    }

    List<WorkbenchPanel> livePanels() {
        return List.copyOf(live.values());
    }

    String title(String id) {
        return live.containsKey(id) ? live.get(id).title() : id;
    }

    /** The panel's control, opened now if needed; empty when the panel failed to open (the reason is logged). */
    Optional<Control> control(String id) {
        PanelView view = open.get(id);
        if (view == null && live.containsKey(id)) {
            try {
                view = live.get(id).open(parking, workbench);
                if (view == null || view.control() == null || view.control().isDisposed()) {
                    throw new IllegalStateException("open() gave no control");
                }
                open.put(id, view);
                // Laid out once at a workable size before it has a place: GTK warns about negative sizes when the
                // tables and scroll bars of a panel still at no size are drawn into a tab.
                view.control().setSize(OPENING_WIDTH, OPENING_HEIGHT);
            } catch (RuntimeException e) {
                messages.error("Panel '" + title(id) + "' could not open", e);
                disposeChildrenOpenedBy(view);
                return Optional.empty();
            }
        }
        return view == null ? Optional.empty() : Optional.of(view.control());
    }

    /** Moves every open control back to the parking composite, before the areas holding them are rebuilt. */
    void park() {
        for (PanelView v : open.values()) {
            if (!v.control().isDisposed() && v.control().getParent() != parking) {
                v.control().setParent(parking);
            }
        }
    }

    void release(String id) {
        PanelView view = open.remove(id);
        if (view == null) {
            return;
        }
        try {
            view.close();
        } catch (RuntimeException e) {
            messages.error("Panel '" + title(id) + "' failed while closing", e);
        }
        if (!view.control().isDisposed()) {
            view.control().dispose();
        }
    }

    void releaseAll() {
        List.copyOf(open.keySet()).forEach(this::release);
    }

    private static void disposeChildrenOpenedBy(PanelView view) {
        if (view != null && view.control() != null && !view.control().isDisposed()) {
            view.control().dispose();
        }
    }
}
