package lamella.cli.data;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CopyOnWriteArrayList;
import lamella.api.AtomicText;
import lamella.api.FileProblems;
import lamella.api.HeatingGeometry;
import lamella.api.InputException;
import lamella.api.Technique;
import lamella.api.command.Command;
import lamella.api.command.CommandIO;
import lamella.api.data.DataImporter;
import lamella.api.data.Dataset;
import lamella.api.data.ImporterProfiles;
import lamella.api.data.DatasetSettings;
import lamella.api.data.SignalNames;
import lamella.api.data.StatedSettings;
import lamella.api.data.TextLines;
import lamella.conditioning.ConditionedTable;
import lamella.conditioning.Conditioner;
import lamella.conditioning.ConditioningOptions;
import org.osgi.service.component.annotations.Component;
import org.osgi.service.component.annotations.Reference;
import org.osgi.service.component.annotations.ReferenceCardinality;
import org.osgi.service.component.annotations.ReferencePolicy;
import org.osgi.service.component.annotations.ReferencePolicyOption;

/**
 * {@code lamella import FILE …}: reads an instrument file with the best live importer (or the one named),
 * conditions it and writes the normalised dataset as CSV, with a short report of what was done.
 */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + ImportCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + ImportCommand.SUMMARY})
public final class ImportCommand implements Command {

    static final String NAME = "import";
    static final String SUMMARY = "Reads an instrument data file, conditions it and writes the normalised dataset as CSV.";

    private final LiveImporters importers = new LiveImporters();
    private final List<Technique> techniques = new CopyOnWriteArrayList<>();
    private final List<HeatingGeometry> geometries = new CopyOnWriteArrayList<>();
    private volatile ImporterProfiles profiles;

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

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeImporter")
    void addImporter(DataImporter i) {
        importers.add(i);
    }

    void removeImporter(DataImporter i) {
        importers.remove(i);
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeTechnique")
    void addTechnique(Technique t) {
        techniques.add(t);
    }

    void removeTechnique(Technique t) {
        techniques.remove(t);
    }

    @Reference(cardinality = ReferenceCardinality.MULTIPLE, policy = ReferencePolicy.DYNAMIC,
            unbind = "removeGeometry")
    void addGeometry(HeatingGeometry g) {
        geometries.add(g);
    }

    void removeGeometry(HeatingGeometry g) {
        geometries.remove(g);
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
                usage: lamella import FILE [--format ID] [--out DATA.csv] [--exclude FROM:TO]...
                                      [--reference FILE] [--detection-phase DEG | --phase-as-recorded
                                      | --step-window S] [--outlier-limit N]
                                      [--column 'HEADER=MEANING[:UNIT]']... [--write-profile PROFILE.json]

                Reads FILE with the live importer most sure it can (lamella formats lists them; --format ID
                chooses one), averages its scans, marks outliers and writes one row per x: the x column
                (delay_s or frequency_hz), the signals (in_phase, out_of_phase, ratio, amplitude, phase_deg),
                sigma_<signal> standard deviations and the marks outlier and excluded (1 or 0; marked rows are
                kept, a fit leaves them out). 13 significant digits, SI units, phase in degrees. Without --out the
                CSV goes to standard output; a report of the conditioning goes to standard error.

                  --exclude FROM:TO       mark rows with FROM <= x <= TO as excluded (x in s or Hz); repeatable
                  --reference FILE        FDTR: subtract the phase of this reference measurement, taken at the
                                          same frequencies (a known sample, or the pump at the detector)
                  --detection-phase DEG   TDTR: rotate in-phase/out-of-phase by this phase instead of finding it
                  --phase-as-recorded     TDTR: keep the signals as recorded
                  --step-window S         TDTR: half-width of the windows either side of zero delay whose mean
                                          change in out_of_phase the found phase removes (default 2e-11 s)
                  --outlier-limit N       mark rows further than N robust standard deviations from the running
                                          median of their neighbours (default 5; 0 marks none)
                  --column 'H=MEANING[:UNIT]'
                                          for a one-off file: the column whose header is H holds MEANING (frequency,
                                          delay, in_phase, out_of_phase, amplitude, phase, ratio, sigma_<signal>,
                                          or ignore), in UNIT if given, else the unit in brackets in H; repeatable
                  --write-profile FILE    also write the importer profile these mappings make of this file, to
                                          edit and publish (lamella formats check FILE checks it)

                Bad input (an unreadable, binary, truncated or inconsistent file, a bad option) is reported with
                the file and line; exit status 2, and no output is written.
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        ImportRequest request;
        try {
            request = ImportRequest.parse(args);
        } catch (InputException e) {
            io.err().println("lamella import: " + e.getMessage() + "\n" + usage());
            return BAD_INPUT;
        }
        Path file = io.resolve(request.file());
        if (request.out() != null) {
            List<Path> inputs = new java.util.ArrayList<>(List.of(file));
            if (request.reference() != null) {
                inputs.add(io.resolve(request.reference()));
            }
            inputs.addAll(io.runtimeInputs());
            Path clash = lamella.api.OwnInputs.clash(io.resolve(request.out()), inputs);
            if (clash != null) {
                io.err().println(lamella.api.OwnInputs.message("import", io.resolve(request.out()), clash));
                return BAD_INPUT;
            }
        }
        if (request.writeProfile() != null) {
            List<Path> inputs = request.reference() == null ? List.of(file)
                    : List.of(file, io.resolve(request.reference()));
            Path clash = lamella.api.OwnInputs.clash(io.resolve(request.writeProfile()), inputs);
            if (clash != null) {
                io.err().println("lamella import: --write-profile " + io.resolve(request.writeProfile())
                        + " would overwrite its own input " + clash + "; nothing was written (choose another file)");
                return BAD_INPUT;
            }
        }
        ImporterProfiles.Draft draft = null;
        ConditionedTable table;
        DataImporter importer;
        Dataset data;
        try {
            if (!request.columns().isEmpty() || request.writeProfile() != null) {
                ImporterProfiles p = profiles;
                if (p == null) {
                    io.err().println("lamella import: --column and --write-profile need the importer-profile"
                            + " bundle, which is not live");
                    return FAILED;
                }
                draft = p.draft(file, request.columns());
                importer = draft.importer();
            } else {
                importer = importers.choose(file, request.format());
            }
            data = read(importer, file);
            if (request.phaseRequested() && data.xColumn().equals(SignalNames.FREQUENCY_HZ)) {
                throw new InputException(file, null, -1, "--detection-phase, --phase-as-recorded and --step-window"
                        + " are for TDTR delay data; this file is over frequency (use --reference for FDTR)");
            }
            Optional<Dataset> reference = Optional.empty();
            if (request.reference() != null) {
                Path ref = io.resolve(request.reference());
                reference = Optional.of(read(importers.choose(ref, null), ref));
            }
            table = Conditioner.condition(data, new ConditioningOptions(request.phase(), reference,
                    request.exclusions(), request.outlierLimit()));
        } catch (InputException e) {
            io.err().println("lamella import: " + e.getMessage());
            return BAD_INPUT;
        } catch (ImporterDefect e) {
            io.err().println("lamella import: " + e.getMessage());
            return FAILED;
        }
        String csv = DataCsv.format(table);
        if (request.writeProfile() != null) {
            Path profileOut = io.resolve(request.writeProfile());
            try {
                AtomicText.write(profileOut, draft.profileText());
            } catch (IOException e) {
                io.err().println("lamella import: cannot write " + profileOut + ": " + e.getMessage());
                return FAILED;
            }
            io.err().println("wrote the starting profile '" + importer.id() + "' to " + profileOut
                    + " (edit it, then lamella formats check " + profileOut + ")");
        }
        if (request.out() == null) {
            io.out().print(csv);
            io.out().flush();
        } else {
            Path out = io.resolve(request.out());
            try {
                AtomicText.write(out, csv);
            } catch (IOException e) {
                io.err().println("lamella import: cannot write " + out + ": " + FileProblems.reason(e));
                return FAILED;
            }
            io.err().println("wrote " + table.rows() + " rows to " + out);
        }
        String encoding = data.metadata().get(TextLines.ENCODING_KEY);
        io.err().println("read " + file + " as '" + importer.id() + "'"
                + (encoding == null || encoding.equals("UTF-8") ? "" : ", text in " + encoding));
        for (String line : table.report().lines()) {
            io.err().println("  " + line);
        }
        settings(data, io);
        return OK;
    }

    /**
     * What the file states and where a fit dataset takes it, in the words of the workbench's import preview (the
     * same mapping); with no case at hand, only the file's own statements count.
     */
    private void settings(Dataset data, CommandIO io) {
        StatedSettings stated = StatedSettings.of(data);
        DatasetSettings s = DatasetSettings.of(stated, data.xColumn(),
                new DatasetSettings.Context(techniques, geometries, null, null), DatasetSettings.Choices.none());
        if (stated.numbers().isEmpty() && stated.technique().isEmpty()) {
            io.err().println("settings the file states: none; a fit dataset of this file takes the case's"
                    + " measurement and geometry");
            stated.unreadable().forEach(n -> io.err().println("  note: " + n));
        } else {
            io.err().println("settings the file states, as a fit dataset's blocks take them:");
            s.settings().forEach(x -> io.err().println("  " + x.describe()));
            s.notes().forEach(n -> io.err().println("  note: " + n));
            s.problems().forEach(p -> io.err().println("  still needed: " + p));
        }
        if (!stated.other().isEmpty()) {
            io.err().println("also in the header:");
        }
        stated.other().forEach((k, v) -> io.err().println("  " + k + ": " + v));
    }

    /** Reads with a plug-in, which may be faulty: anything but bad input is its defect, not the user's. */
    private static Dataset read(DataImporter importer, Path file) throws InputException {
        Dataset d;
        try {
            d = importer.read(file);
        } catch (RuntimeException e) {
            throw new ImporterDefect(importer, e.toString());
        }
        if (d == null) {
            throw new ImporterDefect(importer, "returned no dataset");
        }
        return d;
    }

    /** An importer plug-in that failed other than by reporting bad input. */
    private static final class ImporterDefect extends RuntimeException {
        private static final long serialVersionUID = 1L;

        ImporterDefect(DataImporter importer, String what) {
            super("importer '" + importer.id() + "' failed: " + what);
        }
    }
}
