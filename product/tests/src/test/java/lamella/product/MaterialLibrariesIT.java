package lamella.product;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;

import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The assembled runtime finds the shipped library bundle through its manifest header, and a facility folder named by
 * the runtime's configuration replaces a shipped entry — through the launcher, as a user runs it.
 */
class MaterialLibrariesIT {

    private record Run(int status, String out, String err) {
    }

    @TempDir
    static Path home;
    @TempDir
    static Path userDir;

    @BeforeAll
    static void copyRuntime() throws Exception {
        RuntimeCopy.into(home);
    }

    @Test
    void theExtenderFindsTheShippedLibraryBundle() throws Exception {
        Run run = launch(List.of(), "materials", "list");
        assertEquals(0, run.status(), run.err());
        List<String> rows = run.out().lines().takeWhile(l -> !l.isEmpty()).skip(1).toList();
        assertTrue(rows.size() >= 25, "shipped entries: " + rows.size() + "\n" + run.out());
        assertTrue(rows.stream().allMatch(r -> r.contains(" lamella-shipped ") && r.contains(" shipped ")), run.out());
        assertTrue(run.out().contains("bundle lamella.materials.shipped"), run.out());

        Run plugins = launch(List.of(), "plugins");
        assertTrue(plugins.out().matches("(?s).*\\nmaterial library +lamella-shipped +lamella\\.materials .*"),
                plugins.out());
    }

    @Test
    void aConfiguredFacilityFolderReplacesAShippedEntry() throws Exception {
        Path facility = Path.of("../../demo-data/materials/fenwick-hall").toAbsolutePath().normalize();
        Run run = launch(List.of("-Dlamella.materials.facility=" + facility), "materials", "show", "al");
        assertEquals(0, run.status(), run.err());
        assertTrue(run.out().startsWith("aluminium — Aluminium transducer film"), run.out());
        assertTrue(run.out().contains("Fenwick Hall thermal lab films (facility)"), run.out());
        assertTrue(run.out().contains("replaces   library Lamella shipped materials (shipped), entry aluminium v1"),
                run.out());

        Path demo = Path.of("../../demo-data/cases/libraries/oxide-on-sapphire-tdtr.json").toAbsolutePath().normalize();
        Run simulate = launch(List.of("-Dlamella.materials.facility=" + facility), "simulate", demo.toString(),
                "--explain");
        assertEquals(0, simulate.status(), simulate.err());
        assertTrue(simulate.out().startsWith("delay_s,in_phase,out_of_phase,ratio,phase_deg\n"), simulate.out());
        assertTrue(simulate.err().matches("(?s).*transducer +k_through_w_mk +170 .*library Fenwick Hall thermal lab"
                + " films \\(facility\\), entry aluminium v3.*"), simulate.err());
    }

    @Test
    void aFacilityEntryThatTakesAShippedAliasWithoutSayingSoStopsTheCaseNamingBothEntries() throws Exception {
        Path facility = userDir.resolve("glue-library");
        Files.createDirectories(facility);
        Files.writeString(facility.resolve("library.json"), "{\"library_format\": 1, \"id\": \"glue\","
                + " \"name\": \"Glue library (invented)\"}\n");
        Files.writeString(facility.resolve("glue.json"), "{\"materials\": [\n  {\"id\": \"thermal-glue\","
                + " \"name\": \"glue\", \"aliases\": [\"si\"], \"version\": 1, \"source\": \"invented\",\n"
                + "   \"properties\": {\"k_w_mk\": {\"value\": 1.15, \"at_k\": 300, \"uncertainty_rel\": 0.1},\n"
                + "   \"heat_capacity_j_m3k\": {\"value\": 2e6, \"at_k\": 300, \"uncertainty_rel\": 0.1}}}\n]}\n");
        Path c = Files.writeString(userDir.resolve("on-si.json"), "{\"stack\": {\"layers\": [{\"name\":"
                + " \"substrate\", \"material\": \"si\"}]}, \"geometry\": {\"type\": \"gaussian\","
                + " \"pump_radius_m\": 5e-6, \"probe_radius_m\": 5e-6}, \"measurement\": {\"type\": \"sstr\"}}");
        List<String> options = List.of("-Dlamella.materials.facility=" + facility);
        String glue = "library Glue library (invented) (facility), entry thermal-glue v1, " + facility.resolve("glue.json")
                + ":2";
        String silicon = "library Lamella shipped materials (shipped), entry silicon v1,"
                + " lamella.materials.shipped!/materials/semiconductors.json:3";

        Run check = launch(options, "materials", "check", facility.toString());
        assertEquals(2, check.status(), check.out() + check.err());
        assertTrue(check.out().contains(glue) && check.out().contains(silicon), check.out());

        Run simulate = launch(options, "simulate", c.toString());
        assertEquals(2, simulate.status(), simulate.out() + simulate.err());
        assertEquals("", simulate.out());
        assertTrue(simulate.err().contains("stack.layers[0].material: material 'si' is ambiguous"), simulate.err());
        assertTrue(simulate.err().contains(glue) && simulate.err().contains(silicon), simulate.err());
    }

    @Test
    void noCommandReplacesAFileOfTheConfiguredLibrary() throws Exception {
        Path facility = userDir.resolve("own-library");
        Files.createDirectories(facility);
        Path head = Files.writeString(facility.resolve("library.json"), "{\"library_format\": 1, \"id\": \"own\","
                + " \"name\": \"Own library (invented)\"}\n");
        Path c = Files.writeString(userDir.resolve("plain.json"), "{\"stack\": {\"layers\": [{\"name\": \"s\","
                + " \"k_through_w_mk\": 1.4, \"heat_capacity_j_m3k\": 1.6e6}]}, \"geometry\": {\"type\":"
                + " \"gaussian\", \"pump_radius_m\": 5e-6, \"probe_radius_m\": 5e-6}, \"measurement\": {\"type\":"
                + " \"sstr\"}}");
        List<String> options = List.of("-Dlamella.materials.facility=" + facility);
        String before = Files.readString(head);
        Run simulate = launch(options, "simulate", c.toString(), "--out", facility.resolve("./library.json").toString());
        assertEquals(2, simulate.status(), simulate.err());
        assertTrue(simulate.err().contains("would overwrite its own input " + head), simulate.err());
        Run export = launch(options, "materials", "export", "silicon", "--out",
                facility.resolve("../own-library/library.json").toString());
        assertEquals(2, export.status(), export.err());
        assertTrue(export.err().contains("would overwrite its own input " + head), export.err());
        assertEquals(before, Files.readString(head), "the library file is untouched");
    }

    @Test
    void aConfiguredFolderThatIsMissingIsNamedNotIgnored() throws Exception {
        Path nowhere = userDir.resolve("nowhere");
        Run run = launch(List.of("-Dlamella.materials.facility=" + nowhere), "materials", "list");
        assertEquals(0, run.status(), run.err());
        assertTrue(run.out().contains("the facility library folder does not exist"), run.out());

        Run plugins = launch(List.of("-Dlamella.materials.facility=" + nowhere), "plugins");
        assertEquals(0, plugins.status(), plugins.err());
        List<String> lines = plugins.err().lines().filter(l -> l.contains("material library")).toList();
        assertEquals(List.of("lamella: the facility material library " + nowhere + " cannot be used, so none of its"
                + " values are: the facility library folder does not exist; details: lamella materials check "
                + nowhere + " --tier facility"), lines, "once, by a command that names no material: " + plugins.err());
    }

    @Test
    void aFitItsReportAndTheSensitivitiesNameEveryLibraryValueTheyUsed() throws Exception {
        Path facility = Path.of("../../demo-data/materials/fenwick-hall").toAbsolutePath().normalize();
        List<String> options = List.of("-Dlamella.materials.facility=" + facility);
        Path work = Files.createDirectories(userDir.resolve("provenance"));
        String stack = "\"stack\": {\"layers\": [{\"name\": \"transducer\", \"material\": \"al\", \"thickness_m\":"
                + " 8e-8, \"conductance_below_w_m2k\": 1e8}, {\"name\": \"substrate\", \"material\": \"sapphire\","
                + " \"c_axis\": \"normal\"}]}, \"geometry\": {\"type\": \"gaussian\", \"pump_radius_m\": 5e-6,"
                + " \"probe_radius_m\": 5e-6}, \"measurement\": {\"type\": \"fdtr\", \"frequencies_hz\": [1e5, 3e5,"
                + " 1e6, 3e6, 1e7]}";
        Files.writeString(work.resolve("sim.json"), "{" + stack + "}");
        Run simulate = launch(options, "simulate", work.resolve("sim.json").toString(), "--out",
                work.resolve("fdtr.csv").toString());
        assertEquals(0, simulate.status(), simulate.err());
        Path fit = Files.writeString(work.resolve("fit.json"), "{" + stack + ", \"fit\": {\"datasets\": [{\"data\":"
                + " \"fdtr.csv\"}], \"free\": [{\"layer\": \"transducer\", \"property\": \"conductance_below_w_m2k\","
                + " \"initial\": 5e7}]}}");

        Run result = launch(options, "fit", fit.toString(), "--out", work.resolve("result.json").toString());
        assertEquals(0, result.status(), result.err());
        String json = Files.readString(work.resolve("result.json"));
        for (String s : List.of("\"library_values\"", "\"path\" : \"stack.layers[0].k_through_w_mk\"",
                "\"tier\" : \"facility\"", "\"id\" : \"fenwick-hall\"", "\"id\" : \"aluminium\"",
                "\"version\" : 3", "\"tier\" : \"shipped\"", "\"id\" : \"sapphire\"", "\"source\" : \"Invented demo value")) {
            assertTrue(json.contains(s), "expected " + s + " in " + json);
        }

        Run report = launch(options, "report", fit.toString(), "--out", work.resolve("report").toString());
        assertEquals(0, report.status(), report.err());
        assertTrue(Files.readString(work.resolve("report/result.json")).contains("\"library_values\""));
        String page = Files.readString(work.resolve("report/index.html"));
        assertTrue(page.contains("Values from material libraries") && page.contains("aluminium v3")
                && page.contains("Fenwick Hall thermal lab films (facility), fenwick-hall"), page);

        Run sensitivity = launch(options, "sensitivity", fit.toString(), "--dataset", "0");
        assertEquals(0, sensitivity.status(), sensitivity.err());
        assertTrue(sensitivity.err().contains("library Fenwick Hall thermal lab films (facility), entry aluminium v3,"
                + " Invented demo value"), sensitivity.err());
    }

    private static Run launch(List<String> javaOptions, String... args) throws Exception {
        List<String> command = new ArrayList<>();
        command.add(Path.of(System.getProperty("java.home"), "bin", "java").toString());
        command.add("-Djava.awt.headless=true");
        command.add("-Dlamella.cwd=" + userDir);
        // No user library of whoever runs the tests.
        command.add("-Dlamella.materials.user=");
        command.addAll(javaOptions);
        command.add("-jar");
        command.add(home.resolve("lib/lamella.launcher.jar").toString());
        command.addAll(List.of(args));
        Process process = new ProcessBuilder(command).directory(userDir.toFile()).start();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        Thread drain = new Thread(() -> {
            try {
                process.getErrorStream().transferTo(err);
            } catch (java.io.IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        });
        drain.start();
        String out = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (!process.waitFor(60, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            throw new AssertionError("the launcher did not exit within 60 s: " + command);
        }
        drain.join();
        return new Run(process.exitValue(), out, err.toString(StandardCharsets.UTF_8));
    }
}
