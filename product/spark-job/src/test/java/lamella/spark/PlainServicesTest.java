package lamella.spark;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Set;
import java.util.TreeSet;
import lamella.api.HeatingGeometry;
import lamella.api.Technique;
import org.junit.jupiter.api.Test;

/**
 * The geometries and techniques the job wires without OSGi: every one the runtime ships, and a lab's geometry from a
 * plug-in jar outside the product (examples/lamella.example.linepair, built by the root build before this module).
 */
class PlainServicesTest {

    static final Path LAB_JAR = Path.of(
            "../../examples/lamella.example.linepair/target/lamella.example.linepair-1.0.0-SNAPSHOT.jar");

    static Set<String> types(PlainServices s) {
        Set<String> t = new TreeSet<>();
        for (HeatingGeometry g : s.geometries) {
            t.add("geometry " + g.type());
        }
        for (Technique q : s.techniques) {
            t.add("technique " + q.type());
        }
        return t;
    }

    @Test
    void everyShippedGeometryAndTechniqueAndALabsPlugInJarAreFound() throws Exception {
        assertTrue(Files.isRegularFile(LAB_JAR), "build the root project first: " + LAB_JAR);
        PlainServices shipped = PlainServices.find(getClass().getClassLoader());
        Set<String> own = types(shipped);
        for (String want : new String[] {"geometry gaussian", "geometry point", "geometry ring", "geometry line",
                "geometry elliptic", "geometry line-film-difference", "technique tdtr", "technique fdtr", "technique sstr",
                "technique 3omega", "technique 3omega-voltage"}) {
            assertTrue(own.contains(want), want + " missing from " + own);
        }
        assertTrue(shipped.skipped.isEmpty(), shipped.skipped.toString());
        try (URLClassLoader withLab = new URLClassLoader(new URL[] {LAB_JAR.toUri().toURL()},
                getClass().getClassLoader())) {
            Set<String> all = types(PlainServices.find(withLab));
            assertTrue(all.contains("geometry line-pair"), all.toString());
            assertEquals(own.size() + 1, all.size(), all.toString());
        }
    }
}
