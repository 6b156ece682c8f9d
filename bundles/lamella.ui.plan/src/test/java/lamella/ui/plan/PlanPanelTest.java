package lamella.ui.plan;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.BooleanSupplier;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.GC;
import org.eclipse.swt.graphics.Image;
import org.eclipse.swt.graphics.ImageData;
import org.eclipse.swt.graphics.ImageLoader;
import org.eclipse.swt.graphics.Point;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.TableItem;
import org.eclipse.swt.widgets.Widget;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/**
 * The Plan panel driven through SWT events on the demo plan case (invented sample): its plan block shown, plans
 * ranked in the background, a run stopped and superseded, a plan written into the case as one undoable step, a
 * design variable added as one; screenshots at 1280 × 800 and 1920 × 1080 in target/screenshots.
 */
class PlanPanelTest {

    static final Path SCREENSHOTS = Path.of("target/screenshots");

    private Display display;
    private Shell shell;
    private TestWorkbench workbench;
    private PlanView view;

    private void open(int width, int height) throws Exception {
        Display current = Display.getCurrent();
        display = current != null ? current : new Display();
        shell = new Shell(display);
        shell.setLayout(new FillLayout());
        shell.setSize(width, height);
        shell.setText("Lamella — Plan");
        workbench = new TestWorkbench(display, shell);
        view = (PlanView) new PlanPanel(workbench.fitter).open(shell, workbench);
        shell.layout(true, true);
        shell.open();
        pump(200);
    }

    @AfterEach
    void close() {
        if (view != null) {
            view.close();
        }
        if (workbench != null) {
            workbench.shutdown();
        }
        if (shell != null) {
            shell.dispose();
        }
    }

    @Test
    void thePlanBlockIsShownAndItsPlansRankedInTheBackground() throws Exception {
        open(1280, 800);
        assertEquals(3, view.targets.getItemCount(), "the fit block's free inputs");
        int checked = 0;
        for (TableItem t : view.targets.getItems()) {
            checked += t.getChecked() ? 1 : 0;
        }
        assertEquals(2, checked, "the plan block's two targets");
        assertEquals(2, view.variables.getItemCount());
        assertEquals("measurement.modulation_hz", view.variables.getItem(0).getText(0));
        assertEquals("1, 2, 4, 9.8, 16 MHz", view.variables.getItem(0).getText(1));
        assertEquals("1, 2", view.variables.getItem(0).getText(2));
        assertEquals("3 to 24 µm, 4 steps in ln", view.variables.getItem(1).getText(1));

        click(view.planButton);
        assertTrue(pumpUntil(() -> view.plans.getItemCount() > 0, 120_000), "plans ranked: " + view.status.getText());
        assertEquals(61, view.plans.getItemCount(), "60 plans and the case as written");
        assertEquals("1", view.plans.getItem(0).getText(0));
        assertEquals("as written", view.plans.getItem(60).getText(0));
        assertEquals("measurement.modulation_hz (MHz)", view.plans.getColumn(1).getText());
        assertNotNull(view.map.chart(), "the objective map is drawn");
        assertEquals("measurement.modulation_hz (MHz)", view.map.chart().getXYPlot().getDomainAxis().getLabel());
        assertTrue(view.status.getText().contains("plans ranked"), view.status.getText());
        screenshot("plan-1280x800");

        // a new run supersedes the running one, and Stop ends it without touching what is shown
        click(view.planButton);
        click(view.planButton);
        assertEquals(1, workbench.stopped.get(), "the first of the two runs was cancelled");
        click(view.stopButton);
        assertTrue(pumpUntil(() -> view.status.getText().startsWith("Stopped"), 10_000), view.status.getText());
        assertEquals(61, view.plans.getItemCount(), "the plans of the run before stay");

        // in a narrow area of the window (a third of 1280 × 800) the plan block goes above the results
        assertEquals(SWT.HORIZONTAL, view.root.getOrientation());
        shell.setSize(460, 760);
        pump(300);
        assertEquals(SWT.VERTICAL, view.root.getOrientation());
        screenshot("plan-narrow-460x760");
    }

    @Test
    void usingAPlanWritesItsValuesAsOneUndoableStep() throws Exception {
        open(1280, 800);
        click(view.planButton);
        assertTrue(pumpUntil(() -> view.plans.getItemCount() > 0, 120_000), view.status.getText());
        int row = -1;
        for (int i = 0; i < view.plans.getItemCount() && row < 0; i++) {
            if (!view.plans.getItem(i).getText(1).contains("+") && view.plans.getItem(i).getText(0).matches("\\d+")) {
                row = i;
            }
        }
        assertTrue(row >= 0, "a ranked plan of one frequency");
        view.plans.setSelection(row);
        view.plans.notifyListeners(SWT.Selection, new Event());
        assertTrue(view.use.isEnabled());
        double f = Double.parseDouble(view.plans.getItem(row).getText(1)) * 1e6;
        double r = Double.parseDouble(view.plans.getItem(row).getText(2)) * 1e-6;
        int steps = workbench.project().undoSteps();
        click(view.use);
        JsonNode doc = workbench.project().tree();
        assertEquals(f, doc.path("measurement").path("modulation_hz").asDouble(), 1e-9 * f);
        assertEquals(r, doc.path("geometry").path("pump_radius_m").asDouble(), 1e-9 * r);
        assertEquals(steps + 1, workbench.project().undoSteps(), "one step");
        pump(100);
        assertTrue(view.status.getText().contains("written into the case"), view.status.getText());
        workbench.project().undo();
        JsonNode back = workbench.project().tree();
        assertEquals(9.8e6, back.path("measurement").path("modulation_hz").asDouble());
        assertEquals(1e-5, back.path("geometry").path("pump_radius_m").asDouble());

        // a joint plan cannot be written into one case: the button says so by being off
        for (int i = 0; i < view.plans.getItemCount(); i++) {
            if (view.plans.getItem(i).getText(1).contains("+")) {
                view.plans.setSelection(i);
                view.plans.notifyListeners(SWT.Selection, new Event());
                assertFalse(view.use.isEnabled(), "a plan of two frequencies together");
                break;
            }
        }
    }

    @Test
    void aDesignVariableIsAddedAsOneStepInTheKeysUnit() throws Exception {
        open(1920, 1080);
        int at = view.key.indexOf("transducer.thickness_m");
        assertTrue(at >= 0, "the transducer's thickness can be varied");
        view.key.select(at);
        view.key.notifyListeners(SWT.Selection, new Event());
        assertEquals("nm", view.fromUnit.getText());
        view.from.setText("60");
        view.to.setText("110");
        view.steps.setSelection(6);
        view.log.setSelection(false);
        view.together.setText("1");
        click(find(view, "Add"));
        JsonNode vary = workbench.project().tree().path("plan").path("vary");
        assertEquals(3, vary.size());
        JsonNode added = vary.get(2);
        assertEquals("transducer", added.path("layer").asText());
        assertEquals("thickness_m", added.path("property").asText());
        assertEquals(6e-8, added.path("min").asDouble(), 1e-20);
        assertEquals(1.1e-7, added.path("max").asDouble(), 1e-20);
        assertEquals(6, added.path("steps").asInt());
        assertEquals("linear", added.path("spacing").asText());
        assertEquals("60 to 110 nm, 6 steps linear", view.variables.getItem(2).getText(1));
        assertEquals("add design variable transducer.thickness_m", workbench.project().undoName().orElse(""));

        view.from.setText("sixty");
        click(find(view, "Add"));
        assertTrue(view.status.getText().contains("'from' takes a number"), view.status.getText());
        assertEquals(3, workbench.project().tree().path("plan").path("vary").size(), "nothing written");
        screenshot("plan-1920x1080-before");
        click(view.planButton);
        assertTrue(pumpUntil(() -> view.plans.getItemCount() > 0, 240_000), view.status.getText());
        screenshot("plan-1920x1080");
        workbench.project().undo();
        assertEquals(2, workbench.project().tree().path("plan").path("vary").size());
    }

    private Button find(PlanView v, String text) {
        Button[] found = new Button[1];
        walk(v.control(), w -> {
            if (w instanceof Button b && text.equals(b.getText())) {
                found[0] = b;
            }
        });
        assertNotNull(found[0], "a button '" + text + "'");
        return found[0];
    }

    private static void walk(org.eclipse.swt.widgets.Control c, java.util.function.Consumer<Widget> visit) {
        visit.accept(c);
        if (c instanceof org.eclipse.swt.widgets.Composite comp) {
            for (org.eclipse.swt.widgets.Control child : comp.getChildren()) {
                walk(child, visit);
            }
        }
    }

    private void click(Button b) {
        b.notifyListeners(SWT.Selection, new Event());
        pump(50);
    }

    private boolean pumpUntil(BooleanSupplier condition, long timeoutMs) {
        long end = System.currentTimeMillis() + timeoutMs;
        while (System.currentTimeMillis() < end) {
            if (condition.getAsBoolean()) {
                return true;
            }
            if (!display.readAndDispatch()) {
                sleep();
            }
        }
        return condition.getAsBoolean();
    }

    private void pump(long ms) {
        long end = System.currentTimeMillis() + ms;
        while (System.currentTimeMillis() < end) {
            if (!display.readAndDispatch()) {
                sleep();
            }
        }
    }

    private static void sleep() {
        try {
            Thread.sleep(2);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private void screenshot(String name) throws Exception {
        pump(400);
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
        loader.save(SCREENSHOTS.resolve(name + ".png").toString(), SWT.IMAGE_PNG);
    }
}
