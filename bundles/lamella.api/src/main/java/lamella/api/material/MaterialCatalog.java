package lamella.api.material;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import java.util.TreeSet;
import lamella.api.InputException;
import lamella.api.Names;

/**
 * The live libraries under one precedence: a name (id or alias, in any letter case) means the entry of the highest
 * tier that has it — user over facility over shipped — and a higher tier's entry replaces a lower one whole, so no
 * value is ever mixed from two entries. Two libraries of the same tier that claim one name make it ambiguous: it is
 * then an error to use it, never a guess.
 */
public final class MaterialCatalog {

    private static final Comparator<MaterialLibrary> PRECEDENCE = Comparator
            .comparing((MaterialLibrary l) -> l.info().tier()).reversed()
            .thenComparing(l -> l.info().id());

    private final List<MaterialLibrary> libraries;

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
        for (LibraryTier tier : tiersHighFirst()) {
            List<Material> claims = claims(tier, normal(name));
            if (claims.size() == 1) {
                return claims.get(0);
            }
            if (claims.size() > 1) {
                throw InputException.at(null, "material '" + name + "' is ambiguous: " + describe(claims)
                        + " all claim it in the " + tier.label() + " tier; remove the duplicate from one library");
            }
        }
        String hint = Names.closest(normal(name), new TreeSet<>(allNames()))
                .map(n -> " (did you mean '" + n + "'?)").orElse("");
        throw InputException.at(null, "no material '" + name + "' in the live libraries" + hint + "; libraries: "
                + String.join(", ", libraries.stream().map(l -> l.info().label()).toList())
                + problemsHint());
    }

    /** The entries in effect, one per id (the highest tier's), ordered by id. */
    public List<Material> effective() {
        Map<String, Material> byId = new TreeMap<>();
        for (MaterialLibrary l : libraries) {
            for (Material m : l.materials()) {
                byId.putIfAbsent(normal(m.id()), m);
            }
        }
        return List.copyOf(byId.values());
    }

    /** Entries of lower tiers that {@code m} replaces: same id, lower precedence. */
    public List<Material> replacedBy(Material m) {
        List<Material> out = new ArrayList<>();
        for (MaterialLibrary l : libraries) {
            if (m.library().tier().outranks(l.info().tier())) {
                for (Material other : l.materials()) {
                    if (normal(other.id()).equals(normal(m.id()))) {
                        out.add(other);
                    }
                }
            }
        }
        return out;
    }

    /** Every entry of every library, highest precedence first, also those replaced by a higher tier. */
    public List<Material> all() {
        List<Material> out = new ArrayList<>();
        libraries.forEach(l -> out.addAll(l.materials()));
        return out;
    }

    /**
     * Problems between libraries: a name claimed by two libraries of one tier (an error: the name cannot be used), or
     * an alias that means a different entry in a higher tier than in a lower one (a warning: legal, but likely not
     * what the lower library's users expect).
     */
    public List<LibraryFinding> conflicts() {
        List<LibraryFinding> out = new ArrayList<>();
        Map<String, Material> meaning = new LinkedHashMap<>();
        for (LibraryTier tier : tiersHighFirst()) {
            Map<String, List<Material>> claims = new TreeMap<>();
            for (MaterialLibrary l : libraries) {
                if (l.info().tier() == tier) {
                    for (Material m : l.materials()) {
                        for (String n : m.names()) {
                            List<Material> list = claims.computeIfAbsent(normal(n), k -> new ArrayList<>());
                            if (!list.contains(m)) {
                                list.add(m);
                            }
                        }
                    }
                }
            }
            for (Map.Entry<String, List<Material>> e : claims.entrySet()) {
                List<Material> ms = e.getValue();
                if (ms.size() > 1) {
                    out.add(new LibraryFinding(LibraryFinding.Severity.ERROR, ms.get(1).location(), -1, "",
                            "the name '" + e.getKey() + "' is claimed by " + describe(ms) + " in the " + tier.label()
                                    + " tier; a case that uses it is refused until one library drops it"));
                    continue;
                }
                Material m = ms.get(0);
                Material higher = meaning.get(e.getKey());
                if (higher != null && !normal(higher.id()).equals(normal(m.id()))) {
                    out.add(new LibraryFinding(LibraryFinding.Severity.WARNING, m.location(), -1, "",
                            "the name '" + e.getKey() + "' of " + m.label() + " means " + higher.label()
                                    + ", which takes precedence"));
                }
                meaning.putIfAbsent(e.getKey(), m);
            }
        }
        return out;
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

    private List<Material> claims(LibraryTier tier, String name) {
        List<Material> out = new ArrayList<>();
        for (MaterialLibrary l : libraries) {
            if (l.info().tier() == tier) {
                for (Material m : l.materials()) {
                    if (m.names().stream().anyMatch(n -> normal(n).equals(name))) {
                        out.add(m);
                    }
                }
            }
        }
        return out;
    }

    private List<String> allNames() {
        List<String> out = new ArrayList<>();
        all().forEach(m -> m.names().forEach(n -> out.add(normal(n))));
        return out;
    }

    private static List<LibraryTier> tiersHighFirst() {
        List<LibraryTier> tiers = new ArrayList<>(List.of(LibraryTier.values()));
        java.util.Collections.reverse(tiers);
        return tiers;
    }

    private static String describe(List<Material> ms) {
        return String.join(" and ", ms.stream().map(Material::label).toList());
    }
}
