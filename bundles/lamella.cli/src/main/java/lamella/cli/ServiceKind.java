package lamella.cli;

import java.lang.reflect.InvocationTargetException;
import java.lang.reflect.Method;

/**
 * One kind of contribution that {@code lamella plugins} lists: a service interface, looked up by name so that a new
 * kind is one more row in the table, and the method that names a service of it.
 *
 * @param label         what the listing calls it, such as {@code geometry}
 * @param interfaceName the service interface
 * @param nameMethod    the no-argument method returning the service's name; {@code summary()} gives the summary
 */
record ServiceKind(String label, String interfaceName, String nameMethod) {

    static final String SUMMARY_METHOD = "summary";

    /**
     * Describes a service through its interface type, so that the implementation class may stay private to its
     * bundle.
     */
    ServiceRow describe(Object service, Class<?> type, String bundle, String version) {
        try {
            return new ServiceRow(label, call(type, nameMethod, service), call(type, SUMMARY_METHOD, service),
                    bundle, version);
        } catch (ReflectiveOperationException | RuntimeException e) {
            Throwable cause = e instanceof InvocationTargetException ite ? ite.getCause() : e;
            return new ServiceRow(label, "?", "(cannot describe it: " + cause + ")", bundle, version);
        }
    }

    private static String call(Class<?> type, String method, Object service) throws ReflectiveOperationException {
        Method m = type.getMethod(method);
        return String.valueOf(m.invoke(service));
    }
}
