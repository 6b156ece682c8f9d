package lamella.api.guard;

/**
 * The bundle that registered a service, as {@code lamella plugins} lists it, so that an error can say whose code
 * failed. Built by the consumer from its OSGi service reference.
 *
 * @param symbolicName the bundle's symbolic name
 * @param version      the bundle's version
 */
public record PluginOrigin(String symbolicName, String version) {

    @Override
    public String toString() {
        return "bundle " + symbolicName + " " + version;
    }
}
