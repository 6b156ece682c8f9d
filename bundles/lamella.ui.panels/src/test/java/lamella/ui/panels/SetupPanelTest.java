package lamella.ui.panels;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.List;
import lamella.api.ParameterRef;
import lamella.ui.api.Project;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Event;
import org.eclipse.swt.widgets.Text;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Test;

/** The Set-up panel's fields: the trade's units, typing as one step, lists and ranges, refusals in words. */
class SetupPanelTest {

    @AfterEach
    void unitsAsTheyStart() {
        QuantityField.forgetChosenUnits();
    }

    private static void type(Text t, String... keystrokes) {
        t.setFocus();
        t.notifyListeners(SWT.FocusIn, new Event());
        for (String k : keystrokes) {
            t.setText(k);
        }
    }

    private static void enter(Text t) {
        t.notifyListeners(SWT.DefaultSelection, new Event());
    }

    @Test
    void valuesAreShownInTheTradesUnitsAndTypingIsOneStep() throws Exception {
        try (PanelHarness h = new PanelHarness(900, 760)) {
            SetupView v = (SetupView) h.open(new SetupPanel());
            Project p = h.workbench.project();
            QuantityField modulation = v.field("measurement", "modulation_hz");
            assertEquals("9.8", modulation.text().getText());
            assertEquals("MHz", modulation.unit());
            assertEquals("µm", v.field("geometry", "pump_radius_m").unit());
            assertEquals("10", v.field("geometry", "pump_radius_m").text().getText());

            int steps = p.undoSteps();
            type(modulation.text(), "1", "1.", "1.1");
            assertEquals(1.1e6, p.tree().path("measurement").path("modulation_hz").asDouble(), 1e-6,
                    "taken as typed, in MHz");
            type(modulation.text(), "1.1 M", "1.1 MH", "1100 kHz");
            enter(modulation.text());
            assertEquals(1.1e6, p.tree().path("measurement").path("modulation_hz").asDouble(), 1e-6);
            assertEquals(steps + 1, p.undoSteps(), "the keystrokes of a visit are one step");
            assertEquals("kHz", modulation.unit(), "a unit typed with the number becomes the field's");
            h.screenshot("setup-units");
            p.undo();
            h.pump(50);
            assertEquals(9.8e6, p.tree().path("measurement").path("modulation_hz").asDouble(), 1e-6);
            assertEquals("9800", modulation.text().getText(), "the field follows the undo, in its kHz");
        }
    }

    @Test
    void aFrequencyListIsTypedAsARangeAndReadsBackAsOne() throws Exception {
        try (PanelHarness h = new PanelHarness(900, 760)) {
            SetupView v = (SetupView) h.open(new SetupPanel());
            Project p = h.workbench.project();
            p.switchType("measurement", -1, "fdtr", List.of("frequencies_hz"));
            h.pump(50);
            QuantityField f = v.field("measurement", "frequencies_hz");
            type(f.text(), "1 kHz to 10 MHz, 30 log");
            assertTrue(p.tree().path("measurement").path("frequencies_hz").isMissingNode(),
                    "a list is taken on Enter, not half-typed");
            enter(f.text());
            var list = p.tree().path("measurement").path("frequencies_hz");
            assertEquals(30, list.size());
            assertEquals(1e3, list.get(0).asDouble(), 1e-9);
            assertEquals(1e7, list.get(29).asDouble(), 1e-6);
            assertEquals("1 to 10000 kHz, 30 log", f.text().getText());
            assertTrue(p.problem().isEmpty(), p.problem().map(Throwable::getMessage).orElse(""));
        }
    }

    @Test
    void aValueOfTheWrongKindIsRefusedAndNothingChanges() throws Exception {
        try (PanelHarness h = new PanelHarness(900, 760)) {
            SetupView v = (SetupView) h.open(new SetupPanel());
            Project p = h.workbench.project();
            String before = p.json();
            QuantityField radius = v.field("geometry", "pump_radius_m");
            type(radius.text(), "5 MHz");
            enter(radius.text());
            assertTrue(v.problemText("geometry").contains("'MHz' is not a unit of this value; use nm, µm, mm or m"),
                    v.problemText("geometry"));
            type(radius.text(), "-3");
            enter(radius.text());
            assertTrue(v.problemText("geometry").contains("is not a positive number"), v.problemText("geometry"));
            assertEquals(before, p.json());
            assertEquals(1e-5, p.model().orElseThrow().value(ParameterRef.geometry("pump_radius_m"), "t"), 0);
        }
    }
}
