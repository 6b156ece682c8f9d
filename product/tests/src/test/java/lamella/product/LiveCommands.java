package lamella.product;

import java.util.List;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.InvalidSyntaxException;
import org.osgi.framework.ServiceReference;

/**
 * Finding a running runtime's commands and services from a test whose class path does not hold the API classes:
 * commands are found by calling their own {@code name()} through their bundle's classes.
 */
final class LiveCommands {

    static final String COMMAND = "lamella.api.command.Command";

    private LiveCommands() {
    }

    /** The command of that name, or null while it is not (yet) live. */
    static ServiceReference<?> command(BundleContext context, String name) {
        for (ServiceReference<?> reference : references(context, COMMAND)) {
            Bundle bundle = reference.getBundle();
            Object service = bundle == null ? null : context.getService(reference);
            if (service == null) {
                continue;
            }
            try {
                if (name.equals(bundle.loadClass(COMMAND).getMethod("name").invoke(service))) {
                    return reference;
                }
            } catch (ReflectiveOperationException e) {
                throw new AssertionError("cannot call name() of a command", e);
            } finally {
                context.ungetService(reference);
            }
        }
        return null;
    }

    /** Every registered service of a type, named by its class. */
    static List<ServiceReference<?>> references(BundleContext context, String type) {
        try {
            ServiceReference<?>[] found = context.getAllServiceReferences(type, null);
            return found == null ? List.of() : List.of(found);
        } catch (InvalidSyntaxException e) {
            throw new AssertionError(e);
        }
    }
}
