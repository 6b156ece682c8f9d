package lamella.launcher;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.jar.Attributes;
import java.util.jar.JarFile;
import java.util.jar.Manifest;

import org.osgi.framework.Constants;
import org.osgi.framework.Filter;
import org.osgi.framework.FrameworkUtil;
import org.osgi.framework.InvalidSyntaxException;
import org.osgi.framework.Version;

/**
 * The manifests of the shipped jars, read once before the framework starts, and what the launcher reads from them:
 * the packages the framework's system bundle must export for them ({@link #systemPackages}), and the jars a run that
 * only shows help must install ({@link #helpLayer}). A jar whose manifest cannot be read is left for the framework
 * to report when it is installed.
 */
final class ShippedManifests {

    private static final String SERVICE_NAMESPACE = "osgi.service";
    private static final String EXTENDER_NAMESPACE = "osgi.extender";

    private final Map<Path, Map<String, String>> headers;
    /** Each jar's headers parsed, once: the system packages and the help layer both read them. */
    private final Map<Path, Wiring> wirings = new HashMap<>();

    private ShippedManifests(Map<Path, Map<String, String>> headers) {
        this.headers = headers;
    }

    private Wiring wiring(Path jar) {
        return wirings.computeIfAbsent(jar, j -> Wiring.of(headers.get(j)));
    }

    static ShippedManifests read(List<Path> jars) {
        Map<Path, Map<String, String>> headers = new LinkedHashMap<>();
        for (Path jar : jars) {
            try (JarFile file = new JarFile(jar.toFile())) {
                Manifest manifest = file.getManifest();
                if (manifest != null) {
                    Map<String, String> main = new HashMap<>();
                    for (Map.Entry<Object, Object> e : manifest.getMainAttributes().entrySet()) {
                        main.put(((Attributes.Name) e.getKey()).toString(), (String) e.getValue());
                    }
                    headers.put(jar, Collections.unmodifiableMap(main));
                }
            } catch (IOException unreadable) {
                // the framework says so when it installs the jar
            }
        }
        return new ShippedManifests(headers);
    }

    /** These manifests and those of {@code more}, read now. */
    ShippedManifests with(List<Path> more) {
        Map<Path, Map<String, String>> all = new LinkedHashMap<>(headers);
        all.putAll(read(more).headers);
        return new ShippedManifests(all);
    }

    /** The packages the modules of the JVM's boot layer export to all. */
    static Set<String> platformPackages() {
        Set<String> packages = new java.util.HashSet<>();
        for (Module m : ModuleLayer.boot().modules()) {
            for (java.lang.module.ModuleDescriptor.Exports e : m.getDescriptor().exports()) {
                if (!e.isQualified()) {
                    packages.add(e.source());
                }
            }
        }
        return packages;
    }

    /**
     * Felix's own framework packages, as its default settings export them ({@code osgi-exports}: the clauses with
     * their versions and uses); null when they cannot be read.
     */
    static String frameworkExports() {
        // The framework's own copy, which it reads once per process anyway (and the warm-up thread has read).
        // Its logger is told to say nothing: when the defaults are missing the framework itself says so later.
        org.apache.felix.framework.Logger quiet = new org.apache.felix.framework.Logger();
        quiet.setLogLevel(0);
        java.util.Properties defaults = org.apache.felix.framework.util.Util.loadDefaultProperties(quiet);
        String exports = defaults.getProperty("osgi-exports");
        return exports == null || exports.isBlank() || exports.contains("${") ? null : exports.trim();
    }

    /** A jar's main manifest headers, or null when it has none or could not be read. */
    Map<String, String> of(Path jar) {
        return headers.get(jar);
    }

    /**
     * The framework's own packages ({@link #frameworkExports}) and every package that one of
     * {@code jars} imports and none of them exports: the Java platform's packages these bundles use. Felix's
     * default exports every package of every platform module, some hundreds, which it parses at every start.
     * Empty when a jar's manifest is unknown: the framework's default is then the safe one.
     *
     * @param frameworkExports  the framework's own exports ({@link #frameworkExports})
     * @param platformPackages  the packages the Java platform exports
     */
    String systemPackages(List<Path> jars, String frameworkExports, Set<String> platformPackages) {
        Set<String> frameworkPackages = new java.util.HashSet<>();
        for (Clause c : Clause.parse(frameworkExports)) {
            frameworkPackages.addAll(c.names());
        }
        Set<String> imported = new LinkedHashSet<>();
        Set<String> exported = new java.util.HashSet<>();
        for (Path jar : jars) {
            Wiring w = wiring(jar);
            if (!w.known()) {
                return "";
            }
            imported.addAll(w.allImports());
            exported.addAll(w.exports());
        }
        StringBuilder packages = new StringBuilder(frameworkExports);
        for (String p : imported) {
            if (!exported.contains(p) && !frameworkPackages.contains(p) && platformPackages.contains(p)) {
                packages.append(',').append(p);
            }
        }
        return packages.toString();
    }

    /**
     * The jars of {@code jars} a run that only shows help needs installed: those that register a service of type
     * {@code seedType} and, transitively, the providers of their mandatory service and extender requirements, the
     * exporters of the packages they import (unless optional), the bundles they require, and the fragments of any of
     * these. In the order given.
     */
    List<Path> helpLayer(List<Path> jars, String seedType) {
        return closure(jars, jar -> wiring(jar).provides(seedType), false);
    }

    /**
     * The jars of {@code jars} that {@code seed} picks and, transitively, those they resolve against or cannot work
     * without ({@link #helpLayer}'s relations), the exporters of packages they import optionally too: installed and
     * resolved without the others, they are wired as they would be with every jar there. In the order given.
     */
    List<Path> layer(List<Path> jars, java.util.function.Predicate<Path> seed) {
        return closure(jars, seed, true);
    }

    /**
     * The seeds of {@code jars} and, transitively, the jars they need, in the order given: a jar needs the exporters of
     * the packages it imports (of those imported optionally too when {@code optionalImports}), the bundles it requires,
     * its fragments, the providers of its mandatory service and extender requirements, and any jar whose headers are
     * unknown (one with unknown headers needs every jar). What
     * each jar offers is indexed once (exporters by package, bundles by name, fragments by host, capabilities by
     * namespace), so that a jar's needs are looked up rather than tried against every other jar: the pairwise test,
     * some 1,200 pairs of interpreted set lookups, was half of the help layer's cost at start-up.
     */
    private List<Path> closure(List<Path> jars, java.util.function.Predicate<Path> seed, boolean optionalImports) {
        Map<String, List<Path>> exporters = new HashMap<>();
        Map<String, List<Path>> named = new HashMap<>();
        Map<String, List<Path>> fragments = new HashMap<>();
        Map<String, List<Map.Entry<Path, Integer>>> offers = new HashMap<>();
        List<Path> unknown = new ArrayList<>();
        for (Path jar : jars) {
            Wiring w = wiring(jar);
            if (!w.known()) {
                unknown.add(jar);
                continue;
            }
            for (String p : w.exports()) {
                exporters.computeIfAbsent(p, k -> new ArrayList<>()).add(jar);
            }
            if (w.name() != null) {
                named.computeIfAbsent(w.name(), k -> new ArrayList<>()).add(jar);
            }
            if (w.host() != null) {
                fragments.computeIfAbsent(w.host(), k -> new ArrayList<>()).add(jar);
            }
            for (int i = 0; i < w.capabilities().size(); i++) {
                for (String namespace : w.capabilities().get(i).names()) {
                    offers.computeIfAbsent(namespace, k -> new ArrayList<>()).add(Map.entry(jar, i));
                }
            }
        }
        return CommandLayer.closureOf(jars, seed, from -> {
            Wiring w = wiring(from);
            List<Path> needed = new ArrayList<>(unknown);
            if (!w.known()) {
                needed.addAll(jars); // unknown headers: it may need anything
                return needed;
            }
            for (String p : optionalImports ? w.allImports() : w.imports()) {
                needed.addAll(exporters.getOrDefault(p, List.of()));
            }
            for (String b : w.requiredBundles()) {
                needed.addAll(named.getOrDefault(b, List.of()));
            }
            if (w.name() != null) {
                needed.addAll(fragments.getOrDefault(w.name(), List.of())); // a host brings its fragments
            }
            for (Requirement r : w.requirements()) {
                for (Map.Entry<Path, Integer> offer : offers.getOrDefault(r.namespace, List.of())) {
                    if (r.matches(wiring(offer.getKey()).typed().get(offer.getValue()))) {
                        needed.add(offer.getKey());
                    }
                }
            }
            return needed;
        });
    }

    /** What one jar's manifest says it offers and needs, parsed once. */
    private record Wiring(boolean known, String name, String host, Set<String> exports, Set<String> imports,
            Set<String> allImports, Set<String> requiredBundles, List<Clause> capabilities, List<Map<String, Object>> typed,
            List<Requirement> requirements) {

        static Wiring of(Map<String, String> h) {
            if (h == null) {
                return new Wiring(false, null, null, Set.of(), Set.of(), Set.of(), Set.of(), List.of(), List.of(),
                        List.of());
            }
            Set<String> exports = new java.util.HashSet<>();
            for (Clause c : Clause.parse(h.get(Constants.EXPORT_PACKAGE))) {
                exports.addAll(c.names());
            }
            Set<String> imports = new java.util.HashSet<>();
            Set<String> allImports = new LinkedHashSet<>();
            for (Clause c : Clause.parse(h.get(Constants.IMPORT_PACKAGE))) {
                allImports.addAll(c.names());
                if (!c.optional()) {
                    imports.addAll(c.names());
                }
            }
            Set<String> required = new java.util.HashSet<>();
            for (Clause c : Clause.parse(h.get(Constants.REQUIRE_BUNDLE))) {
                if (!c.optional()) {
                    required.addAll(c.names());
                }
            }
            List<Requirement> requirements = new ArrayList<>();
            for (Clause r : Clause.parse(h.get(Constants.REQUIRE_CAPABILITY))) {
                if (r.optional()) {
                    continue;
                }
                for (String namespace : r.names()) {
                    if (namespace.equals(SERVICE_NAMESPACE) || namespace.equals(EXTENDER_NAMESPACE)) {
                        requirements.add(Requirement.of(namespace, r.directives().get(Constants.FILTER_DIRECTIVE)));
                    }
                }
            }
            List<Clause> capabilities = Clause.parse(h.get(Constants.PROVIDE_CAPABILITY));
            List<Map<String, Object>> typed = new ArrayList<>();
            for (Clause c : capabilities) {
                Map<String, Object> attrs = new HashMap<>();
                try {
                    for (String key : c.attributes().keySet()) {
                        attrs.put(key, c.typed(key));
                    }
                } catch (IllegalArgumentException unreadable) {
                    attrs = null; // a value only the framework can read: any requirement of its namespace is met
                }
                typed.add(attrs);
            }
            return new Wiring(true, symbolicName(h.get(Constants.BUNDLE_SYMBOLICNAME)),
                    symbolicName(h.get(Constants.FRAGMENT_HOST)), exports, imports, allImports, required,
                    capabilities, typed,
                    requirements);
        }

        boolean provides(String serviceType) {
            for (Clause c : capabilities) {
                if (c.names().contains(SERVICE_NAMESPACE) && c.values("objectClass").contains(serviceType)) {
                    return true;
                }
            }
            return false;
        }
    }

    /**
     * A mandatory capability requirement: its namespace and its filter. The filters bnd writes for references,
     * {@code (objectClass=a.b.C)}, are matched by the type's name; any other is compiled when first matched (compiling
     * the some 70 filters of the shipped manifests up front cost ≈11 ms of a cold start).
     */
    static final class Requirement {

        private static final String OBJECT_CLASS = "(objectClass=";

        final String namespace;
        private final String text;
        /** The one type an {@code (objectClass=…)} filter names; null for any other filter. */
        private final String type;
        private Filter filter;
        private boolean unreadable;

        private Requirement(String namespace, String text) {
            this.namespace = namespace;
            this.text = text;
            this.type = text == null ? null : onlyType(text);
        }

        static Requirement of(String namespace, String filter) {
            return new Requirement(namespace, filter);
        }

        /** The type of a filter that is exactly {@code (objectClass=TYPE)}, or null. */
        static String onlyType(String filter) {
            if (!filter.startsWith(OBJECT_CLASS) || !filter.endsWith(")")) {
                return null;
            }
            String type = filter.substring(OBJECT_CLASS.length(), filter.length() - 1);
            for (int i = 0; i < type.length(); i++) {
                char c = type.charAt(i);
                if ("()*\\&|!<>~= \t".indexOf(c) >= 0) {
                    return null;
                }
            }
            return type.isEmpty() ? null : type;
        }

        /** @param attributes a capability's typed attributes; null when they could not be read */
        boolean matches(Map<String, Object> attributes) {
            if (text == null || attributes == null) {
                return true;
            }
            if (type != null) {
                Object types = attributes.get("objectClass");
                return types instanceof List<?> list ? list.contains(type) : type.equals(types);
            }
            if (filter == null && !unreadable) {
                try {
                    filter = FrameworkUtil.createFilter(text);
                } catch (InvalidSyntaxException e) {
                    unreadable = true; // only the framework can read it: counted as met
                }
            }
            return unreadable || filter.matches(attributes);
        }
    }

    private static String symbolicName(String header) {
        if (header == null) {
            return null;
        }
        int semicolon = header.indexOf(';');
        return (semicolon < 0 ? header : header.substring(0, semicolon)).trim();
    }

    /**
     * One clause of a manifest header: its names (paths), attributes and directives, as the OSGi core specification
     * (3.2.4, "Common Header Syntax") writes them: {@code name;name;attr:Type="value";dir:=value, …}.
     */
    record Clause(List<String> names, Map<String, String> attributes, Map<String, String> types,
            Map<String, String> directives) {

        static List<Clause> parse(String header) {
            List<Clause> clauses = new ArrayList<>();
            if (header == null || header.isBlank()) {
                return clauses;
            }
            for (String text : split(header, ',')) {
                List<String> names = new ArrayList<>();
                Map<String, String> attributes = new HashMap<>();
                Map<String, String> types = new HashMap<>();
                Map<String, String> directives = new HashMap<>();
                for (String part : split(text, ';')) {
                    String p = part.trim();
                    if (p.isEmpty()) {
                        continue;
                    }
                    int directive = p.indexOf(":=");
                    int equals = p.indexOf('=');
                    if (directive >= 0 && directive < equals) {
                        directives.put(p.substring(0, directive).trim(), unquote(p.substring(directive + 2)));
                    } else if (equals >= 0) {
                        String key = p.substring(0, equals).trim();
                        int type = key.indexOf(':');
                        String name = type < 0 ? key : key.substring(0, type).trim();
                        attributes.put(name, unquote(p.substring(equals + 1)));
                        if (type >= 0) {
                            types.put(name, key.substring(type + 1).trim());
                        }
                    } else {
                        names.add(p);
                    }
                }
                clauses.add(new Clause(names, attributes, types, directives));
            }
            return clauses;
        }

        boolean optional() {
            return Constants.RESOLUTION_OPTIONAL.equals(directives.get(Constants.RESOLUTION_DIRECTIVE));
        }

        /** An attribute's comma-separated values (a {@code List<String>} attribute), or one value. */
        List<String> values(String attribute) {
            String v = attributes.get(attribute);
            if (v == null) {
                return List.of();
            }
            List<String> values = new ArrayList<>();
            for (String s : v.split(",")) {
                values.add(s.trim());
            }
            return values;
        }

        /** An attribute's value as its declared type makes it (String, Version, Long, Double, or a List of one). */
        Object typed(String attribute) {
            String type = types.getOrDefault(attribute, "String");
            boolean list = type.startsWith("List");
            String element = type;
            if (list) {
                int open = type.indexOf('<');
                int close = type.lastIndexOf('>');
                element = open >= 0 && close > open ? type.substring(open + 1, close).trim() : "String";
            }
            List<Object> values = new ArrayList<>();
            for (String v : list ? values(attribute) : List.of(attributes.get(attribute))) {
                values.add(switch (element) {
                    case "Version" -> Version.parseVersion(v);
                    case "Long" -> Long.valueOf(v.trim());
                    case "Double" -> Double.valueOf(v.trim());
                    default -> v;
                });
            }
            return list ? values : values.get(0);
        }

        private static String unquote(String s) {
            String t = s.trim();
            return t.length() >= 2 && t.startsWith("\"") && t.endsWith("\"") ? t.substring(1, t.length() - 1) : t;
        }

        /**
         * Splits at {@code separator} outside double quotes. It jumps from one separator or quote to the next with
         * {@link String#indexOf}: a bundle's headers run to tens of kilobytes (every export's {@code uses} list), and
         * the launcher reads them while its own code is still interpreted.
         */
        private static List<String> split(String s, char separator) {
            List<String> parts = new ArrayList<>();
            int from = 0;
            int scan = 0;
            // The next quote at or after scan, found again only once scan has passed it (past the last quote, looking
            // again at every separator would scan the rest of the header each time).
            int quote = -2;
            while (true) {
                int next = s.indexOf(separator, scan);
                if (quote != -1 && quote < scan) {
                    quote = s.indexOf('"', scan);
                }
                if (quote >= 0 && (next < 0 || quote < next)) {
                    int close = s.indexOf('"', quote + 1);
                    if (close < 0) {
                        break; // an unclosed quote runs to the end
                    }
                    scan = close + 1;
                    continue;
                }
                if (next < 0) {
                    break;
                }
                parts.add(s.substring(from, next));
                from = next + 1;
                scan = from;
            }
            parts.add(s.substring(from));
            return parts;
        }
    }
}
