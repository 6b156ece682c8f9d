package lamella.io.profiles;

import java.io.IOException;
import java.io.InputStream;
import java.net.URL;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Enumeration;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import lamella.api.data.ImporterProfiles.Finding;
import org.osgi.framework.Bundle;

/** Where profiles come from: a bundle's folder or a folder on disk, read into profiles and findings. */
abstract class ProfileSource {

    /** What reading a source gave: the sound profiles and the findings about the rest. */
    record Loaded(List<Profile> profiles, List<Finding> findings) {
    }

    final String tier;

    ProfileSource(String tier) {
        this.tier = tier;
    }

    abstract String origin();

    abstract Loaded load();

    /** A value that changes when the source's files do (folders); constant for bundles. */
    abstract String fingerprint();

    static Loaded readAll(List<Path> files, Map<Path, byte[]> bytes, Map<Path, Finding> unreadable, String origin,
                          String tier) {
        List<Profile> profiles = new ArrayList<>();
        List<Finding> findings = new ArrayList<>(unreadable.values());
        Map<String, Path> ids = new HashMap<>();
        for (Path f : files) {
            byte[] b = bytes.get(f);
            if (b == null) {
                continue;
            }
            ProfileReader.Result r = ProfileReader.read(f, b, origin, tier);
            findings.addAll(r.findings());
            if (r.profile() != null) {
                Path before = ids.putIfAbsent(r.profile().id(), f);
                if (before != null) {
                    findings.add(new Finding(f, -1, "profile", "'" + r.profile().id() + "' is also the name of the"
                            + " profile in " + before + "; each profile has its own name"));
                } else {
                    profiles.add(r.profile());
                }
            }
        }
        return new Loaded(profiles, findings);
    }

    /** The *.json files of a folder on disk. */
    static final class Folder extends ProfileSource {

        final Path folder;

        Folder(Path folder, String tier) {
            super(tier);
            this.folder = folder;
        }

        @Override
        String origin() {
            return tier + " profiles, " + folder;
        }

        List<Path> files() throws IOException {
            List<Path> files = new ArrayList<>();
            try (DirectoryStream<Path> ds = Files.newDirectoryStream(folder, "*.json")) {
                for (Path p : ds) {
                    if (Files.isRegularFile(p)) {
                        files.add(p);
                    }
                }
            }
            Collections.sort(files);
            return files;
        }

        @Override
        Loaded load() {
            if (!Files.isDirectory(folder)) {
                return new Loaded(List.of(), List.of(new Finding(folder, -1, "", Files.exists(folder)
                        ? "is not a folder; the " + tier + " profiles setting names a folder of profile files"
                        : "no such folder" + (tier.equals("checked") ? ""
                                : " (named by the " + tier + " profiles setting)"))));
            }
            List<Path> files;
            try {
                files = files();
            } catch (IOException e) {
                return new Loaded(List.of(), List.of(new Finding(folder, -1, "", "cannot list: "
                        + ProfileText.reason(e))));
            }
            Map<Path, byte[]> bytes = new HashMap<>();
            Map<Path, Finding> unreadable = new HashMap<>();
            for (Path f : files) {
                try (InputStream in = Files.newInputStream(f)) {
                    bytes.put(f, in.readNBytes(ProfileReader.MAX_BYTES + 1));
                } catch (IOException e) {
                    unreadable.put(f, new Finding(f, -1, "", "cannot read: " + ProfileText.reason(e)));
                }
            }
            return readAll(files, bytes, unreadable, origin(), tier);
        }

        @Override
        String fingerprint() {
            StringBuilder sb = new StringBuilder();
            try {
                for (Path f : files()) {
                    sb.append(f.getFileName()).append(':').append(Files.size(f)).append(':')
                            .append(Files.getLastModifiedTime(f).toMillis()).append(';');
                }
            } catch (IOException e) {
                sb.append("unreadable ").append(e.getClass().getSimpleName());
            }
            return Files.isDirectory(folder) ? sb.toString() : "missing";
        }
    }

    /** The profile folder of a bundle, named by its manifest. */
    static final class InBundle extends ProfileSource {

        private final Bundle bundle;
        private final String dir;

        InBundle(Bundle bundle, String dir, String tier) {
            super(tier);
            this.bundle = bundle;
            this.dir = dir.endsWith("/") ? dir : dir + "/";
        }

        @Override
        String origin() {
            return "bundle " + bundle.getSymbolicName() + " " + bundle.getVersion();
        }

        @Override
        Loaded load() {
            List<Path> files = new ArrayList<>();
            Map<Path, byte[]> bytes = new HashMap<>();
            Map<Path, Finding> unreadable = new HashMap<>();
            Enumeration<URL> found = bundle.findEntries(dir, "*.json", false);
            List<URL> urls = found == null ? List.of() : Collections.list(found);
            for (URL url : urls) {
                String path = url.getPath();
                Path shown = Path.of(bundle.getSymbolicName() + "!", dir, path.substring(path.lastIndexOf('/') + 1));
                files.add(shown);
                try (InputStream in = url.openStream()) {
                    bytes.put(shown, in.readNBytes(ProfileReader.MAX_BYTES + 1));
                } catch (IOException e) {
                    unreadable.put(shown, new Finding(shown, -1, "", "cannot read: " + ProfileText.reason(e)));
                }
            }
            Collections.sort(files);
            return readAll(files, bytes, unreadable, origin(), tier);
        }

        @Override
        String fingerprint() {
            return bundle.getSymbolicName() + bundle.getLastModified();
        }
    }
}
