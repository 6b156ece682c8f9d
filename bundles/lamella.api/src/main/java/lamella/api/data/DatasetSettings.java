package lamella.api.data;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.ArrayList;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;
import lamella.api.HeatingGeometry;
import lamella.api.ParameterSpec;
import lamella.api.Technique;
import lamella.api.Units;

/**
 * The one mapping from what a data file states ({@link StatedSettings}) to a fit dataset's own {@code measurement}
 * and {@code geometry} blocks, used by the workbench's import and by {@code lamella import}, so both report the same
 * settings in the same words.
 *
 * <p>Rules. The technique is the one the file states, else one the user chose, else the case's when its x axis is
 * the data's; it is never guessed from the x axis alone. A stated number goes into the block whose technique or
 * geometry declares its key; keys the case's blocks give and the file does not are carried from the case. A dataset
 * gets a block of its own only when it differs from the case's — a block of its own replaces the case's whole, so
 * the case's free and uncertain inputs of that block no longer reach the dataset. A stated number that no block takes
 * is listed as not a model input, never dropped silently. A required value that neither the file, the user nor the
 * case gives is a problem that keeps the dataset from being added.
 */
public final class DatasetSettings {

    /** Where a setting's value comes from. */
    public enum Origin {
        /** Stated by the data file. */
        FILE("from the file"),
        /** Taken from the case's block, because the file does not state it. */
        CASE("from the case"),
        /** Entered or chosen by the user. */
        ENTERED("entered"),
        /** Required, and given by none of them. */
        MISSING("missing"),
        /** Stated by the file, but not an input of the dataset's blocks. */
        NOT_USED("not used");

        private final String words;

        Origin(String words) {
            this.words = words;
        }

        public String words() {
            return words;
        }
    }

    /**
     * One setting of the dataset.
     *
     * @param block  {@code measurement} or {@code geometry}; empty for a stated value no block takes
     * @param key    the case-file key ({@code type} for the technique)
     * @param value  a {@link Double}, or a {@link String} for {@code type}; null when missing
     * @param origin where it comes from
     * @param note   why, when that is not plain; empty otherwise
     */
    public record Setting(String block, String key, Object value, Origin origin, String note) {

        public Setting {
            note = note == null ? "" : note;
        }

        /** "measurement.modulation_hz = 9e+06 Hz (from the file)", the form both the preview and the command use. */
        public String describe() {
            String where = block.isEmpty() ? key : block + "." + key;
            String unit = Units.ofKey(key);
            String v = value == null ? "—" : value instanceof Double d ? compact(d) + (unit.isEmpty() ? ""
                    : " " + unit) : value instanceof List<?> l ? l.size() + " values" : value.toString();
            return where + " = " + v + " (" + origin.words() + (note.isEmpty() ? "" : "; " + note) + ")";
        }

        /** Six significant digits at most, trailing zeros dropped: 9e6, 7.6e7, 1e-5, 300. */
        static String compact(double v) {
            if (v == 0) {
                return "0";
            }
            BigDecimal b = new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros();
            int exponent = b.precision() - b.scale() - 1;
            if (exponent >= -3 && exponent < 6) {
                return b.toPlainString();
            }
            String mantissa = b.movePointLeft(exponent).stripTrailingZeros().toPlainString();
            return mantissa + "e" + exponent;
        }
    }

    /**
     * What the mapping works from besides the file.
     *
     * @param techniques      the live techniques
     * @param geometries      the live geometries
     * @param caseMeasurement the case's measurement block (JSON-like values: Double, String, lists), or null
     * @param caseGeometry    the case's geometry block, or null
     */
    public record Context(Collection<? extends Technique> techniques, Collection<? extends HeatingGeometry> geometries,
                          Map<String, ?> caseMeasurement, Map<String, ?> caseGeometry) {
    }

    /**
     * What the user decided in a preview.
     *
     * @param technique a technique type that overrides the file's and the case's, or null
     * @param values    values for keys of either block that the file does not state (or states wrongly), SI
     */
    public record Choices(String technique, Map<String, Double> values) {

        public Choices {
            values = Map.copyOf(values);
        }

        public static Choices none() {
            return new Choices(null, Map.of());
        }
    }

    private final String technique;
    private final Map<String, Object> measurement;
    private final Map<String, Object> geometry;
    private final List<Setting> settings;
    private final List<String> problems;
    private final List<String> notes;

    private DatasetSettings(String technique, Map<String, Object> measurement, Map<String, Object> geometry,
                            List<Setting> settings, List<String> problems, List<String> notes) {
        this.technique = technique;
        this.measurement = measurement;
        this.geometry = geometry;
        this.settings = List.copyOf(settings);
        this.problems = List.copyOf(problems);
        this.notes = List.copyOf(notes);
    }

    /**
     * Maps what a file states onto a dataset's blocks.
     *
     * @param stated      what the file states
     * @param dataXColumn the data's x column ({@link SignalNames#DELAY_S} or {@link SignalNames#FREQUENCY_HZ})
     */
    public static DatasetSettings of(StatedSettings stated, String dataXColumn, Context context, Choices choices) {
        return new Mapping(stated, dataXColumn, context, choices).run();
    }

    /** The technique's type, if one could be decided. */
    public Optional<String> technique() {
        return Optional.ofNullable(technique);
    }

    /** The dataset's own measurement block, type first; empty when the case's serves (or none could be made). */
    public Optional<Map<String, Object>> measurement() {
        return Optional.ofNullable(measurement);
    }

    /** The dataset's own geometry block, type first; empty when the case's serves. */
    public Optional<Map<String, Object>> geometry() {
        return Optional.ofNullable(geometry);
    }

    /** Every setting: the technique, each block's values with their origin, and stated values no block takes. */
    public List<Setting> settings() {
        return settings;
    }

    /** What keeps the dataset from being added as it is; empty when it can be. */
    public List<String> problems() {
        return problems;
    }

    /** What the user should know: header values that could not be read, the case's inputs a block cuts off. */
    public List<String> notes() {
        return notes;
    }

    /** The settings, notes and problems as lines for a terminal or a preview. */
    public List<String> lines() {
        List<String> out = new ArrayList<>();
        settings.forEach(s -> out.add(s.describe()));
        notes.forEach(n -> out.add("note: " + n));
        problems.forEach(p -> out.add("problem: " + p));
        return out;
    }

    /** One run of the rules. */
    private static final class Mapping {

        private final StatedSettings stated;
        private final String dataX;
        private final Context context;
        private final Choices choices;
        private final List<Setting> settings = new ArrayList<>();
        private final List<String> problems = new ArrayList<>();
        private final List<String> notes = new ArrayList<>();
        private final List<String> taken = new ArrayList<>();
        private boolean decided;

        Mapping(StatedSettings stated, String dataX, Context context, Choices choices) {
            this.stated = stated;
            this.dataX = dataX;
            this.context = context;
            this.choices = choices;
        }

        DatasetSettings run() {
            notes.addAll(stated.unreadable());
            Technique t = technique();
            decided = t != null;
            Map<String, Object> measurement = null;
            Map<String, Object> geometry = null;
            if (t != null) {
                measurement = measurement(t);
                geometry = geometry(t);
            }
            for (StatedSettings.Stated s : stated.numbers()) {
                if (!taken.contains(s.key())) {
                    settings.add(new Setting("", s.key(), s.value(), Origin.NOT_USED, unusedWhy(s.key())));
                }
            }
            return new DatasetSettings(t == null ? null : t.type(), measurement, geometry, settings, problems, notes);
        }

        private Technique technique() {
            String caseType = text(context.caseMeasurement(), "type");
            String type;
            Origin origin;
            if (choices.technique() != null) {
                type = choices.technique();
                origin = Origin.ENTERED;
            } else if (stated.technique().isPresent()) {
                type = stated.technique().get();
                origin = Origin.FILE;
            } else if (caseType != null && live(caseType).flatMap(Technique::xColumn).filter(dataX::equals)
                    .isPresent()) {
                type = caseType;
                origin = Origin.CASE;
            } else {
                settings.add(new Setting("measurement", "type", null, Origin.MISSING, "the file does not say"));
                problems.add("the file does not state its technique" + (caseType == null ? ""
                        : " and the case's (" + caseType + ") is not over " + dataX) + "; choose one of: "
                        + String.join(", ", overX()));
                return null;
            }
            Optional<Technique> t = live(type);
            if (t.isEmpty()) {
                settings.add(new Setting("measurement", "type", type, origin, "no live technique has this type"));
                problems.add("technique '" + type + "' is not live; live techniques over " + dataX + ": "
                        + String.join(", ", overX()));
                return null;
            }
            Optional<String> x = t.get().xColumn();
            if (x.isEmpty() || !x.get().equals(dataX)) {
                settings.add(new Setting("measurement", "type", type, origin, "its x axis is "
                        + x.orElse("none")));
                problems.add("technique '" + type + "' is over " + x.orElse("no x axis") + " but the data are over "
                        + dataX + "; choose one of: " + String.join(", ", overX()));
                return null;
            }
            settings.add(new Setting("measurement", "type", type, origin, ""));
            return t.get();
        }

        private Map<String, Object> measurement(Technique t) {
            Map<String, ?> base = t.type().equals(text(context.caseMeasurement(), "type"))
                    ? context.caseMeasurement() : null;
            Map<String, Object> block = new LinkedHashMap<>();
            block.put("type", t.type());
            boolean differs = base == null;
            String xList = t.xParameter().orElse(null);
            for (ParameterSpec p : t.parameters()) {
                if (p.key().equals(xList)) {
                    continue;
                }
                Object caseValue = base == null ? null : number(base, p.key());
                Object v = fill("measurement", p, caseValue, block);
                differs |= v != null && !Objects.equals(v, caseValue);
            }
            return differs ? block : null;
        }

        private Map<String, Object> geometry(Technique t) {
            String caseType = text(context.caseGeometry(), "type");
            Optional<HeatingGeometry> g = caseType == null ? Optional.empty()
                    : context.geometries().stream().filter(h -> h.type().equals(caseType))
                    .map(h -> (HeatingGeometry) h).findFirst();
            if (g.isEmpty()) {
                // No case geometry to complete: say which stated keys a geometry would take, build no block.
                for (StatedSettings.Stated s : stated.numbers()) {
                    if (!taken.contains(s.key()) && context.geometries().stream()
                            .anyMatch(h -> declares(h.parameters(), s.key()))) {
                        taken.add(s.key());
                        settings.add(new Setting("geometry", s.key(), s.value(), Origin.FILE, ""));
                    }
                }
                return null;
            }
            if (g.get().unit() != t.requiredUnit()) {
                problems.add("technique '" + t.type() + "' needs a geometry whose response is in "
                        + t.requiredUnit().symbol() + ", but the case's geometry '" + caseType + "' gives "
                        + g.get().unit().symbol() + "; the dataset needs a geometry of its own");
            }
            Map<String, Object> block = new LinkedHashMap<>();
            block.put("type", caseType);
            boolean differs = false;
            for (ParameterSpec p : g.get().parameters()) {
                Object caseValue = number(context.caseGeometry(), p.key());
                Object v = fill("geometry", p, caseValue, block);
                differs |= v != null && !Objects.equals(v, caseValue);
            }
            if (differs) {
                notes.add("the dataset gets a geometry block of its own; the case's free and uncertain geometry"
                        + " inputs no longer reach it (give its own σ in the fit block, dataset by dataset)");
                return block;
            }
            return null;
        }

        /** Puts one key's value into the block, recording its origin; returns the value put, or null. */
        private Object fill(String blockName, ParameterSpec p, Object caseValue, Map<String, Object> block) {
            Double entered = choices.values().get(p.key());
            Optional<StatedSettings.Stated> s = stated.number(p.key());
            if (s.isPresent()) {
                taken.add(p.key());
            }
            if (entered != null) {
                return put(blockName, p, entered, Origin.ENTERED, s.map(x -> "the file says " + x.written())
                        .orElse(""), block);
            }
            if (s.isPresent() && p.kind() == ParameterSpec.Kind.NUMBER) {
                if (p.constraint().admits(s.get().value())) {
                    return put(blockName, p, s.get().value(), Origin.FILE, "", block);
                }
                problems.add("the file states " + p.key() + " = " + s.get().written() + ", which is not "
                        + p.constraint().wording());
                settings.add(new Setting(blockName, p.key(), s.get().value(), Origin.FILE,
                        "not " + p.constraint().wording()));
                return null;
            }
            if (caseValue != null) {
                return put(blockName, p, caseValue, Origin.CASE, "", block);
            }
            if (p.required()) {
                settings.add(new Setting(blockName, p.key(), null, Origin.MISSING, "required"));
                problems.add(blockName + "." + p.key() + " (" + p.description() + ") is required, and neither the"
                        + " file nor the case gives it");
            }
            return null;
        }

        private Object put(String blockName, ParameterSpec p, Object v, Origin origin, String note,
                           Map<String, Object> block) {
            block.put(p.key(), v);
            settings.add(new Setting(blockName, p.key(), v, origin, note));
            return v;
        }

        private String unusedWhy(String key) {
            boolean geometryKey = context.geometries().stream().anyMatch(h -> declares(h.parameters(), key));
            boolean techniqueKey = context.techniques().stream().anyMatch(h -> declares(h.parameters(), key));
            if (geometryKey) {
                String g = text(context.caseGeometry(), "type");
                return "the case's geometry" + (g == null ? "" : " '" + g + "'") + " does not take it";
            }
            if (techniqueKey) {
                return decided ? "the dataset's technique does not take it" : "no technique was decided";
            }
            return "not a model input";
        }

        private Optional<Technique> live(String type) {
            return context.techniques().stream().filter(t -> t.type().equals(type)).map(t -> (Technique) t)
                    .findFirst();
        }

        private List<String> overX() {
            return context.techniques().stream().filter(t -> t.xColumn().filter(dataX::equals).isPresent())
                    .map(Technique::type).sorted().toList();
        }

        private static boolean declares(List<ParameterSpec> specs, String key) {
            return specs.stream().anyMatch(p -> p.key().equals(key));
        }

        private static String text(Map<String, ?> block, String key) {
            return block != null && block.get(key) instanceof String s ? s : null;
        }

        /** A number (or list of numbers) of a JSON-like block as Double values; null when absent. */
        private static Object number(Map<String, ?> block, String key) {
            Object v = block == null ? null : block.get(key);
            if (v instanceof Number n) {
                return n.doubleValue();
            }
            if (v instanceof List<?> l && l.stream().allMatch(Number.class::isInstance)) {
                return l.stream().map(n -> ((Number) n).doubleValue()).toList();
            }
            return null;
        }
    }
}
