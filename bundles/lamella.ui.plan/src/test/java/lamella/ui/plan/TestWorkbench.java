package lamella.ui.plan;

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
import lamella.api.data.DataImporter;
import lamella.api.fit.FitService;
import lamella.api.fit.Progress;
import lamella.api.fit.ReportWriter;
import lamella.api.guard.LiveModels;
import lamella.api.guard.PluginOrigin;
import lamella.api.material.MaterialCatalog;
import lamella.casefile.CaseFileReader;
import lamella.engine.Engine;
import lamella.fit.Fitter;
import lamella.geometry.gaussian.GaussianBeams;
import lamella.technique.fdtr.FrequencyDomain;
import lamella.technique.tdtr.TimeDomain;
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
 * A workbench for the panel's tests from the real services (engine, Gaussian beams, TDTR and FDTR, the case reader,
 * the fitter that offers the plan service), the demo plan case as its project, background work on a pool that a
 * cancel interrupts, as the window's does.
 */
final class TestWorkbench implements Workbench {

    static final Path DEMO = Path.of("../../demo-data/plan/oxide-film-tdtr.json");

    private final Display display;
    private final Shell shell;
    private final ModelCatalog catalog;
    private final CaseFileReader reader = new CaseFileReader();
    final Fitter fitter;
    private final Project project;
    private final ExecutorService pool = Executors.newCachedThreadPool();
    private final List<Messages.Message> log = new CopyOnWriteArrayList<>();
    final AtomicInteger started = new AtomicInteger();
    final AtomicInteger stopped = new AtomicInteger();

    TestWorkbench(Display display, Shell shell) throws Exception {
        this.display = display;
        this.shell = shell;
        List<HeatingGeometry> g = List.of(new GaussianBeams());
        List<Technique> t = List.of(new FrequencyDomain(), new TimeDomain());
        Engine engine = new Engine();
        LiveModels live = new LiveModels();
        PluginOrigin here = new PluginOrigin("lamella.ui.plan.tests", "0");
        g.forEach(x -> live.add(x, here));
        t.forEach(x -> live.add(x, here));
        catalog = live.catalog(engine);
        fitter = new Fitter(engine, g, t);
        project = Project.open(DEMO, CaseReader.withModels(reader::read, () -> catalog));
    }

    void shutdown() {
        pool.shutdownNow();
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
        return new Messages() {
            @Override
            public void info(String text) {
                log.add(new Message(Instant.now(), Level.INFO, text, ""));
            }

            @Override
            public void warning(String text) {
                log.add(new Message(Instant.now(), Level.WARNING, text, ""));
            }

            @Override
            public void error(String text, Throwable cause) {
                log.add(new Message(Instant.now(), Level.ERROR, text, String.valueOf(cause)));
            }

            @Override
            public List<Message> all() {
                return log;
            }

            @Override
            public void subscribe(Consumer<Message> listener) {
            }
        };
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
        return Optional.empty();
    }

    @Override
    public List<DataImporter> importers() {
        return List.of();
    }

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
                    tell.accept(() -> result.failed(String.valueOf(e.getMessage()), e));
                }
            }
        });
        return new Task() {
            @Override
            public void cancel() {
                cancelled.set(true);
                f.cancel(true);
                stopped.incrementAndGet();
                tell.accept(result::stopped);
            }

            @Override
            public boolean done() {
                return done.get() || cancelled.get();
            }
        };
    }

    @Override
    public void show(String panelId) {
    }
}
