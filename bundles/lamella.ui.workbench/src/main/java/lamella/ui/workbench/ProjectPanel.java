package lamella.ui.workbench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import lamella.ui.api.Area;
import lamella.ui.api.PanelView;
import lamella.ui.api.Project;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;
import org.eclipse.swt.widgets.TableItem;
import org.osgi.service.component.annotations.Component;

/**
 * The project's files at a glance: the case file, its folder, every dataset's data file (found or missing) and the
 * settings it has of its own (its measurement and geometry blocks, as an import took them from the file).
 */
@Component(service = WorkbenchPanel.class)
public final class ProjectPanel implements WorkbenchPanel {

    @Override
    public String id() {
        return "project";
    }

    @Override
    public String title() {
        return "Project";
    }

    @Override
    public Area preferredArea() {
        return Area.RIGHT;
    }

    private static final int COLUMN_PADDING = 8;
    private static final int WIDEST_COLUMN = 420;

    @Override
    public PanelView open(Composite parent, Workbench workbench) {
        Table table = new Table(parent, SWT.FULL_SELECTION | SWT.SINGLE | SWT.V_SCROLL | SWT.H_SCROLL);
        // A workable size until the first layout: GTK warns about scroll bars drawn at no size.
        table.setSize(400, 160);
        table.setHeaderVisible(true);
        table.setLinesVisible(true);
        for (String heading : List.of("Item", "File", "State", "Own settings")) {
            new TableColumn(table, SWT.LEFT).setText(heading);
        }
        Project project = workbench.project();
        Project.Listener refresh = change -> fill(table, project);
        project.addListener(refresh);
        fill(table, project);
        return new PanelView() {
            @Override
            public Control control() {
                return table;
            }

            @Override
            public void close() {
                project.removeListener(refresh);
            }
        };
    }

    private static void fill(Table table, Project p) {
        if (table.isDisposed()) {
            return;
        }
        table.removeAll();
        row(table, "Case file", p.file().map(f -> f.getFileName().toString()).orElse("untitled"),
                p.dirty() ? "unsaved changes" : p.file().isPresent() ? "saved" : "not saved yet");
        row(table, "Folder", p.folder().toString(), Files.isDirectory(p.folder()) ? "found" : "missing");
        List<?> datasets = p.datasets();
        for (int i = 0; i < datasets.size(); i++) {
            Path data = p.dataFile(i);
            String signal = p.datasets().get(i).path("signal").asText("");
            row(table, "Dataset " + i + (signal.isEmpty() ? "" : " (" + signal + ")"), shortName(p, data),
                    Files.isRegularFile(data) ? "found" : "missing", ownSettings(p.datasets().get(i)));
        }
        if (datasets.isEmpty()) {
            row(table, "Datasets", "none yet: drop a data file on the window", "");
        }
        row(table, "Last fit", p.lastFit().isEmpty() ? "none" : p.lastFitCurrent()
                ? (p.fittedValuesInUse() ? "its values are in the case" : "belongs to the case")
                : "out of date (edited since)", p.lastFit().isEmpty() ? "" : p.dirty() ? "not saved yet" : "saved");
        // Every column as wide as its words (a long folder's path up to a limit); the table scrolls sideways.
        for (TableColumn c : table.getColumns()) {
            c.pack();
            c.setWidth(Math.min(c.getWidth() + COLUMN_PADDING, WIDEST_COLUMN));
        }
    }

    /** Data inside the project's folder by its relative path, which is how the case file names it. */
    private static String shortName(Project p, Path data) {
        return data.startsWith(p.folder()) ? p.folder().relativize(data).toString() : data.toString();
    }

    private static void row(Table t, String item, String file, String state) {
        row(t, item, file, state, "");
    }

    private static void row(Table t, String item, String file, String state, String settings) {
        new TableItem(t, SWT.NONE).setText(new String[] {item, file, state, settings});
    }

    /** "measurement tdtr: modulation 9 MHz, repetition 76 MHz; geometry: the case's". */
    static String ownSettings(ObjectNode dataset) {
        List<String> parts = new ArrayList<>();
        for (String block : List.of("measurement", "geometry")) {
            JsonNode b = dataset.get(block);
            if (!(b instanceof ObjectNode o)) {
                parts.add(block + ": the case's");
                continue;
            }
            List<String> values = new ArrayList<>();
            o.fields().forEachRemaining(e -> {
                if (e.getValue().isNumber()) {
                    values.add(ImportPreview.words(e.getKey()) + " " + Readable.of(e.getKey(),
                            e.getValue().asDouble()));
                } else if (e.getValue().isArray()) {
                    values.add(ImportPreview.words(e.getKey()) + " " + e.getValue().size() + " values");
                }
            });
            parts.add(block + " " + o.path("type").asText("?") + (values.isEmpty() ? "" : ": "
                    + String.join(", ", values)));
        }
        return String.join("; ", parts);
    }
}
