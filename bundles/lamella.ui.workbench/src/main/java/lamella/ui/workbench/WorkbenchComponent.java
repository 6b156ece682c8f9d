package lamella.ui.workbench;

import java.nio.file.Path;
import java.util.Hashtable;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.BooleanSupplier;
import java.util.function.Function;
import lamella.api.CaseFormat;
import lamella.api.HeatingGeometry;
import lamella.api.ModelCatalog;
import lamella.api.guard.LiveModels;
import lamella.api.guard.PluginOrigin;
import lamella.api.StackKernels;
import lamella.api.Technique;
import lamella.api.data.DataImporter;
import lamella.api.fit.FitService;
import lamella.api.fit.ReportWriter;
import lamella.api.material.MaterialCatalog;
import lamella.api.material.MaterialLibrary;
import lamella.ui.api.WorkbenchPanel;
import org.eclipse.swt.widgets.Display;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceReference;
import org.osgi.framework.ServiceRegistration;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;

/**
 * The workbench as a service of a JDK type, so that the launcher (which sees only java.*) can start it: a
 * {@link Runnable} with {@code lamella.role=workbench} whose {@code run()} takes the SWT display of the calling thread
 * (the launcher creates it there while the bundles start) or creates it, opens the window and runs its event loop
 * until the window closes. While the window is open, a
 * {@code Function<String, String>} with {@code lamella.role=workbench.control} lets a script or test in the same
 * process drive it (see {@link WindowControl}). Activation touches no SWT: the display belongs to the caller.
 */
@Component(service = Runnable.class, immediate = true, property = "lamella.role=workbench")
public final class WorkbenchComponent implements Runnable, LiveServices {

    private final LiveModels models = new LiveModels();
    private final List<DataImporter> importers = new CopyOnWriteArrayList<>();
    private final List<WorkbenchPanel> panels = new CopyOnWriteArrayList<>();

    @Reference
    private CaseFormat caseFormat;
    @Reference
    private StackKernels kernels;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile FitService fitter;
    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC)
    private volatile ReportWriter reports;
    /** Every live library (shipped, data bundles, the facility's and the user's folders), as the case reader has them. */
    private final List<MaterialLibrary> libraries = new CopyOnWriteArrayList<>();

    /** Actions waiting for the runtime's word that every bundle has started; null once it has. */
    private List<Runnable> waitingForStart = new java.util.ArrayList<>();

    private BundleContext context;
    private UserFolder user;
    private Path home;
    private volatile WorkbenchWindow window;

    @Activate
    void activate(BundleContext context) {
        this.context = context;
        this.user = UserFolder.of(context.getProperty(UserFolder.PROPERTY));
        String h = context.getProperty("lamella.home");
        this.home = h == null ? null : Path.of(h);
    }

    @Deactivate
    void deactivate() {
        WorkbenchWindow w = window;
        if (w != null) {
            w.requestClose();
        }
    }

    @Override
    public void run() {
        // The launcher may have created the display on this thread already, while the other bundles started.
        Display display = Display.getCurrent();
        if (display == null) {
            Display.setAppName("Lamella");
            display = new Display();
        }
        ServiceRegistration<?> control = null;
        try {
            MessageLog messages = new MessageLog();
            long started = System.nanoTime();
            WorkbenchWindow w = new WorkbenchWindow(display, this, messages, user, home);
            window = w;
            w.open();
            Hashtable<String, Object> props = new Hashtable<>();
            props.put("lamella.role", "workbench.control");
            control = context.registerService(Function.class, new WindowControl(w, started), props);
            while (!w.closed()) {
                if (!display.readAndDispatch()) {
                    display.sleep();
                }
            }
        } finally {
            window = null;
            if (control != null) {
                try {
                    control.unregister();
                } catch (IllegalStateException alreadyGone) {
                    // the bundle stopped first, which unregistered it
                }
            }
            display.dispose();
        }
    }

    // ------------------------------------------------------------------ LiveServices

    @Override
    public CaseFormat caseFormat() {
        return caseFormat;
    }

    @Override
    public ModelCatalog catalog() {
        return models.catalog(kernels);
    }

    @Override
    public Optional<FitService> fitter() {
        return Optional.ofNullable(fitter);
    }

    @Override
    public Optional<ReportWriter> reports() {
        return Optional.ofNullable(reports);
    }

    /** The libraries live now, in one catalog with their precedence; empty when none is live. */
    @Override
    public Optional<MaterialCatalog> materials() {
        return libraries.isEmpty() ? Optional.empty() : Optional.of(new MaterialCatalog(List.copyOf(libraries)));
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeLibrary")
    void addLibrary(MaterialLibrary library) {
        libraries.add(library);
    }

    void removeLibrary(MaterialLibrary library) {
        libraries.remove(library);
    }

    @Override
    public List<DataImporter> importers() {
        return List.copyOf(importers);
    }

    @Override
    public List<WorkbenchPanel> panels() {
        return List.copyOf(panels);
    }

    @Override
    public String version() {
        return context.getBundle().getVersion().toString();
    }

    @Override
    public void whenStarted(Runnable action) {
        synchronized (this) {
            if (waitingForStart != null) {
                waitingForStart.add(action);
                return;
            }
        }
        action.run();
    }

    // ------------------------------------------------------------------ references

    /**
     * The runtime registers this once every shipped bundle has started: the launcher opens the window while the
     * bundles start, and the project and panels wait for it, so that a project never opens before its techniques
     * and geometries are live.
     */
    @Reference(service = BooleanSupplier.class, target = "(lamella.role=runtime.started)",
            cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC,
            unbind = "runtimeStopping")
    void runtimeStarted(BooleanSupplier started) {
        List<Runnable> due;
        synchronized (this) {
            due = waitingForStart == null ? List.of() : waitingForStart;
            waitingForStart = null;
        }
        due.forEach(Runnable::run);
    }

    void runtimeStopping(BooleanSupplier started) {
        // Once started, the window stays as it is while the runtime stops.
    }

    /** Every geometry behind a guard, so that a faulty plug-in fails one computation with its bundle's name. */
    @Reference(service = HeatingGeometry.class, cardinality = ReferenceCardinality.MULTIPLE,
            policy = ReferencePolicy.DYNAMIC, unbind = "removeGeometry")
    void addGeometry(ServiceReference<HeatingGeometry> reference, HeatingGeometry g) {
        models.add(g, origin(reference));
    }

    void removeGeometry(HeatingGeometry g) {
        models.remove(g);
    }

    @Reference(service = Technique.class, cardinality = ReferenceCardinality.MULTIPLE,
            policy = ReferencePolicy.DYNAMIC, unbind = "removeTechnique")
    void addTechnique(ServiceReference<Technique> reference, Technique t) {
        models.add(t, origin(reference));
    }

    void removeTechnique(Technique t) {
        models.remove(t);
    }

    private static PluginOrigin origin(ServiceReference<?> reference) {
        Bundle bundle = reference.getBundle();
        return bundle == null ? new PluginOrigin("(unregistered)", "?")
                : PluginOrigin.of(bundle.getSymbolicName(), bundle.getVersion().toString(), bundle.getLocation());
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void addImporter(DataImporter i) {
        importers.add(i);
    }

    void removeImporter(DataImporter i) {
        importers.remove(i);
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC)
    void addPanel(WorkbenchPanel p) {
        panels.add(p);
        WorkbenchWindow w = window;
        if (w != null) {
            w.panelArrived(p);
        }
    }

    void removePanel(WorkbenchPanel p) {
        panels.remove(p);
        WorkbenchWindow w = window;
        if (w != null) {
            w.panelLeft(p);
        }
    }
}
