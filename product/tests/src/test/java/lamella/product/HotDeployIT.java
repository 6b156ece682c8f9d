package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.time.Duration;
import java.util.Arrays;
import java.util.Map;
import java.util.Optional;

import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;

import lamella.launcher.FelixRuntime;

/** A bundle dropped into the plugins folder of a running runtime goes live, and leaves when its jar is deleted. */
class HotDeployIT {

    private static final String NAME = "lamella.test.hotdrop";
    /** FileInstall polls every 500 ms (conf/lamella.properties); this leaves room for a slow machine. */
    private static final Duration LIVE_WITHIN = Duration.ofSeconds(5);
    private static final Duration TWO_POLLS = Duration.ofMillis(1200);

    @TempDir
    Path home;
    @TempDir
    Path scratch;
    private FelixRuntime runtime;
    private BundleContext context;

    @BeforeEach
    void start() throws Exception {
        runtime = FelixRuntime.start(RuntimeCopy.into(home), Map.of());
        context = runtime.framework().getBundleContext();
    }

    @AfterEach
    void stop() {
        runtime.close();
    }

    @Test
    void aJarRenamedIntoPluginsGoesLiveAndLeavesWhenDeleted() throws Exception {
        Path plugins = runtime.pluginsDir();
        assertEquals(home.resolve("plugins"), plugins);
        Path partial = plugins.resolve("hotdrop.jar.part");
        Path jar = plugins.resolve("hotdrop.jar");
        Path made = scratch.resolve("hotdrop.jar");
        TestBundles.write(made, NAME, Map.of());

        Files.copy(made, partial);
        Thread.sleep(TWO_POLLS.toMillis());
        assertTrue(bundle().isEmpty(), "a jar under a temporary name must be left alone");

        Files.move(partial, jar, StandardCopyOption.ATOMIC_MOVE);
        assertTrue(Eventually.within(LIVE_WITHIN, () -> bundle().map(b -> b.getState() == Bundle.ACTIVE).orElse(false)),
                "the dropped bundle is not ACTIVE; state: " + bundle().map(Bundle::getState));

        Files.delete(jar);
        assertTrue(Eventually.within(LIVE_WITHIN, () -> bundle().isEmpty()), "the deleted bundle is still installed");
    }

    private Optional<Bundle> bundle() {
        return Arrays.stream(context.getBundles()).filter(b -> NAME.equals(b.getSymbolicName())).findFirst();
    }
}
