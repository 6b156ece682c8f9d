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

    /** A command leaves the desktop bundles unstarted, but a plugin that imports their packages still goes live. */
    @Test
    void aPluginThatNeedsTheDesktopStillLoadsForACommand() throws Exception {
        Path panel = home.resolve("plugins/lab-panel.jar");
        TestBundles.write(panel, "lamella.test.panel", Map.of("Import-Package",
                "org.eclipse.swt.widgets,lamella.ui.api"));
        try {
            Run run = launch("help");

            assertEquals(0, run.status(), run.err());
            assertEquals("", run.err());
            assertTrue(run.out().startsWith("usage: lamella COMMAND"), run.out());
        } finally {
            Files.delete(panel);
        }
    }

    @Test
    void frameworkPropertiesGivenWithDashDReachTheRuntime() throws Exception {
        Path elsewhere = Files.createDirectories(userDir.resolve("other-plugins"));
        Run run = launch(List.of("-Dlamella.plugins.dir=" + elsewhere), "plugins");

        assertEquals(0, run.status(), run.err());
        assertTrue(run.out().contains("\nplugins folder: " + elsewhere + "\n"), run.out());
    }

    /** The main job end to end: a demo case through the real runtime, CSV to a file relative to the user's folder. */
    @Test
    void simulateWritesTheDemoCaseAsCsv() throws Exception {
        Path demo = Path.of("../../demo-data/cases/oxide-film-tdtr.json").toAbsolutePath().normalize();
        Run run = launch("simulate", demo.toString(), "--out", "result/tdtr.csv");

        assertEquals(0, run.status(), run.err());
        List<String> lines = Files.readAllLines(userDir.resolve("result/tdtr.csv"));
        assertEquals("delay_s,in_phase,out_of_phase,ratio,phase_deg", lines.get(0));
        assertEquals(26, lines.size(), "a header and one row per delay");
        assertTrue(lines.get(1).matches("1\\.000000000000e-10(,-?\\d\\.\\d{12}e[+-]\\d{2}){4}"), lines.get(1));
    }

    /** Bad input: exit status 2, the message names file, line and JSON path, and no output file appears. */
    @Test
    void simulateRejectsATypoWithoutWritingOutput() throws Exception {
        Path bad = userDir.resolve("typo.json");
        Files.writeString(bad, """
                {
                  "stack": {"layers": [{"name": "glass", "k_through_w_mk": 1.4, "heat_capacity_j_m3k": 1.6e6}]},
                  "geometry": {"type": "gaussian", "pump_radus_m": 5e-6, "probe_radius_m": 5e-6},
                  "measurement": {"type": "sstr"}
                }
                """);
        Run run = launch("simulate", "typo.json", "--out", "typo.csv");

        assertEquals(2, run.status(), run.err());
        assertTrue(run.err().contains("typo.json:3: geometry.pump_radus_m: unknown key"), run.err());
        assertTrue(run.err().contains("did you mean 'pump_radius_m'"), run.err());
        assertTrue(Files.notExists(userDir.resolve("typo.csv")));
    }

    /** Experiment design end to end: the demo plan is ranked, printed with the case as written, written whole. */
    @Test
    void planRanksTheDemoPlansAndWritesEveryOne() throws Exception {
        Path demo = Path.of("../../demo-data/plan/oxide-film-tdtr.json").toAbsolutePath().normalize();
        Run run = launch("plan", demo.toString(), "--out", "plans/tdtr.json", "--show", "3");

        assertEquals(0, run.status(), run.err());
        assertTrue(run.out().contains("as written"), run.out());
        assertTrue(run.out().contains("Budget of the best plan"), run.out());
        String json = Files.readString(userDir.resolve("plans/tdtr.json"));
        assertEquals(61, json.split("\"values\" : \\{", -1).length - 1, "the case as written and 60 plans: 5 single"
                + " and 10 paired frequencies, 4 spots");
        assertTrue(json.contains("\"rank\" : 1,"), json);
        assertTrue(json.contains("\"geometry.pump_radius_m\" : "), json);
        for (String key : List.of("\"parameter\" : \"film.k_through_w_mk\"", "\"sigma\" : ", "\"sigma_noise\" : ",
                "\"sigma_relative\" : ", "\"steady_rise_k\" : ")) {
            assertTrue(json.contains(key), key);
        }
        // the pictures beside the plan file: the objective map and the best plan's sensitivity curves
        for (String name : List.of("tdtr-objective", "tdtr-sensitivity")) {
            Path png = userDir.resolve("plans/" + name + ".png");
            assertTrue(run.err().contains("wrote " + png), run.err());
            java.awt.image.BufferedImage image = javax.imageio.ImageIO.read(png.toFile());
            java.util.Set<Integer> colours = new java.util.HashSet<>();
            for (int x = 0; x < image.getWidth(); x += 7) {
                for (int y = 0; y < image.getHeight(); y += 7) {
                    colours.add(image.getRGB(x, y));
                }
            }
            assertTrue(colours.size() > 20, name + ": a picture, not a blank: " + colours.size() + " colours");
            String svg = Files.readString(userDir.resolve("plans/" + name + ".svg"));
            javax.xml.parsers.DocumentBuilderFactory.newInstance().newDocumentBuilder()
                    .parse(new org.xml.sax.InputSource(new java.io.StringReader(svg)));
        }
        assertTrue(Files.readString(userDir.resolve("plans/tdtr-objective.svg")).contains("(MHz)"), "axis unit");
    }

    /** A plan's bad input: exit status 2 at the JSON path, and no output file; its own case is never overwritten. */
    @Test
    void planRefusesABadPlanAndItsOwnInput() throws Exception {
        Path bad = userDir.resolve("bad-plan.json");
        Files.writeString(bad, """
                {
                  "stack": {"layers": [{"name": "glass", "k_through_w_mk": 1.4, "heat_capacity_j_m3k": 1.6e6}]},
                  "geometry": {"type": "gaussian", "pump_radius_m": 5e-6, "probe_radius_m": 5e-6},
                  "measurement": {"type": "fdtr", "frequencies_hz": [1e3, 1e4, 1e5, 1e6]},
                  "fit": {"free": [{"layer": "glass", "property": "k_w_mk"}]},
                  "plan": {"vary": [
                    {"geometry": "pump_radus_m", "values": [2e-6, 8e-6]}]}
                }
                """);
        Run run = launch("plan", "bad-plan.json", "--out", "bad-plans.json");
        assertEquals(2, run.status(), run.err());
        assertTrue(run.err().contains("bad-plan.json:7: plan.vary[0].geometry: unknown key 'pump_radus_m'"), run.err());
        assertTrue(Files.notExists(userDir.resolve("bad-plans.json")));

        Run own = launch("plan", "bad-plan.json", "--out", "./bad-plan.json");
        assertEquals(2, own.status(), own.err());
        assertTrue(own.err().contains("would overwrite its own input"), own.err());
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
