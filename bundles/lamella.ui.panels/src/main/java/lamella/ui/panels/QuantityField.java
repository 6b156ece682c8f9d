package lamella.ui.panels;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Pattern;
import lamella.api.ParameterSpec;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Text;

/**
 * One value of a case block as a user edits it: its name, a text in the unit chosen beside it (the unit the trade
 * reads, nm or µm, kHz or MHz, ps or ns), and that unit's chooser; files stay SI. A single number is taken as it is
 * typed, each visit to the field one undoable step; a list or a range ({@code 1 kHz to 10 MHz, 30 log}) when Enter
 * is pressed or the field is left. Text that is not a value is refused in words on the block's status line and
 * changes nothing. Lays itself out in three columns of its parent's grid.
 */
final class QuantityField {

    /** What the field hands to the project: the new value (null: none, for the default) and the visit's key. */
    @FunctionalInterface
    interface Commit {
        void value(JsonNode value, Object mergeKey);
    }

    /** The unit chosen for each field, kept for the session: a user who reads delays in ps keeps reading ps. */
    private static final Map<String, DisplayUnit> CHOSEN = new ConcurrentHashMap<>();

    private final ParameterSpec spec;
    private final String memory;
    private final Commit commit;
    private final StatusLine problem;
    private final Label label;
    private final Text text;
    private final Combo units;
    private final List<DisplayUnit> choices;
    private DisplayUnit unit;
    private JsonNode shown;
    /** An SI unit named in a key's description ("… in m", "… in Hz,"). */
    private static final Pattern SI_UNIT_PHRASE = Pattern.compile(
            " in (m|s|Hz|W|K|A|V|ohm|Ω|W/\\(m K\\)|W/\\(m² K\\)|J/\\(m³ K\\))(?=$|[ ,;:)])");

    private Object visit = new Object();
    private boolean showing;

    /**
     * A key's description without the SI unit it names ("the ring's radius in m" → "the ring's radius"): the field
     * shows and reads the unit chosen beside it, so the file's unit would mislead there.
     */
    static String shownUnitless(String description) {
        return SI_UNIT_PHRASE.matcher(description).replaceAll("");
    }

    QuantityField(Composite parent, ParameterSpec spec, String memory, Commit commit, StatusLine problem) {
        this.spec = spec;
        this.memory = memory;
        this.commit = commit;
        this.problem = problem;
        this.choices = DisplayUnit.choices(spec.key());
        this.unit = CHOSEN.getOrDefault(memory, DisplayUnit.of(spec.key(), false));
        label = new Label(parent, SWT.NONE);
        label.setText(Words.key(spec.key()) + (spec.required() ? "" : ", optional") + ":");
        label.setToolTipText(spec.description() + " — case-file key " + spec.key() + " (SI in the file)");
        text = new Text(parent, SWT.BORDER);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        gd.widthHint = list() ? 220 : 120;
        text.setLayoutData(gd);
        text.setToolTipText(shownUnitless(spec.description()) + (list() ? "; a list such as 1, 10, 100 kHz or a range"
                + " such as 1 kHz to 10 MHz, 30 log" : "; a number in the unit beside it, or with its own unit"));
        units = new Combo(parent, SWT.READ_ONLY);
        units.setItems(choices.stream().map(DisplayUnit::unit).toArray(String[]::new));
        units.select(Math.max(0, choices.indexOf(unit)));
        units.setEnabled(choices.size() > 1);
        units.setToolTipText("the unit this field shows and reads; the case file stays in SI");
        units.addListener(SWT.Selection, e -> {
            unit = choices.get(units.getSelectionIndex());
            CHOSEN.put(memory, unit);
            show(shown);
        });
        text.addListener(SWT.FocusIn, e -> visit = new Object());
        text.addListener(SWT.Modify, e -> {
            if (!showing && !list()) {
                take(false);
            }
        });
        text.addListener(SWT.DefaultSelection, e -> take(true));
        text.addListener(SWT.FocusOut, e -> take(true));
    }

    /** Back to the units each field starts with; for tests that must not depend on each other. */
    static void forgetChosenUnits() {
        CHOSEN.clear();
    }

    Text text() {
        return text;
    }

    String unit() {
        return unit.unit();
    }

    /** Shows the block's value; a field being typed in keeps its text unless the value changed under it. */
    void show(JsonNode value) {
        shown = value;
        String now = display(value);
        if (text.isFocusControl() && sameValue(text.getText(), value)) {
            return;
        }
        if (!now.equals(text.getText())) {
            showing = true;
            try {
                text.setText(now);
            } finally {
                showing = false;
            }
        }
        text.setMessage(spec.required() ? spec.constraint().wording() + " (" + unit.unit() + ")"
                : Double.isNaN(spec.defaultValue()) ? "none" : "default "
                + QuantityText.format(spec.defaultValue(), unit) + " " + unit.unit());
    }

    private boolean list() {
        return spec.kind() == ParameterSpec.Kind.NUMBER_LIST;
    }

    private String display(JsonNode v) {
        if (v == null || v.isMissingNode() || v.isNull()) {
            return "";
        }
        if (v.isArray()) {
            double[] x = new double[v.size()];
            for (int i = 0; i < x.length; i++) {
                x[i] = v.get(i).asDouble();
            }
            return QuantityText.formatList(x, unit);
        }
        return v.isNumber() ? QuantityText.format(v.asDouble(), unit) : v.asText();
    }

    private record Parsed(JsonNode value, DisplayUnit unit) {
    }

    private boolean sameValue(String typed, JsonNode value) {
        try {
            JsonNode v = parse(typed).value();
            return v == null ? value == null || value.isMissingNode() : v.equals(value);
        } catch (QuantityText.Refusal e) {
            return false;
        }
    }

    /** The typed text as a case-file value (null for an empty optional field) and the unit it was written in. */
    private Parsed parse(String typed) throws QuantityText.Refusal {
        if (typed.isBlank()) {
            if (spec.required()) {
                throw new QuantityText.Refusal("it is required: " + spec.constraint().wording());
            }
            return new Parsed(null, unit);
        }
        if (list()) {
            double[] x = QuantityText.parseList(typed, spec.key(), unit);
            ArrayNode a = JsonNodeFactory.instance.arrayNode();
            for (double v : x) {
                admit(v);
                a.add(v);
            }
            return new Parsed(a, unit);
        }
        QuantityText.Reading r = QuantityText.parse(typed, spec.key(), unit);
        admit(r.si());
        return new Parsed(JsonNodeFactory.instance.numberNode(r.si()), r.unit());
    }

    private void admit(double v) throws QuantityText.Refusal {
        if (!spec.constraint().admits(v)) {
            throw new QuantityText.Refusal(QuantityText.format(v, unit) + " " + unit.unit() + " is not "
                    + spec.constraint().wording());
        }
    }

    /** Takes the text if it is a value; when finishing (Enter, leaving the field), says why not if it is not. */
    private void take(boolean finishing) {
        if (text.isDisposed() || showing) {
            return;
        }
        Parsed p;
        try {
            p = parse(text.getText());
        } catch (QuantityText.Refusal e) {
            if (finishing) {
                problem.show(Words.key(spec.key()) + ": " + e.getMessage(), StatusLine.Tone.PROBLEM);
            }
            return;
        }
        problem.show("", StatusLine.Tone.PLAIN);
        JsonNode before = shown == null || shown.isMissingNode() ? null : shown;
        if (p.value() == null ? before != null : !p.value().equals(before)) {
            commit.value(p.value(), visit);
        }
        if (finishing) {
            // A unit typed with the number becomes the field's unit, as if chosen beside it.
            if (!p.unit().equals(unit)) {
                unit = p.unit();
                CHOSEN.put(memory, unit);
                units.select(choices.indexOf(unit));
            }
            visit = new Object();
            showing = true;
            try {
                text.setText(display(p.value()));
            } finally {
                showing = false;
            }
        }
    }

    /** For tests and the window's control: the field's words as a user reads them. */
    String reading() {
        return label.getText() + " " + text.getText() + " " + unit.unit();
    }
}
