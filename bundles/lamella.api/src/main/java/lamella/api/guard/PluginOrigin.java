package lamella.api.guard;

/**
 * The bundle that registered a service, as {@code lamella plugins} lists it, so that an error can say whose code
 * failed. Built by the consumer from its OSGi service reference.
 *
 * @param symbolicName the bundle's symbolic name
 * @param version      the bundle's version
 * @param shipped      whether the bundle is one of the runtime's own (installed from its {@code bundle/} folder)
 *                     rather than a plug-in dropped into {@code plugins/}: its failure is Lamella's, never a
 *                     plug-in's
 */
public record PluginOrigin(String symbolicName, String version, boolean shipped) {

    /** The runtime installs its own bundles in place ({@code reference:} locations); plug-ins are copied in. */
    private static final String SHIPPED_LOCATION = "reference:";

    /** A plug-in's origin. */
    public PluginOrigin(String symbolicName, String version) {
        this(symbolicName, version, false);
    }

    /** The origin of a bundle by its location: shipped when the runtime installed it in place. */
    public static PluginOrigin of(String symbolicName, String version, String location) {
        return new PluginOrigin(symbolicName, version, location != null && location.startsWith(SHIPPED_LOCATION));
    }

    @Override
    public String toString() {
        return "bundle " + symbolicName + " " + version;
    }
}
