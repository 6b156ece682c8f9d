package lamella.ui.workbench;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Optional;
import java.util.function.Consumer;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.ui.api.CaseReader;
import lamella.ui.api.JsonFiles;
import lamella.ui.api.Project;
import org.eclipse.swt.SWT;
import org.eclipse.swt.widgets.FileDialog;
import org.eclipse.swt.widgets.MessageBox;
import org.eclipse.swt.widgets.Shell;

/**
 * The project of the window: opening, new from a case, saving (atomic, through {@link Project#save}), the recent
 * list, and never losing a change: a question on close, and a recovery copy while there are unsaved changes,
 * offered on the next start.
 */
final class ProjectSession {

    static final int RECOVERY_EVERY_MS = 30_000;
    static final String DEMO_CASE = "demo/oxide-film-joint/case.json";

    /** Made on first use: the first mapper of a run costs some 150 ms, which the window's opening need not wait for. */
    private static final class Json {
        static final ObjectMapper MAPPER = new ObjectMapper();
    }

    private final Shell shell;
    private final CaseReader reader;
    private final UserFolder user;
    private final Path home;
    private final MessageLog messages;
    private final RecentProjects recent;
    private final Consumer<Project> onReplaced;
    private Project project;

    ProjectSession(Shell shell, CaseReader reader, UserFolder user, Path home, MessageLog messages,
            Consumer<Project> onReplaced) {
        this.shell = shell;
        this.reader = reader;
        this.user = user;
        this.home = home;
        this.messages = messages;
        this.recent = new RecentProjects(user.recent(), messages);
        this.onReplaced = onReplaced;
    }

    Project project() {
        return project;
    }

    RecentProjects recent() {
        return recent;
    }

    /** The project as the title names it: its file and the folder it is in ("case.json in oxide-film-joint"). */
    String name() {
        return project.file().map(f -> f.getFileName() + (f.getParent() != null && f.getParent().getFileName()
                != null ? " in " + f.getParent().getFileName() : "") + (isDemo(f) ? " (demo, read-only)" : ""))
                .orElse("untitled");
    }

    /** The shipped demo's folder is Lamella's own: Save never writes into it. */
    boolean isDemo(Path file) {
        if (home == null) {
            return false;
        }
        Path demo = home.resolve("demo").toAbsolutePath().normalize();
        return file.toAbsolutePath().normalize().startsWith(demo);
    }

    /** The last project if it still opens, else the shipped demo case, else a small template. */
    void openInitial() {
        for (Path last : recent.paths().stream().limit(1).toList()) {
            if (Files.isRegularFile(last) && tryOpen(last)) {
                return;
            }
        }
        Path demo = home == null ? null : home.resolve(DEMO_CASE);
        if (demo != null && Files.isRegularFile(demo) && tryOpen(demo)) {
            return;
        }
        replace(template());
        messages.info("Started an untitled project from the template (two layers, FDTR).");
    }

    /** Offers the recovery copy left by a session that ended with unsaved changes. */
    /** When a recovery copy was kept, in the reader's local time ("17:22 on 3 Dec 2026"); other text as it is. */
    static String keptAt(String written, java.time.ZoneId zone) {
        try {
            return java.time.format.DateTimeFormatter.ofPattern("HH:mm 'on' d MMM yyyy", java.util.Locale.ENGLISH)
                    .withZone(zone).format(Instant.parse(written));
        } catch (java.time.format.DateTimeParseException e) {
            return written;
        }
    }

    void offerRecovery() {
        Path copy = recoveryCase();
        if (!Files.isRegularFile(copy)) {
            return;
        }
        String about = "an earlier session";
        Path of = null;
        try {
            ObjectNode info = (ObjectNode) JsonFiles.read(recoveryInfo());
            about = info.path("project").asText("an untitled project") + " (copy kept at "
                    + keptAt(info.path("written").asText("an unknown time"), java.time.ZoneId.systemDefault()) + ")";
            of = info.hasNonNull("project") ? Path.of(info.get("project").asText()) : null;
        } catch (IOException | RuntimeException e) {
            messages.warning("The recovery note " + recoveryInfo() + " is unreadable: " + e.getMessage());
        }
        MessageBox ask = new MessageBox(shell, SWT.ICON_QUESTION | SWT.YES | SWT.NO);
        ask.setText("Unsaved changes found");
        ask.setMessage("Lamella ended without saving changes to " + about + ".\n\nRestore them as an untitled"
                + " project? (No keeps the copy in " + user.recovery() + ".)");
        if (ask.open() != SWT.YES) {
            return;
        }
        try {
            Path folder = of != null && of.getParent() != null ? of.getParent() : user.root();
            replace(Project.recovered(Files.readString(copy, StandardCharsets.UTF_8), folder, reader));
            messages.info("Restored the unsaved changes of " + about + ".");
        } catch (IOException | RuntimeException e) {
            messages.error("Could not restore the recovery copy " + copy, e);
        }
    }

    void newFromCase() {
        if (!confirmDiscard()) {
            return;
        }
        Optional<Path> file = chooseCase("New project from a case file");
        file.ifPresent(f -> {
            try {
                replace(Project.of(Files.readString(f, StandardCharsets.UTF_8), f.getParent(), reader));
                messages.info("New untitled project from " + f + ".");
            } catch (IOException e) {
                messages.error("Could not read the case file " + f, e);
            }
        });
    }

    void open() {
        if (confirmDiscard()) {
            chooseCase("Open a project").ifPresent(this::tryOpen);
        }
    }

    void openRecent(Path file) {
        if (confirmDiscard()) {
            tryOpen(file);
        }
    }

    /** Saves to the project's file; a project that is untitled or the shipped demo asks where instead. */
    boolean save() {
        if (project.file().isPresent() && !isDemo(project.file().get())) {
            return saveTo(project.file().get());
        }
        return saveAs();
    }

    /**
     * Asks where to save, never offering the demo's own folder: the data files are copied beside the chosen case
     * file, which then refers to them by relative paths.
     */
    boolean saveAs() {
        FileDialog d = new FileDialog(shell, SWT.SAVE);
        d.setText("Save the project as (its data files are copied beside it)");
        d.setFilterExtensions(new String[] {"*.json", "*"});
        d.setFilterNames(new String[] {"Lamella case files (*.json)", "All files"});
        boolean demo = project.file().filter(this::isDemo).isPresent();
        String suggested = project.file().map(f -> demo ? f.getParent().getFileName() + ".json"
                : f.getFileName().toString()).orElse("case.json");
        d.setFileName(suggested);
        d.setFilterPath(demo || project.file().isEmpty() ? System.getProperty("user.home")
                : project.folder().toString());
        d.setOverwrite(true);
        String chosen = d.open();
        return chosen != null && saveTo(Path.of(chosen));
    }

    boolean saveTo(Path target) {
        if (isDemo(target)) {
            String why = "The demo folder " + home.resolve("demo") + " holds Lamella's own files; save your project"
                    + " in a folder of your own.";
            messages.warning("Not saved: " + why);
            Dialogs.tell(shell, "Not saved", why, SWT.ICON_WARNING);
            return false;
        }
        try {
            project.save(target);
            recent.opened(target);
            deleteRecovery();
            messages.info("Saved " + target + ".");
            return true;
        } catch (IOException | RuntimeException e) {
            messages.error("Could not save " + target + "; nothing was changed on disk", e);
            Dialogs.tell(shell, "Not saved", "Could not save " + target + ":\n" + Failures.words(e), SWT.ICON_ERROR);
            return false;
        }
    }

    /** On close or before the project is replaced: Save, Discard or Cancel when there are unsaved changes. */
    boolean confirmDiscard() {
        if (!project.dirty()) {
            return true;
        }
        MessageBox ask = new MessageBox(shell, SWT.ICON_WARNING | SWT.YES | SWT.NO | SWT.CANCEL);
        ask.setText("Unsaved changes");
        ask.setMessage(name() + " has unsaved changes.\n\nYes saves them, No discards them, Cancel goes back.");
        int answer = ask.open();
        if (answer == SWT.YES) {
            return save();
        }
        if (answer == SWT.NO) {
            deleteRecovery();
            return true;
        }
        return false;
    }

    /** Writes the recovery copy if there is anything to recover; called on a timer and before risky steps. */
    void writeRecovery() {
        if (project == null || !project.dirty()) {
            return;
        }
        try {
            project.writeRecovery(recoveryCase());
            ObjectNode info = Json.MAPPER.createObjectNode();
            info.put("project", project.file().map(Path::toString).orElse(null));
            info.put("written", Instant.now().toString());
            AtomicFile.write(recoveryInfo(), Json.MAPPER.writeValueAsString(info) + "\n");
        } catch (IOException e) {
            messages.error("Could not write the recovery copy in " + user.recovery(), e);
        }
    }

    void deleteRecovery() {
        try {
            Files.deleteIfExists(recoveryCase());
            Files.deleteIfExists(recoveryInfo());
        } catch (IOException e) {
            messages.warning("Could not delete the old recovery copy in " + user.recovery() + ": " + FileProblems.reason(e));
        }
    }

    private boolean tryOpen(Path file) {
        try {
            replace(Project.open(file, reader));
            recent.opened(file);
            messages.info("Opened " + file + ".");
            return true;
        } catch (InputException e) {
            messages.error("Could not open " + file + ": the case is not valid", e);
        } catch (IOException | RuntimeException e) {
            messages.error("Could not open " + file, e);
        }
        return false;
    }

    private void replace(Project p) {
        project = p;
        onReplaced.accept(p);
    }

    private Optional<Path> chooseCase(String title) {
        FileDialog d = new FileDialog(shell, SWT.OPEN);
        d.setText(title);
        d.setFilterExtensions(new String[] {"*.json", "*"});
        d.setFilterNames(new String[] {"Lamella case files (*.json)", "All files"});
        if (project != null) {
            d.setFilterPath(project.folder().toString());
        }
        return Optional.ofNullable(d.open()).map(Path::of);
    }

    private Project template() {
        try {
            return Project.of(TEMPLATE, user.root(), reader);
        } catch (IOException e) {
            throw new IllegalStateException("the built-in template is valid JSON", e);
        }
    }

    private Path recoveryCase() {
        return user.recovery().resolve("case.json");
    }

    private Path recoveryInfo() {
        return user.recovery().resolve("about.json");
    }

    /** An 80 nm metal transducer on a glass-like substrate under FDTR; values are typical, not a sample's. */
    private static final String TEMPLATE = String.join("\n",
            "{",
            "  \"description\": \"Untitled: a metal transducer on a glass-like substrate (typical values)\",",
            "  \"stack\": {",
            "    \"layers\": [",
            "      {\"name\": \"transducer\", \"thickness_m\": 8.0e-8, \"k_through_w_mk\": 200.0,",
            "       \"heat_capacity_j_m3k\": 2.42e6, \"conductance_below_w_m2k\": 1.0e8},",
            "      {\"name\": \"substrate\", \"k_through_w_mk\": 1.38, \"heat_capacity_j_m3k\": 1.65e6}",
            "    ],",
            "    \"bottom\": \"semi-infinite\"",
            "  },",
            "  \"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 5e-6, \"probe_radius_m\": 5e-6},",
            "  \"measurement\": {\"type\": \"fdtr\", \"frequencies_hz\": [1e4, 1e5, 1e6, 1e7]}",
            "}",
            "");
}
