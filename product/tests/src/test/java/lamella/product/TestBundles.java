package lamella.product;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.jar.Attributes;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;

/** Bundles made at test time: a manifest and nothing else is a valid bundle. */
final class TestBundles {

    private TestBundles() {
    }

    static void write(Path jar, String symbolicName, Map<String, String> extraHeaders) throws IOException {
        Manifest manifest = new Manifest();
        Attributes main = manifest.getMainAttributes();
        main.put(Attributes.Name.MANIFEST_VERSION, "1.0");
        main.putValue("Bundle-ManifestVersion", "2");
        main.putValue("Bundle-SymbolicName", symbolicName);
        main.putValue("Bundle-Version", "1.0.0");
        extraHeaders.forEach(main::putValue);
        // The constructor writes the manifest, and a bundle needs nothing else.
        new JarOutputStream(Files.newOutputStream(jar), manifest).close();
    }
}
