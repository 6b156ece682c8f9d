package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Arrays;
import java.util.List;
import lamella.api.ParameterRef;
import lamella.ui.api.Project;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.FillLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Shell;
import org.junit.jupiter.api.Test;

class StackPanelTest {

    private static final int K_THROUGH = 3;

    @Test
    void typingAConductivityInTheStackTableChangesTheSignalPanelsModel() throws Exception {
        try (PanelHarness h = new PanelHarness(1200, 520)) {
            StackView stack = (StackView) h.open(new StackPanel());
            Shell other = new Shell(h.display);
            other.setLayout(new FillLayout());
            other.setSize(900, 600);
            SignalView signal = (SignalView) new SignalPanel().open(other, h.workbench);
            other.layout(true, true);
            assertTrue(h.pumpUntil(() -> signal.modelValues().length > 0, 20_000), signal.statusText());
            double[] before = signal.modelValues();
            assertEquals("1", stack.table().getItem(1).getText(K_THROUGH).split(" ")[0]);
            h.screenshot("stack");

            assertTrue(stack.commit(1, K_THROUGH, "2.5"));
            assertEquals(2.5, h.workbench.project().model().orElseThrow().value(
                    ParameterRef.layer("film", "k_through_w_mk"), "test"), 1e-12);
            assertTrue(h.pumpUntil(() -> !Arrays.equals(before, signal.modelValues()), 20_000),
                    "the Signal panel's model follows the Stack panel's edit");
            other.dispose();
        }
    }

    @Test
    void badTextIsRefusedWithAMessageAndNothingChanges() throws Exception {
        try (PanelHarness h = new PanelHarness(1200, 520)) {
            StackView stack = (StackView) h.open(new StackPanel());
            String json = h.workbench.project().json();
            assertFalse(stack.commit(1, K_THROUGH, "1,5"));
            assertTrue(stack.statusText().contains("'1,5' is not a number"), stack.statusText());
            assertFalse(stack.commit(1, K_THROUGH, "-2"));
            assertTrue(stack.statusText().contains("positive"), stack.statusText());
            assertEquals(json, h.workbench.project().json(), "nothing was clamped or written");
        }
    }

    @Test
    void removingALayerAsksFirstAndUndoBringsItBackWithItsRoles() throws Exception {
        try (PanelHarness h = new PanelHarness(1200, 520)) {
            StackView stack = (StackView) h.open(new StackPanel());
            Project p = h.workbench.project();
            Button remove = button(h, "Remove layer");
            stack.table().setSelection(1);
            h.workbench.confirmAnswer = false;
            remove.notifyListeners(SWT.Selection, new Event());
            assertEquals(1, h.workbench.questions.size());
            assertTrue(h.workbench.questions.get(0).contains("Remove layer 'film'"), h.workbench.questions.get(0));
            assertTrue(h.workbench.questions.get(0).contains("2 free or uncertain inputs"),
                    h.workbench.questions.get(0));
            assertEquals(3, stack.table().getItemCount(), "not confirmed: nothing removed");

            h.workbench.confirmAnswer = true;
            remove.notifyListeners(SWT.Selection, new Event());
            assertEquals(2, stack.table().getItemCount());
            assertEquals("remove layer 'film'", p.undoName().orElseThrow());
            p.undo();
            assertEquals(3, stack.table().getItemCount());
            assertEquals("film", stack.table().getItem(1).getText(0));
            assertEquals(Project.Role.FREE, p.role(ParameterRef.layer("film", "k_through_w_mk")));
        }
    }

    @Test
    void aColumnShowsTheUnitChosenForItAndTypedUnitsConvert() throws Exception {
        try (PanelHarness h = new PanelHarness(1200, 520)) {
            StackView stack = (StackView) h.open(new StackPanel());
            assertEquals("thickness (nm)", stack.table().getColumn(2).getText());
            assertEquals("G below (MW/(m² K))", stack.table().getColumn(6).getText());
            stack.useUnit(0, DisplayUnit.choices("thickness_m").get(1));
            try {
                assertEquals("thickness (µm)", stack.table().getColumn(2).getText());
                assertTrue(stack.table().getItem(0).getText(2).startsWith("0.085 "),
                        stack.table().getItem(0).getText(2));
                assertTrue(stack.commit(1, 2, "250 nm"), stack.statusText());
                assertEquals(2.5e-7, h.workbench.project().tree().path("stack").path("layers").get(1)
                        .path("thickness_m").asDouble(), 0, "files stay SI, exactly");
                assertTrue(stack.table().getItem(1).getText(2).startsWith("0.25"), stack.table().getItem(1).getText(2));
                for (int c = 0; c < stack.table().getColumnCount(); c++) {
                    org.eclipse.swt.widgets.TableColumn col = stack.table().getColumn(c);
                    org.eclipse.swt.graphics.GC gc = new org.eclipse.swt.graphics.GC(stack.table());
                    try {
                        assertTrue(col.getWidth() >= gc.textExtent(col.getText()).x,
                                "the heading '" + col.getText() + "' is not cut");
                    } finally {
                        gc.dispose();
                    }
                }
            } finally {
                stack.useUnit(0, DisplayUnit.choices("thickness_m").get(0));
            }
        }
    }

    private static Button button(PanelHarness h, String label) {
        java.util.ArrayDeque<org.eclipse.swt.widgets.Control> todo = new java.util.ArrayDeque<>(
                List.of(h.shell.getChildren()));
        while (!todo.isEmpty()) {
            org.eclipse.swt.widgets.Control c = todo.pop();
            if (c instanceof Button b && b.getText().equals(label)) {
                return b;
            }
            if (c instanceof org.eclipse.swt.widgets.Composite k) {
                todo.addAll(List.of(k.getChildren()));
            }
        }
        throw new AssertionError("no button " + label);
    }

    @Test
    void theTableShowsRolesInDisplayUnits() throws Exception {
        try (PanelHarness h = new PanelHarness(1200, 520)) {
            StackView stack = (StackView) h.open(new StackPanel());
            String thickness = stack.table().getItem(0).getText(2);
            assertTrue(thickness.startsWith("85 ") && thickness.endsWith("± 3 %"), thickness);
            assertTrue(stack.table().getItem(1).getText(K_THROUGH).endsWith("free"));
            h.workbench.project().setFixed(ParameterRef.layer("film", "k_through_w_mk"));
            h.pump(50);
            assertEquals("1", stack.table().getItem(1).getText(K_THROUGH));
            assertEquals(Project.Role.FIXED, h.workbench.project().role(ParameterRef.layer("film", "k_through_w_mk")));
        }
    }

    /** The Stack panel's room in the default arrangement at 1280×800. */
    @Test
    void theMaterialChooserOpensInsideItsCellAndLeavesTheLayersNameInView() throws Exception {
        try (PanelHarness h = new PanelHarness(806, 513)) {
            StackView stack = (StackView) h.open(new StackPanel());
            org.eclipse.swt.widgets.Table t = stack.table();
            org.eclipse.swt.graphics.Rectangle name = t.getItem(1).getBounds(0);
            org.eclipse.swt.graphics.Rectangle cell = t.getItem(1).getBounds(1);
            Event click = new Event();
            click.x = cell.x + cell.width / 2;
            click.y = cell.y + cell.height / 2;
            click.button = 1;
            t.notifyListeners(SWT.MouseDown, click);
            h.pump(200);
            org.eclipse.swt.custom.CCombo chooser = Arrays.stream(t.getChildren())
                    .filter(c -> c instanceof org.eclipse.swt.custom.CCombo).map(c -> (org.eclipse.swt.custom.CCombo) c)
                    .findFirst().orElseThrow(() -> new AssertionError("no chooser opened"));
            org.eclipse.swt.graphics.Rectangle at = chooser.getBounds();
            h.screenshot("stack-material-chooser-806x513");
            assertTrue(at.x >= name.x + name.width, "the chooser " + at + " leaves the name cell " + name + " free");
            assertTrue(at.y >= cell.y - 1 && at.y + at.height <= cell.y + cell.height + 1,
                    "the chooser " + at + " stays within its row " + cell);
            assertEquals("film", t.getItem(1).getText(0));
            assertTrue(Arrays.asList(chooser.getItems()).contains("(own values)"), Arrays.toString(chooser.getItems()));
        }
    }
}
