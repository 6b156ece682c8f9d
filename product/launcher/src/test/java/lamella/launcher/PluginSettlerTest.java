package lamella.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;
import java.util.jar.Attributes;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;
import java.util.zip.ZipEntry;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class PluginSettlerTest {

    @TempDir
    Path folder;

    @Test
    void aFileThatIsNotAJarIsNamedAsSuch() throws IOException {
        Path junk = Files.writeString(folder.resolve("junk.jar"), "not a jar");
        assertTrue(PluginSettler.unreadable(junk).orElseThrow().startsWith("is not a readable jar: "));
    }

    @Test
    void aJarWithoutAManifestIsNotABundle() throws IOException {
        Path jar = folder.resolve("plain.jar");
        try (JarOutputStream out = new JarOutputStream(Files.newOutputStream(jar))) {
            out.putNextEntry(new ZipEntry("readme.txt"));
        }
        assertEquals(Optional.of("is not a bundle: it has no META-INF/MANIFEST.MF"), PluginSettler.unreadable(jar));
    }

    @Test
    void aJarWithAManifestIsLeftToTheFramework() throws IOException {
        Path jar = folder.resolve("bundle.jar");
        Manifest manifest = new Manifest();
        manifest.getMainAttributes().put(Attributes.Name.MANIFEST_VERSION, "1.0");
        new JarOutputStream(Files.newOutputStream(jar), manifest).close();
        assertEquals(Optional.empty(), PluginSettler.unreadable(jar));
    }

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
