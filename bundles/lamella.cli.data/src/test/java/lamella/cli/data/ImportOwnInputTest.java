package lamella.cli.data;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Stream;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * {@code import --out} never replaces its own input — the raw instrument file, the reference file, or a file of a
 * configured material library — however it is spelled (./, .., a symbolic link, a hard link): exit 2, "would
 * overwrite its own input FILE", nothing written. The demo's raw files are the inputs.
 */
class ImportOwnInputTest {

    @TempDir
    Path dir;

    private Path raw;
    private Path reference;
    private Path library;

    @BeforeEach
    void files() throws IOException {
        Files.createDirectories(dir.resolve("sub"));
        raw = Files.copy(ImportCommandTest.DEMO_RAW.resolve("oxide-film-fdtr.csv"), dir.resolve("fdtr.csv"));
        reference = Files.copy(ImportCommandTest.DEMO_RAW.resolve("fdtr-reference-phase.csv"), dir.resolve("ref.csv"));
        Files.createDirectories(dir.resolve("lib"));
        library = Files.writeString(dir.resolve("lib/films.json"), "{\"materials\": []}\n");
    }

    private Map<Path, String> snapshot() throws IOException {
        Map<Path, String> all = new TreeMap<>();
        try (Stream<Path> s = Files.walk(dir)) {
            for (Path p : s.filter(Files::isRegularFile).toList()) {
                all.put(p, Files.readString(p, StandardCharsets.ISO_8859_1));
            }
        }
        return all;
    }

    @Test
    void theRawFileTheReferenceAndALibraryFileAreRefusedInEverySpelling() throws IOException {
        ImportCommand command = Runs.importCommand();
        for (Path input : List.of(raw, reference, library)) {
            String name = dir.relativize(input).toString();
            Path link = Files.createSymbolicLink(dir.resolve("sub/link-" + input.getFileName()), input);
            Path hard = Files.createLink(dir.resolve("sub/hard-" + input.getFileName()), input);
            for (String out : List.of(name, "./" + name, "sub/../" + name, "sub/link-" + input.getFileName(),
                    "sub/hard-" + input.getFileName())) {
                Map<Path, String> before = snapshot();
                ByteArrayOutputStream o = new ByteArrayOutputStream();
                ByteArrayOutputStream e = new ByteArrayOutputStream();
                int status = command.run(List.of("fdtr.csv", "--reference", "ref.csv", "--out", out),
                        new CommandIO(new PrintStream(o, true, StandardCharsets.UTF_8),
                                new PrintStream(e, true, StandardCharsets.UTF_8), dir, List.of(library)));
                String err = e.toString(StandardCharsets.UTF_8);
                assertEquals(Command.BAD_INPUT, status, out + ": " + err);
                assertTrue(err.startsWith("lamella import: --out ") && err.contains(" would overwrite its own input "
                        + input + "; nothing was written"), out + ": " + err);
                assertEquals("", o.toString(StandardCharsets.UTF_8));
                assertEquals(before, snapshot(), "nothing written: " + out);
            }
        }
    }
}
