package lamella.ui.panels;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.BooleanSupplier;
import lamella.ui.api.PanelView;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

/** A display, a shell per panel, the event loop pumped until a condition holds, and screenshots under target/. */
final class PanelHarness implements AutoCloseable {

    static final Path SCREENSHOTS = Path.of("target/screenshots");

    final Display display;
    final Shell shell;
    final FakeWorkbench workbench;

    PanelHarness(int width, int height) throws Exception {
        this(width, height, FakeWorkbench.DEMO);
    }

    PanelHarness(int width, int height, Path caseFile) throws Exception {
        Display current = Display.getCurrent();
        display = current != null ? current : new Display();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(width, height);
        workbench = new FakeWorkbench(display, shell, caseFile);
    }

    PanelView open(WorkbenchPanel panel) {
        shell.setText("Lamella — " + panel.title());
        PanelView v = panel.open(shell, workbench);
        shell.layout(true, true);
        shell.open();
        pump(200);
        return v;
    }

    /** Runs the event loop until the condition holds; false on timeout. */
    boolean pumpUntil(BooleanSupplier condition, long timeoutMs) {
        long end = System.currentTimeMillis() + timeoutMs;
        while (System.currentTimeMillis() < end) {
            if (condition.getAsBoolean()) {
                return true;
            }
            if (!display.readAndDispatch()) {
                sleepBriefly();
            }
        }
        return condition.getAsBoolean();
    }

    void pump(long ms) {
        long end = System.currentTimeMillis() + ms;
        while (System.currentTimeMillis() < end) {
            if (!display.readAndDispatch()) {
                sleepBriefly();
            }
        }
    }

    private static void sleepBriefly() {
        try {
            Thread.sleep(2);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    Path screenshot(String name) throws Exception {
        pump(300);
        Files.createDirectories(SCREENSHOTS);
        Point size = shell.getSize();
        Image img = new Image(display, size.x, size.y);
        GC gc = new GC(shell);
        try {
            gc.copyArea(img, 0, 0);
        } finally {
            gc.dispose();
        }
        ImageData data = img.getImageData();
        img.dispose();
        ImageLoader loader = new ImageLoader();
        loader.data = new ImageData[] {data};
        Path file = SCREENSHOTS.resolve(name + ".png");
        loader.save(file.toString(), SWT.IMAGE_PNG);
        return file;
    }

    @Override
    public void close() {
        workbench.shutdown();
        shell.dispose();
    }
}
