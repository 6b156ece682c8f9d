package lamella.launcher;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import java.util.Properties;

import org.junit.jupiter.api.Test;

class DisplayCheckTest {

    @Test
    void anX11OrWaylandDisplayOpensTheWorkbench() {
        assertTrue(DisplayCheck.available(Map.of("DISPLAY", ":99"), new Properties()));
        assertTrue(DisplayCheck.available(Map.of("WAYLAND_DISPLAY", "wayland-0"), new Properties()));
    }

    @Test
    void noDisplayOrAnEmptyOneMeansHelp() {
        assertFalse(DisplayCheck.available(Map.of(), new Properties()));
        assertFalse(DisplayCheck.available(Map.of("DISPLAY", " "), new Properties()));
    }

    @Test
    void headlessJavaMeansHelpEvenWithADisplay() {
        Properties headless = new Properties();
        headless.setProperty("java.awt.headless", "true");
        assertFalse(DisplayCheck.available(Map.of("DISPLAY", ":0"), headless));
    }
}
