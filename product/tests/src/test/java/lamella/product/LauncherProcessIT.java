package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The launcher as a user starts it: a child {@code java -jar} process, its output and its exit status. */
class LauncherProcessIT {

    private record Run(int status, String out, String err) {
    }

    @TempDir
    static Path home;
    @TempDir
    static Path userDir;

    @BeforeAll
    static void copyRuntime() throws IOException {
        RuntimeCopy.into(home);
    }

    @Test
    void pluginsListsTheLiveContributionsAndThePluginsFolder() throws Exception {
        Run run = launch("plugins");

        assertEquals(0, run.status(), run.err());
        assertTrue(run.out().startsWith("kind "), run.out());
        assertTrue(run.out().matches("(?s).*\\ncommand +plugins +lamella\\.cli +\\S+ +Lists .*"), run.out());
        assertTrue(run.out().contains("\nplugins folder: " + home.resolve("plugins").toRealPath() + "\n")
                || run.out().contains("\nplugins folder: " + home.resolve("plugins") + "\n"), run.out());
        assertEquals("", run.err());
    }

    @Test
    void anUnknownCommandIsBadInputWithASuggestion() throws Exception {
        Run run = launch("plugin");

        assertEquals(2, run.status());
        assertTrue(run.err().startsWith("lamella: there is no command 'plugin'; did you mean 'plugins'?\n"),
                run.err());
        assertEquals("", run.out());
    }

    @Test
    void noCommandPrintsTheHelp() throws Exception {
        Run run = launch();

        assertEquals(0, run.status(), run.err());
        assertTrue(run.out().startsWith("usage: lamella COMMAND"), run.out());
        assertTrue(run.out().contains("\n  plugins "), run.out());
    }

    @Test
    void helpFlagAfterACommandShowsItsUsage() throws Exception {
        Run run = launch("plugins", "--help");

        assertEquals(0, run.status(), run.err());
        assertTrue(run.out().startsWith("usage: lamella plugins\n"), run.out());
    }

    @Test
    void aPluginThatCannotResolveIsNamedAndTheCommandStillRuns() throws Exception {
        Path broken = home.resolve("plugins/broken-plugin.jar");
        TestBundles.write(broken, "lamella.test.broken", Map.of("Import-Package", "lamella.test.nowhere"));
        try {
            Run run = launch("help");

            assertEquals(0, run.status(), run.err());
            assertTrue(run.err().contains("lamella: plugin broken-plugin.jar (lamella.test.broken) could not start"),
                    run.err());
            assertTrue(run.err().contains("lamella.test.nowhere"), run.err());
        } finally {
            Files.delete(broken);
        }
    }

    @Test
    void frameworkPropertiesGivenWithDashDReachTheRuntime() throws Exception {
        Path elsewhere = Files.createDirectories(userDir.resolve("other-plugins"));
        Run run = launch(List.of("-Dlamella.plugins.dir=" + elsewhere), "plugins");

        assertEquals(0, run.status(), run.err());
        assertTrue(run.out().contains("\nplugins folder: " + elsewhere + "\n"), run.out());
    }

    private static Run launch(String... args) throws Exception {
        return launch(List.of(), args);
    }

    private static Run launch(List<String> javaOptions, String... args) throws Exception {
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        command.add("-Djava.awt.headless=true");
        command.add("-Dlamella.cwd=" + userDir);
        command.addAll(javaOptions);
        command.add("-jar");
        command.add(home.resolve("lib/lamella.launcher.jar").toString());
        command.addAll(List.of(args));
        Path out = Files.createTempFile(userDir, "out", ".txt");
        Path err = Files.createTempFile(userDir, "err", ".txt");
        Process process = new ProcessBuilder(command).directory(userDir.toFile())
                .redirectOutput(out.toFile()).redirectError(err.toFile()).start();
        if (!process.waitFor(60, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            throw new AssertionError("the launcher did not exit within 60 s: " + command);
        }
        return new Run(process.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
    }
}
