package lamella.io.profiles;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Dictionary;
import java.util.Hashtable;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.TimeUnit;
import lamella.api.InputException;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.ImportLimits;
import lamella.api.data.ImporterProfiles;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.BundleEvent;
import org.osgi.framework.InvalidSyntaxException;
import org.osgi.framework.ServiceReference;
import org.osgi.framework.ServiceRegistration;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Deactivate;
import org.osgi.util.tracker.BundleTracker;

/**
 * Makes importer profiles live: those of bundles whose manifest has {@value #HEADER} (the shipped ones, and any data
 * bundle dropped into plugins/), and those of the facility and user folders the runtime's configuration names. Each
 * sound profile becomes a {@link DataImporter} service with its tier in {@link ImporterProfiles#TIER_PROPERTY}; a
 * profile with findings is left out and its findings are kept for {@link #liveProblems()}, so a mistyped profile never
 * takes another importer down. Folders are looked at again every {@value #POLL_SECONDS} seconds: a profile saved,
 * changed or deleted is live, changed or gone without a restart.
 */
@Component(immediate = true, service = ImporterProfiles.class)
public final class ProfilesService implements ImporterProfiles {

    static final String HEADER = "Lamella-Import-Profiles";
    static final String FACILITY = "lamella.profiles.facility";
    static final String USER = "lamella.profiles.user";
    static final String DEFAULT_USER_FOLDER = ".lamella/profiles";
    static final String WORKING_DIRECTORY = "lamella.cwd";
    static final int POLL_SECONDS = 2;

    private final Map<ProfileSource, List<ServiceRegistration<DataImporter>>> live = new LinkedHashMap<>();
    private final Map<ProfileSource, List<Finding>> problems = new LinkedHashMap<>();
    private final Map<ProfileSource, String> fingerprints = new LinkedHashMap<>();
    private BundleContext context;
    private BundleTracker<ProfileSource> tracker;
    private ScheduledExecutorService poller;

    @Activate
    void activate(BundleContext ctx) {
        this.context = ctx;
        String selfName = ctx.getBundle().getSymbolicName();
        tracker = new BundleTracker<>(ctx, Bundle.STARTING | Bundle.ACTIVE, null) {
            @Override
            public ProfileSource addingBundle(Bundle bundle, BundleEvent event) {
                String folder = bundle.getHeaders("").get(HEADER);
                if (folder == null) {
                    return null;
                }
                String tier = bundle.getSymbolicName().equals(selfName) ? "shipped"
                        : "bundle " + bundle.getSymbolicName();
                ProfileSource s = new ProfileSource.InBundle(bundle, folder.trim(), tier);
                load(s);
                return s;
            }

            @Override
            public void removedBundle(Bundle bundle, BundleEvent event, ProfileSource s) {
                unload(s);
            }
        };
        tracker.open();
        Path base = Path.of(Optional.ofNullable(ctx.getProperty(WORKING_DIRECTORY))
                .orElse(System.getProperty("user.dir")));
        List<ProfileSource> folders = new ArrayList<>();
        folder(ctx.getProperty(FACILITY), base).ifPresent(f -> folders.add(new ProfileSource.Folder(f, "facility")));
        userFolder(ctx.getProperty(USER), base, Path.of(System.getProperty("user.home")))
                .ifPresent(f -> folders.add(new ProfileSource.Folder(f, "user")));
        for (ProfileSource s : folders) {
            load(s);
        }
        if (!folders.isEmpty()) {
            poller = Executors.newSingleThreadScheduledExecutor(r -> {
                Thread t = new Thread(r, "lamella-profile-folders");
                t.setDaemon(true);
                return t;
            });
            poller.scheduleWithFixedDelay(() -> {
                for (ProfileSource s : folders) {
                    String now = s.fingerprint();
                    boolean changed;
                    synchronized (this) {
                        changed = !now.equals(fingerprints.get(s));
                    }
                    if (changed) {
                        unload(s);
                        load(s);
                    }
                }
            }, POLL_SECONDS, POLL_SECONDS, TimeUnit.SECONDS);
        }
    }

    @Deactivate
    void deactivate() {
        if (poller != null) {
            poller.shutdownNow();
        }
        tracker.close();
        synchronized (this) {
            for (ProfileSource s : new ArrayList<>(live.keySet())) {
                unload(s);
            }
        }
    }

    private synchronized void load(ProfileSource s) {
        fingerprints.put(s, s.fingerprint());
        ProfileSource.Loaded loaded = s.load();
        List<Finding> findings = new ArrayList<>(loaded.findings());
        List<ServiceRegistration<DataImporter>> regs = new ArrayList<>();
        for (Profile p : loaded.profiles()) {
            Optional<String> taken = takenBy(p.id());
            if (taken.isPresent()) {
                findings.add(new Finding(Path.of(p.origin()), -1, "profile", "'" + p.id() + "' is already the name"
                        + " of " + taken.get() + "; this profile is not live until it has a name of its own"));
                continue;
            }
            Dictionary<String, Object> props = new Hashtable<>();
            props.put(TIER_PROPERTY, s.tier);
            try {
                regs.add(context.registerService(DataImporter.class, new ProfileImporter(p), props));
            } catch (IllegalStateException stopping) {
                break;
            }
        }
        live.put(s, regs);
        problems.put(s, findings);
    }

    private synchronized void unload(ProfileSource s) {
        List<ServiceRegistration<DataImporter>> regs = live.remove(s);
        if (regs != null) {
            for (ServiceRegistration<DataImporter> r : regs) {
                try {
                    r.unregister();
                } catch (IllegalStateException gone) {
                    // unregistered already, as the framework stops
                }
            }
        }
        problems.remove(s);
        fingerprints.remove(s);
    }

    /** Which live importer already has this id, in words. */
    private Optional<String> takenBy(String id) {
        Collection<ServiceReference<DataImporter>> refs;
        try {
            refs = context.getServiceReferences(DataImporter.class, null);
        } catch (InvalidSyntaxException | IllegalStateException e) {
            return Optional.empty();
        }
        for (ServiceReference<DataImporter> ref : refs) {
            DataImporter i = context.getService(ref);
            try {
                if (i != null && i.id().equals(id)) {
                    return Optional.of(i instanceof ProfileImporter pi ? "the profile from " + pi.profile().origin()
                            : "the importer of bundle " + ref.getBundle().getSymbolicName());
                }
            } finally {
                context.ungetService(ref);
            }
        }
        return Optional.empty();
    }

    @Override
    public synchronized List<Finding> liveProblems() {
        List<Finding> all = new ArrayList<>();
        problems.values().forEach(all::addAll);
        return all;
    }

    @Override
    public List<Finding> check(Path folderOrFile) {
        return sourceOf(folderOrFile).load().findings();
    }

    private static ProfileSource sourceOf(Path folderOrFile) {
        Path p = folderOrFile.toAbsolutePath().normalize();
        if (Files.isRegularFile(p)) {
            return new OneFile(p);
        }
        return new ProfileSource.Folder(p, "checked");
    }

    @Override
    public Dataset tryOn(Path profileOrFolder, Path sample) throws InputException {
        ProfileSource.Loaded loaded = sourceOf(profileOrFolder).load();
        if (!loaded.findings().isEmpty()) {
            Finding f = loaded.findings().get(0);
            throw new InputException(f.file(), f.path(), f.line(), f.problem() + (loaded.findings().size() > 1
                    ? " (and " + (loaded.findings().size() - 1) + " more: lamella formats check " + profileOrFolder
                    + ")" : ""));
        }
        if (loaded.profiles().isEmpty()) {
            throw new InputException(profileOrFolder, null, -1, "holds no profile (*.json files)");
        }
        ProfileImporter best = null;
        double score = 0;
        byte[] head = head(sample);
        for (Profile p : loaded.profiles()) {
            ProfileImporter i = new ProfileImporter(p);
            double c = i.confidence(sample, head);
            if (c > score) {
                score = c;
                best = i;
            }
        }
        if (best == null) {
            if (loaded.profiles().size() == 1) {
                best = new ProfileImporter(loaded.profiles().get(0));
            } else {
                throw new InputException(sample, null, -1, "none of the " + loaded.profiles().size()
                        + " profiles in " + profileOrFolder + " recognises this file (by its extension and the"
                        + " texts near its top)");
            }
        }
        return best.read(sample);
    }

    private static byte[] head(Path file) throws InputException {
        return lamella.api.data.TextLines.head(file);
    }

    @Override
    public Draft draft(Path file, List<String> mappings) throws InputException {
        String text = DraftProfile.make(file, mappings);
        ProfileReader.Result r = ProfileReader.read(file, text.getBytes(java.nio.charset.StandardCharsets.UTF_8),
                "made for " + file.getFileName(), "one-off");
        if (r.profile() == null) {
            Finding f = r.findings().get(0);
            throw new InputException(file, null, -1, "the column mapping makes no usable profile: " + f.path()
                    + ": " + f.problem());
        }
        return new Draft(text, new ProfileImporter(r.profile()));
    }

    /** One profile file, for checking before it is published. */
    private static final class OneFile extends ProfileSource {

        private final Path file;

        OneFile(Path file) {
            super("checked");
            this.file = file;
        }

        @Override
        String origin() {
            return file.toString();
        }

        @Override
        Loaded load() {
            try (InputStream in = Files.newInputStream(file)) {
                byte[] b = in.readNBytes(ProfileReader.MAX_BYTES + 1);
                return readAll(List.of(file), Map.of(file, b), Map.of(), origin(), tier);
            } catch (IOException e) {
                return new Loaded(List.of(), List.of(new Finding(file, -1, "", "cannot read: "
                        + ProfileText.reason(e))));
            }
        }

        @Override
        String fingerprint() {
            return file.toString();
        }
    }

    static Optional<Path> folder(String setting, Path base) {
        if (setting == null || setting.isBlank()) {
            return Optional.empty();
        }
        return Optional.of(base.resolve(setting.trim()).toAbsolutePath().normalize());
    }

    static Optional<Path> userFolder(String setting, Path base, Path home) {
        if (setting == null) {
            Path standard = home.resolve(DEFAULT_USER_FOLDER);
            return Files.isDirectory(standard) ? Optional.of(standard) : Optional.empty();
        }
        return folder(setting, base);
    }
}
