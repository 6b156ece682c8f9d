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
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.MenuItem;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Text;

/**
 * Drives the open window from another thread with words only (a JDK type crosses the bundle boundary): each
 * command runs on the UI thread, as the user's gesture would, and answers with text. Commands:
 * {@code panels}, {@code placements}, {@code move ID TARGET_ID TABS|LEFT|RIGHT|TOP|BOTTOM}, {@code view-menu},
 * {@code toggle ID}, {@code front ID}, {@code enlarge ID}, {@code safety}, {@code save-as PATH}, {@code status},
 * {@code title}, {@code size W H}, {@code screenshot PATH}, {@code messages}, {@code first-paint-ms},
 * {@code close}. A failure answers {@code error: …}.
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
            case "enlarge":
                window.layout().toggleEnlarged(w[1]);
                return window.layout().enlarged() ? "enlarged" : "restored";
            case "safety":
                return safetyDialogText();
            case "save-as":
                return window.session().saveTo(Path.of(rest(w, 1))) ? "saved" : "error: not saved";
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
            case "close":
                window.shell().close();
                return window.closed() ? "closed" : "still open";
            default:
                return "error: unknown command '" + w[0] + "'";
        }
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
        long until = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(SETTLE_MS);
        while (System.nanoTime() < until) {
            if (!d.readAndDispatch()) {
                sleep();
            }
        }
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
