package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The {@code lamella} script as a user runs it, on a copy of the source tree's layout whose build is fresh (so the
 * script does not build): its start-up archives are written once, used afterwards and kept off standard output, a
 * failed command writes none, and relative paths are the user's, through a symlink too.
 */
class LauncherScriptIT {

    @TempDir
    Path root;
    @TempDir
    Path userDir;
    private Path home;

    @BeforeEach
    void tree() throws IOException {
        Path sources = RuntimeCopy.assembled().resolve("../../../..").normalize();
        Files.copy(sources.resolve("lamella"), root.resolve("lamella"));
        root.resolve("lamella").toFile().setExecutable(true);
        home = RuntimeCopy.into(root.resolve("product/runtime/target/lamella"));
        Files.copy(RuntimeCopy.assembled().resolve("demo/cases/oxide-film-fdtr.json"), userDir.resolve("case.json"));
        for (String folder : List.of("bundles", "features")) {
            Files.createDirectories(root.resolve(folder));
        }
        Files.writeString(root.resolve("pom.xml"), "<project/>\n");
        Files.createDirectories(root.resolve("target"));
        // The build is newer than every source here, so the script starts what is there.
        Instant past = Instant.now().minusSeconds(3600);
        try (Stream<Path> files = Files.walk(root)) {
            for (Path f : files.toList()) {
                Files.setLastModifiedTime(f, FileTime.from(past));
            }
        }
        Files.writeString(root.resolve("target/lamella-build.stamp"), "");
    }

    @Test
    void theArchiveIsWrittenOnceAndUsedAfterAndNothingButTheResultIsOnStandardOutput() throws Exception {
        checkArchives(Map.of(), "jsa|aot");
    }

    /** From Java 25 the archive is an ahead-of-time cache; checked where such a JDK is installed beside this one. */
    @Test
    void onJava25TheArchiveIsAnAheadOfTimeCache() throws Exception {
        Optional<Path> jdk = recentJdkBeside(Path.of(System.getProperty("java.home")));
        assumeTrue(jdk.isPresent(), "no JDK 25 or newer beside " + System.getProperty("java.home"));
        checkArchives(Map.of("JAVA_HOME", jdk.get().toString()), "aot");
    }

    private void checkArchives(Map<String, String> env, String suffix) throws Exception {
        Run first = run(env, "help");
        assertEquals(0, first.status(), first.err());
        assertTrue(first.out().startsWith("usage: lamella COMMAND"), first.out());
        List<Path> archives = archives("help");
        assertEquals(1, archives.size(), archives.toString());
        Path archive = archives.get(0);
        assertTrue(archive.getFileName().toString().matches("help\\.(" + suffix + ")"), archive.toString());
        assertTrue(Files.isRegularFile(Path.of(archive + ".fingerprint")));
        FileTime written = Files.getLastModifiedTime(archive);

        Run second = run(env, "help");
        assertEquals(0, second.status(), second.err());
        assertEquals(first.out(), second.out(), "the same help, from the archive");
        assertEquals("", second.err());
        assertEquals(written, Files.getLastModifiedTime(archive), "the archive was used, not written again");

        Run simulate = run(env, "simulate", "case.json");
        assertEquals(0, simulate.status(), simulate.err());
        assertTrue(simulate.out().startsWith("delay_s,") || simulate.out().startsWith("frequency_hz,"),
                simulate.out());
        Run again = run(env, "simulate", "case.json");
        assertEquals(simulate.out(), again.out());

        Run wrong = run(env, "no-such-command");
        assertEquals(2, wrong.status(), wrong.err());
        assertEquals("", wrong.out(), "a failed command's standard output stays empty");
        assertTrue(archives("no-such-command").isEmpty(), "a failed command keeps no archive");
        try (Stream<Path> files = Files.list(home.resolve("cds"))) {
            List<String> partial = files.map(f -> f.getFileName().toString()).filter(n -> n.startsWith("."))
                    .toList();
            assertEquals(List.of(), partial, "no part of an archive is left behind");
        }
    }

    @Test
    void relativePathsAreTheUsersThroughASymlinkToo() throws Exception {
        Path link = Files.createSymbolicLink(userDir.resolve("lm"), root.resolve("lamella"));
        Run run = run(Map.of(), link.toString(), List.of("simulate", "case.json"));
        assertEquals(0, run.status(), run.err());
        assertFalse(run.out().isEmpty());
    }

    @Test
    void aJavaHomeWithoutJavaIsNamed() throws Exception {
        Path empty = Files.createDirectories(root.resolve("not-a-jdk"));
        Run run = run(Map.of("JAVA_HOME", empty.toString()), "help");
        assertEquals(1, run.status(), run.err());
        assertEquals("", run.out());
        assertEquals("lamella: JAVA_HOME is " + empty + ", which holds no bin/java; Lamella needs Java 17 or newer\n",
                run.err());
    }

    @Test
    void theWorkbenchAloneRunsWithGtksOpenGlSetUpOffUnlessTheUserSaysOtherwise() throws Exception {
        // A stand-in JDK whose java prints the GDK_GL it was started with: no display is opened.
        Path jdk = Files.createDirectories(root.resolve("stand-in-jdk/bin"));
        Files.writeString(jdk.resolveSibling("release"), "JAVA_VERSION=\"17.0.1\"\n");
        Path java = jdk.resolve("java");
        Files.writeString(java, "#!/bin/bash\necho \"GDK_GL=${GDK_GL-unset}\"\n");
        java.toFile().setExecutable(true);
        Map<String, String> env = new HashMap<>();
        env.put("JAVA_HOME", jdk.getParent().toString());
        env.put("DISPLAY", ":99");

        Run workbench = run(env);
        assertEquals(0, workbench.status(), workbench.err());
        assertEquals("GDK_GL=disable\n", workbench.out());

        env.put("GDK_GL", "always");
        Run chosen = run(env);
        assertEquals("GDK_GL=always\n", chosen.out(), chosen.err());

        env.remove("GDK_GL");
        Run command = run(env, "help");
        assertEquals("GDK_GL=unset\n", command.out(), command.err());
    }

    private List<Path> archives(String name) throws IOException {
        Path cds = home.resolve("cds");
        if (!Files.isDirectory(cds)) {
            return List.of();
        }
        try (Stream<Path> files = Files.list(cds)) {
            return files.filter(f -> f.getFileName().toString().matches(Pattern.quote(name) + "\\.(jsa|aot)"))
                    .sorted().toList();
        }
    }

    /** A JDK of release 25 or newer in the folder that holds this JDK, if there is one. */
    private static Optional<Path> recentJdkBeside(Path javaHome) throws IOException {
        Path parent = javaHome.toRealPath().getParent();
        if (parent == null) {
            return Optional.empty();
        }
        Pattern version = Pattern.compile("^JAVA_VERSION=\"?(\\d+)", Pattern.MULTILINE);
        try (Stream<Path> jdks = Files.list(parent)) {
            for (Path jdk : jdks.sorted().toList()) {
                Path release = jdk.resolve("release");
                if (Files.isRegularFile(release) && Files.isExecutable(jdk.resolve("bin/java"))) {
                    Matcher m = version.matcher(Files.readString(release));
                    if (m.find() && Integer.parseInt(m.group(1)) >= 25) {
                        return Optional.of(jdk);
                    }
                }
            }
        }
        return Optional.empty();
    }

    private Run run(Map<String, String> env, String... args) throws Exception {
        return run(env, root.resolve("lamella").toString(), List.of(args));
    }

    private Run run(Map<String, String> env, String script, List<String> args) throws Exception {
        List<String> command = new ArrayList<>();
        command.add("bash");
        command.add(script);
        command.addAll(args);
        Path out = Files.createTempFile(root, "out", ".txt");
        Path err = Files.createTempFile(root, "err", ".txt");
        ProcessBuilder pb = new ProcessBuilder(command).directory(userDir.toFile())
                .redirectOutput(out.toFile()).redirectError(err.toFile());
        Map<String, String> environment = pb.environment();
        environment.remove("DISPLAY");
        environment.remove("WAYLAND_DISPLAY");
        environment.remove("LAMELLA_JAVA_OPTS");
        environment.remove("JAVA_TOOL_OPTIONS");
        environment.remove("GDK_GL");
        // The JDK running the tests unless the case names another.
        environment.put("JAVA_HOME", System.getProperty("java.home"));
        environment.putAll(new HashMap<>(env));
        Process process = pb.start();
        if (!process.waitFor(120, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            throw new AssertionError("the script did not exit within 120 s: " + command);
        }
        return new Run(process.exitValue(), Files.readString(out, StandardCharsets.UTF_8),
                Files.readString(err, StandardCharsets.UTF_8));
    }

    private record Run(int status, String out, String err) {
    }
}
