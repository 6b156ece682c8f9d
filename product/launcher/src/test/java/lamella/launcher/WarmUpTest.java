package lamella.launcher;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertNotNull;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.logging.Logger;

import org.junit.jupiter.api.Test;

/** The warm-up thread sets up what it says, never holds the process, and is off when asked. */
class WarmUpTest {

    @Test
    void itIsADaemonThatEndsHavingSetUpThePluginFolderLogAndTheFrameworkDefaults() throws Exception {
        Thread thread = WarmUp.begin();
        assertNotNull(thread);
        assertTrue(thread.isDaemon());
        assertEquals("lamella-warm-up", thread.getName());
        thread.join(20_000);
        assertFalse(thread.isAlive(), "the warm-up did not end within 20 s");
        // The plugins folder's logger has the launcher's handler and only it.
        Logger fileinstall = Logger.getLogger(PluginFolderLog.LOGGER);
        assertFalse(fileinstall.getUseParentHandlers());
        assertTrue(Arrays.stream(fileinstall.getHandlers()).anyMatch(h -> h instanceof PluginFolderLog));
        // The framework's defaults are read: its own packages are there to export.
        assertNotNull(ShippedManifests.frameworkExports());
        assertTrue(ShippedManifests.frameworkExports().contains("org.osgi.framework;"),
                ShippedManifests.frameworkExports());
    }

    @Test
    void aFailingStepIsSkippedAndTheOthersStillRun() {
        List<String> ran = new ArrayList<>();
        WarmUp.run(List.of(() -> ran.add("first"), () -> {
            throw new NoClassDefFoundError("absent");
        }, () -> {
            throw new IllegalStateException("broken");
        }, () -> ran.add("last")));
        assertEquals(List.of("first", "last"), ran);
    }

    @Test
    void everyStepBearsRunningAgain() {
        // The main thread may set up the same things at the same time, or after: nothing may break.
        WarmUp.run(WarmUp.steps());
        List<Runnable> checked = new ArrayList<>();
        for (Runnable step : WarmUp.steps()) {
            step.run();
            checked.add(step);
        }
        assertEquals(4, checked.size());
    }

    @Test
    void itIsOffWhenTheSettingSaysFalse() {
        String before = System.getProperty(WarmUp.PROPERTY);
        System.setProperty(WarmUp.PROPERTY, " FALSE ");
        try {
            assertNull(WarmUp.begin());
        } finally {
            if (before == null) {
                System.clearProperty(WarmUp.PROPERTY);
            } else {
                System.setProperty(WarmUp.PROPERTY, before);
            }
        }
    }
}
