package lamella.materials;

import java.net.URL;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Dictionary;
import java.util.Enumeration;
import java.util.Hashtable;
import java.util.List;
import java.util.function.Supplier;
import lamella.api.material.LibraryTier;
import lamella.api.material.MaterialLibrary;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.BundleEvent;
import org.osgi.framework.ServiceRegistration;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.util.tracker.BundleTracker;

/**
 * Finds library bundles: a bundle whose manifest has {@value #HEADER} (the folder holding its library, such as
 * {@code materials/}) gets a {@link MaterialLibrary} service while it is active — of the shipped tier for Lamella's own
 * library bundle ({@value #SHIPPED_BUNDLE}), of the data-bundle tier for any other. A library is data
 * only; no code is needed per library. Immediate, so that libraries are live before the first command runs; each is
 * read when first asked for, so that a command naming no material never reads one.
 */
@Component(immediate = true, service = {})
public final class LibraryExtender {

    static final String HEADER = PlainLibraries.HEADER;
    static final String LIBRARY_TIER = "lamella.material.library.tier";
    static final String SHIPPED_BUNDLE = PlainLibraries.SHIPPED_BUNDLE;

    private BundleTracker<ServiceRegistration<MaterialLibrary>> tracker;

    @Activate
    void activate(BundleContext context) {
        tracker = new BundleTracker<>(context, Bundle.STARTING | Bundle.ACTIVE, null) {
            @Override
            public ServiceRegistration<MaterialLibrary> addingBundle(Bundle bundle, BundleEvent event) {
                String folder = bundle.getHeaders("").get(HEADER);
                if (folder == null) {
                    return null;
                }
                LibraryTier tier = tierOf(bundle.getSymbolicName());
                return register(context, tier, () -> read(bundle, folder.trim(), tier));
            }

            @Override
            public void removedBundle(Bundle bundle, BundleEvent event, ServiceRegistration<MaterialLibrary> r) {
                r.unregister();
            }
        };
        tracker.open();
    }

    @Deactivate
    void deactivate() {
        tracker.close();
    }

    /** Registers a library that {@code reader} reads when the library is first asked for. */
    static ServiceRegistration<MaterialLibrary> register(BundleContext context, LibraryTier tier,
                                                         Supplier<ReadLibrary> reader) {
        return register(context, tier, new DeferredLibrary(reader));
    }

    static ServiceRegistration<MaterialLibrary> register(BundleContext context, LibraryTier tier,
                                                         DeferredLibrary library) {
        Dictionary<String, Object> properties = new Hashtable<>();
        properties.put(LIBRARY_TIER, tier.label());
        return context.registerService(MaterialLibrary.class, library, properties);
    }

    /** Lamella's own library bundle is the shipped tier; a lab's data bundle ranks above it. */
    static LibraryTier tierOf(String symbolicName) {
        return PlainLibraries.tierOf(symbolicName);
    }

    static ReadLibrary read(Bundle bundle, String folder, LibraryTier tier) {
        String dir = folder.endsWith("/") ? folder : folder + "/";
        String origin = bundle.getSymbolicName() + " " + bundle.getVersion();
        List<SourceFile> files = new ArrayList<>();
        Enumeration<URL> found = bundle.findEntries(dir, "*.json", false);
        for (URL url : found == null ? Collections.<URL>emptyList() : Collections.list(found)) {
            String path = url.getPath();
            String name = path.substring(path.lastIndexOf('/') + 1);
            files.add(new SourceFile(bundle.getSymbolicName() + "!/" + dir + name, name, url::openStream));
        }
        return LibraryReader.read(tier, "bundle " + origin + ", " + dir, files);
    }
}
