package lamella.launcher;

import java.util.ArrayDeque;
import java.util.ArrayList;
import java.util.Collection;
import java.util.Deque;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;
import java.util.function.BiPredicate;
import java.util.function.Function;
import java.util.function.Predicate;

import org.osgi.framework.Bundle;
import org.osgi.framework.Constants;
import org.osgi.framework.wiring.BundleCapability;
import org.osgi.framework.wiring.BundleRequirement;
import org.osgi.framework.wiring.BundleRevision;

/**
 * The bundles a run that only shows help needs started: those that provide a command, and, transitively, every
 * bundle that provides what one of them cannot do without — a service a mandatory reference names, or the extender
 * (Declarative Services) that sets its components up. Read from the {@code Provide-Capability} and {@code
 * Require-Capability} headers bnd writes for each component; an optional reference (the geometries, techniques and
 * importers a command lists when it runs) does not pull its providers in.
 */
final class CommandLayer {

    static final String COMMAND = "lamella.api.command.Command";
    private static final String SERVICE_NAMESPACE = "osgi.service";
    private static final String EXTENDER_NAMESPACE = "osgi.extender";
    private static final String OBJECT_CLASS = "objectClass";

    private CommandLayer() {
    }

    /** The bundles of {@code bundles} that provide a command, with what they need; in the order given. */
    static List<Bundle> commandsAndNeeds(List<Bundle> bundles) {
        return closure(bundles, b -> provides(b, COMMAND), CommandLayer::needs);
    }

    /** The bundles of {@code bundles} that {@code seeds} are or need, transitively; in the order given. */
    static List<Bundle> needs(List<Bundle> bundles, Set<Bundle> seeds) {
        return closure(bundles, seeds::contains, CommandLayer::needs);
    }

    /**
     * The members of {@code all} that a seed is, or that one of them needs, directly or through others; in the order
     * of {@code all}.
     *
     * @param needs whether the first needs the second
     */
    static <T> List<T> closure(List<T> all, Predicate<T> seed, BiPredicate<T, T> needs) {
        return closureOf(all, seed, from -> {
            List<T> needed = new ArrayList<>();
            for (T to : all) {
                if (needs.test(from, to)) {
                    needed.add(to);
                }
            }
            return needed;
        });
    }

    /**
     * The members of {@code all} that a seed is, or that one of them needs, directly or through others; in the order
     * of {@code all}.
     *
     * @param needed what a member needs directly (itself, and non-members, are passed over)
     */
    static <T> List<T> closureOf(List<T> all, Predicate<T> seed, Function<T, Collection<T>> needed) {
        Set<T> members = new java.util.HashSet<>(all);
        Set<T> reached = new LinkedHashSet<>();
        Deque<T> next = new ArrayDeque<>();
        for (T t : all) {
            if (seed.test(t) && reached.add(t)) {
                next.add(t);
            }
        }
        while (!next.isEmpty()) {
            T from = next.poll();
            for (T to : needed.apply(from)) {
                if (!to.equals(from) && members.contains(to) && reached.add(to)) {
                    next.add(to);
                }
            }
        }
        List<T> ordered = new ArrayList<>();
        for (T t : all) {
            if (reached.contains(t)) {
                ordered.add(t);
            }
        }
        return ordered;
    }

    /** Whether {@code bundle} declares that it registers a service of the type {@code type}. */
    static boolean provides(Bundle bundle, String type) {
        BundleRevision revision = bundle.adapt(BundleRevision.class);
        if (revision == null) {
            return false;
        }
        for (BundleCapability c : revision.getDeclaredCapabilities(SERVICE_NAMESPACE)) {
            Object types = c.getAttributes().get(OBJECT_CLASS);
            if (types instanceof List<?> list ? list.contains(type) : type.equals(types)) {
                return true;
            }
        }
        return false;
    }

    /** Whether a mandatory service or extender requirement of {@code from} is met by a capability of {@code to}. */
    static boolean needs(Bundle from, Bundle to) {
        if (from == to) {
            return false;
        }
        BundleRevision requiring = from.adapt(BundleRevision.class);
        BundleRevision providing = to.adapt(BundleRevision.class);
        if (requiring == null || providing == null) {
            return false;
        }
        for (BundleRequirement r : requiring.getDeclaredRequirements(null)) {
            String namespace = r.getNamespace();
            if (!(SERVICE_NAMESPACE.equals(namespace) || EXTENDER_NAMESPACE.equals(namespace))
                    || Constants.RESOLUTION_OPTIONAL.equals(r.getDirectives().get(Constants.RESOLUTION_DIRECTIVE))) {
                continue;
            }
            for (BundleCapability c : providing.getDeclaredCapabilities(namespace)) {
                if (r.matches(c)) {
                    return true;
                }
            }
        }
        return false;
    }
}
