package lamella.ui.workbench;

import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Function;
import java.util.stream.Collectors;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Text;

/**
 * Drives the open window from another thread with words only (a JDK type crosses the bundle boundary): each
 * command runs on the UI thread, as the user's gesture would, and answers with text. Commands:
 * {@code panels}, {@code placements}, {@code move ID TARGET_ID TABS|LEFT|RIGHT|TOP|BOTTOM}, {@code view-menu},
 * {@code toggle ID}, {@code front ID}, {@code enlarge ID},
 * {@code area-size ID wide|high PIXELS} (the sash beside its area dragged to give it that width or height; answers
 * whether the panel is shown and its tables' heights), {@code safety}, {@code help ITEM}, {@code save-as PATH}, {@code status},
 * {@code title}, {@code size W H}, {@code screenshot PATH}, {@code messages}, {@code first-paint-ms},
 * {@code open PATH} (as File ▸ Recent with that file), {@code import PATH} (as File ▸ Import data… with that file chosen, without waiting for its preview),
 * {@code close}; the Edit menu: {@code edit-menu}, {@code undo}, {@code redo}; keys pressed as on the keyboard:
 * {@code key ctrl+shift+z}; controls found by what they show: {@code press LABEL} (without waiting, so that a dialog
 * it opens can be answered), {@code dialog}, {@code dialog-press LABEL}, {@code table HEADING},
 * {@code table-select HEADING | ROW}, {@code cell-click HEADING | ROW | COLUMN} (a click into a table's cell, as
 * the mouse gives it), {@code editor-choose TEXT} (the item of an open cell chooser that starts with TEXT),
 * {@code search PANEL_ID | TEXT} (typed into the panel's search field), {@code texts PANEL_ID} (its labels),
 * {@code menu TITLE} (its items as shown, a key after a tab), {@code cut PANEL_ID} (what it shows cut short where it is now, see {@link CutTexts}; {@code cut status}: each label of the status line, then cut or whole), {@code choose GROUP | VALUE}, {@code field GROUP | LABEL | TEXT}. A failure
 * answers {@code error: …}.
 */
final class WindowControl implements Function<String, String> {

    private static final long SETTLE_MS = 400;

    private final WorkbenchWindow window;
    private final long startedNanos;

    WindowControl(WorkbenchWindow window, long startedNanos) {
        this.window = window;
        this.startedNanos = startedNanos;
    }

    @Override
    public String apply(String command) {
        Display d = window.display();
        if (d.isDisposed()) {
            return "error: the window is closed";
        }
        AtomicReference<String> answer = new AtomicReference<>();
        d.syncExec(() -> {
            try {
                answer.set(run(command.strip().split("\\s+")));
            } catch (RuntimeException e) {
                answer.set("error: " + e);
            }
        });
        return answer.get() == null ? "error: the window closed before answering" : answer.get();
    }

    private String run(String[] w) {
        switch (w[0]) {
            case "panels":
                return window.shelf().livePanels().stream().map(p -> p.id()).collect(Collectors.joining("\n"));
            case "placements":
                return String.join("\n", window.layout().placements());
            case "move":
                return window.layout().move(w[1], w[2], Zone.valueOf(w[3])) ? "moved" : "unchanged";
            case "view-menu":
                return String.join("\n", window.menus().viewLabels());
            case "toggle":
                MenuItem item = window.menus().panelItem(w[1]);
                item.setSelection(!item.getSelection());
                item.notifyListeners(SWT.Selection, null);
                return item.getSelection() ? "shown" : "hidden";
            case "front":
                window.show(w[1]);
                return "ok";
            case "area-size":
                return areaSize(w[1], w[2].equals("wide"), Integer.parseInt(w[3]));
            case "enlarge":
                window.layout().toggleEnlarged(w[1]);
                return window.layout().enlarged() ? "enlarged" : "restored";
            case "safety":
                return safetyDialogText();
            case "help":
                return helpText(rest(w, 1));
            case "save-as":
                return window.session().saveTo(Path.of(rest(w, 1))) ? "saved" : "error: not saved";
            case "open":
                Path opened = Path.of(rest(w, 1)).toAbsolutePath().normalize();
                window.session().openRecent(opened);
                return window.project().file().filter(opened::equals).isPresent() ? "opened" : "error: not opened";
            case "import":
                window.drop().importFile(Path.of(rest(w, 1)));
                return "importing";
            case "status":
                return window.status().text();
            case "title":
                return window.shell().getText();
            case "size":
                window.shell().setSize(Integer.parseInt(w[1]), Integer.parseInt(w[2]));
                window.shell().layout(true, true);
                return "ok";
            case "screenshot":
                return screenshot(Path.of(rest(w, 1)));
            case "messages":
                return window.messages().all().stream().map(m -> m.level() + " " + m.text())
                        .collect(Collectors.joining("\n"));
            case "first-paint-ms":
                long painted = window.firstPaintNanos();
                return painted == 0 ? "not painted" : Long.toString(TimeUnit.NANOSECONDS.toMillis(painted
                        - startedNanos));
            case "edit-menu":
                return String.join("\n", window.menus().editLabels());
            case "undo":
            case "redo":
                window.menus().chooseEdit(w[0].equals("undo"));
                return window.menus().editLabels().get(0);
            case "key":
                return keys(w[1]);
            case "press":
                return press(rest(w, 1));
            case "dialog":
                return WidgetFinder.dialog(window.shell()).map(WindowControl::describe).orElse("none");
            case "dialog-press":
                return dialogPress(rest(w, 1));
            case "table":
                return table(rest(w, 1));
            case "table-select":
                return tableSelect(parts(w));
            case "choose":
                return choose(parts(w));
            case "field":
                return field(parts(w));
            case "search":
                return search(parts(w));
            case "cell-click":
                return cellClick(parts(w));
            case "editor-choose":
                return editorChoose(rest(w, 1));
            case "texts":
                return texts(w[1]);
            case "menu":
                return String.join("\n", window.menus().labels(rest(w, 1)));
            case "cut":
                return cut(w[1]);
            case "fields":
                return fields(rest(w, 1));
            case "close":
                window.shell().close();
                return window.closed() ? "closed" : "still open";
            default:
                return "error: unknown command '" + w[0] + "'";
        }
    }

    /** Presses keys through the system's input queue, as the keyboard would: {@code ctrl+z}, {@code ctrl+shift+z}. */
    private String keys(String chord) {
        Display d = window.display();
        Shell shell = window.shell();
        // Without a window manager the keyboard follows the pointer: bring both to the window first.
        org.eclipse.swt.widgets.Event move = new org.eclipse.swt.widgets.Event();
        move.type = SWT.MouseMove;
        Rectangle b = shell.getBounds();
        move.x = b.x + b.width / 2;
        move.y = b.y + b.height / 2;
        d.post(move);
        shell.forceActive();
        // Keys go to the control with the focus; one hidden behind another tab hears nothing, as a user would
        // first click into the window.
        Control focus = d.getFocusControl();
        if (focus == null || !focus.isVisible() || focus.getShell() != shell) {
            shell.setFocus();
        }
        settle(150);
        List<String> parts = List.of(chord.toLowerCase(java.util.Locale.ROOT).split("\\+"));
        List<Integer> modifiers = new java.util.ArrayList<>();
        for (String m : parts.subList(0, parts.size() - 1)) {
            modifiers.add(switch (m) {
                case "ctrl" -> SWT.CTRL;
                case "shift" -> SWT.SHIFT;
                case "alt" -> SWT.ALT;
                default -> throw new IllegalArgumentException("unknown modifier '" + m + "'");
            });
        }
        char key = parts.get(parts.size() - 1).charAt(0);
        for (int m : modifiers) {
            post(d, SWT.KeyDown, m, '\0');
        }
        post(d, SWT.KeyDown, 0, key);
        post(d, SWT.KeyUp, 0, key);
        for (int i = modifiers.size() - 1; i >= 0; i--) {
            post(d, SWT.KeyUp, modifiers.get(i), '\0');
        }
        settle(300);
        return "pressed " + chord;
    }

    private static void post(Display d, int type, int keyCode, char character) {
        org.eclipse.swt.widgets.Event e = new org.eclipse.swt.widgets.Event();
        e.type = type;
        e.keyCode = keyCode != 0 ? keyCode : character;
        e.character = character;
        if (!d.post(e)) {
            throw new IllegalStateException("the display refused a posted key event");
        }
    }

    private String press(String label) {
        Shell target = WidgetFinder.dialog(window.shell()).orElse(window.shell());
        Button b = WidgetFinder.button(target, label).filter(Button::isEnabled)
                .orElseThrow(() -> new IllegalArgumentException("no enabled button '" + label + "' in view"));
        window.display().asyncExec(() -> {
            if (!b.isDisposed()) {
                b.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
            }
        });
        return "pressed";
    }

    private String dialogPress(String label) {
        Shell dialog = WidgetFinder.dialog(window.shell())
                .orElseThrow(() -> new IllegalStateException("no dialog is open"));
        Button b = WidgetFinder.button(dialog, label)
                .orElseThrow(() -> new IllegalArgumentException("no button '" + label + "' in " + describe(dialog)));
        b.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
        settle(100);
        return "pressed";
    }

    private static String describe(Shell dialog) {
        return dialog.getText() + ": " + WidgetFinder.visible(dialog).stream()
                .map(c -> c instanceof Label l ? l.getText() : c instanceof Button b ? "[" + b.getText() + "]" : "")
                .filter(t -> !t.isEmpty()).collect(Collectors.joining(" "));
    }

    private String table(String heading) {
        Table t = WidgetFinder.tableWithColumn(window.shell(), heading)
                .orElseThrow(() -> new IllegalArgumentException("no table with a column '" + heading + "' in view"));
        List<String> rows = new java.util.ArrayList<>();
        rows.add(Arrays.stream(t.getColumns()).map(TableColumn::getText).collect(Collectors.joining("\t")));
        for (TableItem item : t.getItems()) {
            List<String> cells = new java.util.ArrayList<>();
            for (int c = 0; c < t.getColumnCount(); c++) {
                cells.add(item.getText(c));
            }
            rows.add(String.join("\t", cells));
        }
        return String.join("\n", rows);
    }

    private String tableSelect(List<String> args) {
        Table t = WidgetFinder.tableWithColumn(window.shell(), args.get(0))
                .orElseThrow(() -> new IllegalArgumentException("no table with a column '" + args.get(0) + "'"));
        int row = Integer.parseInt(args.get(1));
        t.setSelection(row);
        t.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
        return "selected " + t.getItem(row).getText(0);
    }

    /** Drags the sash beside a panel's area to give it this width or height; answers what it had and what it has. */
    private String areaSize(String id, boolean wide, int pixels) {
        Control panel = window.shelf().control(id)
                .orElseThrow(() -> new IllegalArgumentException("no panel '" + id + "'"));
        int had = window.layout().resizeArea(id, wide, pixels);
        if (had < 0) {
            throw new IllegalArgumentException("no " + (wide ? "side-by-side" : "stacked") + " split holds '" + id + "'");
        }
        settle(SETTLE_MS);
        org.eclipse.swt.graphics.Point room = panel.getParent().getSize();
        if (!panel.getVisible()) {
            return "had " + had + "; room " + room.x + "x" + room.y + "; panel hidden";
        }
        String tables = WidgetFinder.visible((org.eclipse.swt.widgets.Composite) panel).stream()
                .filter(c -> c instanceof Table).map(c -> String.valueOf(c.getSize().y))
                .collect(Collectors.joining(","));
        return "had " + had + "; room " + room.x + "x" + room.y + "; panel shown; table heights " + tables;
    }

    private String choose(List<String> args) {
        Group g = WidgetFinder.group(window.shell(), args.get(0))
                .orElseThrow(() -> new IllegalArgumentException("no group '" + args.get(0) + "' in view"));
        Combo c = WidgetFinder.first(g, Combo.class, x -> true)
                .orElseThrow(() -> new IllegalArgumentException("no chooser in '" + args.get(0) + "'"));
        int i = Arrays.asList(c.getItems()).indexOf(args.get(1));
        if (i < 0) {
            throw new IllegalArgumentException("'" + args.get(1) + "' is not among " + Arrays.toString(c.getItems()));
        }
        c.select(i);
        c.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
        settle(100);
        return "chosen " + c.getText();
    }

    /** Types into the field after the label that starts with the given words, and presses Enter. */
    private String field(List<String> args) {
        Group g = WidgetFinder.group(window.shell(), args.get(0))
                .orElseThrow(() -> new IllegalArgumentException("no group '" + args.get(0) + "' in view"));
        List<Control> controls = WidgetFinder.visible(g);
        for (int i = 0; i < controls.size() - 1; i++) {
            if (controls.get(i) instanceof Label l && l.getText().startsWith(args.get(1))
                    && controls.get(i + 1) instanceof Text t) {
                t.setFocus();
                t.setText(args.get(2));
                t.notifyListeners(SWT.DefaultSelection, new org.eclipse.swt.widgets.Event());
                settle(100);
                return t.getText();
            }
        }
        throw new IllegalArgumentException("no field '" + args.get(1) + "' in '" + args.get(0) + "'");
    }

    private String search(List<String> args) {
        Control c = window.shelf().control(args.get(0))
                .orElseThrow(() -> new IllegalArgumentException("no panel '" + args.get(0) + "'"));
        Text t = WidgetFinder.first((org.eclipse.swt.widgets.Composite) c, Text.class,
                x -> (x.getStyle() & SWT.SEARCH) != 0)
                .orElseThrow(() -> new IllegalArgumentException("no search field in '" + args.get(0) + "'"));
        t.setText(args.size() > 1 ? args.get(1) : "");
        settle(100);
        return t.getText();
    }

    /** A mouse press in the middle of a table cell, as the user's click delivers it to the table's listeners. */
    private String cellClick(List<String> args) {
        Table t = WidgetFinder.tableWithColumn(window.shell(), args.get(0))
                .orElseThrow(() -> new IllegalArgumentException("no table with a column '" + args.get(0) + "'"));
        int row = Integer.parseInt(args.get(1));
        int column = Arrays.asList(t.getColumns()).stream().map(TableColumn::getText).toList().indexOf(args.get(2));
        if (column < 0) {
            throw new IllegalArgumentException("no column '" + args.get(2) + "'");
        }
        Rectangle cell = t.getItem(row).getBounds(column);
        org.eclipse.swt.widgets.Event e = new org.eclipse.swt.widgets.Event();
        e.x = cell.x + cell.width / 2;
        e.y = cell.y + cell.height / 2;
        e.button = 1;
        t.notifyListeners(SWT.MouseDown, e);
        settle(100);
        return "clicked " + t.getItem(row).getText(column);
    }

    /** Chooses in the chooser a table cell opened for editing, by the start of the item's text. */
    private String editorChoose(String start) {
        org.eclipse.swt.custom.CCombo c = WidgetFinder.first(window.shell(), org.eclipse.swt.custom.CCombo.class,
                        x -> x.getParent() instanceof Table)
                .orElseThrow(() -> new IllegalStateException("no cell chooser is open"));
        List<String> items = Arrays.asList(c.getItems());
        int i = -1;
        for (int k = 0; k < items.size() && i < 0; k++) {
            if (items.get(k).startsWith(start)) {
                i = k;
            }
        }
        if (i < 0) {
            throw new IllegalArgumentException("'" + start + "' starts none of " + items);
        }
        c.select(i);
        String chosen = c.getText();
        c.notifyListeners(SWT.Selection, new org.eclipse.swt.widgets.Event());
        settle(100);
        return "chosen " + chosen;
    }

    /** The texts a panel shows in labels (its status lines, headings), one a line; the panel is opened if needed. */
    private String texts(String panelId) {
        Control c = window.shelf().control(panelId)
                .orElseThrow(() -> new IllegalArgumentException("no panel '" + panelId + "'"));
        if (!(c instanceof org.eclipse.swt.widgets.Composite root)) {
            return c instanceof Label l ? l.getText() : "";
        }
        return WidgetFinder.visible(root).stream().filter(x -> x instanceof Label).map(x -> ((Label) x).getText())
                .filter(t -> !t.isEmpty()).collect(Collectors.joining("\n"));
    }

    private String cut(String panelId) {
        if (panelId.equals("status")) {
            return Arrays.stream(window.status().bar().getChildren()).filter(c -> c instanceof Label)
                    .map(c -> ((Label) c).getText() + (CutTexts.isCut(c) ? "\tcut" : "\twhole"))
                    .collect(Collectors.joining("\n"));
        }
        Control c = window.shelf().control(panelId)
                .orElseThrow(() -> new IllegalArgumentException("no panel '" + panelId + "'"));
        return c instanceof org.eclipse.swt.widgets.Composite root ? String.join("\n", CutTexts.in(root)) : "";
    }

    /** Each labelled field of a group as "label text = value". */
    private String fields(String title) {
        Group g = WidgetFinder.group(window.shell(), title)
                .orElseThrow(() -> new IllegalArgumentException("no group '" + title + "' in view"));
        List<Control> controls = WidgetFinder.visible(g);
        List<String> out = new java.util.ArrayList<>();
        for (int i = 0; i < controls.size() - 1; i++) {
            if (controls.get(i) instanceof Label l && controls.get(i + 1) instanceof Text t) {
                String unit = i + 2 < controls.size() && controls.get(i + 2) instanceof Combo c ? " " + c.getText()
                        : "";
                out.add(l.getText() + " = " + t.getText() + unit);
            }
        }
        return String.join("\n", out);
    }

    private void settle(long ms) {
        Display d = window.display();
        long until = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(ms);
        while (System.nanoTime() < until) {
            if (!d.readAndDispatch()) {
                sleep();
            }
        }
    }

    private static List<String> parts(String[] w) {
        return Arrays.stream(rest(w, 1).split("\\s*\\|\\s*")).toList();
    }

    /** Opens a Help menu item as a user would, reads its window's texts, and closes it again. */
    private String helpText(String item) {
        window.menus().chooseHelp(item);
        Shell s = WidgetFinder.dialog(window.shell())
                .orElseThrow(() -> new IllegalStateException("Help ▸ " + item + " opened no window"));
        String text = s.getText() + "\n" + WidgetFinder.visible(s).stream()
                .map(c -> c instanceof Text t ? t.getText() : c instanceof Label l ? l.getText() : "")
                .filter(x -> !x.isEmpty()).collect(Collectors.joining("\n"));
        s.close();
        return text;
    }

    /** Opens the safety notice through the Help menu, reads what it says, and closes it again. */
    private String safetyDialogText() {
        window.menus().chooseHelp("Laser and heater safety");
        for (Shell s : window.shell().getShells()) {
            if (SafetyNotice.TITLE.equals(s.getText())) {
                String text = Arrays.stream(s.getChildren()).filter(c -> c instanceof Text)
                        .map(c -> ((Text) c).getText()).collect(Collectors.joining("\n"));
                s.close();
                return text;
            }
        }
        return "error: the safety notice did not open";
    }

    /**
     * The window as it is on screen, as PNG. Events are served for a moment first: the X server resizes and
     * repaints the window asynchronously, and a capture taken at once can show it half done.
     */
    private String screenshot(Path file) {
        Display d = window.display();
        Shell shell = window.shell();
        shell.layout(true, true);
        settle(SETTLE_MS);
        Rectangle b = shell.getBounds();
        Image image = new Image(d, b.width, b.height);
        GC gc = new GC(d);
        try {
            gc.copyArea(image, b.x, b.y);
            ImageData data = image.getImageData();
            ImageLoader loader = new ImageLoader();
            loader.data = new ImageData[] {data};
            file.toAbsolutePath().getParent().toFile().mkdirs();
            loader.save(file.toString(), SWT.IMAGE_PNG);
        } finally {
            gc.dispose();
            image.dispose();
        }
        return file.toString();
    }

    private static void sleep() {
        try {
            Thread.sleep(10);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private static String rest(String[] w, int from) {
        return String.join(" ", List.of(w).subList(from, w.length));
    }
}
