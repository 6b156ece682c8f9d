package lamella.materials;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import lamella.api.command.RuntimeInputs;
import lamella.api.command.StartupNotice;
import lamella.api.material.LibraryTier;
import org.osgi.framework.BundleContext;
import org.osgi.framework.ServiceRegistration;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;

/**
 * The facility and user libraries named by the runtime's configuration, each offered as a {@link MaterialLibrary} at
 * start and read once, when first asked for. A folder that is named but missing is offered as an empty library with a
 * finding, so the problem shows wherever libraries are listed instead of disappearing, and a {@link StartupNotice}
 * has every command mention a configured library that is missing or has errors.
 */
@Component(immediate = true, service = {})
public final class ConfiguredLibraries {

    static final String FACILITY = PlainLibraries.FACILITY_SETTING;
    static final String USER = PlainLibraries.USER_SETTING;
    static final String WORKING_DIRECTORY = "lamella.cwd";

    private final List<ServiceRegistration<?>> registrations = new ArrayList<>();
    private final LibraryNotices notices = new LibraryNotices();

    @Activate
    void activate(BundleContext context) {
        Path base = Path.of(Optional.ofNullable(context.getProperty(WORKING_DIRECTORY))
                .orElse(System.getProperty("user.dir")));
        folder(context.getProperty(FACILITY), base).ifPresent(f -> offer(context, LibraryTier.FACILITY, f));
        userFolder(context.getProperty(USER), base, Path.of(System.getProperty("user.home")))
                .ifPresent(f -> offer(context, LibraryTier.USER, f));
        registrations.add(context.registerService(new String[] {StartupNotice.class.getName(),
                RuntimeInputs.class.getName()}, notices, null));
    }

    private void offer(BundleContext context, LibraryTier tier, Path folder) {
        DeferredLibrary library = new DeferredLibrary(() -> LibraryFolder.read(folder, tier));
        registrations.add(LibraryExtender.register(context, tier, library));
        notices.add(tier, folder, library);
    }

    @Deactivate
    void deactivate() {
        registrations.forEach(ServiceRegistration::unregister);
        registrations.clear();
        notices.clear();
    }

    static Optional<Path> folder(String setting, Path base) {
        return PlainLibraries.folder(setting, base);
    }

    static Optional<Path> userFolder(String setting, Path base, Path home) {
        return PlainLibraries.userFolder(setting, base, home);
    }
}
