package lamella.materials;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import lamella.api.OwnInputs;
import lamella.api.command.RuntimeInputs;
import lamella.api.command.StartupNotice;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryTier;
import lamella.api.material.MaterialLibrary;

/**
 * One line for each configured facility or user library that is missing or has errors, so that every command
 * mentions it as it starts instead of leaving it to {@code materials list}. Asking reads the libraries (they are
 * read at most once); a process that configures none reads nothing. Also the files of those folders, which no
 * command's output may replace.
 */
final class LibraryNotices implements StartupNotice, RuntimeInputs {

    record Configured(LibraryTier tier, Path folder, MaterialLibrary library) {
    }

    private final List<Configured> libraries = new CopyOnWriteArrayList<>();

    void add(LibraryTier tier, Path folder, MaterialLibrary library) {
        libraries.add(new Configured(tier, folder, library));
    }

    void clear() {
        libraries.clear();
    }

    /** The files of every configured folder, listed (not read): no output may replace them. */
    @Override
    public List<Path> files() {
        List<Path> out = new ArrayList<>();
        for (Configured c : libraries) {
            out.addAll(OwnInputs.ofLibraryFolder(c.folder()));
        }
        return out;
    }

    @Override
    public List<String> notices() {
        List<String> out = new ArrayList<>();
        for (Configured c : libraries) {
            notice(c).ifPresent(out::add);
        }
        return out;
    }

    static java.util.Optional<String> notice(Configured c) {
        List<LibraryFinding> errors = c.library().findings().stream().filter(LibraryFinding::isError).toList();
        if (errors.isEmpty()) {
            return java.util.Optional.empty();
        }
        String details = "; details: lamella materials check " + c.folder() + " --tier " + c.tier().label();
        String what = "the " + c.tier().label() + " material library " + c.folder();
        if (c.library().materials().isEmpty()) {
            return java.util.Optional.of(what + " cannot be used, so none of its values are: "
                    + errors.get(0).message() + (errors.size() > 1 ? " (and " + (errors.size() - 1) + " more)" : "")
                    + details);
        }
        return java.util.Optional.of(what + " has " + errors.size() + " error" + (errors.size() == 1 ? "" : "s")
                + ", and the entries or files " + (errors.size() == 1 ? "it concerns are" : "they concern are")
                + " left out" + details);
    }
}
