package lamella.api.material;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;
import lamella.api.InputException;
import lamella.api.Names;

/**
 * The live libraries under one precedence — user over facility over data bundles over shipped — and one meaning for
 * every name (id or alias, in any letter case). An entry takes the place of lower tiers' entries only where it says
 * so: its {@code replaces} names them, and the replaced entries are then out of effect whole, their names meaning the
 * replacing entry (no value is ever mixed from two entries). A name that two entries in effect answer to — two
 * libraries of one tier, or a higher tier's entry that uses a lower one's name without replacing it — is ambiguous:
 * it is an error to use it, never a guess, and {@link #conflicts()} names both entries.
 */
public final class MaterialCatalog {

    private static final Comparator<MaterialLibrary> PRECEDENCE = Comparator
            .comparing((MaterialLibrary l) -> l.info().tier()).reversed()
            .thenComparing(l -> l.info().id());

    private final List<MaterialLibrary> libraries;
    private volatile Resolution resolution;

    public MaterialCatalog(Collection<? extends MaterialLibrary> libraries) {
        List<MaterialLibrary> sorted = new ArrayList<>(libraries);
        sorted.sort(PRECEDENCE);
        this.libraries = List.copyOf(sorted);
    }

    /** The libraries, highest precedence first. */
    public List<MaterialLibrary> libraries() {
        return libraries;
    }

    public boolean isEmpty() {
        return libraries.isEmpty();
    }

    static String normal(String name) {
        return name.trim().toLowerCase(Locale.ROOT);
    }

    /** The entry a case file's name means. */
    public Material lookup(String name) throws InputException {
        if (libraries.isEmpty()) {
            throw InputException.at(null, "no material libraries are live, so material '" + name + "' cannot be"
                    + " looked up; give the layer's values explicitly, or check that bundle lamella.materials runs"
                    + " (lamella plugins)");
        }
        List<Material> claims = resolved().answers.getOrDefault(normal(name), List.of());
        if (claims.size() == 1) {
            return claims.get(0);
        }
        if (claims.size() > 1) {
            throw InputException.at(null, "material '" + name + "' is ambiguous: " + ambiguity(claims));
        }
        String hint = Names.closest(normal(name), new TreeSet<>(allNames()))
                .map(n -> " (did you mean '" + n + "'?)").orElse("");
        throw InputException.at(null, "no material '" + name + "' in the live libraries" + hint + "; libraries: "
                + String.join(", ", libraries.stream().map(l -> l.info().label()).toList())
                + problemsHint());
    }

    /** The entries in effect (those no higher tier replaces), ordered by id, higher tier first. */
    public List<Material> effective() {
        Resolution r = resolved();
        List<Material> out = new ArrayList<>();
        for (Material m : all()) {
            if (!r.superseded.containsKey(m)) {
                out.add(m);
            }
        }
        out.sort(Comparator.comparing((Material m) -> normal(m.id()))
                .thenComparing(m -> m.library().tier(), Comparator.reverseOrder()));
        return List.copyOf(out);
    }

    /** Entries of lower tiers that {@code m} replaces, directly or through an entry it replaces; highest first. */
    public List<Material> replacedBy(Material m) {
        Resolution r = resolved();
        List<Material> out = new ArrayList<>();
        List<Material> next = new ArrayList<>(r.replaced.getOrDefault(m, List.of()));
        while (!next.isEmpty()) {
            Material e = next.remove(0);
            if (out.stream().noneMatch(x -> x == e)) {
                out.add(e);
                next.addAll(r.replaced.getOrDefault(e, List.of()));
            }
        }
        out.sort(Comparator.comparing((Material x) -> x.library().tier(), Comparator.reverseOrder()));
        return out;
    }

    /** Every entry of every library, highest precedence first, also those replaced by a higher tier. */
    public List<Material> all() {
        return resolved().all;
    }

    /**
     * Problems between libraries, each an error: a name that two entries in effect answer to (claimed by two
     * libraries of one tier, or used by a higher tier's entry that does not say it replaces the lower one), and a
     * {@code replaces} that names no entry of a lower tier.
     */
    public List<LibraryFinding> conflicts() {
        return resolved().conflicts;
    }

    /** The libraries' own findings and the conflicts between them. */
    public List<LibraryFinding> findings() {
        List<LibraryFinding> out = new ArrayList<>();
        libraries.forEach(l -> out.addAll(l.findings()));
        out.addAll(conflicts());
        return out;
    }

    private String problemsHint() {
        long errors = libraries.stream().flatMap(l -> l.findings().stream()).filter(LibraryFinding::isError).count();
        return errors == 0 ? "; lamella materials list shows every entry"
                : "; " + errors + " problem" + (errors == 1 ? "" : "s") + " kept entries out of the libraries:"
                + " lamella materials list names " + (errors == 1 ? "it" : "them");
    }

    private List<String> allNames() {
        List<String> out = new ArrayList<>();
        all().forEach(m -> m.names().forEach(n -> out.add(normal(n))));
        return out;
    }

    private Resolution resolved() {
        Resolution r = resolution;
        if (r == null) {
            r = new Resolution(libraries);
            resolution = r;
        }
        return r;
    }

    /** Why two or more entries in effect answering one name make it unusable, and what would settle it. */
    private static String ambiguity(List<Material> claims) {
        LibraryTier top = claims.stream().map(m -> m.library().tier()).max(Comparator.naturalOrder()).orElseThrow();
        List<Material> highest = claims.stream().filter(m -> m.library().tier() == top).toList();
        if (highest.size() > 1) {
            return describe(highest) + " all claim it in the " + top.label() + " tier; remove the duplicate from one"
                    + " library";
        }
        Material m = highest.get(0);
        List<Material> lower = claims.stream().filter(x -> x != m).toList();
        return describe(List.of(m)) + " uses it, and so does " + describe(lower) + " of a lower tier, but entry "
                + m.id() + " does not say that it replaces " + (lower.size() == 1 ? "it" : "them")
                + ": add \"replaces\": [" + String.join(", ", lower.stream().map(x -> "\"" + x.id() + "\"").toList())
                + "] to entry " + m.id() + " if it should take " + (lower.size() == 1 ? "its" : "their")
                + " place, or give it another name";
    }

    private static String describe(List<Material> ms) {
        return String.join(" and ", ms.stream().map(Material::placedLabel).toList());
    }

    /**
     * Every name's meaning, worked out tier by tier from the lowest: an entry's {@code replaces} is read against the
     * meanings of the tiers below its own, so it names entries as a case using those tiers would.
     */
    private static final class Resolution {

        /** Each name (normalised) and the entries in effect that answer to it, highest tier first. */
        final Map<String, List<Material>> answers = new HashMap<>();
        /** Each entry and the lower entries its {@code replaces} names directly. */
        final Map<Material, List<Material>> replaced = new IdentityHashMap<>();
        /** Entries out of effect, each with the entry that replaced it. */
        final Map<Material, Material> superseded = new IdentityHashMap<>();
        final List<LibraryFinding> conflicts;
        /** Every entry, highest precedence first, as read once for this resolution. */
        final List<Material> all;

        Resolution(List<MaterialLibrary> libraries) {
            List<LibraryFinding> found = new ArrayList<>();
            Map<MaterialLibrary, List<Material>> read = new IdentityHashMap<>();
            List<Material> every = new ArrayList<>();
            for (MaterialLibrary l : libraries) {
                read.put(l, List.copyOf(l.materials()));
                every.addAll(read.get(l));
            }
            all = List.copyOf(every);
            Map<Material, Set<String>> answeredBy = new IdentityHashMap<>();
            for (LibraryTier tier : LibraryTier.values()) {
                List<Material> entries = new ArrayList<>();
                for (MaterialLibrary l : libraries) {
                    if (l.info().tier() == tier) {
                        entries.addAll(read.get(l));
                    }
                }
                for (Material m : entries) {
                    List<Material> rep = new ArrayList<>();
                    for (String r : m.replaces()) {
                        List<Material> below = answers.getOrDefault(normal(r), List.of());
                        if (below.isEmpty()) {
                            found.add(new LibraryFinding(LibraryFinding.Severity.ERROR, m.location(), -1, "",
                                    m.label() + " says it replaces '" + r + "', but no entry of a lower tier than "
                                            + tier.label() + " has that name; correct the name or remove it from"
                                            + " replaces"));
                        }
                        below.stream().filter(e -> rep.stream().noneMatch(x -> x == e)).forEach(rep::add);
                    }
                    replaced.put(m, rep);
                }
                for (Material m : entries) {
                    Set<String> names = answeredBy.computeIfAbsent(m, k -> new LinkedHashSet<>());
                    for (Material e : replaced.get(m)) {
                        superseded.putIfAbsent(e, m);
                        names.addAll(answeredBy.getOrDefault(e, Set.of()));
                    }
                    m.names().forEach(n -> names.add(normal(n)));
                }
                for (List<Material> list : answers.values()) {
                    list.removeIf(superseded::containsKey);
                }
                for (Material m : entries) {
                    for (String n : answeredBy.get(m)) {
                        List<Material> list = answers.computeIfAbsent(n, k -> new ArrayList<>());
                        if (list.stream().noneMatch(x -> x == m)) {
                            list.add(m);
                        }
                    }
                }
            }
            answers.values().removeIf(List::isEmpty);
            answers.values().forEach(list -> list.sort(Comparator.comparing((Material m) -> m.library().tier(),
                    Comparator.reverseOrder()).thenComparing(m -> m.library().id())));
            found.addAll(ambiguities());
            conflicts = List.copyOf(found);
        }

        /** One error per group of entries that share names, naming every shared name. */
        private List<LibraryFinding> ambiguities() {
            Map<List<Material>, List<String>> groups = new LinkedHashMap<>();
            for (String n : new TreeSet<>(answers.keySet())) {
                List<Material> claims = answers.get(n);
                if (claims.size() > 1) {
                    List<Material> key = groups.keySet().stream().filter(k -> sameEntries(k, claims)).findFirst()
                            .orElse(claims);
                    groups.computeIfAbsent(key, k -> new ArrayList<>()).add(n);
                }
            }
            List<LibraryFinding> out = new ArrayList<>();
            groups.forEach((claims, names) -> {
                String quoted = String.join(", ", names.stream().map(n -> "'" + n + "'").toList());
                out.add(new LibraryFinding(LibraryFinding.Severity.ERROR, claims.get(0).location(), -1, "",
                        "the name" + (names.size() == 1 ? " " : "s ") + quoted + ": " + ambiguity(claims)
                                + "; a case that names " + (names.size() == 1 ? "it" : "one of them")
                                + " is refused until then"));
            });
            return out;
        }

        private static boolean sameEntries(List<Material> a, List<Material> b) {
            return a.size() == b.size() && a.stream().allMatch(x -> b.stream().anyMatch(y -> y == x));
        }
    }
}
