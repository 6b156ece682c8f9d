package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.ParameterRef;
import lamella.ui.api.Project;
import org.eclipse.swt.SWT;
import org.eclipse.swt.graphics.Rectangle;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Text;
import org.junit.jupiter.api.Test;

/**
 * The case keys of several samples, depths of heating and reading, and named gains, as the Stack, Set-up and
 * Datasets panels edit them: each edit one undoable step, bad input refused in words, and the saved case read back
 * by the headless readers (the case reader, and the fit block's through the fitter).
 */
class SamplesAndGainsPanelTest {

    private static final Path SERIES = Path.of("../../demo-data/thickness-series");
    private static final ObjectMapper JSON = new ObjectMapper();

    private static void type(Text t, String text) {
        t.setFocus();
        t.notifyListeners(SWT.FocusIn, new Event());
        t.setText(text);
    }

    private static void enter(Text t) {
        t.notifyListeners(SWT.DefaultSelection, new Event());
    }

    private static void choose(Combo c, String item) {
        c.select(List.of(c.getItems()).indexOf(item));
        c.notifyListeners(SWT.Selection, new Event());
    }

    /** Inside the shell's client area: a control a person can see without scrolling. */
    private static void inView(PanelHarness h, Control c) {
        Rectangle at = h.display.map(c.getParent(), h.shell, c.getBounds());
        Rectangle room = h.shell.getClientArea();
        assertTrue(c.isVisible() && at.x >= 0 && at.y >= 0 && at.x + at.width <= room.width
                && at.y + at.height <= room.height, c + " at " + at + " within " + room);
    }

    @Test
    void theTopLayersDepthsAreTypedInNmClearedByBlankAndRefusedWhenNotPositive() throws Exception {
        try (PanelHarness h = new PanelHarness(806, 513)) {
            StackView stack = (StackView) h.open(new StackPanel());
            Project p = h.workbench.project();
            Text absorption = stack.depth("absorption_depth_m");
            inView(h, absorption);
            assertEquals("", absorption.getText(), "the demo's transducer is heated at its surface");
            int steps = p.undoSteps();
            type(absorption, "1");
            absorption.setText("12");
            enter(absorption);
            assertEquals(1.2e-8, p.tree().path("stack").path("layers").get(0).path("absorption_depth_m").asDouble(),
                    0, "nm, SI in the file");
            assertEquals(steps + 1, p.undoSteps(), "the keystrokes of a visit are one step");
            assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());

            String before = p.json();
            type(absorption, "-3");
            enter(absorption);
            assertTrue(stack.statusText().contains("absorption depth (nm): -3 is not allowed; a depth is positive"),
                    stack.statusText());
            assertEquals(before, p.json(), "nothing clamped or written");

            ParameterRef ref = ParameterRef.layer("transducer", "absorption_depth_m");
            type(absorption, "12");
            p.setFree(ref, Double.NaN, Double.NaN);
            h.pump(50);
            type(absorption, "");
            enter(absorption);
            assertTrue(stack.statusText().contains("a free or uncertain depth needs a value"), stack.statusText());
            p.setFixed(ref);
            h.pump(50);
            type(absorption, "");
            enter(absorption);
            assertFalse(p.tree().path("stack").path("layers").get(0).has("absorption_depth_m"),
                    "blank removes the key");
        }
    }

    @Test
    void aSecondSampleIsAddedByNameAndASampleDatasetsNameIsNotRemoved() throws Exception {
        try (PanelHarness h = new PanelHarness(806, 513)) {
            StackView stack = (StackView) h.open(new StackPanel());
            Project p = h.workbench.project();
            inView(h, stack.sampleName());
            assertFalse(stack.sampleCombo().isEnabled(), "one stack: nothing to choose");
            stack.sampleName().setText("sample[1]");
            stack.addSample();
            assertTrue(stack.statusText().contains("holds no '[', ']'"), stack.statusText());
            assertEquals(List.of(), p.sampleNames());

            stack.sampleName().setText("annealed");
            stack.addSample();
            assertEquals(List.of(Project.FIRST_SAMPLE, "annealed"), p.sampleNames());
            assertEquals("annealed", stack.sampleCombo().getText());
            assertTrue(stack.sampleCombo().isEnabled());
            assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());
            h.screenshot("stack-two-samples-806x513");

            stack.sampleName().setText(Project.FIRST_SAMPLE);
            stack.renameSample();
            assertTrue(stack.statusText().contains("already used"), stack.statusText());

            choose(stack.sampleCombo(), Project.FIRST_SAMPLE);
            h.pump(50);
            stack.removeSample();
            assertTrue(stack.statusText().contains("datasets 0, 1, 2 were measured on it"), stack.statusText());
            assertEquals(2, p.sampleNames().size());

            h.workbench.confirmAnswer = true;
            choose(stack.sampleCombo(), "annealed");
            h.pump(50);
            stack.removeSample();
            assertEquals(List.of(Project.FIRST_SAMPLE), p.sampleNames());
            assertTrue(h.workbench.questions.get(h.workbench.questions.size() - 1)
                    .contains("Remove sample 'annealed'"));
        }
    }

    /** A copy of the thickness series whose first dataset is an amplitude, which a gain may multiply. */
    private static Path seriesWithAnAmplitude(Path dir) throws Exception {
        for (String f : List.of("fdtr-sn-25.csv", "fdtr-sn-75.csv", "fdtr-sn-200.csv")) {
            Files.copy(SERIES.resolve(f), dir.resolve(f));
        }
        // Invented numbers for a round trip of the case file, not a measurement and not fitted here.
        Files.writeString(dir.resolve("amplitude.csv"), "frequency_hz,amplitude_k_per_w\n1000,40\n10000,30\n"
                + "100000,20\n");
        ObjectNode c = (ObjectNode) JSON.readTree(SERIES.resolve("case.json").toFile());
        ObjectNode first = (ObjectNode) c.path("fit").path("datasets").get(0);
        first.put("data", "amplitude.csv");
        first.put("signal", "amplitude_k_per_w");
        Path file = dir.resolve("case.json");
        Files.writeString(file, JSON.writeValueAsString(c));
        return file;
    }

    @Test
    void aGainIsAddedFreedAndNamedByADatasetAndTheSavedCaseReadsBack() throws Exception {
        Path dir = Files.createTempDirectory("lamella-gains");
        try (PanelHarness h = new PanelHarness(900, 760, seriesWithAnAmplitude(dir))) {
            SetupView setup = (SetupView) h.open(new SetupPanel());
            Project p = h.workbench.project();
            GainsEditor gains = setup.gains();
            inView(h, gains.name());
            gains.name().setText("detector");
            gains.value().setText("0");
            gains.add();
            assertTrue(gains.statusText().contains("gain value: 0 is outside the range; a gain is a factor from"
                    + " 1e-12 to 1e12"), gains.statusText());
            assertTrue(p.gains().isEmpty());

            gains.value().setText("1.5");
            gains.add();
            assertEquals(1.5, p.gains().get("detector"), 0);
            assertEquals(Project.Role.FIXED, p.role(ParameterRef.gain("detector")));
            assertTrue(gains.statusText().contains("let a dataset name it"), gains.statusText());
            gains.name().setText("detector");
            gains.add();
            assertTrue(gains.statusText().contains("already used by a gain"), gains.statusText());

            gains.role().select(1);
            gains.apply();
            assertEquals(Project.Role.FREE, p.role(ParameterRef.gain("detector")));
            assertEquals("free", gains.table().getItem(0).getText(2));
            h.screenshot("setup-gains-900x760");

            org.eclipse.swt.widgets.Shell other = new org.eclipse.swt.widgets.Shell(h.display);
            other.setLayout(new org.eclipse.swt.layout.FillLayout());
            other.setSize(1000, 700);
            DatasetsView datasets = (DatasetsView) new DatasetsPanel().open(other, h.workbench);
            other.open();
            h.pump(100);
            assertTrue(datasets.sample().isVisible(), "several samples: the dataset's sample is chosen");
            assertEquals("SN-25", datasets.sample().getText());
            int steps = p.undoSteps();
            choose(datasets.gain(), "detector");
            assertEquals(steps + 1, p.undoSteps());
            assertEquals("detector", p.datasets().get(0).path("gain").asText());
            assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());
            datasets.select(1);
            h.pump(50);
            assertFalse(datasets.gain().isEnabled(), "a phase carries no gain: none is offered");
            assertEquals("SN-75", datasets.sample().getText());
            datasets.select(0);
            h.pump(50);

            gains.select(0);
            gains.name().setText("lock-in");
            gains.rename();
            assertEquals("lock-in", p.datasets().get(0).path("gain").asText(), "the dataset follows the rename");
            assertEquals(Project.Role.FREE, p.role(ParameterRef.gain("lock-in")));
            h.pump(50);
            assertEquals("lock-in", datasets.gain().getText());

            Path saved = dir.resolve("saved.json");
            p.save(saved);
            CaseDocument back = h.workbench.caseFormat().read(saved);
            assertEquals(List.of("SN-25", "SN-75", "SN-200"), back.sampleNames());
            Block fit = (Block) back.root().get("fit");
            assertEquals(1.5, ((Number) ((Block) fit.get("gains")).get("lock-in")).doubleValue(), 0);
            // The fit block as the headless fit reads it: gains, the dataset's gain and sample, the free gain.
            assertEquals("amplitude_k_per_w", h.workbench.fitter().orElseThrow().sensitivity(back, 0, null)
                    .signal(), "the fit block reads back: a gain no dataset names, or one named but missing, throws");
            JsonNode written = JSON.readTree(saved.toFile());
            assertEquals("lock-in", written.path("fit").path("free").get(2).path("gain").asText());

            h.workbench.confirmAnswer = true;
            gains.select(0);
            gains.remove();
            assertTrue(p.gains().isEmpty());
            assertFalse(p.datasets().get(0).has("gain"));
            assertFalse(p.tree().path("fit").has("gains"), "no empty gains object is left");
            assertEquals(Project.Role.FIXED, p.role(ParameterRef.gain("lock-in")));
            p.undo();
            assertEquals("lock-in", p.datasets().get(0).path("gain").asText(), "undo brings the gain back");
            other.dispose();
        }
    }

    @Test
    void layersAboveTheHeatedPlaneAreAddedEditedMovedAndRemovedWithTheirTop() throws Exception {
        try (PanelHarness h = new PanelHarness(806, 513)) {
            StackView stack = (StackView) h.open(new StackPanel());
            Project p = h.workbench.project();
            assertFalse(stack.topCombo().isEnabled(), "no layers above: no top to choose");
            stack.addLayerAbove();
            assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());
            assertTrue(p.model().orElseThrow().stack().heatsBothWays());
            assertEquals(4, stack.table().getItemCount());
            assertEquals("↑ above 1", stack.table().getItem(0).getText(0));
            assertEquals("transducer ◂ heated", stack.table().getItem(1).getText(0));
            assertTrue(stack.table().getItem(0).getText(2).startsWith("semi-infinite"),
                    "the first layer above is a half-space for the default top");
            assertTrue(stack.topCombo().isEnabled());
            assertEquals("semi-infinite", stack.topCombo().getText());

            assertTrue(stack.commit(0, 3, "0.2"), stack.statusText());
            assertEquals(0.2, p.tree().path("stack").path("above").get(0).path("k_through_w_mk").asDouble(), 0,
                    "a value typed in an above row goes to stack.above");
            stack.addLayerAbove();
            assertEquals("above 2", p.tree().path("stack").path("above").get(0).path("name").asText(),
                    "a new layer above goes next to the plane");
            assertEquals("↑ above 2", stack.table().getItem(1).getText(0), "drawn just above the plane");
            assertTrue(stack.commit(1, 6, "80"), stack.statusText());
            assertEquals(8e7, p.tree().path("stack").path("above").get(0).path("conductance_below_w_m2k")
                    .asDouble(), 0, "G of the interface toward the heated plane, in MW/(m² K)");
            p.setFree(ParameterRef.layer("above 1", "k_through_w_mk"), Double.NaN, Double.NaN);
            h.pump(50);
            assertTrue(stack.table().getItem(0).getText(3).endsWith("free"), stack.table().getItem(0).getText(3));
            assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());
            h.screenshot("stack-above-806x513");

            choose(stack.topCombo(), "isothermal");
            assertEquals("isothermal", p.tree().path("stack").path("top").asText());
            assertTrue(p.problem().isPresent(), "an isothermal top needs the outermost layer's thickness");
            assertTrue(stack.commit(0, 2, "2000"), stack.statusText());
            assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());

            stack.table().setSelection(1);
            button(h, "Move up").notifyListeners(SWT.Selection, new Event());
            assertEquals("above 2", p.tree().path("stack").path("above").get(1).path("name").asText(),
                    "up in the drawing is away from the plane");
            button(h, "Move up").notifyListeners(SWT.Selection, new Event());
            assertEquals(2, p.tree().path("stack").path("above").size(), "a layer stays on its side of the plane");
            stack.table().setSelection(1);
            button(h, "Move down").notifyListeners(SWT.Selection, new Event());
            assertEquals("above 1", p.tree().path("stack").path("above").get(0).path("name").asText(),
                    "the layer next to the plane does not cross it");
            assertEquals(3, p.tree().path("stack").path("layers").size());

            h.workbench.confirmAnswer = true;
            for (int k = 0; k < 2; k++) {
                stack.table().setSelection(0);
                button(h, "Remove layer").notifyListeners(SWT.Selection, new Event());
            }
            assertFalse(p.tree().path("stack").has("above"));
            assertFalse(p.tree().path("stack").has("top"), "the top goes with the last layer above");
            assertEquals(Project.Role.FIXED, p.role(ParameterRef.layer("above 1", "k_through_w_mk")));
            assertFalse(p.problem().isPresent(), () -> p.problem().orElseThrow().getMessage());
            assertEquals(3, stack.table().getItemCount());
        }
    }

    private static org.eclipse.swt.widgets.Button button(PanelHarness h, String label) {
        java.util.ArrayDeque<Control> todo = new java.util.ArrayDeque<>(List.of(h.shell.getChildren()));
        while (!todo.isEmpty()) {
            Control c = todo.pop();
            if (c instanceof org.eclipse.swt.widgets.Button b && b.getText().equals(label)) {
                return b;
            }
            if (c instanceof org.eclipse.swt.widgets.Composite k) {
                todo.addAll(List.of(k.getChildren()));
            }
        }
        throw new AssertionError("no button " + label);
    }
}
