package lamella.cli;

import lamella.api.guard.PluginOrigin;
import org.osgi.framework.Bundle;
import org.osgi.framework.ServiceReference;

/** The bundle behind a service reference, for guards' messages. */
final class Origins {

    private Origins() {
    }

    static PluginOrigin of(ServiceReference<?> reference) {
        Bundle bundle = reference.getBundle();
        if (bundle == null) {
            // The service was unregistered while it was being bound; it is about to be unbound again.
            return new PluginOrigin("(unregistered)", "?");
        }
        return PluginOrigin.of(bundle.getSymbolicName(), bundle.getVersion().toString(), bundle.getLocation());
    }
}
