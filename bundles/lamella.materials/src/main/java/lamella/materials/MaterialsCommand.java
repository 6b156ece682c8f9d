package lamella.materials;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import lamella.api.AtomicText;
import lamella.api.FileProblems;
import lamella.api.InputException;
import lamella.api.OwnInputs;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.material.LibraryTier;
import lamella.api.material.Material;
import lamella.api.material.MaterialCatalog;
import lamella.api.material.MaterialLibrary;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;

/** {@code lamella materials list | show ID | check FOLDER | export ID}: the live material libraries. */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + MaterialsCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + MaterialsCommand.SUMMARY})
public final class MaterialsCommand implements Command {

    static final String NAME = "materials";
    static final String SUMMARY = "Lists, shows, checks and exports entries of the material libraries.";

    private final List<MaterialLibrary> libraries = new CopyOnWriteArrayList<>();

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeLibrary")
    void addLibrary(MaterialLibrary library) {
        libraries.add(library);
    }

    void removeLibrary(MaterialLibrary library) {
        libraries.remove(library);
    }

    @Override
    public String name() {
        return NAME;
    }

    @Override
    public String summary() {
        return SUMMARY;
    }

    @Override
    public String usage() {
        return """
                usage: lamella materials list
                       lamella materials show NAME
                       lamella materials check FOLDER [--tier bundle|facility|user]
                       lamella materials export NAME [--out FILE.json]

                list    every entry in effect (user over facility over data bundles over shipped), the entries
                        a higher tier replaces, the live libraries and every problem found in them
                show    one entry (by id or alias) with every property, its table, uncertainty, source and curation
                check   reads a library folder as it would be published (as a facility library unless --tier says
                        otherwise) and reports every problem with file, line and JSON path, and the problems it
                        would cause among the live libraries (a name of a lower tier's entry used without
                        "replaces" naming that entry, a "replaces" that names none); exit status 2 if there is
                        an error
                export  one entry as a library file, to standard output or written atomically to --out, ready to
                        copy into a folder of your own and revise

                Libraries come from bundles with a Lamella-Material-Library manifest header and from the folders
                named by lamella.materials.facility and lamella.materials.user (see conf/lamella.properties).
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        if (args.isEmpty()) {
            return usageError(io, "which subcommand: list, show, check or export?");
        }
        List<String> rest = args.subList(1, args.size());
        MaterialCatalog catalog = new MaterialCatalog(libraries);
        switch (args.get(0)) {
            case "list":
                if (!rest.isEmpty()) {
                    return usageError(io, "list takes no arguments, got: " + String.join(" ", rest));
                }
                io.out().print(MaterialText.list(catalog));
                return OK;
            case "show":
                if (rest.size() != 1) {
                    return usageError(io, "show takes one material name");
                }
                return show(catalog, rest.get(0), io);
            case "check":
                return check(rest, io);
            case "export":
                return export(catalog, rest, io);
            default:
                return usageError(io, "unknown subcommand '" + args.get(0) + "'; expected list, show, check or export");
        }
    }

    private int show(MaterialCatalog catalog, String name, CommandIO io) {
        try {
            io.out().print(MaterialText.show(catalog.lookup(name), catalog));
            return OK;
        } catch (InputException e) {
            io.err().println("lamella materials: " + e.problem());
            return BAD_INPUT;
        }
    }

    private int check(List<String> args, CommandIO io) {
        String folder = null;
        LibraryTier tier = LibraryTier.FACILITY;
        for (int i = 0; i < args.size(); i++) {
            String a = args.get(i);
            if (a.equals("--tier")) {
                if (i + 1 >= args.size()) {
                    return usageError(io, "--tier needs bundle, facility or user");
                }
                String t = args.get(++i);
                tier = Arrays.stream(LibraryTier.values()).filter(x -> x.label().equals(t)).findFirst().orElse(null);
                if (tier == null) {
                    return usageError(io, "--tier: unknown tier '" + t + "'; expected bundle, facility or user");
                }
            } else if (a.startsWith("-")) {
                return usageError(io, "check: unknown option " + a);
            } else if (folder == null) {
                folder = a;
            } else {
                return usageError(io, "check takes one folder; got also " + a);
            }
        }
        if (folder == null) {
            return usageError(io, "check needs the library folder");
        }
        LibraryCheck check = LibraryCheck.of(io.resolve(folder), tier, libraries);
        io.out().print(check.report());
        return check.hasErrors() ? BAD_INPUT : OK;
    }

    private int export(MaterialCatalog catalog, List<String> args, CommandIO io) {
        String name = null;
        String out = null;
        for (int i = 0; i < args.size(); i++) {
            String a = args.get(i);
            if (a.equals("--out")) {
                if (i + 1 >= args.size()) {
                    return usageError(io, "--out needs a file name");
                }
                out = args.get(++i);
            } else if (a.startsWith("-")) {
                return usageError(io, "export: unknown option " + a);
            } else if (name == null) {
                name = a;
            } else {
                return usageError(io, "export takes one material name; got also " + a);
            }
        }
        if (name == null) {
            return usageError(io, "export needs a material name");
        }
        Material m;
        try {
            m = catalog.lookup(name);
        } catch (InputException e) {
            io.err().println("lamella materials: " + e.problem());
            return BAD_INPUT;
        }
        String json = EntryExport.json(m);
        if (out == null) {
            io.out().print(json);
            return OK;
        }
        Path target = io.resolve(out);
        Path clash = OwnInputs.clash(target, libraryFiles(io));
        if (clash != null) {
            io.err().println(OwnInputs.message("materials export", target, clash));
            return BAD_INPUT;
        }
        try {
            AtomicText.write(target, json);
        } catch (IOException e) {
            io.err().println("lamella materials: cannot write " + target + ": " + FileProblems.reason(e));
            return FAILED;
        }
        io.err().println("wrote " + m.label() + " to " + target);
        return OK;
    }

    /** Every file of the live folder libraries, and the runtime's other inputs: what an export must not replace. */
    private List<Path> libraryFiles(CommandIO io) {
        List<Path> files = new java.util.ArrayList<>(io.runtimeInputs());
        for (MaterialLibrary l : libraries) {
            LibraryTier tier = l.info().tier();
            if (tier == LibraryTier.FACILITY || tier == LibraryTier.USER) {
                files.addAll(OwnInputs.ofLibraryFolder(Path.of(l.info().location())));
            }
        }
        return files;
    }

    private int usageError(CommandIO io, String problem) {
        io.err().println("lamella materials: " + problem + "\n" + usage());
        return BAD_INPUT;
    }

}
