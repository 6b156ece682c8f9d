package lamella.launcher;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Properties;

/**
 * The framework configuration of one run. Later sources win: the runtime's {@code conf/lamella.properties}, then
 * {@code -D} options on the java command line (Felix would not see them otherwise), then the caller's overrides.
 * The storage settings and the FileInstall folder are always the launcher's own.
 */
final class RuntimeProperties {

    static final String CONF_FILE = "conf/lamella.properties";
    static final String HOME = "lamella.home";
    static final String PLUGINS_DIR = "lamella.plugins.dir";
    static final String FILEINSTALL_DIR = "felix.fileinstall.dir";
    static final String STORAGE = "org.osgi.framework.storage";
    static final String STORAGE_CLEAN = "org.osgi.framework.storage.clean";

    /** System properties with these prefixes are framework or bundle settings; the rest belong to the JVM. */
    static final List<String> FRAMEWORK_PREFIXES = List.of("org.osgi.", "org.apache.felix.", "felix.", "ds.", "lamella.");

    private RuntimeProperties() {
    }

    static Map<String, String> of(Path home, Properties system, Map<String, String> overrides, Path storage)
            throws IOException {
        Map<String, String> config = new HashMap<>();
        config.put(PLUGINS_DIR, "plugins");
        config.putAll(readConf(home));
        system.stringPropertyNames().stream()
                .filter(RuntimeProperties::isFrameworkProperty)
                .forEach(name -> config.put(name, system.getProperty(name)));
        config.putAll(overrides);

        Path plugins = home.resolve(config.get(PLUGINS_DIR)).toAbsolutePath().normalize();
        config.put(HOME, home.toAbsolutePath().normalize().toString());
        config.put(PLUGINS_DIR, plugins.toString());
        config.put(FILEINSTALL_DIR, plugins.toString());
        config.put(STORAGE, storage.toString());
        config.put(STORAGE_CLEAN, "onFirstInit");
        return config;
    }

    static boolean isFrameworkProperty(String name) {
        return FRAMEWORK_PREFIXES.stream().anyMatch(name::startsWith);
    }

    private static Map<String, String> readConf(Path home) throws IOException {
        Path file = home.resolve(CONF_FILE);
        Properties properties = new Properties();
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            properties.load(in);
        } catch (NoSuchFileException e) {
            throw new NoSuchFileException(file.toString(), null, "the runtime's framework settings are missing");
        }
        Map<String, String> values = new HashMap<>();
        properties.stringPropertyNames().forEach(name -> values.put(name, properties.getProperty(name)));
        return values;
    }
}
