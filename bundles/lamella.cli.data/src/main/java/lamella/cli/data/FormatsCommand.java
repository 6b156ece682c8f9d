package lamella.cli.data;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import lamella.api.InputException;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.ImporterProfiles;
import lamella.api.data.Scan;
import lamella.api.data.StatedSettings;
import org.osgi.framework.Bundle;
import org.osgi.framework.ServiceReference;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.osgi.service.component.annotations.ReferencePolicyOption;

/**
 * {@code lamella formats}: the live importers, each with its id, its tier and what it reads; and
 * {@code lamella formats check PATH [--try FILE]}, which checks importer profiles before a facility publishes them.
 */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + FormatsCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + FormatsCommand.SUMMARY})
public final class FormatsCommand implements Command {

    static final String NAME = "formats";
    static final String SUMMARY = "Lists the live data importers and checks importer profiles (lamella formats check FOLDER).";

    private final LiveImporters importers = new LiveImporters();
    private final Map<DataImporter, String> tiers = new ConcurrentHashMap<>();
    private volatile ImporterProfiles profiles;

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeImporter")
    void addImporter(ServiceReference<DataImporter> reference, DataImporter i) {
        Object tier = reference.getProperty(ImporterProfiles.TIER_PROPERTY);
        Bundle bundle = reference.getBundle();
        String name = bundle == null ? null : bundle.getSymbolicName();
        tiers.put(i, tier != null ? tier.toString()
                : name == null || name.startsWith("lamella.") ? "built-in" : "bundle " + name);
        importers.add(i);
    }

    /** For tests without a framework: an importer of Lamella's own (not a bind method: that takes the reference). */
    void addBuiltIn(DataImporter i) {
        tiers.put(i, "built-in");
        importers.add(i);
    }

    void removeImporter(DataImporter i) {
        importers.remove(i);
        tiers.remove(i);
    }

    @Reference(cardinality = ReferenceCardinality.OPTIONAL, policy = ReferencePolicy.DYNAMIC,
            policyOption = ReferencePolicyOption.GREEDY, unbind = "removeProfiles")
    void addProfiles(ImporterProfiles p) {
        profiles = p;
    }

    void removeProfiles(ImporterProfiles p) {
        if (profiles == p) {
            profiles = null;
        }
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
                usage: lamella formats
                       lamella formats check PROFILE.json|FOLDER [--try FILE]

                Lists every live importer with the id that lamella import --format takes, its tier (built-in
                code, or a profile's tier: shipped, facility, user, or the data bundle it came in) and the files
                it reads. Importers are plug-ins: a bundle dropped into plugins/ adds one while Lamella runs, and
                a profile saved in the facility or user profile folder is live within a few seconds.

                check reads every profile (*.json) of FOLDER, or one profile file, and prints each finding with
                its file, line and JSON path; exit status 2 when there is any. --try FILE then reads FILE with the
                profile that recognises it best and shows what it read: the x column, scans, rows, signals and
                the settings its header states.
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        if (!args.isEmpty() && args.get(0).equals("check")) {
            return check(args.subList(1, args.size()), io);
        }
        if (!args.isEmpty()) {
            io.err().println("lamella formats: takes no arguments but check, got: " + String.join(" ", args));
            return BAD_INPUT;
        }
        List<DataImporter> all = importers.all();
        int width = "format".length();
        int tierWidth = "tier".length();
        for (DataImporter i : all) {
            width = Math.max(width, i.id().length());
            tierWidth = Math.max(tierWidth, tierOf(i).length());
        }
        StringBuilder sb = new StringBuilder();
        sb.append(pad("format", width)).append("  ").append(pad("tier", tierWidth)).append("  reads\n");
        for (DataImporter i : all) {
            sb.append(pad(i.id(), width)).append("  ").append(pad(tierOf(i), tierWidth)).append("  ")
                    .append(i.summary()).append('\n');
        }
        if (all.isEmpty()) {
            sb.append("(no importer is live)\n");
        }
        ImporterProfiles p = profiles;
        if (p != null && !p.liveProblems().isEmpty()) {
            sb.append("\nprofiles not live until fixed (lamella formats check FOLDER shows every finding):\n");
            for (ImporterProfiles.Finding f : p.liveProblems()) {
                sb.append("  ").append(f).append('\n');
            }
        }
        io.out().print(sb);
        io.out().flush();
        return OK;
    }

    private String tierOf(DataImporter i) {
        return tiers.getOrDefault(i, "built-in");
    }

    private int check(List<String> args, CommandIO io) {
        String target = null;
        String sample = null;
        for (int i = 0; i < args.size(); i++) {
            String a = args.get(i);
            if (a.equals("--try")) {
                if (i + 1 >= args.size()) {
                    io.err().println("lamella formats check: --try needs a data file");
                    return BAD_INPUT;
                }
                sample = args.get(++i);
            } else if (a.startsWith("-") || target != null) {
                io.err().println("lamella formats check: unexpected '" + a + "'\n" + usage());
                return BAD_INPUT;
            } else {
                target = a;
            }
        }
        if (target == null) {
            io.err().println("lamella formats check: which profile file or folder?\n" + usage());
            return BAD_INPUT;
        }
        ImporterProfiles p = profiles;
        if (p == null) {
            io.err().println("lamella formats check: the importer-profile bundle is not live");
            return FAILED;
        }
        Path path = io.resolve(target);
        List<ImporterProfiles.Finding> findings = p.check(path);
        if (!findings.isEmpty()) {
            for (ImporterProfiles.Finding f : findings) {
                io.out().println(f);
            }
            io.out().println(findings.size() + (findings.size() == 1 ? " finding" : " findings") + " in " + path);
            io.out().flush();
            return BAD_INPUT;
        }
        io.out().println(path + ": no findings");
        if (sample != null) {
            Path file = io.resolve(sample);
            Dataset d;
            try {
                d = p.tryOn(path, file);
            } catch (InputException e) {
                io.err().println("lamella formats check: " + e.getMessage());
                return BAD_INPUT;
            }
            int rows = 0;
            for (Scan s : d.scans()) {
                rows += s.rows();
            }
            io.out().println("read " + file + " with profile '" + d.format() + "':");
            io.out().println("  x: " + d.xColumn() + ", " + d.scans().size() + (d.scans().size() == 1 ? " scan, "
                    : " scans, ") + rows + " rows; signals: " + String.join(", ", d.signalColumns())
                    + (d.scans().get(0).sigmas().isEmpty() ? "" : "; standard deviations of "
                    + String.join(", ", d.scans().get(0).sigmas().keySet())));
            Scan first = d.scans().get(0);
            io.out().println("  first row: " + d.xColumn() + " = " + first.x()[0] + (first.signals().entrySet()
                    .stream().map(e -> ", " + e.getKey() + " = " + e.getValue()[0]).reduce("", String::concat)));
            StatedSettings stated = StatedSettings.of(d);
            stated.technique().ifPresent(t -> io.out().println("  technique: " + t));
            stated.numbers().forEach(n -> io.out().println("  " + n.key() + ": " + n.value() + " " + n.unit()));
            stated.other().forEach((k, v) -> io.out().println("  " + k + ": " + v));
            stated.unreadable().forEach(u -> io.out().println("  could not use: " + u));
        }
        io.out().flush();
        return OK;
    }

    private static String pad(String s, int width) {
        return s + " ".repeat(Math.max(0, width - s.length()));
    }
}
