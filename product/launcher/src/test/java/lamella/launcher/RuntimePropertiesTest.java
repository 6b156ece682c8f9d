package lamella.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Map;
import java.util.Properties;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class RuntimePropertiesTest {

    @TempDir
    Path home;

    private final Path storage = Path.of("/tmp/storage-of-this-run");

    private void conf(String text) throws IOException {
        Files.createDirectories(home.resolve("conf"));
        Files.writeString(home.resolve(RuntimeProperties.CONF_FILE), text);
    }

    @Test
    void laterSourcesWinConfThenSystemPropertiesThenOverrides() throws IOException {
        conf("felix.fileinstall.poll=500\nfelix.log.level=1\nds.loglevel=error\n");
        Properties system = new Properties();
        system.setProperty("felix.fileinstall.poll", "200");
        system.setProperty("ds.loglevel", "debug");
        Map<String, String> config = RuntimeProperties.of(home, system, Map.of("ds.loglevel", "warn"), storage);

        assertEquals("200", config.get("felix.fileinstall.poll"));
        assertEquals("1", config.get("felix.log.level"));
        assertEquals("warn", config.get("ds.loglevel"));
    }

    @Test
    void onlyFrameworkSystemPropertiesAreCopied() throws IOException {
        conf("");
        Properties system = new Properties();
        system.setProperty("java.home", "/opt/jdk");
        system.setProperty("lamella.debug", "true");
        system.setProperty("org.osgi.framework.bootdelegation", "sun.*");
        Map<String, String> config = RuntimeProperties.of(home, system, Map.of(), storage);

        assertFalse(config.containsKey("java.home"));
        assertEquals("true", config.get("lamella.debug"));
        assertEquals("sun.*", config.get("org.osgi.framework.bootdelegation"));
    }

    @Test
    void storageIsAlwaysThisRunsOwnAndCleanedOnFirstInit() throws IOException {
        conf("org.osgi.framework.storage=/shared/cache\norg.osgi.framework.storage.clean=none\n");
        Map<String, String> config = RuntimeProperties.of(home, new Properties(), Map.of(), storage);

        assertEquals(storage.toString(), config.get(RuntimeProperties.STORAGE));
        assertEquals("onFirstInit", config.get(RuntimeProperties.STORAGE_CLEAN));
    }

    @Test
    void pluginsFolderIsResolvedAgainstHomeAndWatchedByFileInstall() throws IOException {
        conf("lamella.plugins.dir=drop/here\n");
        Map<String, String> config = RuntimeProperties.of(home, new Properties(), Map.of(), storage);

        String expected = home.resolve("drop/here").toAbsolutePath().normalize().toString();
        assertEquals(expected, config.get(RuntimeProperties.PLUGINS_DIR));
        assertEquals(expected, config.get(RuntimeProperties.FILEINSTALL_DIR));
        assertEquals(home.toAbsolutePath().normalize().toString(), config.get(RuntimeProperties.HOME));
    }

    @Test
    void withoutAPluginsSettingThePluginsFolderOfHomeIsUsed() throws IOException {
        conf("");
        Map<String, String> config = RuntimeProperties.of(home, new Properties(), Map.of(), storage);

        assertEquals(home.resolve("plugins").toAbsolutePath().normalize().toString(),
                config.get(RuntimeProperties.FILEINSTALL_DIR));
    }

    @Test
    void aMissingConfFileIsNamedInTheError() {
        NoSuchFileException e = assertThrows(NoSuchFileException.class,
                () -> RuntimeProperties.of(home, new Properties(), Map.of(), storage));
        assertTrue(e.getMessage().contains(home.resolve("conf/lamella.properties").toString()), e.getMessage());
    }
}
