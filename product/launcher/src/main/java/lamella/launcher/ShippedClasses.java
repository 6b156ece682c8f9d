package lamella.launcher;

import java.io.File;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.MalformedURLException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;

import org.osgi.framework.BundleActivator;
import org.osgi.framework.BundleException;
import org.osgi.framework.Constants;
import org.osgi.framework.connect.ConnectContent;
import org.osgi.framework.connect.ConnectModule;
import org.osgi.framework.connect.ModuleConnector;

/**
 * The shipped bundles of {@code bundle/} as OSGi Connect modules: the framework reads their manifests and entries
 * from here and loads their classes with one class loader shared by all of them, instead of one loader per bundle
 * that defines every class anew at every start. When the script has put those jars on the JVM's class path, that
 * loader is the JVM's own application loader, whose classes the start-up archive (class-data sharing) holds already
 * parsed and verified: measured, the bundles' start went from some 80 to some 30 ms of a command. Otherwise (a test,
 * or {@code java -jar lib/lamella.launcher.jar}) it is a loader of those jars that looks in them first.
 *
 * <p>The wiring is still the framework's: a bundle resolves only if its imports are met, and a plug-in's classes
 * still come from its own loader, wired to the shipped packages it imports, which are the shared loader's. Shipped
 * bundles may not split a package, which {@code RuntimeScopeIT} checks. Fragments, and bundles with a {@code
 * Bundle-ClassPath} of their own, are left to the framework, as are the desktop feature's bundles. {@code
 * -Dlamella.shipped.classes=false} turns this off: every bundle is then installed as before, with its own loader.
 */
final class ShippedClasses implements ModuleConnector {

    /** Set to {@code false} to install the shipped bundles without OSGi Connect. */
    static final String PROPERTY = "lamella.shipped.classes";

    private final Map<String, Path> jars;
    private final ClassLoader loader;
    private final ShippedManifests manifests;

    private ShippedClasses(Map<String, Path> jars, ClassLoader loader, ShippedManifests manifests) {
        this.jars = jars;
        this.loader = loader;
        this.manifests = manifests;
    }

    /**
     * The connector for {@code shipped}, or none when {@code setting} (the value of {@value #PROPERTY}) is {@code
     * false} or there is nothing to connect.
     *
     * @param manifests the jars' manifests, read already
     * @param classPath the JVM's class path ({@code java.class.path})
     */
    static Optional<ShippedClasses> of(List<Path> shipped, ShippedManifests manifests, String setting,
            String classPath) {
        if ("false".equalsIgnoreCase(setting == null ? "" : setting.trim()) || shipped.isEmpty()) {
            return Optional.empty();
        }
        Map<String, Path> byLocation = new HashMap<>();
        for (Path jar : shipped) {
            byLocation.put(location(jar), jar);
        }
        ClassLoader loader = onClassPath(shipped, classPath)
                ? ClassLoader.getSystemClassLoader()
                : new OwnFirst(shipped, ShippedClasses.class.getClassLoader());
        return Optional.of(new ShippedClasses(Map.copyOf(byLocation), loader, manifests));
    }

    /** The location a shipped jar is installed from when it is connected: its plain file URL. */
    static String location(Path jar) {
        return jar.toUri().toString();
    }

    /** Whether every one of {@code jars} is on {@code classPath}, so that the application loader has its classes. */
    static boolean onClassPath(List<Path> jars, String classPath) {
        if (classPath == null || classPath.isEmpty()) {
            return false;
        }
        Set<Path> entries = new HashSet<>();
        for (String entry : classPath.split(File.pathSeparator)) {
            if (!entry.isEmpty()) {
                entries.add(canonical(Path.of(entry)));
            }
        }
        return jars.stream().allMatch(j -> entries.contains(canonical(j)));
    }

    private static Path canonical(Path p) {
        try {
            return p.toRealPath();
        } catch (IOException e) {
            return p.toAbsolutePath().normalize();
        }
    }

    /** The jars this connects. */
    java.util.Collection<Path> jars() {
        return jars.values();
    }

    /** The loader the connected bundles share. */
    ClassLoader loader() {
        return loader;
    }

    @Override
    public void initialize(File storage, Map<String, String> configuration) {
        // Nothing is kept between runs: every start connects the jars afresh.
    }

    @Override
    public Optional<ConnectModule> connect(String location) throws BundleException {
        Path jar = jars.get(location);
        if (jar == null) {
            return Optional.empty();
        }
        Map<String, String> headers = manifests.of(jar);
        if (headers == null) {
            throw new BundleException("could not read the manifest of " + jar, BundleException.MANIFEST_ERROR);
        }
        String classPath = headers.get(Constants.BUNDLE_CLASSPATH);
        if (headers.containsKey(Constants.FRAGMENT_HOST) || (classPath != null && !classPath.trim().equals("."))) {
            return Optional.empty();
        }
        return Optional.of(() -> new JarContent(jar, headers, loader));
    }

    @Override
    public Optional<BundleActivator> newBundleActivator() {
        return Optional.empty();
    }

    /** A shipped jar's headers and entries, read from the jar; its classes from the shared loader. */
    private static final class JarContent implements ConnectContent {
        private final Path jar;
        private final Map<String, String> headers;
        private final ClassLoader loader;
        private JarFile file;

        JarContent(Path jar, Map<String, String> headers, ClassLoader loader) {
            this.jar = jar;
            this.headers = headers;
            this.loader = loader;
        }

        @Override
        public Optional<Map<String, String>> getHeaders() {
            return Optional.of(headers);
        }

        @Override
        public synchronized Iterable<String> getEntries() throws IOException {
            List<String> names = new ArrayList<>();
            jarFile().stream().forEach(e -> names.add(e.getName()));
            return names;
        }

        @Override
        public synchronized Optional<ConnectEntry> getEntry(String path) {
            try {
                JarFile jarFile = jarFile();
                JarEntry entry = jarFile.getJarEntry(path);
                return entry == null ? Optional.empty() : Optional.of(new Entry(jarFile, entry));
            } catch (IOException e) {
                throw new UncheckedIOException("could not read " + jar, e);
            }
        }

        @Override
        public Optional<ClassLoader> getClassLoader() {
            return Optional.of(loader);
        }

        @Override
        public synchronized void open() throws IOException {
            jarFile();
        }

        private JarFile jarFile() throws IOException {
            if (file == null) {
                file = new JarFile(jar.toFile());
            }
            return file;
        }

        @Override
        public synchronized void close() throws IOException {
            if (file != null) {
                file.close();
                file = null;
            }
        }
    }

    private record Entry(JarFile file, JarEntry entry) implements ConnectContent.ConnectEntry {
        @Override
        public String getName() {
            return entry.getName();
        }

        @Override
        public long getContentLength() {
            return entry.getSize();
        }

        @Override
        public long getLastModified() {
            return entry.getTime();
        }

        @Override
        public InputStream getInputStream() throws IOException {
            return file.getInputStream(entry);
        }
    }

    /**
     * The shipped jars' classes and resources from the jars first, the rest (the JDK, the framework's own packages)
     * from the parent: a test's class path may hold copies of shipped classes, which must not mix with these.
     */
    static final class OwnFirst extends URLClassLoader {
        static {
            registerAsParallelCapable();
        }

        OwnFirst(List<Path> jars, ClassLoader parent) {
            super("lamella-shipped", urls(jars), parent);
        }

        private static URL[] urls(List<Path> jars) {
            URL[] urls = new URL[jars.size()];
            for (int i = 0; i < urls.length; i++) {
                try {
                    urls[i] = jars.get(i).toUri().toURL();
                } catch (MalformedURLException e) {
                    throw new IllegalArgumentException(jars.get(i).toString(), e);
                }
            }
            return urls;
        }

        @Override
        protected Class<?> loadClass(String name, boolean resolve) throws ClassNotFoundException {
            synchronized (getClassLoadingLock(name)) {
                Class<?> c = findLoadedClass(name);
                if (c == null && !name.startsWith("java.")) {
                    try {
                        c = findClass(name);
                    } catch (ClassNotFoundException notOurs) {
                        // the parent's, then
                    }
                }
                if (c == null) {
                    c = getParent().loadClass(name);
                }
                if (resolve) {
                    resolveClass(c);
                }
                return c;
            }
        }

        @Override
        public URL getResource(String name) {
            URL own = findResource(name);
            return own != null ? own : super.getResource(name);
        }
    }
}
