package lamella.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;
import java.util.Map;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.CaseFormat;
import lamella.api.ExplainedCase;
import lamella.api.ExplainingCaseFormat;
import lamella.api.InputException;
import lamella.api.Units;
import lamella.api.ValueOrigin;

/**
 * {@code simulate --explain}: every stack value a case uses, with where it came from, and every number of its
 * geometry and measurement blocks (a heater's thickness, heat capacity and boundary resistance, a drive current), as
 * a table.
 */
final class ValueOrigins {

    private ValueOrigins() {
    }

    /** Reads the case and writes the table of its values' origins to {@code err}. */
    static CaseDocument readExplaining(CaseFormat format, Path file, PrintStream err) throws InputException {
        if (!(format instanceof ExplainingCaseFormat explaining)) {
            err.println("lamella simulate: the live case format does not record where values came from;"
                    + " --explain has nothing to show");
            return format.read(file);
        }
        ExplainedCase c = explaining.readExplained(file);
        err.print(render(c));
        return c.document();
    }

    static String render(ExplainedCase c) {
        TextTable table = new TextTable("layer", "key", "value", "unit", "from");
        for (ValueOrigin o : c.origins()) {
            table.add(o.layer(), o.key(), value(o.value()), Units.ofKey(o.key()), o.describe());
        }
        CaseDocument doc = c.document();
        for (Block b : List.of(doc.geometry(), doc.measurement())) {
            for (Map.Entry<String, Object> e : b.values().entrySet()) {
                String shown = shown(e.getValue());
                if (shown != null) {
                    int line = doc.locate(InputException.at(b.pathOf(e.getKey()), "")).line();
                    table.add(b.path(), e.getKey(), shown, Units.ofKey(e.getKey()),
                            "explicit in case file" + (line > 0 ? " (line " + line + ")" : ""));
                }
            }
        }
        return "values used by " + c.document().file() + ":\n" + table.render("  ") + "model: "
                + c.document().stack().heatFlowInWords() + "\n";
    }

    /** A number as it is, a list of numbers by count and ends; null for what is not a number (a type name). */
    private static String shown(Object v) {
        if (v instanceof Double d) {
            return value(d);
        }
        if (v instanceof List<?> list && !list.isEmpty() && list.stream().allMatch(x -> x instanceof Double)) {
            return list.size() == 1 ? value((Double) list.get(0)) : list.size() + " values, "
                    + value((Double) list.get(0)) + " … " + value((Double) list.get(list.size() - 1));
        }
        return null;
    }

    private static String value(double v) {
        if (Double.isInfinite(v)) {
            return "∞";
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros();
        return d.scale() <= 0 && d.precision() - d.scale() <= 8 ? d.toPlainString() : d.toString();
    }
}
