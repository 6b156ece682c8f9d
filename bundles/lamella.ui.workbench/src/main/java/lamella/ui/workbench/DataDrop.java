package lamella.ui.workbench;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.List;
import java.util.Optional;
import lamella.api.InputException;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.ImportLimits;
import lamella.conditioning.ConditionedTable;
import lamella.conditioning.Conditioner;
import lamella.conditioning.ConditioningOptions;
import lamella.ui.api.Workbench;
import org.eclipse.swt.SWT;
import org.eclipse.swt.dnd.DND;
import org.eclipse.swt.dnd.DropTargetAdapter;
import org.eclipse.swt.dnd.DropTargetEvent;
import org.eclipse.swt.dnd.FileTransfer;
import org.eclipse.swt.dnd.Transfer;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.DirectoryDialog;

/**
 * Instrument files dropped on the window (or chosen with File ▸ Import data…): the most confident importer reads
 * each one off the UI thread, it is conditioned with the default options, written as normalised CSV next to the
 * project and added to the project's datasets. Every file that cannot be taken is reported with the reason.
 */
final class DataDrop {

    private final Workbench workbench;

    DataDrop(Workbench workbench) {
        this.workbench = workbench;
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
                this::addToProject);
    }

    private static ConditionedTable read(Path file, List<DataImporter> importers) throws IOException,
            InputException {
        if (!Files.isRegularFile(file)) {
            throw new IOException(file + " is not a file");
        }
        byte[] head;
        try (InputStream in = Files.newInputStream(file)) {
            head = in.readNBytes(ImportLimits.HEAD_BYTES);
        }
        DataImporter best = importers.stream()
                .max(Comparator.comparingDouble(i -> i.confidence(file, head))).orElseThrow();
        if (best.confidence(file, head) <= 0) {
            throw new IOException("no live importer reads " + file.getFileName() + " (live: "
                    + String.join(", ", importers.stream().map(DataImporter::id).toList()) + ")");
        }
        Dataset data = best.read(file);
        return Conditioner.condition(data, ConditioningOptions.defaults());
    }

    private void addToProject(ConditionedTable table) {
        Path source = table.source();
        Optional<Path> folder = workbench.project().file().map(Path::getParent).or(this::askFolder);
        if (folder.isEmpty()) {
            workbench.messages().warning("Import of " + source.getFileName() + " cancelled: the project has no"
                    + " folder yet and none was chosen.");
            return;
        }
        Path target = freeName(folder.get(), stem(source) + ".csv", source);
        try {
            AtomicFile.write(target, NormalisedCsv.of(table));
        } catch (IOException e) {
            workbench.messages().error("Could not write the imported data to " + target, e);
            return;
        }
        workbench.project().addDataset(target, null, null, null);
        workbench.messages().info("Imported " + source + " as " + target.getFileName() + " (" + table.rows()
                + " rows; " + String.join("; ", table.report().notes()) + ").");
    }

    private Optional<Path> askFolder() {
        DirectoryDialog d = new DirectoryDialog(workbench.shell(), SWT.NONE);
        d.setText("Where should the imported data go?");
        d.setMessage("The project is untitled; choose the folder for the normalised CSV files.");
        return Optional.ofNullable(d.open()).map(Path::of);
    }

    /** The name next to the project, numbered if taken, and never the dropped file itself. */
    private static Path freeName(Path folder, String name, Path source) {
        Path p = folder.resolve(name);
        String base = name.substring(0, name.length() - ".csv".length());
        for (int i = 1; Files.exists(p) || p.toAbsolutePath().equals(source.toAbsolutePath()); i++) {
            p = folder.resolve(base + "-" + i + ".csv");
        }
        return p;
    }

    private static String stem(Path file) {
        String n = file.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }
}
