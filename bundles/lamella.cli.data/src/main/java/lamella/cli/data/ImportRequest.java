package lamella.cli.data;

import java.util.ArrayList;
import java.util.List;
import lamella.api.InputException;
import lamella.api.data.Decimals;
import lamella.conditioning.ConditioningOptions;
import lamella.conditioning.PhaseCorrection;
import lamella.conditioning.XRange;

/**
 * The command line of {@code lamella import}, checked.
 *
 * @param file           the data file
 * @param format         the importer id the user chose, or null to choose by confidence
 * @param out            the output CSV, or null for standard output
 * @param reference      the FDTR reference file, or null
 * @param exclusions     x ranges to exclude
 * @param phase          the TDTR detection-phase correction
 * @param phaseRequested whether the user set a phase option (an error for frequency data)
 * @param outlierLimit   the outlier threshold, 0 for none
 * @param columns        one-off column meanings, {@code HEADER=MEANING[:UNIT]}
 * @param writeProfile   where to write the starting profile of this file, or null
 */
record ImportRequest(String file, String format, String out, String reference, List<XRange> exclusions,
                     PhaseCorrection phase, boolean phaseRequested, double outlierLimit, List<String> columns,
                     String writeProfile) {

    static ImportRequest parse(List<String> args) throws InputException {
        String file = null;
        String format = null;
        String out = null;
        String reference = null;
        List<XRange> exclusions = new ArrayList<>();
        Double fixed = null;
        boolean asRecorded = false;
        double window = PhaseCorrection.DEFAULT_STEP_WINDOW_S;
        boolean windowSet = false;
        double outlierLimit = ConditioningOptions.DEFAULT_OUTLIER_LIMIT;
        List<String> columns = new ArrayList<>();
        String writeProfile = null;
        for (int i = 0; i < args.size(); i++) {
            String a = args.get(i);
            switch (a) {
                case "--format" -> format = value(args, ++i, a);
                case "--out" -> out = value(args, ++i, a);
                case "--reference" -> reference = value(args, ++i, a);
                case "--column" -> columns.add(value(args, ++i, a));
                case "--write-profile" -> writeProfile = value(args, ++i, a);
                case "--exclude" -> exclusions.add(XRange.parse(value(args, ++i, a)));
                case "--detection-phase" -> fixed = number(value(args, ++i, a), a, false);
                case "--phase-as-recorded" -> asRecorded = true;
                case "--step-window" -> {
                    window = number(value(args, ++i, a), a, true);
                    windowSet = true;
                }
                case "--outlier-limit" -> {
                    outlierLimit = number(value(args, ++i, a), a, false);
                    if (outlierLimit < 0) {
                        throw InputException.at(a, "expected a positive number of robust standard deviations, or 0"
                                + " for no outlier marking; got " + Decimals.show(outlierLimit));
                    }
                }
                default -> {
                    if (a.startsWith("-") && a.length() > 1) {
                        throw InputException.at(a, "unknown option");
                    }
                    if (file != null) {
                        throw InputException.at(a, "one data file at a time; already have " + file);
                    }
                    file = a;
                }
            }
        }
        if (file == null) {
            throw InputException.at("", "which data file?");
        }
        if ((fixed != null ? 1 : 0) + (asRecorded ? 1 : 0) + (windowSet ? 1 : 0) > 1) {
            throw InputException.at("--detection-phase", "choose one of --detection-phase, --phase-as-recorded and"
                    + " --step-window");
        }
        if (format != null && (!columns.isEmpty() || writeProfile != null)) {
            throw InputException.at("--format", "--column and --write-profile make a profile of this file; they do"
                    + " not go with --format");
        }
        PhaseCorrection phase = fixed != null ? PhaseCorrection.fixed(fixed)
                : asRecorded ? PhaseCorrection.asRecorded() : PhaseCorrection.fromStep(window);
        return new ImportRequest(file, format, out, reference, exclusions, phase,
                fixed != null || asRecorded || windowSet, outlierLimit, List.copyOf(columns), writeProfile);
    }

    private static String value(List<String> args, int i, String option) throws InputException {
        if (i >= args.size()) {
            throw InputException.at(option, "needs a value");
        }
        return args.get(i);
    }

    private static double number(String text, String option, boolean positive) throws InputException {
        double v;
        try {
            v = Decimals.parse(text, '.');
        } catch (NumberFormatException e) {
            throw InputException.at(option, e.getMessage());
        }
        if (positive && !(v > 0)) {
            throw InputException.at(option, "expected a positive number, got " + text);
        }
        return v;
    }
}
