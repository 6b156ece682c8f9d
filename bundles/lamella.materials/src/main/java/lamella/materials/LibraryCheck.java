package lamella.materials;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import lamella.api.material.LibraryFinding;
import lamella.api.material.LibraryTier;
import lamella.api.material.Material;
import lamella.api.material.MaterialCatalog;
import lamella.api.material.MaterialLibrary;

/**
 * A library folder checked before it is published: its own findings, and the problems it would cause among the live
 * libraries (names claimed twice in one tier, aliases that change meaning). A live library read from the same folder
 * is set aside, so a configured folder can be checked again after an edit.
 *
 * @param library  the folder as read
 * @param findings its own findings and the new conflicts, in that order
 * @param replaces for each of its entries that replaces a lower tier's, a line saying so
 */
record LibraryCheck(ReadLibrary library, List<LibraryFinding> findings, List<String> replaces) {

    static LibraryCheck of(Path folder, LibraryTier tier, Collection<? extends MaterialLibrary> live) {
        ReadLibrary candidate = LibraryFolder.read(folder, tier);
        List<MaterialLibrary> others = new ArrayList<>();
        for (MaterialLibrary l : live) {
            if (!l.info().location().equals(candidate.info().location())) {
                others.add(l);
            }
        }
        Set<String> before = new HashSet<>();
        new MaterialCatalog(others).conflicts().forEach(f -> before.add(f.toString()));
        List<MaterialLibrary> with = new ArrayList<>(others);
        with.add(candidate);
        MaterialCatalog catalog = new MaterialCatalog(with);
        List<LibraryFinding> findings = new ArrayList<>(candidate.findings());
        for (LibraryFinding f : catalog.conflicts()) {
            if (!before.contains(f.toString())) {
                findings.add(f);
            }
        }
        List<String> replaces = new ArrayList<>();
        for (Material m : candidate.materials()) {
            for (Material lower : catalog.replacedBy(m)) {
                replaces.add(m.id() + " replaces " + lower.label());
            }
        }
        return new LibraryCheck(candidate, findings, replaces);
    }

    boolean hasErrors() {
        return findings.stream().anyMatch(LibraryFinding::isError);
    }

    String report() {
        StringBuilder sb = new StringBuilder();
        findings.forEach(f -> sb.append(f).append('\n'));
        long errors = findings.stream().filter(LibraryFinding::isError).count();
        long warnings = findings.size() - errors;
        sb.append(library.info().location()).append(": library ").append(library.info().id()).append(", ")
                .append(library.materials().size()).append(" entries read, ").append(errors).append(" error")
                .append(errors == 1 ? "" : "s").append(", ").append(warnings).append(" warning")
                .append(warnings == 1 ? "" : "s").append('\n');
        replaces.forEach(r -> sb.append("  ").append(r).append('\n'));
        return sb.toString();
    }
}
