package lamella.materials;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.jar.Attributes;
import java.util.jar.JarEntry;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;
import java.util.stream.Stream;
import lamella.api.material.LibraryTier;
import lamella.api.material.MaterialLibrary;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Libraries found without OSGi, as the Spark job finds them: by the manifest header of a class folder or jar on a
 * class path, and in the configured folders. The same entries as the bundle extender and the folder reader give.
 */
class PlainLibrariesTest {

    @TempDir
    Path dir;

    static Manifest manifest(String symbolicName, String header, String folder) {
        Manifest m = new Manifest();
        m.getMainAttributes().put(Attributes.Name.MANIFEST_VERSION, "1.0");
        if (symbolicName != null) {
            m.getMainAttributes().putValue("Bundle-SymbolicName", symbolicName);
            m.getMainAttributes().putValue("Bundle-Version", "1.2.0");
        }
        m.getMainAttributes().putValue(header, folder);
        return m;
    }

    static List<MaterialLibrary> onClassPath(Path... entries) throws IOException {
        URL[] urls = new URL[entries.length];
        for (int i = 0; i < entries.length; i++) {
            urls[i] = entries[i].toUri().toURL();
        }
        try (URLClassLoader loader = new URLClassLoader(urls, null)) {
            return PlainLibraries.onClassPath(loader);
        }
    }

    @Test
    void aDataBundleJarAndTheShippedLibraryInAJobJarAreFoundWithTheirTiers() throws IOException {
        // A lab's data bundle as a class folder, and a job jar holding the shipped library under its own header.
        Path data = dir.resolve("lab-data");
        Folders.library(data.resolve("lib"), "lab-films", "Lab films (invented)");
        Folders.file(data.resolve("lib"), "films.json", Folders.entries("""
                {"id": "lab-oxide", "name": "lab oxide film (invented)", "version": 1,
                 "source": "invented for a test", "properties": {
                   "k_w_mk": {"value": 1.1, "range_k": [290, 310], "uncertainty_rel": 0.05},
                   "heat_capacity_j_m3k": {"value": 1.7e6, "range_k": [290, 310], "uncertainty_rel": 0.03}}}"""));
        Files.createDirectories(data.resolve("META-INF"));
        try (OutputStream out = Files.newOutputStream(data.resolve("META-INF/MANIFEST.MF"))) {
            manifest("lab.films.data", PlainLibraries.HEADER, "lib/").write(out);
        }
        Path job = dir.resolve("job.jar");
        try (JarOutputStream jar = new JarOutputStream(Files.newOutputStream(job),
                manifest(null, PlainLibraries.SHIPPED_HEADER, "materials/"));
             Stream<Path> shipped = Files.list(Folders.SHIPPED)) {
            for (Path f : shipped.sorted().toList()) {
                jar.putNextEntry(new JarEntry("materials/" + f.getFileName()));
                jar.write(Files.readAllBytes(f));
                jar.closeEntry();
            }
        }
        List<MaterialLibrary> found = onClassPath(data, job);
        assertEquals(2, found.size());
        MaterialLibrary shipped = found.get(0);
        assertEquals(LibraryTier.SHIPPED, shipped.info().tier());
        assertTrue(shipped.findings().isEmpty(), shipped.findings().toString());
        assertEquals(LibraryFolder.read(Folders.SHIPPED, LibraryTier.SHIPPED).materials().size(),
                shipped.materials().size());
        MaterialLibrary lab = found.get(1);
        assertEquals(LibraryTier.BUNDLE, lab.info().tier());
        assertEquals("lab-films", lab.info().id());
        assertEquals(1, lab.materials().size(), lab.findings().toString());
        assertTrue(lab.info().location().contains("lab.films.data"), lab.info().location());
    }

    @Test
    void configuredFoldersAreTheFacilityAndUserTiersAndAnUnsetUserFolderIsTheDefaultOneIfItExists()
            throws IOException {
        Path home = dir.resolve("home");
        Folders.library(home.resolve(PlainLibraries.DEFAULT_USER_FOLDER), "mine", "My own (invented)");
        List<MaterialLibrary> libraries = PlainLibraries.configured(Folders.DEMO_FACILITY.toAbsolutePath().toString(), null,
                dir, home);
        assertEquals(2, libraries.size());
        assertEquals(LibraryTier.FACILITY, libraries.get(0).info().tier());
        assertTrue(libraries.get(0).materials().size() > 0);
        assertEquals(LibraryTier.USER, libraries.get(1).info().tier());
        assertEquals("mine", libraries.get(1).info().id());
        assertEquals(0, PlainLibraries.configured(" ", "", dir, home).size(), "blank settings: no library");
    }
}
