package lamella.materials;

import java.io.IOException;
import java.io.InputStream;
import java.net.JarURLConnection;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.Enumeration;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.jar.Manifest;
import java.util.stream.Stream;
import lamella.api.material.LibraryTier;
import lamella.api.material.MaterialLibrary;

/**
 * The material libraries of a program that runs Lamella's libraries without OSGi (the Spark job): every jar or class
 * folder on a class path whose manifest names a library folder ({@value #HEADER}, as a data bundle's
 * does, or {@value #SHIPPED_HEADER} in a job jar that carries the shipped library after its manifests were merged),
 * and the facility and user folders as the runtime configures them. Each library is read when first asked for, with
 * the same reader, tiers and findings as in the runtime.
 */
public final class PlainLibraries {

    /** The manifest header of a library bundle: the folder inside it that holds its library. */
    public static final String HEADER = "Lamella-Material-Library";
    /** The header a job jar carries for the shipped library it holds. */
    public static final String SHIPPED_HEADER = "Lamella-Shipped-Library";
    /** Lamella's own library bundle, the shipped tier. */
    static final String SHIPPED_BUNDLE = "lamella.materials.shipped";
    /** The runtime's settings of the facility's and the user's library folders. */
    public static final String FACILITY_SETTING = "lamella.materials.facility";
    public static final String USER_SETTING = "lamella.materials.user";
    /** The user folder when {@value #USER_SETTING} is not set, used only if it exists. */
    static final String DEFAULT_USER_FOLDER = ".lamella/materials";

    private PlainLibraries() {
    }

    /** The libraries of every jar or class folder on the class loader's class path, shipped library first. */
    public static List<MaterialLibrary> onClassPath(ClassLoader loader) throws IOException {
        List<MaterialLibrary> shipped = new ArrayList<>();
        List<MaterialLibrary> bundles = new ArrayList<>();
        Set<String> seen = new LinkedHashSet<>();
        Enumeration<URL> manifests = loader.getResources(JarFile.MANIFEST_NAME);
        for (URL url : Collections.list(manifests)) {
            if (!seen.add(url.toString())) {
                continue;
            }
            Manifest manifest;
            try (InputStream in = url.openStream()) {
                manifest = new Manifest(in);
            }
            Attributes main = manifest.getMainAttributes();
            String name = main.getValue("Bundle-SymbolicName");
            String symbolic = name == null ? null : name.split(";")[0].trim();
            String shippedFolder = main.getValue(SHIPPED_HEADER);
            String folder = main.getValue(HEADER);
            if (shippedFolder != null) {
                shipped.add(library(url, shippedFolder.trim(), LibraryTier.SHIPPED, "job jar"));
            } else if (folder != null) {
                LibraryTier tier = tierOf(symbolic);
                String origin = (symbolic == null ? "jar" : symbolic) + " " + main.getValue("Bundle-Version");
                (tier == LibraryTier.SHIPPED ? shipped : bundles).add(library(url, folder.trim(), tier, origin));
            }
        }
        List<MaterialLibrary> all = new ArrayList<>(shipped);
        all.addAll(bundles);
        return all;
    }

    /**
     * The facility and user folders of the runtime's settings ({@code lamella.materials.facility},
     * {@code lamella.materials.user}; a relative folder is taken from {@code base}; an unset user folder is the default
     * one under {@code home} if it exists).
     */
    public static List<MaterialLibrary> configured(String facility, String user, Path base, Path home) {
        List<MaterialLibrary> libraries = new ArrayList<>();
        folder(facility, base).ifPresent(f -> libraries.add(
                new DeferredLibrary(() -> LibraryFolder.read(f, LibraryTier.FACILITY))));
        userFolder(user, base, home).ifPresent(f -> libraries.add(
                new DeferredLibrary(() -> LibraryFolder.read(f, LibraryTier.USER))));
        return libraries;
    }

    /** The configured facility and user folders that are in effect, as {@link #configured} reads them. */
    public static List<Path> configuredFolders(String facility, String user, Path base, Path home) {
        List<Path> folders = new ArrayList<>();
        folder(facility, base).ifPresent(folders::add);
        userFolder(user, base, home).ifPresent(folders::add);
        return folders;
    }

    /** Lamella's own library bundle is the shipped tier; a lab's data bundle ranks above it. */
    static LibraryTier tierOf(String symbolicName) {
        return SHIPPED_BUNDLE.equals(symbolicName) ? LibraryTier.SHIPPED : LibraryTier.BUNDLE;
    }

    /** A configured folder; empty when the setting is absent or blank. Relative paths are the user's. */
    static Optional<Path> folder(String setting, Path base) {
        if (setting == null || setting.isBlank()) {
            return Optional.empty();
        }
        return Optional.of(base.resolve(setting.trim()).toAbsolutePath().normalize());
    }

    /** Unset: the default folder if it exists. Set but blank: no user library. */
    static Optional<Path> userFolder(String setting, Path base, Path home) {
        if (setting == null) {
            Path standard = home.resolve(DEFAULT_USER_FOLDER);
            return Files.isDirectory(standard) ? Optional.of(standard) : Optional.empty();
        }
        return folder(setting, base);
    }

    private static MaterialLibrary library(URL manifest, String folder, LibraryTier tier, String origin)
            throws IOException {
        String dir = folder.endsWith("/") ? folder : folder + "/";
        List<SourceFile> files = new ArrayList<>();
        String where;
        if ("jar".equals(manifest.getProtocol())) {
            JarURLConnection c = (JarURLConnection) manifest.openConnection();
            c.setUseCaches(false);
            URL jarUrl = c.getJarFileURL();
            Path jar = path(jarUrl);
            where = jar.getFileName() + "!/" + dir;
            try (JarFile jf = new JarFile(jar.toFile())) {
                for (JarEntry e : Collections.list(jf.entries())) {
                    String n = e.getName();
                    if (n.startsWith(dir) && n.endsWith(".json") && n.indexOf('/', dir.length()) < 0) {
                        String entry = n;
                        files.add(new SourceFile(where + n.substring(dir.length()), n.substring(dir.length()),
                                () -> new URL("jar:" + jarUrl + "!/" + entry).openStream()));
                    }
                }
            }
        } else {
            Path root = path(manifest).getParent().getParent();
            Path libraryFolder = root.resolve(dir);
            where = libraryFolder.toString();
            if (Files.isDirectory(libraryFolder)) {
                try (Stream<Path> s = Files.list(libraryFolder)) {
                    s.filter(p -> p.getFileName().toString().endsWith(".json")).sorted().forEach(p -> files.add(
                            new SourceFile(p.toString(), p.getFileName().toString(), () -> Files.newInputStream(p))));
                }
            }
        }
        files.sort((a, b) -> a.name().compareTo(b.name()));
        String location = origin + ", " + where;
        return new DeferredLibrary(() -> LibraryReader.read(tier, location, files));
    }

    private static Path path(URL url) throws IOException {
        try {
            return Path.of(url.toURI());
        } catch (URISyntaxException | IllegalArgumentException e) {
            throw new IOException("not a file on this machine: " + url, e);
        }
    }
}
