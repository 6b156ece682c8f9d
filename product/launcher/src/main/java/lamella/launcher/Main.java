package lamella.launcher;

import java.net.URISyntaxException;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Hashtable;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import java.util.function.IntConsumer;

import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceRegistration;

/**
 * {@code java -jar lib/lamella.launcher.jar [COMMAND ARGS…]}: starts the runtime around this jar, hands the command
 * line to the command dispatcher of bundle lamella.cli and exits with the command's status.
 */
public final class Main {

    private static final Duration PLUGIN_PATIENCE = Duration.ofSeconds(10);
    private static final long DISPATCHER_PATIENCE_MS = 10_000;
    private static final long WORKBENCH_PATIENCE_MS = 20_000;
    private static final long POLL_MS = 20;
    private static final int FAILED = 1;

    /** Set once the command (or the workbench) has ended by itself, before the runtime is closed. */
    private static volatile boolean finished;

    private Main() {
    }

    public static void main(String[] args) {
        StartupTrace.step("main entered");
        WarmUp.begin();
        int status = run(args);
        StartupTrace.step("runtime closed");
        StartupTrace.print();
        System.out.flush();
        System.err.flush();
        System.exit(status);
    }

    private static int run(String[] args) {
        boolean workbench = args.length == 0 && DisplayCheck.available(System.getenv(), System.getProperties());
        String[] commandLine = args.length == 0 ? new String[] {"help"} : args;
        FelixRuntime runtime;
        try {
            // The workbench's window opens while the other bundles start; a command waits for them all.
            runtime = workbench
                    ? FelixRuntime.startInBackground(home(), Map.of(), RuntimeScope.WORKBENCH, Main::settle)
                    : FelixRuntime.start(home(), Map.of(), RuntimeScope.of(List.of(commandLine)));
        } catch (Exception e) {
            System.err.println("lamella: could not start the runtime: " + e.getMessage());
            return FAILED;
        }
        Runtime.getRuntime().addShutdownHook(new Thread(() -> ending(runtime), "lamella-shutdown"));
        try {
            BundleContext context = runtime.framework().getBundleContext();
            if (workbench) {
                WorkbenchStart.prepareDisplay(runtime.toolkit());
                return WorkbenchStart.run(context, WORKBENCH_PATIENCE_MS) ? 0 : FAILED;
            }
            settle(runtime);
            return dispatch(context, commandLine);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return FAILED;
        } finally {
            finished = true;
            StartupTrace.step("command returned");
            if (workbench) {
                runtime.close();
            } else {
                runtime.abandon();
            }
        }
    }

    /** Says which shipped bundles could not start, then waits for the plugins present at launch to be live. */
    private static void settle(FelixRuntime runtime) {
        runtime.startProblems().forEach(p -> System.err.println("lamella: " + p));
        try {
            PluginSettler.settle(runtime.framework().getBundleContext(), runtime.pluginsAtLaunch(), PLUGIN_PATIENCE)
                    .forEach(p -> System.err.println("lamella: " + p));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        StartupTrace.step("plugins settled");
    }

    /**
     * The JVM is ending. After the command's own end this does nothing more; otherwise a signal (Ctrl-C, SIGTERM)
     * is ending it, and the JVM exits with 128 + the signal's number (130, 143) once this returns. The user gets one
     * line, and nothing after it: standard output and error are held while the runtime is discarded, so the
     * command under way cannot print about its own end; its outputs are written atomically, so none is half there.
     */
    private static void ending(FelixRuntime runtime) {
        if (finished) {
            runtime.close();
            return;
        }
        synchronized (System.out) {
            synchronized (System.err) {
                System.out.flush();
                runtime.discard();
                System.err.println("lamella: interrupted");
                System.err.flush();
            }
        }
    }

    private static int dispatch(BundleContext context, String[] commandLine) throws InterruptedException {
        LaunchHandle handle = new LaunchHandle();
        Hashtable<String, Object> properties = new Hashtable<>();
        properties.put(LaunchHandle.ROLE, LaunchHandle.ROLE_LAUNCH);
        properties.put(LaunchHandle.ARGS, commandLine);
        properties.put(LaunchHandle.CWD, workingDirectory().toString());
        ServiceRegistration<IntConsumer> registration =
                context.registerService(IntConsumer.class, handle, properties);
        StartupTrace.step("command line handed to the dispatcher");

        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(DISPATCHER_PATIENCE_MS);
        boolean seen = false;
        while (!handle.await(POLL_MS, TimeUnit.MILLISECONDS)) {
            boolean taken = registration.getReference().getUsingBundles() != null;
            if (!taken && System.nanoTime() > deadline) {
                System.err.println("lamella: no command dispatcher came up; is bundle lamella.cli in "
                        + home().resolve("bundle") + " and resolved?");
                return FAILED;
            }
        }
        StartupTrace.step("command finished");
        return handle.status();
    }

    /** The script passes the user's directory, since it may change directory before starting Java. */
    private static Path workingDirectory() {
        return Path.of(System.getProperty(LaunchHandle.CWD, System.getProperty("user.dir"))).toAbsolutePath();
    }

    /** The runtime folder is the parent of the lib/ folder holding this jar, unless -Dlamella.home says otherwise. */
    private static Path home() {
        String given = System.getProperty(RuntimeProperties.HOME);
        if (given != null) {
            return Path.of(given).toAbsolutePath();
        }
        try {
            Path jar = Path.of(Main.class.getProtectionDomain().getCodeSource().getLocation().toURI());
            return jar.getParent().getParent();
        } catch (URISyntaxException e) {
            throw new IllegalStateException("cannot locate the launcher jar", e);
        }
    }
}
