package lamella.ui.workbench;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import lamella.ui.api.Project;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.Menu;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Shell;

/**
 * The menu bar: File, Edit, View and Help. Lists that change (panels, recent projects, arrangements) fill on opening;
 * Undo and Redo follow the project's history as it changes, so that their names and keys are always current.
 */
final class WindowMenus {

    private final WorkbenchWindow window;
    private final Shell shell;
    private Menu view;
    private Menu help;
    private MenuItem undo;
    private MenuItem redo;

    WindowMenus(WorkbenchWindow window) {
        this.window = window;
        this.shell = window.shell();
    }

    void install() {
        Menu bar = new Menu(shell, SWT.BAR);
        file(bar);
        edit(bar);
        view = cascade(bar, "&View");
        view.addListener(SWT.Show, e -> fillView());
        fillView();
        help = cascade(bar, "&Help");
        item(help, "&User guide…", SWT.F1, () -> HelpWindow.open(shell, HelpTexts.GUIDE_TITLE,
                "Working with the workbench: stack, set-up, import, datasets, sensitivity, fit, plan, report",
                HelpTexts.GUIDE, 680, 520));
        item(help, "&Keyboard shortcuts…", 0, () -> HelpWindow.open(shell, HelpTexts.KEYS_TITLE,
                HelpTexts.KEYS_TITLE, HelpTexts.KEYS, 560, 320));
        new MenuItem(help, SWT.SEPARATOR);
        item(help, "&Laser and heater safety…", 0, () -> SafetyNotice.open(shell));
        item(help, "&About Lamella", 0, () -> AboutNotice.open(shell, window.version()));
        shell.setMenuBar(bar);
    }

    /** Names Undo and Redo after the edits they would take back or make again, or disables them. */
    void projectChanged() {
        if (undo == null || undo.isDisposed()) {
            return;
        }
        Project p = window.project();
        undo.setText(label("&Undo", p.undoName()) + shortcut(undo.getAccelerator()));
        undo.setEnabled(p.undoName().isPresent());
        redo.setText(label("&Redo", p.redoName()) + shortcut(redo.getAccelerator()));
        redo.setEnabled(p.redoName().isPresent());
    }

    /** The Edit menu's labels as a user reads them, with their state: "Undo remove layer 'film' (enabled)". */
    List<String> editLabels() {
        projectChanged();
        return java.util.Arrays.stream(undo.getParent().getItems()).filter(i -> (i.getStyle() & SWT.SEPARATOR) == 0)
                .map(i -> WidgetFinder.plain(i.getText()) + (i.isEnabled() ? "" : " (disabled)")).toList();
    }

    /** Chooses Undo or Redo as the menu would. */
    void chooseEdit(boolean undoIt) {
        MenuItem i = undoIt ? undo : redo;
        if (i.isEnabled()) {
            i.notifyListeners(SWT.Selection, new Event());
        }
    }

    private static String label(String verb, java.util.Optional<String> name) {
        return verb + name.map(n -> " " + n.replace("&", "&&")).orElse("");
    }

    private void edit(Menu bar) {
        Menu edit = cascade(bar, "&Edit");
        undo = new MenuItem(edit, SWT.PUSH);
        undo.setAccelerator(SWT.MOD1 | 'Z');
        undo.addListener(SWT.Selection, e -> window.project().undo());
        redo = new MenuItem(edit, SWT.PUSH);
        redo.setAccelerator(SWT.MOD1 | SWT.SHIFT | 'Z');
        redo.addListener(SWT.Selection, e -> window.project().redo());
        // Ctrl+Y is the other usual key for redo; a menu item takes one accelerator, so the window listens for it.
        shell.getDisplay().addFilter(SWT.KeyDown, e -> {
            boolean ctrlY = (e.stateMask & SWT.MOD1) != 0 && (e.stateMask & (SWT.SHIFT | SWT.ALT)) == 0
                    && (e.keyCode == 'y' || e.keyCode == 'Y');
            if (ctrlY && !shell.isDisposed() && e.widget instanceof org.eclipse.swt.widgets.Control c
                    && c.getShell() == shell) {
                e.doit = false;
                window.project().redo();
            }
        });
        projectChanged();
    }

    /** The View menu's item for a panel, as a user would find it. */
    MenuItem panelItem(String panelId) {
        fillView();
        for (MenuItem i : view.getItems()) {
            if (panelId.equals(i.getData(ArrangementView.PANEL))) {
                return i;
            }
        }
        throw new IllegalArgumentException("no View menu item for panel '" + panelId + "'");
    }

    List<String> viewLabels() {
        fillView();
        return java.util.Arrays.stream(view.getItems()).filter(i -> (i.getStyle() & SWT.SEPARATOR) == 0)
                .map(i -> ((i.getStyle() & SWT.CHECK) != 0 ? (i.getSelection() ? "[x] " : "[ ] ") : "")
                        + WidgetFinder.plain(i.getText())).toList();
    }

    /** Chooses a Help menu item as a user would. */
    void chooseHelp(String label) {
        for (MenuItem i : help.getItems()) {
            if (i.getText().replace("&", "").startsWith(label)) {
                i.notifyListeners(SWT.Selection, new Event());
                return;
            }
        }
        throw new IllegalArgumentException("no Help menu item '" + label + "'");
    }

    private void file(Menu bar) {
        Menu file = cascade(bar, "&File");
        ProjectSession s = window.session();
        item(file, "&New from case…", SWT.MOD1 | 'N', s::newFromCase);
        item(file, "&Open…", SWT.MOD1 | 'O', s::open);
        Menu recent = new Menu(shell, SWT.DROP_DOWN);
        MenuItem recentItem = new MenuItem(file, SWT.CASCADE);
        recentItem.setText("Open &recent");
        recentItem.setMenu(recent);
        recent.addListener(SWT.Show, e -> {
            clear(recent);
            List<Path> paths = s.recent().paths();
            if (paths.isEmpty()) {
                new MenuItem(recent, SWT.PUSH).setText("(no recent projects)");
                recent.getItems()[0].setEnabled(false);
            }
            for (Path p : paths) {
                item(recent, p.getFileName() + "  —  " + p.getParent(), 0, () -> s.openRecent(p));
            }
        });
        new MenuItem(file, SWT.SEPARATOR);
        item(file, "&Save", SWT.MOD1 | 'S', s::save);
        item(file, "Save &as…", SWT.MOD1 | SWT.SHIFT | 'S', s::saveAs);
        new MenuItem(file, SWT.SEPARATOR);
        item(file, "&Import data…", SWT.MOD1 | 'I', this::importData);
        new MenuItem(file, SWT.SEPARATOR);
        item(file, "&Quit", SWT.MOD1 | 'Q', shell::close);
    }

    private void importData() {
        FileDialog d = new FileDialog(shell, SWT.OPEN | SWT.MULTI);
        d.setText("Import instrument data");
        if (d.open() != null) {
            for (String name : d.getFileNames()) {
                window.drop().importFile(Path.of(d.getFilterPath(), name));
            }
        }
    }

    private void fillView() {
        clear(view);
        List<WorkbenchPanel> panels = window.shelf().livePanels().stream()
                .sorted(Comparator.comparing(WorkbenchPanel::title)).toList();
        for (WorkbenchPanel p : panels) {
            MenuItem i = new MenuItem(view, SWT.CHECK);
            i.setText(p.title());
            i.setData(ArrangementView.PANEL, p.id());
            i.setSelection(window.layout().shows(p.id()));
            i.addListener(SWT.Selection, e -> window.setShown(p.id(), i.getSelection()));
        }
        if (panels.isEmpty()) {
            MenuItem none = new MenuItem(view, SWT.PUSH);
            none.setText("(no panels are installed)");
            none.setEnabled(false);
        }
        new MenuItem(view, SWT.SEPARATOR);
        item(view, window.layout().enlarged() ? "Show all &areas" : "&Enlarge the front area", SWT.MOD1 | 'M',
                window::toggleEnlarged);
        Menu arrangements = new Menu(shell, SWT.DROP_DOWN);
        MenuItem a = new MenuItem(view, SWT.CASCADE);
        a.setText("A&rrangements");
        a.setMenu(arrangements);
        item(arrangements, "&Save as named…", 0, this::saveNamed);
        Menu restore = new Menu(shell, SWT.DROP_DOWN);
        MenuItem r = new MenuItem(arrangements, SWT.CASCADE);
        r.setText("&Restore named");
        r.setMenu(restore);
        List<String> names = window.arrangements().names();
        r.setEnabled(!names.isEmpty());
        for (String n : names) {
            item(restore, n, 0, () -> restoreNamed(n));
        }
        new MenuItem(arrangements, SWT.SEPARATOR);
        item(arrangements, "Reset to &default", 0, window::resetArrangement);
    }

    private void saveNamed() {
        String name = Dialogs.askName(shell, "Save arrangement", "Name of this arrangement:", "");
        if (name != null) {
            window.arrangements().saveNamed(name, window.layout().arrangement());
        }
    }

    private void restoreNamed(String name) {
        try {
            window.useArrangement(window.arrangements().named(name));
            window.messages().info("Restored the arrangement '" + name + "'.");
        } catch (IOException | RuntimeException e) {
            window.messages().error("Could not restore the arrangement '" + name + "'", e);
        }
    }

    private Menu cascade(Menu bar, String text) {
        MenuItem top = new MenuItem(bar, SWT.CASCADE);
        top.setText(text);
        Menu menu = new Menu(shell, SWT.DROP_DOWN);
        top.setMenu(menu);
        return menu;
    }

    private static void item(Menu menu, String text, int accelerator, Runnable action) {
        MenuItem i = new MenuItem(menu, SWT.PUSH);
        i.setText(text + shortcut(accelerator));
        if (accelerator != 0) {
            i.setAccelerator(accelerator);
        }
        i.addListener(SWT.Selection, e -> action.run());
    }

    /**
     * The key beside a menu item's words, as GTK shows it after a tab ("\tCtrl+Shift+S"); empty for none. The menu
     * is where a user learns the keys.
     */
    static String shortcut(int accelerator) {
        if (accelerator == 0) {
            return "";
        }
        StringBuilder sb = new StringBuilder("\t");
        if ((accelerator & SWT.MOD1) != 0) {
            sb.append("Ctrl+");
        }
        if ((accelerator & SWT.SHIFT) != 0) {
            sb.append("Shift+");
        }
        if ((accelerator & SWT.ALT) != 0) {
            sb.append("Alt+");
        }
        int key = accelerator & SWT.KEY_MASK;
        if (key >= SWT.F1 && key <= SWT.F12) {
            sb.append('F').append(key - SWT.F1 + 1);
        } else {
            sb.append(Character.toUpperCase((char) key));
        }
        return sb.toString();
    }

    /** The items of a menu of the bar as shown, the key after a tab: "Save\tCtrl+S". */
    List<String> labels(String menuTitle) {
        for (MenuItem top : shell.getMenuBar().getItems()) {
            if (WidgetFinder.plain(top.getText()).equals(menuTitle) && top.getMenu() != null) {
                if (top.getMenu() == view) {
                    fillView();
                }
                return java.util.Arrays.stream(top.getMenu().getItems())
                        .filter(i -> (i.getStyle() & SWT.SEPARATOR) == 0).map(i -> i.getText().replace("&", ""))
                        .toList();
            }
        }
        throw new IllegalArgumentException("no menu '" + menuTitle + "'");
    }

    private static void clear(Menu menu) {
        for (MenuItem i : menu.getItems()) {
            i.dispose();
        }
    }
}
