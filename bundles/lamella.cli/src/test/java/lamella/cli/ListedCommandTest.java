package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.lang.reflect.Proxy;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;
import org.osgi.framework.ServiceReference;

import lamella.api.command.Command;

/** Listing a command reads its service properties; the command itself is got only to be shown or run. */
class ListedCommandTest {

    @Test
    void nameAndSummaryComeFromThePropertiesWithoutGettingTheCommand() {
        AtomicInteger got = new AtomicInteger();
        FakeCommand real = new FakeCommand("simulate", args -> 0);
        ListedCommand listed = new ListedCommand(reference(Map.of(Command.NAME_PROPERTY, "simulate",
                Command.SUMMARY_PROPERTY, "Computes the model signal.")), r -> {
                    got.incrementAndGet();
                    return real;
                });
        assertEquals("simulate", listed.name());
        assertEquals("Computes the model signal.", listed.summary());
        assertEquals(0, got.get());
        assertFalse(listed.wasGot());
        assertEquals(real.usage(), listed.usage());
        Capture capture = new Capture();
        assertEquals(0, listed.run(List.of("case.json"), capture.io));
        assertEquals("ran simulate", capture.out());
        assertEquals(1, got.get(), "got once, then kept");
        assertTrue(listed.wasGot());
        assertEquals(List.of(List.of("case.json")), real.calls);
    }

    /** A plug-in's command written before the properties existed is asked its name instead. */
    @Test
    void aCommandWithoutThePropertiesIsGotToBeAsked() {
        AtomicInteger got = new AtomicInteger();
        ListedCommand listed = new ListedCommand(reference(Map.of()), r -> {
            got.incrementAndGet();
            return new FakeCommand("lab-export", args -> 0);
        });
        assertEquals("lab-export", listed.name());
        assertEquals("Summary of lab-export.", listed.summary());
        assertEquals(1, got.get());
    }

    @Test
    void twoListingsOfOneServiceAreEqualAndOfTwoAreNot() {
        ServiceReference<Command> one = reference(Map.of(Command.NAME_PROPERTY, "fit"));
        ServiceReference<Command> two = reference(Map.of(Command.NAME_PROPERTY, "fit"));
        assertEquals(new ListedCommand(one, r -> null), new ListedCommand(one, r -> null));
        assertNotEquals(new ListedCommand(one, r -> null), new ListedCommand(two, r -> null));
    }

    @SuppressWarnings("unchecked")
    private static ServiceReference<Command> reference(Map<String, Object> properties) {
        Object[] self = new Object[1];
        self[0] = Proxy.newProxyInstance(ListedCommandTest.class.getClassLoader(),
                new Class<?>[] {ServiceReference.class}, (proxy, method, args) -> switch (method.getName()) {
                    case "getProperty" -> properties.get((String) args[0]);
                    case "getBundle" -> null;
                    case "equals" -> proxy == args[0];
                    case "hashCode" -> System.identityHashCode(proxy);
                    case "toString" -> "reference " + properties;
                    default -> throw new UnsupportedOperationException(method.getName());
                });
        return (ServiceReference<Command>) self[0];
    }
}
