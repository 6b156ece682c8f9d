package lamella.ui.workbench;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import lamella.api.InputException;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.DatasetSettings;
import lamella.api.data.ImportLimits;
import lamella.conditioning.Conditioner;
import lamella.conditioning.ConditioningOptions;
import lamella.ui.api.Workbench;
import org.eclipse.swt.dnd.DND;
import org.eclipse.swt.dnd.DropTargetAdapter;
import org.eclipse.swt.dnd.DropTargetEvent;
import org.eclipse.swt.dnd.FileTransfer;
import org.eclipse.swt.dnd.Transfer;
import org.eclipse.swt.widgets.Control;

/**
 * Instrument files dropped on the window (or chosen with File ▸ Import data…): the most confident importer reads
 * each one off the UI thread and it is conditioned with the default options; a preview shows the columns, what
 * conditioning did and the dataset's own measurement and geometry settings as the file states them
 * ({@link DatasetSettings}, the same mapping as {@code lamella import}); only on "Add dataset" is it added to the
 * project, with those settings in its own blocks. The normalised CSV waits in the user's folder until the project is
 * saved, when the save copies it beside the case: nothing is written into the case's folder before that. Every file
 * that cannot be taken is reported with the reason.
 */
final class DataDrop {

    /** Made on first use, not as the window opens. */
    private static final class Json {
        static final ObjectMapper MAPPER = new ObjectMapper();
    }

    private final Workbench workbench;
    private final Path staging;

    DataDrop(Workbench workbench, Path staging) {
        this.workbench = workbench;
        this.staging = staging;
    }

    void acceptOn(Control control) {
        org.eclipse.swt.dnd.DropTarget target = new org.eclipse.swt.dnd.DropTarget(control,
                DND.DROP_COPY | DND.DROP_DEFAULT);
        target.setTransfer(new Transfer[] {FileTransfer.getInstance()});
        target.addDropListener(new DropTargetAdapter() {
            @Override
            public void dragEnter(DropTargetEvent e) {
                e.detail = DND.DROP_COPY;
            }

            @Override
            public void drop(DropTargetEvent e) {
                if (e.data instanceof String[] files) {
                    for (String f : files) {
                        importFile(Path.of(f));
                    }
                }
            }
        });
    }

    void importFile(Path file) {
        List<DataImporter> importers = workbench.importers();
        if (importers.isEmpty()) {
            workbench.messages().warning("Cannot import " + file.getFileName() + ": no data importer is live"
                    + " (is the importers feature installed?).");
            return;
        }
        workbench.background("Importing " + file.getFileName(), progress -> read(file, importers),
                this::preview);
    }

    private static ImportPreview.Read read(Path file, List<DataImporter> importers) throws IOException,
            InputException {
        if (!Files.isRegularFile(file)) {
            throw new IOException(file + " is not a file");
        }
        byte[] head = lamella.api.data.TextLines.head(file);
        DataImporter best = importers.stream()
                .max(Comparator.comparingDouble(i -> i.confidence(file, head))).orElseThrow();
        if (best.confidence(file, head) <= 0) {
            throw new IOException("no live importer reads " + file.getFileName() + " (live: "
                    + String.join(", ", importers.stream().map(DataImporter::id).toList()) + ")");
        }
        Dataset data = best.read(file);
        return new ImportPreview.Read(data, Conditioner.condition(data, ConditioningOptions.defaults()), best);
    }

    private void preview(ImportPreview.Read read) {
        ObjectNode doc = workbench.project().tree();
        DatasetSettings.Context context = new DatasetSettings.Context(workbench.catalog().techniques(),
                workbench.catalog().geometries(), map(doc.get("measurement")), map(doc.get("geometry")));
        Optional<DatasetSettings> chosen = ImportPreview.ask(workbench.shell(), read, context);
        if (chosen.isEmpty()) {
            workbench.messages().info("Import of " + read.data().source().getFileName() + " cancelled.");
            return;
        }
        add(read, chosen.get());
    }

    private void add(ImportPreview.Read read, DatasetSettings settings) {
        Path source = read.data().source();
        Path target;
        try {
            // A folder of its own per import keeps the file's own name, which the save's copy beside the case takes.
            Path folder = Files.createDirectories(staging.resolve(UUID.randomUUID().toString()));
            target = folder.resolve(stem(source) + ".csv");
            AtomicFile.write(target, NormalisedCsv.of(read.table()));
        } catch (IOException e) {
            workbench.messages().error("Could not keep the imported data of " + source.getFileName()
                    + " until the project is saved (in " + staging + ")", e);
            return;
        }
        workbench.project().addDataset(target, null, node(settings.measurement()), node(settings.geometry()));
        int number = workbench.project().datasets().size() - 1;
        String own = settings.settings().stream()
                .filter(s -> s.origin() == DatasetSettings.Origin.FILE && !s.block().isEmpty())
                .map(s -> ImportPreview.words(s.key()) + " " + (s.value() instanceof Double d
                        ? Readable.of(s.key(), d) : String.valueOf(s.value())))
                .reduce((a, b) -> a + ", " + b).orElse("none");
        workbench.messages().info("Imported " + source + " as dataset " + number + " (" + read.table().rows()
                + " rows; from the file: " + own + "); the data are written beside the case when the project is"
                + " saved.");
    }

    @SuppressWarnings("unchecked")
    private static Map<String, Object> map(JsonNode block) {
        return block instanceof ObjectNode o ? Json.MAPPER.convertValue(o, Map.class) : null;
    }

    private static ObjectNode node(Optional<Map<String, Object>> block) {
        return block.map(b -> (ObjectNode) Json.MAPPER.valueToTree(b)).orElse(null);
    }

    private static String stem(Path file) {
        String n = file.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }
}
