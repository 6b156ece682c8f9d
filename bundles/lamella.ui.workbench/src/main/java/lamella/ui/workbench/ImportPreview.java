package lamella.ui.workbench;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import lamella.api.Technique;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.DatasetSettings;
import lamella.api.data.StatedSettings;
import lamella.conditioning.ConditionedTable;
import org.eclipse.swt.SWT;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Combo;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Shell;

/**
 * What an import will add, shown before it is added: the file and the importer that read it, the columns
 * recognised with their units and range, what conditioning did, every setting of the dataset's own blocks with
 * where it comes from (the file's header, the case, the user's choice), what the header says besides, and what
 * still keeps the dataset out. The user may choose the technique; the dataset is added only with "Add dataset".
 */
final class ImportPreview {

    static final String TITLE = "Import data";
    static final String ADD = "Add dataset";

    /** A file read and conditioned, waiting for the user's word. */
    record Read(Dataset data, ConditionedTable table, DataImporter importer) {
    }

    private final Shell dialog;
    private final Read read;
    private final DatasetSettings.Context context;
    private final StatedSettings stated;
    private final Composite settingsBox;
    private final Label problems;
    private final Button add;
    private String chosenTechnique;
    private DatasetSettings settings;
    private DatasetSettings accepted;

    private ImportPreview(Shell parent, Read read, DatasetSettings.Context context) {
        this.read = read;
        this.context = context;
        this.stated = StatedSettings.of(read.data());
        dialog = new Shell(parent, SWT.DIALOG_TRIM | SWT.APPLICATION_MODAL | SWT.RESIZE);
        dialog.setText(TITLE + " — " + read.data().source().getFileName());
        GridLayout layout = new GridLayout(1, false);
        layout.marginWidth = 14;
        layout.marginHeight = 12;
        layout.verticalSpacing = 10;
        dialog.setLayout(layout);

        wrapped(dialog, read.data().source() + "\nread as '" + read.importer().id() + "' (" + read.importer()
                .summary() + ")");
        Group columns = group(dialog, "Columns recognised", 1);
        for (String line : columnLines(read)) {
            wrapped(columns, line);
        }
        Group technique = group(dialog, "Technique of the dataset", 2);
        techniqueChooser(technique);
        Group settingsGroup = group(dialog, "Settings of the dataset", 1);
        settingsBox = new Composite(settingsGroup, SWT.NONE);
        GridLayout grid = new GridLayout(3, false);
        grid.marginWidth = 0;
        grid.horizontalSpacing = 14;
        settingsBox.setLayout(grid);
        settingsBox.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        if (!stated.other().isEmpty() || !stated.unreadable().isEmpty()) {
            Group header = group(dialog, "Also in the header", 1);
            wrapped(header, String.join(" · ", stated.other().entrySet().stream()
                    .map(e -> e.getKey() + ": " + e.getValue()).toList()));
        }
        problems = wrapped(dialog, "");
        problems.setForeground(dialog.getDisplay().getSystemColor(SWT.COLOR_DARK_RED));
        Composite buttons = new Composite(dialog, SWT.NONE);
        buttons.setLayout(new GridLayout(2, true));
        buttons.setLayoutData(new GridData(SWT.END, SWT.CENTER, true, false));
        add = new Button(buttons, SWT.PUSH);
        add.setText(ADD);
        add.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        Button cancel = new Button(buttons, SWT.PUSH);
        cancel.setText("Cancel");
        cancel.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        add.addListener(SWT.Selection, e -> {
            if (settings.problems().isEmpty()) {
                accepted = settings;
                dialog.close();
            }
        });
        cancel.addListener(SWT.Selection, e -> dialog.close());
        refresh();
    }

    /**
     * Shows the preview and waits for the user; the settings to add the dataset with, or empty when cancelled.
     */
    static Optional<DatasetSettings> ask(Shell parent, Read read, DatasetSettings.Context context) {
        ImportPreview p = new ImportPreview(parent, read, context);
        p.dialog.pack();
        org.eclipse.swt.graphics.Point size = p.dialog.getSize();
        org.eclipse.swt.graphics.Rectangle over = parent.getBounds();
        p.dialog.setSize(Math.min(size.x, over.width), Math.min(size.y, over.height));
        Dialogs.centre(p.dialog, parent);
        p.dialog.open();
        while (!p.dialog.isDisposed()) {
            if (!p.dialog.getDisplay().readAndDispatch()) {
                p.dialog.getDisplay().sleep();
            }
        }
        return Optional.ofNullable(p.accepted);
    }

    private void techniqueChooser(Group g) {
        List<String> types = context.techniques().stream()
                .filter(t -> t.xColumn().filter(read.data().xColumn()::equals).isPresent())
                .map(Technique::type).sorted().toList();
        Label l = new Label(g, SWT.NONE);
        l.setText("Technique:");
        Combo combo = new Combo(g, SWT.READ_ONLY | SWT.DROP_DOWN);
        List<String> items = new ArrayList<>();
        items.add("as the file or case says");
        items.addAll(types);
        combo.setItems(items.toArray(String[]::new));
        combo.select(0);
        combo.addListener(SWT.Selection, e -> {
            chosenTechnique = combo.getSelectionIndex() <= 0 ? null : combo.getText();
            refresh();
            dialog.layout(true, true);
            dialog.setSize(dialog.computeSize(dialog.getSize().x, SWT.DEFAULT));
        });
    }

    private void refresh() {
        settings = DatasetSettings.of(stated, read.data().xColumn(), context,
                new DatasetSettings.Choices(chosenTechnique, Map.of()));
        for (Control c : settingsBox.getChildren()) {
            c.dispose();
        }
        for (DatasetSettings.Setting s : settings.settings()) {
            cell(s.block().isEmpty() ? s.key() : s.block() + " · " + words(s.key()));
            cell(value(s));
            cell(s.origin().words() + (s.note().isEmpty() ? "" : "; " + s.note()));
        }
        if (settings.measurement().isEmpty() && settings.geometry().isEmpty() && settings.problems().isEmpty()) {
            Label l = new Label(settingsBox, SWT.WRAP);
            l.setText("The dataset takes the case's measurement and geometry as they are.");
            l.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false, 3, 1));
        }
        List<String> words = new ArrayList<>();
        settings.notes().forEach(n -> words.add("Note: " + n + "."));
        settings.problems().forEach(p -> words.add("Cannot add yet: " + p + "."));
        problems.setText(String.join("\n", words));
        add.setEnabled(settings.problems().isEmpty());
        settingsBox.layout(true, true);
    }

    private void cell(String text) {
        Label l = new Label(settingsBox, SWT.NONE);
        l.setText(text);
    }

    private static String value(DatasetSettings.Setting s) {
        if (s.value() == null) {
            return "—";
        }
        if (s.value() instanceof Double d) {
            return Readable.of(s.key(), d);
        }
        if (s.value() instanceof List<?> list) {
            return list.size() + " values";
        }
        return s.value().toString();
    }

    /** "modulation_hz" → "modulation", "pump_radius_m" → "pump radius"; "type" is the technique or geometry. */
    static String words(String key) {
        if (key.equals("type")) {
            return "type";
        }
        String unit = lamella.api.Units.ofKey(key);
        String k = key;
        for (String suffix : List.of("_hz", "_m", "_s", "_w", "_k", "_deg")) {
            if (!unit.isEmpty() && k.endsWith(suffix)) {
                k = k.substring(0, k.length() - suffix.length());
                break;
            }
        }
        return k.replace('_', ' ');
    }

    /** The x column, the signals, what conditioning did: each as a line. */
    static List<String> columnLines(Read read) {
        ConditionedTable t = read.table();
        Dataset d = read.data();
        List<String> out = new ArrayList<>();
        double[] x = t.x();
        String xName = d.xColumn().equals(lamella.api.data.SignalNames.DELAY_S) ? "delay" : "frequency";
        out.add("x: " + xName + " (" + d.xColumn() + "), " + Readable.of(d.xColumn(), x[0]) + " to "
                + Readable.of(d.xColumn(), x[x.length - 1]) + ", " + t.rows() + " rows");
        List<String> signals = new ArrayList<>();
        for (String s : t.signals().keySet()) {
            boolean inFile = d.signalColumns().contains(s);
            String unit = s.equals("phase_deg") ? "°" : s.equals("ratio") ? "no unit"
                    : d.metadata().containsKey("signal_unit") ? "V" : "as recorded";
            signals.add(s + " (" + unit + (t.sigmas().containsKey(s) ? ", with σ" : ", no σ")
                    + (inFile ? "" : ", computed") + ")");
        }
        out.add("signals: " + String.join(", ", signals));
        out.add("conditioning: " + String.join("; ", t.report().lines()));
        return out;
    }

    private static Group group(Composite parent, String title, int columns) {
        Group g = new Group(parent, SWT.NONE);
        g.setText(title);
        g.setLayout(new GridLayout(columns, false));
        g.setLayoutData(new GridData(SWT.FILL, SWT.TOP, true, false));
        return g;
    }

    private static Label wrapped(Composite parent, String text) {
        Label l = new Label(parent, SWT.WRAP);
        l.setText(text);
        GridData gd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        gd.widthHint = 620;
        l.setLayoutData(gd);
        return l;
    }
}
