package lamella.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import org.junit.jupiter.api.Test;

class LaunchRequestTest {

    @Test
    void readsTheCommandLineAndTheWorkingDirectory() {
        LaunchRequest request = LaunchRequest.from(Map.of(
                "lamella.args", new String[] {"simulate", "a.json"}, "lamella.cwd", "/data/run"));

        assertEquals(List.of("simulate", "a.json"), request.args());
        assertEquals(Path.of("/data/run"), request.workingDirectory());
    }

    @Test
    void aLaunchServiceWithoutACommandLineIsRefused() {
        IllegalArgumentException e = assertThrows(IllegalArgumentException.class,
                () -> LaunchRequest.from(Map.of("lamella.args", "simulate")));
        assertEquals("the launch service has no lamella.args (String[]) property", e.getMessage());
    }
}
