package lamella.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.jar.Attributes;
import java.util.jar.JarOutputStream;
import java.util.jar.Manifest;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.Version;

/**
 * Reading the shipped manifests before the framework starts: the header syntax of the OSGi core specification
 * (3.2.4), the help layer's closure and the system bundle's packages. Common practice, no source.
 */
class ShippedManifestsTest {

    private static final String COMMAND = "lab.Command";

    @TempDir
    Path dir;

    @Test
    void clausesSplitOutsideQuotesAndKeepTypedAttributes() {
        List<ShippedManifests.Clause> clauses = ShippedManifests.Clause.parse(
                "a.b;version=\"1.2\";uses:=\"x.y,z.w\", c.d;e.f;resolution:=optional,"
                        + "osgi.service;objectClass:List<String>=\"p.Q,p.R\";rank:Long=3;v:Version=\"1.10.0\"");
        assertEquals(3, clauses.size());
        assertEquals(List.of("a.b"), clauses.get(0).names());
        assertEquals("x.y,z.w", clauses.get(0).directives().get("uses"));
        assertEquals("1.2", clauses.get(0).attributes().get("version"));
        assertEquals(List.of("c.d", "e.f"), clauses.get(1).names());
        assertTrue(clauses.get(1).optional());
        assertFalse(clauses.get(0).optional());
        ShippedManifests.Clause service = clauses.get(2);
        assertEquals(List.of("p.Q", "p.R"), service.typed("objectClass"));
        assertEquals(3L, service.typed("rank"));
        assertEquals(new Version(1, 10, 0), service.typed("v"));
        assertEquals(List.of(), ShippedManifests.Clause.parse(null));
    }

    /**
     * cmd provides a command; it needs the service api.Store (mandatory), the extender osgi.component (version 1.5,
     * which a lexical comparison would get wrong against 1.10) and the package lib.p; it wants api.Extra only
     * optionally. store provides api.Store; lib exports lib.p and has a fragment; extra provides api.Extra; scr
     * provides the extender; other is needed by no one.
     */
    @Test
    void theHelpLayerFollowsMandatoryServicesExtendersPackagesAndFragmentsOnly() throws IOException {
        Path cmd = jar("cmd", Map.of(
                "Provide-Capability", "osgi.service;objectClass:List<String>=\"" + COMMAND + "\"",
                "Require-Capability", "osgi.service;filter:=\"(objectClass=api.Store)\";effective:=active,"
                        + "osgi.service;filter:=\"(objectClass=api.Extra)\";effective:=active;resolution:=optional,"
                        + "osgi.extender;filter:=\"(&(osgi.extender=osgi.component)(version>=1.5.0)"
                        + "(!(version>=2.0.0)))\"",
                "Import-Package", "lib.p;version=\"[1.0,2)\",opt.q;resolution:=optional,java.util"));
        Path store = jar("store", Map.of("Provide-Capability", "osgi.service;objectClass:List<String>=\"api.Store\""));
        Path lib = jar("lib", Map.of("Export-Package", "lib.p;version=\"1.1\";uses:=\"lib.q,lib.r\""));
        Path fragment = jar("lib.fragment", Map.of("Fragment-Host", "lib;bundle-version=\"[1,2)\""));
        Path extra = jar("extra", Map.of("Provide-Capability", "osgi.service;objectClass:List<String>=\"api.Extra\"",
                "Export-Package", "opt.q"));
        Path scr = jar("scr", Map.of("Provide-Capability",
                "osgi.extender;osgi.extender=\"osgi.component\";version:Version=\"1.10.0\""));
        Path other = jar("other", Map.of("Export-Package", "other.p"));
        List<Path> all = List.of(other, scr, extra, fragment, lib, store, cmd);
        ShippedManifests manifests = ShippedManifests.read(all);
        assertEquals(List.of(scr, fragment, lib, store, cmd), manifests.helpLayer(all, COMMAND));
        // The workbench's first layer also holds the exporter of what is imported optionally (extra exports opt.q),
        // so that it is wired as with every jar there; an optional service (api.Extra) alone would not pull it in.
        assertEquals(List.of(scr, extra, fragment, lib, store, cmd), manifests.layer(all, cmd::equals));
        // Manifests read later join those read before.
        ShippedManifests part = ShippedManifests.read(List.of(other, scr, extra, fragment, lib, store));
        assertEquals(List.of(scr, extra, fragment, lib, store, cmd), part.with(List.of(cmd)).layer(all, cmd::equals));
    }

    /**
     * bnd's reference filters, {@code (objectClass=TYPE)}, are matched by the type's name; any other filter as the
     * framework reads it, and one it cannot read counts as met.
     */
    @Test
    void requirementsMatchTheirFiltersWhetherPlainTypesOrNot() {
        assertEquals("a.b.C", ShippedManifests.Requirement.onlyType("(objectClass=a.b.C)"));
        assertNull(ShippedManifests.Requirement.onlyType("(objectClass=a.b.*)"));
        assertNull(ShippedManifests.Requirement.onlyType("(&(objectClass=a.b.C)(x=1))"));
        assertNull(ShippedManifests.Requirement.onlyType("(objectClass=)"));
        Map<String, Object> store = Map.of("objectClass", List.of("api.Other", "api.Store"));
        assertTrue(ShippedManifests.Requirement.of("osgi.service", "(objectClass=api.Store)").matches(store));
        assertFalse(ShippedManifests.Requirement.of("osgi.service", "(objectClass=api.Extra)").matches(store));
        assertTrue(ShippedManifests.Requirement.of("osgi.service", "(objectClass=api.St*)").matches(store));
        assertFalse(ShippedManifests.Requirement.of("osgi.service", "(&(objectClass=api.Store)(x=1))")
                .matches(store));
        assertTrue(ShippedManifests.Requirement.of("osgi.service", "(objectClass=api.Store").matches(store),
                "an unreadable filter is the framework's to judge");
        assertTrue(ShippedManifests.Requirement.of("osgi.service", null).matches(store));
    }

    /** A jar whose manifest cannot be read is taken to need, and be needed by, everything: nothing is left out. */
    @Test
    void aJarWithoutAManifestKeepsEverythingIn() throws IOException {
        Path cmd = jar("cmd", Map.of("Provide-Capability", "osgi.service;objectClass:List<String>=\"" + COMMAND
                + "\""));
        Path broken = dir.resolve("broken.jar");
        Files.writeString(broken, "not a jar");
        Path other = jar("other", Map.of());
        ShippedManifests manifests = ShippedManifests.read(List.of(cmd, broken, other));
        assertEquals(List.of(cmd, broken, other), manifests.helpLayer(List.of(cmd, broken, other), COMMAND));
        assertEquals("", manifests.systemPackages(List.of(cmd, broken), "org.osgi.framework;version=\"1.10\"",
                Set.of("java.util")));
    }

    @Test
    void theSystemPackagesAreTheFrameworksAndThePlatformPackagesImportedAndNotExported() throws IOException {
        Path a = jar("a", Map.of("Import-Package", "java.util,javax.xml.parsers,org.osgi.framework;version=\"[1.10,2)\","
                + "b.p,com.nowhere;resolution:=optional,java.util.function"));
        Path b = jar("b", Map.of("Export-Package", "b.p", "Import-Package", "java.util"));
        ShippedManifests manifests = ShippedManifests.read(List.of(a, b));
        String own = "org.osgi.framework;version=\"1.10\", org.osgi.util.tracker;version=\"1.5.3\"";
        String packages = manifests.systemPackages(List.of(a, b), own,
                Set.of("java.util", "java.util.function", "javax.xml.parsers", "org.osgi.framework", "java.net.http"));
        assertEquals(own + ",java.util,javax.xml.parsers,java.util.function", packages);
    }

    @Test
    void felixsOwnExportsAndThePlatformsPackagesAreRead() {
        String own = ShippedManifests.frameworkExports();
        assertNotNull(own);
        assertTrue(own.startsWith("org.osgi.framework;version="), own);
        Set<String> platform = ShippedManifests.platformPackages();
        assertTrue(platform.containsAll(Set.of("java.lang", "java.util", "javax.xml.parsers")), platform.toString());
        assertFalse(platform.contains("sun.nio.ch"), "a package the platform does not export to all");
    }

    private Path jar(String name, Map<String, String> headers) throws IOException {
        Manifest manifest = new Manifest();
        Attributes main = manifest.getMainAttributes();
        main.put(Attributes.Name.MANIFEST_VERSION, "1.0");
        main.putValue("Bundle-ManifestVersion", "2");
        main.putValue("Bundle-SymbolicName", name);
        headers.forEach(main::putValue);
        Path jar = dir.resolve(name + ".jar");
        try (OutputStream out = Files.newOutputStream(jar); JarOutputStream j = new JarOutputStream(out, manifest)) {
            j.flush();
        }
        return jar;
    }
}
