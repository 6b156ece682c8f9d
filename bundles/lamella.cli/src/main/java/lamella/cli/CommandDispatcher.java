package lamella.cli;

import java.time.Duration;
import java.util.List;
import java.util.Map;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.function.IntConsumer;

import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceReference;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;

import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.command.RuntimeInputs;
import lamella.api.command.StartupNotice;

/**
 * Runs the command line of the launcher's launch service against the live {@link Command} services and hands the
 * exit status back to the launcher. Immediate, so that it starts as soon as the launcher asks; the command runs on
 * its own thread so that activation never waits for it.
 */
@Component(immediate = true)
public final class CommandDispatcher {

    static final Duration PATIENCE = Duration.ofSeconds(5);
    static final Duration QUIET = Duration.ofMillis(500);

    private final CommandShelf shelf = new CommandShelf();
    private final List<StartupNotice> notices = new CopyOnWriteArrayList<>();
    private final List<RuntimeInputs> inputs = new CopyOnWriteArrayList<>();
    private volatile BundleContext context;
    private IntConsumer launcher;
    private LaunchRequest request;

    @Reference(target = LaunchRequest.ROLE_FILTER)
    void bindLauncher(IntConsumer launcher, Map<String, Object> properties) {
        this.launcher = launcher;
        this.request = LaunchRequest.from(properties);
    }

    /**
     * Commands are bound by reference: the dispatcher gets only the one it runs, so that {@code help} or a command's
     * start never activates every command and all they reference.
     */
    @Reference(service = Command.class, cardinality = ReferenceCardinality.MULTIPLE,
            policy = ReferencePolicy.DYNAMIC, unbind = "removeCommand")
    void addCommand(ServiceReference<Command> reference) {
        shelf.add(new ListedCommand(reference, this::service));
    }

    void removeCommand(ServiceReference<Command> reference) {
        ListedCommand gone = new ListedCommand(reference, this::service);
        shelf.remove(gone);
        BundleContext c = context;
        if (c != null) {
            try {
                c.ungetService(reference);
            } catch (IllegalStateException | IllegalArgumentException stopped) {
                // the dispatcher's own bundle is stopping
            }
        }
    }

    private Command service(ServiceReference<Command> reference) {
        BundleContext c = context;
        return c == null ? null : c.getService(reference);
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeNotice")
    void addNotice(StartupNotice notice) {
        notices.add(notice);
    }

    void removeNotice(StartupNotice notice) {
        notices.remove(notice);
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeInputs")
    void addInputs(RuntimeInputs files) {
        inputs.add(files);
    }

    void removeInputs(RuntimeInputs files) {
        inputs.remove(files);
    }

    @Activate
    void activate(BundleContext context) {
        this.context = context;
        boolean debug = Boolean.parseBoolean(context.getProperty("lamella.debug"));
        Dispatch dispatch = new Dispatch(shelf, PATIENCE, QUIET, debug, () -> List.copyOf(notices),
                () -> List.copyOf(inputs));
        CommandIO io = new CommandIO(System.out, System.err, request.workingDirectory());
        new Thread(() -> runAndReport(dispatch, io), "lamella-command").start();
    }

    /** The launcher waits for a status, so one is sent whatever happens. */
    private void runAndReport(Dispatch dispatch, CommandIO io) {
        int status = Command.FAILED;
        try {
            status = dispatch.run(request.args(), io);
        } catch (RuntimeException | Error e) {
            System.err.println("lamella: internal error in the command dispatcher: " + e);
        } finally {
            launcher.accept(status);
        }
    }
}
