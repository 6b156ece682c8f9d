package lamella.ui.panels;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.Consumer;
import lamella.api.CaseFormat;
import lamella.api.HeatingGeometry;
import lamella.api.ModelCatalog;
import lamella.api.Technique;
import lamella.api.guard.LiveModels;
import lamella.api.guard.PluginOrigin;
import lamella.api.data.DataImporter;
import lamella.api.fit.FitService;
import lamella.api.fit.Progress;
import lamella.api.fit.ReportWriter;
import lamella.api.material.MaterialCatalog;
import lamella.api.material.MaterialLibrary;
import lamella.casefile.CaseFileReader;
import lamella.engine.Engine;
import lamella.fit.Fitter;
import lamella.geometry.elliptic.EllipticBeams;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.geometry.line.LineHeater;
import lamella.geometry.point.PointSource;
import lamella.geometry.ring.RingSource;
import lamella.io.delimited.DelimitedImporter;
import lamella.materials.ShippedLibraryForTests;
import lamella.technique.fdtr.FrequencyDomain;
import lamella.technique.sstr.SteadyState;
import lamella.technique.tdtr.TimeDomain;
import lamella.technique.threeomega.ThreeOmega;
import lamella.ui.api.BackgroundWork;
import lamella.ui.api.CaseReader;
import lamella.ui.api.Messages;
import lamella.ui.api.Project;
import lamella.ui.api.Task;
import lamella.ui.api.Workbench;
import lamella.ui.api.WorkResult;
import org.eclipse.swt.widgets.Display;
import org.eclipse.swt.widgets.Shell;

/**
 * A workbench for panel tests built from the real services (engine, geometries, techniques, case reader, fitter,
 * delimited importer, the shipped material library), with background work on a thread pool.
 */
final class FakeWorkbench implements Workbench {

    static final Path DEMO = Path.of("../../demo-data/oxide-film-joint/case.json");
    private static final Path SHIPPED_MATERIALS = Path.of("../lamella.materials.shipped/src/main/resources/materials");

    private final Display display;
    private final Shell shell;
    private final ModelCatalog catalog;
    private final CaseFileReader reader = new CaseFileReader();
    private final Fitter fitter;
    private final MaterialCatalog materials;
    private final Project project;
    private final ExecutorService pool = Executors.newCachedThreadPool();
    private final FakeMessages messages = new FakeMessages();

    FakeWorkbench(Display display, Shell shell) throws Exception {
        this(display, shell, DEMO);
    }

    /** A workbench on another case file. */
    FakeWorkbench(Display display, Shell shell, Path caseFile) throws Exception {
        this.display = display;
        this.shell = shell;
        List<HeatingGeometry> g = List.of(new GaussianBeams(), new PointSource(), new LineHeater(), new RingSource(),
                new EllipticBeams());
        List<Technique> t = List.of(new FrequencyDomain(), new TimeDomain(), new SteadyState(), new ThreeOmega());
        Engine engine = new Engine();
        // Behind guards, as the window holds them: a plug-in's failure is named, and an interrupt stops any geometry.
        LiveModels live = new LiveModels();
        PluginOrigin here = new PluginOrigin("lamella.ui.panels.tests", "0");
        g.forEach(x -> live.add(x, here));
        live.add(TroubleGeometries.slow(), here);
        live.add(TroubleGeometries.broken(), here);
        t.forEach(x -> live.add(x, here));
        catalog = live.catalog(engine);
        fitter = new Fitter(engine, g, t);
        if (Files.isDirectory(SHIPPED_MATERIALS)) {
            MaterialLibrary shipped = ShippedLibraryForTests.read(SHIPPED_MATERIALS);
            reader.addLibrary(shipped);
            materials = new MaterialCatalog(List.of(shipped));
        } else {
            materials = null;
        }
        project = Project.open(caseFile, CaseReader.withModels(reader::read, () -> catalog));
    }

    void shutdown() {
        pool.shutdownNow();
    }

    FakeMessages messageLog() {
        return messages;
    }

    @Override
    public Display display() {
        return display;
    }

    @Override
    public Shell shell() {
        return shell;
    }

    @Override
    public Project project() {
        return project;
    }

    @Override
    public Messages messages() {
        return messages;
    }

    @Override
    public ModelCatalog catalog() {
        return catalog;
    }

    @Override
    public CaseFormat caseFormat() {
        return reader;
    }

    @Override
    public Optional<FitService> fitter() {
        return Optional.of(fitter);
    }

    @Override
    public Optional<ReportWriter> reports() {
        return Optional.empty();
    }

    @Override
    public Optional<MaterialCatalog> materials() {
        return Optional.ofNullable(materials);
    }

    @Override
    public List<DataImporter> importers() {
        return List.of(new DelimitedImporter());
    }

    /** Like the window's: cancelling interrupts the work's thread and tells the caller it stopped. */
    @Override
    public <T> Task start(String label, BackgroundWork<T> work, WorkResult<T> result) {
        AtomicBoolean cancelled = new AtomicBoolean();
        AtomicBoolean done = new AtomicBoolean();
        AtomicBoolean told = new AtomicBoolean();
        Consumer<Runnable> tell = r -> {
            if (told.compareAndSet(false, true) && !display.isDisposed()) {
                display.asyncExec(r);
            }
        };
        Progress progress = new Progress() {
            @Override
            public void update(String stage, int d, int total) {
            }

            @Override
            public boolean cancelled() {
                return cancelled.get();
            }
        };
        started.incrementAndGet();
        Future<?> f = pool.submit(() -> {
            try {
                T value = work.run(progress);
                done.set(true);
                tell.accept(() -> result.done(value));
            } catch (Exception | Error e) {
                done.set(true);
                if (cancelled.get() || e instanceof java.util.concurrent.CancellationException) {
                    tell.accept(result::stopped);
                } else {
                    messages.error(label + " failed", e);
                    tell.accept(() -> result.failed(String.valueOf(e.getMessage()), e));
                }
            }
        });
        Task task = new Task() {
            @Override
            public void cancel() {
                cancelled.set(true);
                f.cancel(true);
                tell.accept(result::stopped);
            }

            @Override
            public boolean done() {
                return done.get() || cancelled.get();
            }
        };
        tasks.add(task);
        return task;
    }

    private final List<Task> tasks = new CopyOnWriteArrayList<>();

    /** Stops all work, as the status line's Stop button does. */
    void stopAll() {
        tasks.forEach(Task::cancel);
    }

    /** How many pieces of background work were started. */
    final AtomicInteger started = new AtomicInteger();

    /** What the panels told the status line, by where. */
    final java.util.Map<String, String> problems = new java.util.concurrent.ConcurrentHashMap<>();

    @Override
    public void showProblem(String where, String problem) {
        if (problem == null) {
            problems.remove(where);
        } else {
            problems.put(where, problem);
        }
    }

    @Override
    public void show(String panelId) {
    }

    /** The answer the next questions get, and what they asked. */
    volatile boolean confirmAnswer = true;
    final List<String> questions = new CopyOnWriteArrayList<>();

    @Override
    public boolean confirm(String title, String question, String action) {
        questions.add(question);
        return confirmAnswer;
    }

    static final class FakeMessages implements Messages {

        private final List<Message> all = new CopyOnWriteArrayList<>();

        @Override
        public void info(String text) {
            all.add(new Message(Instant.now(), Level.INFO, text, ""));
        }

        @Override
        public void warning(String text) {
            all.add(new Message(Instant.now(), Level.WARNING, text, ""));
        }

        @Override
        public void error(String text, Throwable cause) {
            all.add(new Message(Instant.now(), Level.ERROR, text, String.valueOf(cause)));
        }

        @Override
        public List<Message> all() {
            return all;
        }

        @Override
        public void subscribe(Consumer<Message> listener) {
        }
    }
}
