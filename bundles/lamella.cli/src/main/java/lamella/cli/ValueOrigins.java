package lamella.cli;

import java.io.PrintStream;
import java.math.BigDecimal;
import java.math.MathContext;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import lamella.api.Block;
import lamella.api.CaseDocument;
import lamella.api.CaseFormat;
import lamella.api.ExplainedCase;
import lamella.api.ExplainingCaseFormat;
import lamella.api.InputException;
import lamella.api.Sample;
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
        CaseDocument doc = c.document();
        boolean named = doc.samples().get(0).named();
        TextTable table = named ? new TextTable("sample", "layer", "key", "value", "unit", "from")
                : new TextTable("layer", "key", "value", "unit", "from");
        for (ValueOrigin o : c.origins()) {
            if (named) {
                table.add(sampleOf(doc, o), o.layer(), o.key(), value(o.value()), Units.ofKey(o.key()),
                        o.describe());
            } else {
                table.add(o.layer(), o.key(), value(o.value()), Units.ofKey(o.key()), o.describe());
            }
        }
        for (Block b : List.of(doc.geometry(), doc.measurement())) {
            for (Map.Entry<String, Object> e : b.values().entrySet()) {
                String shown = shown(e.getValue());
                if (shown != null) {
                    int line = doc.locate(InputException.at(b.pathOf(e.getKey()), "")).line();
                    String from = "explicit in case file" + (line > 0 ? " (line " + line + ")" : "");
                    if (named) {
                        table.add("", b.path(), e.getKey(), shown, Units.ofKey(e.getKey()), from);
                    } else {
                        table.add(b.path(), e.getKey(), shown, Units.ofKey(e.getKey()), from);
                    }
                }
            }
        }
        StringBuilder models = new StringBuilder();
        if (!named) {
            models.append("model: ").append(doc.stack().heatFlowInWords()).append('\n');
        } else {
            for (Sample s : doc.samples()) {
                models.append("sample ").append(s.name()).append(": ").append(s.stack().heatFlowInWords())
                        .append(s.geometry() != null ? " Its own geometry: " + s.geometry().get("type") + "." : "")
                        .append('\n');
            }
        }
        return "values used by " + doc.file() + ":\n" + table.render("  ") + models;
    }

    /** The sample whose stack a value belongs to, from its JSON path ({@code samples[2].stack…}). */
    private static String sampleOf(CaseDocument doc, ValueOrigin o) {
        for (Sample s : doc.samples()) {
            if (o.path().startsWith(s.path() + ".")) {
                return s.name();
            }
        }
        return "";
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
