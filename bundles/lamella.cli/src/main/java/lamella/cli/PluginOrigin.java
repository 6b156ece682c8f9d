package lamella.cli;

import org.osgi.framework.Bundle;
import org.osgi.framework.ServiceReference;

/**
 * The bundle that registered a service, as {@code lamella plugins} lists it, so that an error can say whose code
 * failed.
 *
 * @param symbolicName the bundle's symbolic name
 * @param version      the bundle's version
 */
record PluginOrigin(String symbolicName, String version) {

    static PluginOrigin of(ServiceReference<?> reference) {
        Bundle bundle = reference.getBundle();
        if (bundle == null) {
            // The service was unregistered while it was being bound; it is about to be unbound again.
            return new PluginOrigin("(unregistered)", "?");
        }
        return new PluginOrigin(bundle.getSymbolicName(), bundle.getVersion().toString());
    }

    @Override
    public String toString() {
        return "bundle " + symbolicName + " " + version;
    }
}
