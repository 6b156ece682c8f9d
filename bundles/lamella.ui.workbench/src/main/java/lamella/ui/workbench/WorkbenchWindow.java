package lamella.ui.workbench;

import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.LinkedHashMap;
import java.util.Map;
import lamella.api.CaseFormat;
import lamella.api.ModelCatalog;
import lamella.api.data.DataImporter;
import lamella.api.fit.FitService;
import lamella.api.fit.ReportWriter;
import lamella.api.material.MaterialCatalog;
import lamella.ui.api.BackgroundWork;
import lamella.ui.api.CaseReader;
import lamella.ui.api.Messages;
import lamella.ui.api.Project;
import lamella.ui.api.Task;
import lamella.ui.api.WorkResult;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

/**
 * The window: menus, the arranged areas of panels, the status line; and the {@link Workbench} every panel is given.
 * Created and used on the UI thread; {@link #panelArrived} and {@link #panelLeft} may be called from any thread.
 */
final class WorkbenchWindow implements Workbench {

    private final Display display;
    private final LiveServices services;
    private final MessageLog messages;
    private final ArrangementStore arrangements;
    private final Shell shell;
    private final PanelShelf shelf;
    private final ArrangementView layout;
    private final StatusLine status;
    private final BackgroundTasks tasks;
    private final ProjectSession session;
    private final DataDrop drop;
    private final WindowMenus menus;
    private final Project.Listener projectListener = change -> projectChanged();
    private final Map<String, String> panelProblems = new LinkedHashMap<>();
    /** How long the window waits for the runtime's word that every bundle has started. */
    static final int STARTED_PATIENCE_MS = 30_000;
    private boolean ready;
    private long firstPaintNanos;

    WorkbenchWindow(Display display, LiveServices services, MessageLog messages, UserFolder user, Path home) {
        this.display = display;
        this.services = services;
        this.messages = messages;
        this.arrangements = new ArrangementStore(user, messages);
        messages.deliverOn(display);
        shell = new Shell(display, SWT.SHELL_TRIM);
        GridLayout grid = new GridLayout(1, false);
        grid.marginWidth = 0;
        grid.marginHeight = 0;
        grid.verticalSpacing = 0;
        shell.setLayout(grid);
        Composite host = new Composite(shell, SWT.NONE);
        FillLayout fill = new FillLayout();
        fill.marginWidth = 4;
        fill.marginHeight = 4;
        host.setLayout(fill);
        host.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        status = new StatusLine(shell, () -> tasks().cancelAll());
        Composite parking = new Composite(shell, SWT.NONE);
        GridData parked = new GridData();
        parked.exclude = true;
        parking.setLayoutData(parked);
        parking.setVisible(false);
        shelf = new PanelShelf(parking, this, messages);
        // The standard arrangement until the panels come: the user's is read then (see ready()), since reading JSON
        // is slow the first time in a run and the window waits for nothing but its place.
        layout = new ArrangementView(host, shelf, Arrangement.standard(), new ArrangementView.Actions() {
            @Override
            public void close(String panelId) {
                setShown(panelId, false);
            }

            @Override
            public void changed() {
                // The arrangement is saved when the window closes; nothing else depends on it meanwhile.
            }
        });
        tasks = new BackgroundTasks(display, messages, () -> status.showWork(tasks().summary()));
        session = new ProjectSession(shell, CaseReader.withModels(services.caseFormat()::read, services::catalog),
                user, home, messages, this::projectReplaced);
        drop = new DataDrop(this, user.imports());
        menus = new WindowMenus(this);
        host.addListener(SWT.Paint, e -> {
            if (firstPaintNanos == 0) {
                firstPaintNanos = System.nanoTime();
            }
        });
    }

    /**
     * Opens the window at once with a placeholder where the panels go, then builds the panels live now on the next
     * turn of the event loop (building their views is most of the workbench's first seconds); panels that come later
     * are added as they arrive. Anything queued on the display after this, such as the window control's requests,
     * runs after the panels are in.
     */
    /**
     * Maps the window at once, with "Opening the panels…" where the arrangement goes; the project, the menus and the
     * panels come on a later turn of the event loop, once the runtime says that every bundle has started (the
     * launcher starts them while the window opens). A runtime that never says so gets the project after
     * {@value #STARTED_PATIENCE_MS} ms, with a warning.
     */
    void open() {
        status.showWork("");
        shell.addListener(SWT.Close, e -> e.doit = closing());
        placeWindow();
        layout.showOpening();
        shell.setText("Lamella");
        shell.open();
        services.whenStarted(() -> onUi(() -> display.asyncExec(this::ready)));
        display.timerExec(STARTED_PATIENCE_MS, () -> {
            if (!ready && !shell.isDisposed()) {
                messages.warning("The runtime did not say within " + STARTED_PATIENCE_MS / 1000 + " s that all its"
                        + " bundles had started; the project opens without waiting longer.");
                ready();
            }
        });
    }

    /** The project, the menus and the panels, once every bundle is live. */
    private void ready() {
        if (ready || shell.isDisposed()) {
            return;
        }
        ready = true;
        layout.take(arrangements.last());
        session.openInitial();
        menus.install();
        drop.acceptOn(shell);
        for (WorkbenchPanel p : services.panels()) {
            addPanel(p);
        }
        layout.rebuild();
        session.offerRecovery();
        display.timerExec(ProjectSession.RECOVERY_EVERY_MS, new Runnable() {
            @Override
            public void run() {
                if (!shell.isDisposed()) {
                    session.writeRecovery();
                    display.timerExec(ProjectSession.RECOVERY_EVERY_MS, this);
                }
            }
        });
    }

    boolean closed() {
        return shell.isDisposed();
    }

    long firstPaintNanos() {
        return firstPaintNanos;
    }

    void panelArrived(WorkbenchPanel panel) {
        onUi(() -> {
            if (!ready) {
                return; // ready() adds every panel live by then
            }
            addPanel(panel);
            layout.rebuild();
        });
    }

    void panelLeft(WorkbenchPanel panel) {
        onUi(() -> {
            if (!ready) {
                return;
            }
            if (shelf.panel(panel.id()).filter(p -> p == panel).isPresent()) {
                layout.edit(() -> shelf.left(panel.id()));
            }
        });
    }

    /** Closes the window as the user would (asking about unsaved changes); from any thread. */
    void requestClose() {
        onUi(shell::close);
    }

    // ------------------------------------------------------------------ used by the menus and the control

    ProjectSession session() {
        return session;
    }

    PanelShelf shelf() {
        return shelf;
    }

    ArrangementView layout() {
        return layout;
    }

    ArrangementStore arrangements() {
        return arrangements;
    }

    DataDrop drop() {
        return drop;
    }

    WindowMenus menus() {
        return menus;
    }

    StatusLine status() {
        return status;
    }

    String version() {
        return services.version();
    }

    BackgroundTasks tasks() {
        return tasks;
    }

    void setShown(String panelId, boolean shown) {
        if (shown) {
            show(panelId);
            return;
        }
        layout.edit(() -> {
            layout.arrangement().closed.add(panelId);
            shelf.release(panelId);
        });
    }

    void toggleEnlarged() {
        layout.arrangement().areas().stream().filter(a -> a.front != null && layout.shows(a.front)).findFirst()
                .ifPresent(a -> layout.toggleEnlarged(a.front));
    }

    void resetArrangement() {
        useArrangement(Arrangement.standard());
        messages.info("The arrangement is back to the standard one.");
    }

    void useArrangement(Arrangement a) {
        Rectangle b = shell.getBounds();
        a.x = b.x;
        a.y = b.y;
        a.width = b.width;
        a.height = b.height;
        shelf.livePanels().forEach(p -> a.place(p.id(), p.preferredArea()));
        layout.replace(a);
    }

    // ------------------------------------------------------------------ Workbench

    @Override
    public Display display() {
        return display;
    }

    @Override
    public Shell shell() {
        return shell;
    }

    @Override
    public Project project() {
        return session.project();
    }

    @Override
    public Messages messages() {
        return messages;
    }

    @Override
    public ModelCatalog catalog() {
        return services.catalog();
    }

    @Override
    public CaseFormat caseFormat() {
        return services.caseFormat();
    }

    @Override
    public Optional<FitService> fitter() {
        return services.fitter();
    }

    @Override
    public Optional<ReportWriter> reports() {
        return services.reports();
    }

    @Override
    public Optional<MaterialCatalog> materials() {
        return services.materials();
    }

    @Override
    public List<DataImporter> importers() {
        return services.importers();
    }

    @Override
    public <T> Task start(String label, BackgroundWork<T> work, WorkResult<T> result) {
        return tasks.submit(label, work, result);
    }

    @Override
    public void showProblem(String where, String problem) {
        boolean changed = problem == null ? panelProblems.remove(where) != null
                : !problem.equals(panelProblems.put(where, problem));
        if (changed) {
            projectChanged();
        }
    }

    @Override
    public boolean confirm(String title, String question, String action) {
        return Dialogs.confirm(shell, title, question, action);
    }

    @Override
    public void show(String panelId) {
        if (!shelf.isLive(panelId)) {
            messages.warning("There is no panel '" + panelId + "' (its bundle is not installed or not started).");
            return;
        }
        if (!layout.shows(panelId)) {
            layout.edit(() -> layout.arrangement().closed.remove(panelId));
        }
        layout.bringToFront(panelId);
    }

    // ------------------------------------------------------------------ internals

    private void addPanel(WorkbenchPanel panel) {
        if (shelf.panel(panel.id()).filter(p -> p == panel).isPresent()) {
            return;
        }
        if (shelf.isLive(panel.id())) {
            messages.warning("Two panels have the id '" + panel.id() + "'; the second (" + panel.title()
                    + ") is not shown.");
            return;
        }
        shelf.arrived(panel);
        layout.arrangement().place(panel.id(), panel.preferredArea());
    }

    private boolean closing() {
        if (!ready) {
            // Closed before the project opened: there is nothing to keep but the window's place.
            tasks.shutdown();
            return true;
        }
        session.writeRecovery();
        if (!session.confirmDiscard()) {
            return false;
        }
        session.deleteRecovery();
        Arrangement a = layout.arrangement();
        a.windowMaximised = shell.getMaximized();
        Rectangle b = shell.getBounds();
        a.x = b.x;
        a.y = b.y;
        a.width = b.width;
        a.height = b.height;
        arrangements.saveLast(a);
        session.project().removeListener(projectListener);
        shelf.releaseAll();
        tasks.shutdown();
        return true;
    }

    private void projectReplaced(Project p) {
        p.addListener(projectListener);
        panelProblems.clear();
        // Panels hold listeners on the project they were opened with, so they reopen with the new one.
        if (shell.getMenuBar() != null) {
            layout.edit(shelf::releaseAll);
        }
        projectChanged();
    }

    private void projectChanged() {
        if (!shell.isDisposed()) {
            shell.setText("Lamella — " + session.name() + (session.project().dirty() ? " •" : ""));
            status.showProject(session.project(), panelProblems);
            menus.projectChanged();
        }
    }

    /** The saved bounds if they still fit on a screen, else the whole of the primary screen's work area. */
    private void placeWindow() {
        Rectangle screen = display.getPrimaryMonitor().getClientArea();
        Optional<WindowPlace> place = arrangements.lastPlace();
        Rectangle saved = place.map(p -> new Rectangle(p.x(), p.y(), p.width(), p.height())).orElse(null);
        if (saved != null && saved.width > 200 && saved.height > 150 && screen.intersects(saved)) {
            shell.setBounds(saved.intersection(screen));
            shell.setMaximized(place.get().maximised());
        } else {
            shell.setBounds(screen);
            shell.setMaximized(true);
        }
    }

    private void onUi(Runnable r) {
        if (display.isDisposed()) {
            return;
        }
        if (display.getThread() == Thread.currentThread()) {
            r.run();
        } else {
            display.asyncExec(() -> {
                if (!shell.isDisposed()) {
                    r.run();
                }
            });
        }
    }
}
