package lamella.materials;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.stream.Stream;
import lamella.api.FileProblems;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryInfo;
import lamella.api.material.LibraryTier;

/** A library in a folder of the file system: a facility's shared folder, a user's own, or one being checked. */
final class LibraryFolder {

    private LibraryFolder() {
    }

    static ReadLibrary read(Path folder, LibraryTier tier) {
        String location = folder.toString();
        if (!Files.isDirectory(folder)) {
            return unusable(tier, location, Files.exists(folder) ? "is not a folder" : "does not exist");
        }
        List<SourceFile> files;
        try (Stream<Path> s = Files.list(folder)) {
            files = s.filter(p -> p.getFileName().toString().endsWith(".json") && Files.isRegularFile(p)).sorted()
                    .map(p -> new SourceFile(p.toString(), p.getFileName().toString(), () -> Files.newInputStream(p)))
                    .toList();
        } catch (IOException e) {
            return unusable(tier, location, "cannot be listed: " + FileProblems.reason(e));
        }
        return LibraryReader.read(tier, location, files);
    }

    private static ReadLibrary unusable(LibraryTier tier, String location, String why) {
        return new ReadLibrary(new LibraryInfo(tier.label() + "?", "(missing " + tier.label() + " library)", tier,
                location, ""), List.of(), List.of(new LibraryFinding(LibraryFinding.Severity.ERROR, location, -1, "",
                "the " + tier.label() + " library folder " + why)));
    }
}
