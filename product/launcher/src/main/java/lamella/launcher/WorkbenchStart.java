package lamella.launcher;

import java.util.Collection;
import java.util.Optional;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.InvalidSyntaxException;
import org.osgi.framework.ServiceEvent;
import org.osgi.framework.ServiceListener;
import org.osgi.framework.ServiceReference;

/**
 * Opens the desktop workbench on the calling thread — the launcher's main thread, which SWT's display then belongs
 * to — and returns when its window closes. The workbench bundle offers it as a {@link Runnable} with
 * {@code lamella.role=workbench}, a JDK type because nothing else crosses to the launcher's class loader.
 */
final class WorkbenchStart {

    static final String FILTER = "(lamella.role=workbench)";
    private static final String APP_NAME = "Lamella";
    private static final String CONTROL_FILTER = "(lamella.role=workbench.control)";
    private static final long POLL_MS = 20;
    /** How long the bundles the window does not need wait for it to open. */
    static final long WINDOW_PATIENCE_MS = 5_000;

    private WorkbenchStart() {
    }

    /**
     * Creates SWT's display on the calling thread — the one the workbench's event loop then runs on — from the
     * toolkit's bundle, while the other bundles install and start on another thread: setting up the toolkit takes a
     * few hundred milliseconds that would otherwise come after them. The workbench takes it as the current display.
     * Any failure is left to the workbench, which creates its own display and says why it cannot.
     */
    static void prepareDisplay(Optional<Bundle> toolkit) {
        System.setProperty("java.awt.headless", "true");
        toolkit.ifPresent(swt -> {
            try {
                Class<?> display = swt.loadClass("org.eclipse.swt.widgets.Display");
                display.getMethod("setAppName", String.class).invoke(null, APP_NAME);
                display.getConstructor().newInstance();
                StartupTrace.step("display created");
            } catch (ReflectiveOperationException | RuntimeException | LinkageError e) {
                StartupTrace.step("display not created here: " + e);
            }
        });
    }

    /**
     * Waits until the workbench's window is open (its window control is offered), or {@code patienceMs} have passed:
     * the bundles the window does not need start after it, instead of competing with it for the processors.
     */
    static void awaitWindow(BundleContext context, long patienceMs) {
        CountDownLatch open = new CountDownLatch(1);
        ServiceListener listener = event -> {
            if (event.getType() == ServiceEvent.REGISTERED) {
                open.countDown();
            }
        };
        try {
            context.addServiceListener(listener, CONTROL_FILTER);
            if (context.getServiceReferences((String) null, CONTROL_FILTER) != null) {
                return;
            }
            open.await(patienceMs, TimeUnit.MILLISECONDS);
            StartupTrace.step(open.getCount() == 0 ? "window open: the other bundles start"
                    : "no window after " + patienceMs + " ms: the other bundles start");
        } catch (InvalidSyntaxException e) {
            throw new IllegalStateException("the control filter is constant and valid", e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (IllegalStateException stopping) {
            // The framework is stopping: nothing to wait for.
        } finally {
            try {
                context.removeServiceListener(listener);
            } catch (IllegalStateException stopping) {
                // as above
            }
        }
    }

    /** The workbench offers its window control once the window is open: the end of its start-up. */
    private static void traceWindowOpen(BundleContext context) {
        try {
            context.addServiceListener(event -> {
                if (event.getType() == ServiceEvent.REGISTERED) {
                    StartupTrace.step("workbench window open");
                    StartupTrace.print();
                }
            }, CONTROL_FILTER);
        } catch (InvalidSyntaxException e) {
            throw new IllegalStateException("the control filter is constant and valid", e);
        }
    }

    /** @return false, having said why, when no workbench came up within the patience */
    static boolean run(BundleContext context, long patienceMs) throws InterruptedException {
        // Charts are drawn into images off-screen; SWT, not AWT, owns the display.
        System.setProperty("java.awt.headless", "true");
        long deadline = System.nanoTime() + TimeUnit.MILLISECONDS.toNanos(patienceMs);
        if (StartupTrace.on()) {
            traceWindowOpen(context);
        }
        while (true) {
            try {
                Collection<ServiceReference<Runnable>> refs = context.getServiceReferences(Runnable.class, FILTER);
                if (!refs.isEmpty()) {
                    ServiceReference<Runnable> ref = refs.iterator().next();
                    Runnable workbench = context.getService(ref);
                    if (workbench != null) {
                        StartupTrace.step("workbench service found");
                        try {
                            workbench.run();
                        } finally {
                            context.ungetService(ref);
                        }
                        return true;
                    }
                }
            } catch (InvalidSyntaxException e) {
                throw new IllegalStateException("the workbench filter is constant and valid", e);
            }
            if (System.nanoTime() > deadline) {
                System.err.println("lamella: the workbench did not come up within " + patienceMs / 1000 + " s; is"
                        + " the desktop feature (bundle lamella.ui.workbench and SWT) installed and resolved?"
                        + " Run 'lamella help' for the commands.");
                return false;
            }
            Thread.sleep(POLL_MS);
        }
    }
}
