package lamella.materials;

import static lamella.materials.Folders.aliased;
import static lamella.materials.Folders.entries;
import static lamella.materials.Folders.entry;
import static lamella.materials.Folders.replacing;
import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.material.LibraryTier;
import lamella.api.material.Material;
import lamella.api.material.MaterialCatalog;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code lamella materials} over the shipped library and the invented demo facility library. */
class MaterialsCommandTest {

    record Run(int status, String out, String err) {
    }

    @TempDir
    Path dir;

    private final MaterialsCommand command = new MaterialsCommand();

    @BeforeEach
    void wire() {
        command.addLibrary(LibraryFolder.read(Folders.SHIPPED, LibraryTier.SHIPPED));
        command.addLibrary(LibraryFolder.read(Folders.DEMO_FACILITY.toAbsolutePath().normalize(), LibraryTier.FACILITY));
    }

    private Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = command.run(List.of(args), new CommandIO(new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir));
        return new Run(status, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void listShowsEveryEntryInEffectAndWhatTheFacilityReplaces() {
        Run r = run("list");
        assertEquals(Command.OK, r.status(), r.err());
        assertTrue(r.out().startsWith("id "), r.out());
        assertTrue(r.out().matches("(?s).*\\naluminium +Aluminium transducer film.*fenwick-hall +facility +v3 .*"),
                r.out());
        assertTrue(r.out().matches("(?s).*\\nsilicon +Silicon.*lamella-shipped +shipped +v1 .*"), r.out());
        assertTrue(r.out().contains("aluminium: Fenwick Hall thermal lab films (facility) replaces Lamella shipped"
                + " materials (shipped) v1"), r.out());
        long rows = r.out().lines().takeWhile(l -> !l.isEmpty()).count() - 1;
        assertTrue(rows >= 26, "30 shipped entries, one replaced, one facility-only: " + rows);
        assertFalse(r.out().contains("problems:"), r.out());
    }

    @Test
    void showGivesEveryPropertyWithItsSourceAndCuration() {
        Run r = run("show", "Si");
        assertEquals(Command.OK, r.status(), r.err());
        for (String s : List.of("silicon — Silicon", "Lamella shipped materials (shipped)", "v1; not reviewed",
                "k_w_mk", "100 K: 884", "1000 K: 31.2", "uncertainty ±5 %", "Table A.1 (6th ed., Wiley 2007",
                "heat_capacity_j_m3k — derived", "at 300 K: 1658960")) {
            assertTrue(r.out().contains(s), "expected '" + s + "' in:\n" + r.out());
        }
        Run al = run("show", "aluminium");
        assertTrue(al.out().contains("reviewed by R. Okafor (invented) on 2024-11-18"), al.out());
        assertTrue(al.out().contains("replaces   library Lamella shipped materials (shipped), entry aluminium v1"),
                al.out());
    }

    @Test
    void showOfAnUnknownNameIsBadInput() {
        Run r = run("show", "unobtainium");
        assertEquals(Command.BAD_INPUT, r.status());
        assertTrue(r.err().contains("no material 'unobtainium'"), r.err());
    }

    @Test
    void checkPassesTheDemoLibraryAndNamesWhatItReplaces() {
        Run r = run("check", Folders.DEMO_FACILITY.toAbsolutePath().toString());
        assertEquals(Command.OK, r.status(), r.out() + r.err());
        assertTrue(r.out().contains("library fenwick-hall, 2 entries read, 0 errors, 0 warnings"), r.out());
        assertTrue(r.out().contains("aluminium replaces library Lamella shipped materials (shipped), entry aluminium v1"),
                r.out());
    }

    @Test
    void checkReportsEveryProblemAndFailsOnAnError() throws Exception {
        Path lib = Folders.library(dir.resolve("draft"), "draft", "Draft");
        Folders.file(lib, "a.json", entries(entry("ok", 1.0), entry("bad", -1.0)));
        Folders.file(lib, "b.json", "{\"materials\": [\n");
        Run r = run("check", "draft");
        assertEquals(Command.BAD_INPUT, r.status(), r.out());
        assertTrue(r.out().contains(lib.resolve("a.json") + ":7: materials[1].properties.k_w_mk.value: error:"),
                r.out());
        assertTrue(r.out().contains(lib.resolve("b.json") + ":"), r.out());
        assertTrue(r.out().contains("1 entries read, 2 errors"), r.out());
    }

    @Test
    void checkFindsANameThatAnotherLibraryOfTheSameTierClaims() throws Exception {
        Path lib = Folders.library(dir.resolve("second"), "second", "Second facility library");
        Folders.file(lib, "a.json", entries(entry("fh-pecvd-oxide", 1.0)));
        Run r = run("check", "second");
        assertEquals(Command.BAD_INPUT, r.status(), r.out());
        assertTrue(r.out().contains("the name 'fh-pecvd-oxide': ") && r.out().contains("all claim it in the facility"
                + " tier"), r.out());
        Run asUser = run("check", "second", "--tier", "user");
        assertEquals(Command.BAD_INPUT, asUser.status(), "a user entry of the same name must say it replaces: "
                + asUser.out());
        assertTrue(asUser.out().contains("does not say that it replaces it"), asUser.out());
        Folders.file(lib, "a.json", entries(replacing(entry("fh-pecvd-oxide", 1.0), "fh-pecvd-oxide")));
        Run declared = run("check", "second", "--tier", "user");
        assertEquals(Command.OK, declared.status(), declared.out());
        assertTrue(declared.out().contains("fh-pecvd-oxide replaces library Fenwick Hall thermal lab films (facility),"
                + " entry fh-pecvd-oxide v1"), declared.out());
    }

    @Test
    void checkRefusesAnEntryThatTakesAShippedAliasWithoutSayingSo() throws Exception {
        Path lib = Folders.library(dir.resolve("glue"), "glue", "Glue library");
        Path file = Folders.file(lib, "a.json", entries(aliased(entry("thermal-glue", 1.15), "si")));
        Run r = run("check", "glue");
        assertEquals(Command.BAD_INPUT, r.status(), r.out());
        for (String s : List.of("error: the name 'si': ", "library Glue library (facility), entry thermal-glue v1, "
                + file + ":3", "library Lamella shipped materials (shipped), entry silicon v1, "
                + Folders.SHIPPED.resolve("semiconductors.json") + ":", "\"replaces\": [\"silicon\"]",
                "1 entries read, 1 error, 0 warnings")) {
            assertTrue(r.out().contains(s), "expected '" + s + "' in:\n" + r.out());
        }
        Folders.file(lib, "a.json", entries(replacing(aliased(entry("thermal-glue", 1.15), "si"), "si")));
        Run declared = run("check", "glue");
        assertEquals(Command.OK, declared.status(), declared.out());
        assertTrue(declared.out().contains("thermal-glue replaces library Lamella shipped materials (shipped), entry"
                + " silicon v1"), declared.out());
    }

    @Test
    void checkRefusesAReplacesThatNamesNoLowerEntry() throws Exception {
        Path lib = Folders.library(dir.resolve("typo"), "typo", "Typo library");
        Folders.file(lib, "a.json", entries(replacing(entry("si-film", 100), "silcon")));
        Run r = run("check", "typo");
        assertEquals(Command.BAD_INPUT, r.status(), r.out());
        assertTrue(r.out().contains("entry si-film v1 says it replaces 'silcon', but no entry of a lower tier than"
                + " facility has that name"), r.out());
    }

    @Test
    void exportWritesAFileThatChecksCleanAndReadsBackTheSame() throws Exception {
        Path target = dir.resolve("mine/quartz.json");
        Run r = run("export", "alpha-quartz", "--out", "mine/quartz.json");
        assertEquals(Command.OK, r.status(), r.err());
        Folders.library(dir.resolve("mine"), "mine", "Mine");
        ReadLibrary back = LibraryFolder.read(dir.resolve("mine"), LibraryTier.USER);
        assertEquals(List.of(), back.findings());
        Material original = new MaterialCatalog(List.of(LibraryFolder.read(Folders.SHIPPED, LibraryTier.SHIPPED)))
                .lookup("quartz");
        Material copy = back.materials().get(0);
        assertEquals(original.id(), copy.id());
        assertEquals(original.aliases(), copy.aliases());
        assertEquals(List.of(original.id()), copy.replaces(), "the copy takes the place of what it copies");
        assertEquals(original.curation(), copy.curation());
        assertEquals(original.properties().keySet(), copy.properties().keySet());
        original.properties().forEach((q, p) -> {
            assertArrayEquals(p.curve().temperatures(), copy.properties().get(q).curve().temperatures());
            assertArrayEquals(p.curve().values(), copy.properties().get(q).curve().values());
            assertEquals(p.curve().isTable(), copy.properties().get(q).curve().isTable());
            assertEquals(p.source(), copy.properties().get(q).source());
            assertEquals(p.uncertaintyRel(), copy.properties().get(q).uncertaintyRel());
            assertEquals(p.notes(), copy.properties().get(q).notes());
        });
        assertTrue(Files.readString(target).startsWith("{\n  \"materials\": ["));
    }

    @Test
    void exportNeverReplacesAFileOfALiveLibraryHoweverItIsSpelled() throws Exception {
        Path lib = Folders.library(dir.resolve("lab"), "lab", "Lab library");
        Path entries = Folders.file(lib, "films.json", entries(entry("lab-film", 3.0)));
        MaterialsCommand own = new MaterialsCommand();
        own.addLibrary(LibraryFolder.read(Folders.SHIPPED, LibraryTier.SHIPPED));
        own.addLibrary(LibraryFolder.read(lib, LibraryTier.USER));
        Files.createDirectories(dir.resolve("sub"));
        Path link = Files.createSymbolicLink(dir.resolve("sub/link.json"), entries);
        Path hard = Files.createLink(dir.resolve("sub/hard.json"), lib.resolve("library.json"));
        String before = Files.readString(entries);
        String head = Files.readString(lib.resolve("library.json"));
        for (String[] c : List.of(new String[] {"lab/films.json", entries.toString()},
                new String[] {"./lab/films.json", entries.toString()},
                new String[] {"sub/../lab/films.json", entries.toString()},
                new String[] {"sub/link.json", entries.toString()},
                new String[] {"sub/hard.json", lib.resolve("library.json").toString()})) {
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            ByteArrayOutputStream err = new ByteArrayOutputStream();
            int status = own.run(List.of("export", "silicon", "--out", c[0]), new CommandIO(
                    new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true,
                    StandardCharsets.UTF_8), dir));
            String e = err.toString(StandardCharsets.UTF_8);
            assertEquals(Command.BAD_INPUT, status, c[0] + ": " + e);
            assertTrue(e.startsWith("lamella materials export: --out ") && e.contains(" would overwrite its own input "
                    + c[1] + "; nothing was written"), c[0] + ": " + e);
        }
        assertEquals(before, Files.readString(entries));
        assertEquals(head, Files.readString(lib.resolve("library.json")));

        Path configured = Folders.file(Files.createDirectories(dir.resolve("facility")), "films.json", "{}");
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int status = own.run(List.of("export", "silicon", "--out", "facility/./films.json"), new CommandIO(
                new PrintStream(new ByteArrayOutputStream(), true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8), dir, List.of(configured)));
        assertEquals(Command.BAD_INPUT, status, "a file of a configured library, even one that did not read");
        assertEquals("{}", Files.readString(configured));
    }

    @Test
    void usageErrorsAreBadInput() {
        for (String[] args : List.of(new String[] {}, new String[] {"lst"}, new String[] {"show"},
                new String[] {"check"}, new String[] {"check", "x", "--tier", "shipping"},
                new String[] {"export", "si", "--out"}, new String[] {"list", "extra"})) {
            Run r = run(args);
            assertEquals(Command.BAD_INPUT, r.status(), String.join(" ", args));
            assertTrue(r.err().contains("usage: lamella materials"), r.err());
        }
    }
}
