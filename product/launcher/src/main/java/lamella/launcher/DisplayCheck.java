package lamella.launcher;

import java.util.Map;
import java.util.Properties;

/** Whether {@code lamella} with no command can open the workbench: a display is named and AWT was not told none. */
final class DisplayCheck {

    private DisplayCheck() {
    }

    static boolean available(Map<String, String> environment, Properties system) {
        boolean named = !environment.getOrDefault("DISPLAY", "").isBlank()
                || !environment.getOrDefault("WAYLAND_DISPLAY", "").isBlank();
        return named && !Boolean.parseBoolean(system.getProperty("java.awt.headless", "false"));
    }
}
