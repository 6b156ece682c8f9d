package lamella.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.Optional;

import org.junit.jupiter.api.Test;

class PluginSettlerTest {

    @Test
    void aFileLocationNamesTheJar() {
        Path jar = Path.of("/opt/lamella/plugins/my plugin.jar");
        assertEquals(Optional.of(jar), PluginSettler.fileOf(jar.toUri().toString()));
    }

    @Test
    void shippedBundlesInstalledByReferenceAreNotPluginFiles() {
        assertTrue(PluginSettler.fileOf("reference:file:/opt/lamella/bundle/a.jar").isEmpty());
        assertTrue(PluginSettler.fileOf("System Bundle").isEmpty());
    }
}
