package lamella.cli;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * A command line of one positional argument and {@code --name value} options. Unknown options, a missing value or
 * a second positional argument are errors (IllegalArgumentException with the message to show).
 */
final class Options {

    private final String positional;
    private final Map<String, String> values;

    private Options(String positional, Map<String, String> values) {
        this.positional = positional;
        this.values = values;
    }

    static Options parse(List<String> args, String command, List<String> known) {
        String positional = null;
        Map<String, String> values = new HashMap<>();
        for (int i = 0; i < args.size(); i++) {
            String a = args.get(i);
            if (a.startsWith("--")) {
                if (!known.contains(a)) {
                    throw new IllegalArgumentException("lamella " + command + ": unknown option " + a);
                }
                if (i + 1 >= args.size()) {
                    throw new IllegalArgumentException("lamella " + command + ": " + a + " needs a value");
                }
                values.put(a, args.get(++i));
            } else if (positional == null) {
                positional = a;
            } else {
                throw new IllegalArgumentException("lamella " + command + ": one case file at a time; got also " + a);
            }
        }
        if (positional == null) {
            throw new IllegalArgumentException("lamella " + command + ": which case file?");
        }
        return new Options(positional, values);
    }

    String positional() {
        return positional;
    }

    boolean has(String option) {
        return values.containsKey(option);
    }

    String value(String option) {
        return values.get(option);
    }

    /** A whole number ≥ min given to an option. */
    int count(String option, int min) {
        String v = values.get(option);
        try {
            int n = Integer.parseInt(v);
            if (n >= min) {
                return n;
            }
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(option + " expects a whole number ≥ " + min + ", got '" + v + "'");
        }
        throw new IllegalArgumentException(option + " expects a whole number ≥ " + min + ", got " + v);
    }
}
