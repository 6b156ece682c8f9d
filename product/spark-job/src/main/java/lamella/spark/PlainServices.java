package lamella.spark;

import java.io.IOException;
import java.io.InputStream;
import java.net.JarURLConnection;
import java.net.URISyntaxException;
import java.net.URL;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.jar.JarEntry;
import java.util.jar.JarFile;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import lamella.api.HeatingGeometry;
import lamella.api.Technique;
import org.w3c.dom.Document;
import org.w3c.dom.Element;
import org.w3c.dom.NodeList;
import org.xml.sax.SAXException;

/**
 * The geometries and techniques on a class path, found as the framework finds them: from the Declarative Services
 * descriptors ({@code OSGI-INF/*.xml}) of every jar or class folder — Lamella's own and any plug-in jar shipped with
 * the job — and made with their public no-argument constructors. A component that needs other services
 * ({@code reference} elements) cannot be wired here and is named in {@link #skipped}.
 */
final class PlainServices {

    final List<HeatingGeometry> geometries = new ArrayList<>();
    final List<Technique> techniques = new ArrayList<>();
    final List<String> skipped = new ArrayList<>();

    private PlainServices() {
    }

    static PlainServices find(ClassLoader loader) throws IOException {
        Map<String, Descriptor> byClass = new LinkedHashMap<>();
        for (URL manifest : Collections.list(loader.getResources(JarFile.MANIFEST_NAME))) {
            for (Descriptor d : descriptors(manifest)) {
                byClass.putIfAbsent(d.implementation, d);
            }
        }
        PlainServices found = new PlainServices();
        for (Descriptor d : byClass.values()) {
            boolean geometry = d.provides.contains(HeatingGeometry.class.getName());
            boolean technique = d.provides.contains(Technique.class.getName());
            if (!geometry && !technique) {
                continue;
            }
            if (d.references) {
                found.skipped.add(d.implementation + " (needs other services)");
                continue;
            }
            Object o;
            try {
                o = loader.loadClass(d.implementation).getConstructor().newInstance();
            } catch (ReflectiveOperationException | LinkageError e) {
                found.skipped.add(d.implementation + " (cannot be created here: " + e.getMessage() + ")");
                continue;
            }
            if (geometry) {
                found.geometries.add((HeatingGeometry) o);
            }
            if (technique) {
                found.techniques.add((Technique) o);
            }
        }
        return found;
    }

    private record Descriptor(String implementation, List<String> provides, boolean references) {
    }

    private static List<Descriptor> descriptors(URL manifest) throws IOException {
        List<Descriptor> out = new ArrayList<>();
        if ("jar".equals(manifest.getProtocol())) {
            JarURLConnection c = (JarURLConnection) manifest.openConnection();
            c.setUseCaches(false);
            try (JarFile jar = new JarFile(path(c.getJarFileURL()).toFile())) {
                for (JarEntry e : Collections.list(jar.entries())) {
                    if (isDescriptor(e.getName())) {
                        try (InputStream in = jar.getInputStream(e)) {
                            parse(in, manifest + " " + e.getName(), out);
                        }
                    }
                }
            }
        } else if ("file".equals(manifest.getProtocol())) {
            Path folder = path(manifest).getParent().getParent().resolve("OSGI-INF");
            if (Files.isDirectory(folder)) {
                try (Stream<Path> s = Files.list(folder)) {
                    for (Path p : (Iterable<Path>) s.sorted()::iterator) {
                        if (p.getFileName().toString().endsWith(".xml")) {
                            try (InputStream in = Files.newInputStream(p)) {
                                parse(in, p.toString(), out);
                            }
                        }
                    }
                }
            }
        }
        return out;
    }

    private static boolean isDescriptor(String entry) {
        return entry.startsWith("OSGI-INF/") && entry.endsWith(".xml") && entry.indexOf('/', 9) < 0;
    }

    private static void parse(InputStream in, String where, List<Descriptor> out) throws IOException {
        Document doc;
        try {
            DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
            f.setNamespaceAware(true);
            f.setFeature("http://apache.org/xml/features/disallow-doctype-decl", true);
            doc = f.newDocumentBuilder().parse(in);
        } catch (ParserConfigurationException | SAXException e) {
            throw new IOException(where + ": not a component descriptor: " + e.getMessage(), e);
        }
        Element root = doc.getDocumentElement();
        if (!"component".equals(root.getLocalName())) {
            return;
        }
        NodeList impl = root.getElementsByTagNameNS("*", "implementation");
        if (impl.getLength() == 0) {
            impl = root.getElementsByTagName("implementation");
        }
        if (impl.getLength() == 0) {
            return;
        }
        String cls = ((Element) impl.item(0)).getAttribute("class");
        List<String> provides = new ArrayList<>();
        NodeList p = root.getElementsByTagName("provide");
        for (int i = 0; i < p.getLength(); i++) {
            provides.add(((Element) p.item(i)).getAttribute("interface"));
        }
        boolean references = root.getElementsByTagName("reference").getLength() > 0;
        out.add(new Descriptor(cls, provides, references));
    }

    private static Path path(URL url) throws IOException {
        try {
            return Path.of(url.toURI());
        } catch (URISyntaxException | IllegalArgumentException e) {
            throw new IOException("not a file on this machine: " + url, e);
        }
    }
}
