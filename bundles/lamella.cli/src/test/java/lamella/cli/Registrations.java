package lamella.cli;

import java.lang.reflect.Proxy;
import org.osgi.framework.Bundle;
import org.osgi.framework.ServiceReference;
import org.osgi.framework.Version;

/**
 * Service references as Declarative Services hands them to a bind method, for tests without a framework: they know
 * the registering bundle's name, version and location and nothing else.
 */
final class Registrations {

    private Registrations() {
    }

    static <S> ServiceReference<S> by(String symbolicName, String version) {
        return at(symbolicName, version, "file:/plugins/" + symbolicName + ".jar");
    }

    /** A reference whose bundle was installed from a location: the runtime installs its own by reference. */
    static <S> ServiceReference<S> at(String symbolicName, String version, String location) {
        Bundle bundle = proxy(Bundle.class, method -> switch (method) {
            case "getSymbolicName" -> symbolicName;
            case "getVersion" -> Version.parseVersion(version);
            case "getLocation" -> location;
            default -> null;
        });
        @SuppressWarnings("unchecked")
        ServiceReference<S> reference = proxy(ServiceReference.class, method -> method.equals("getBundle") ? bundle
                : null);
        return reference;
    }

    /** A reference from one of Lamella's own bundles. */
    static <S> ServiceReference<S> shipped(String symbolicName) {
        return at(symbolicName, "0.1.0", "reference:file:/bundle/" + symbolicName + ".jar");
    }

    private interface Answers {
        Object to(String method);
    }

    private static <T> T proxy(Class<T> type, Answers answers) {
        return type.cast(Proxy.newProxyInstance(Registrations.class.getClassLoader(), new Class<?>[] {type},
                (self, method, args) -> {
                    Object answer = answers.to(method.getName());
                    if (answer == null) {
                        throw new UnsupportedOperationException(method.getName() + " is not part of this test double");
                    }
                    return answer;
                }));
    }
}
