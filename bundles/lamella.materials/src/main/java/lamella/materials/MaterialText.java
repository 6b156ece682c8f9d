package lamella.materials;

import java.util.ArrayList;
import java.util.List;
import lamella.api.InputException;
import lamella.api.Units;
import lamella.api.material.Curation;
import lamella.api.material.LibraryFinding;
import lamella.api.material.Material;
import lamella.api.material.MaterialCatalog;
import lamella.api.material.MaterialLibrary;
import lamella.api.material.MaterialProperty;
import lamella.api.material.MaterialQuantity;
import lamella.api.material.PropertyValue;
import lamella.api.material.TemperatureCurve;

/** What {@code materials list} and {@code materials show} print. */
final class MaterialText {

    static final double ROOM_K = 300.0;

    private MaterialText() {
    }

    static String list(MaterialCatalog catalog) {
        Columns table = new Columns("id", "name", "library", "tier", "version", "states", "temperatures");
        for (Material m : catalog.effective()) {
            table.add(m.id(), m.name(), m.library().id(), m.library().tier().label(), "v" + m.curation().version(),
                    states(m), commonRange(m));
        }
        StringBuilder sb = new StringBuilder(table.render());
        List<String> replaced = new ArrayList<>();
        for (Material m : catalog.effective()) {
            for (Material lower : catalog.replacedBy(m)) {
                replaced.add("  " + m.id() + ": " + m.library().label() + " replaces " + lower.library().label()
                        + " v" + lower.curation().version());
            }
        }
        if (!replaced.isEmpty()) {
            sb.append("\nreplaced by a higher tier:\n").append(String.join("\n", replaced)).append('\n');
        }
        sb.append("\nlibraries, highest precedence first:\n");
        for (MaterialLibrary l : catalog.libraries()) {
            sb.append("  ").append(l.id()).append("  ").append(l.summary()).append('\n');
        }
        sb.append(findings(catalog.findings()));
        return sb.toString();
    }

    static String findings(List<LibraryFinding> findings) {
        if (findings.isEmpty()) {
            return "";
        }
        StringBuilder sb = new StringBuilder("\nproblems:\n");
        findings.forEach(f -> sb.append("  ").append(f).append('\n'));
        return sb.toString();
    }

    /** The properties stated, briefly: "k; ρ, c_p" or "k∥c, k⊥c; C". */
    static String states(Material m) {
        List<String> parts = new ArrayList<>();
        switch (m.conductivityForm()) {
            case ISOTROPIC -> parts.add("k");
            case FILM -> parts.add("k_through, k_in_plane");
            case UNIAXIAL -> parts.add("k∥c, k⊥c");
            default -> {
            }
        }
        if (m.property(MaterialQuantity.HEAT_CAPACITY).isPresent()) {
            parts.add("C");
        } else if (m.property(MaterialQuantity.DENSITY).isPresent()) {
            parts.add("ρ, c_p");
        }
        return String.join("; ", parts);
    }

    /** The temperatures at which every stated property has a value. */
    static String commonRange(Material m) {
        double lo = 0;
        double hi = Double.POSITIVE_INFINITY;
        for (MaterialProperty p : m.properties().values()) {
            lo = Math.max(lo, p.curve().lowK());
            hi = Math.min(hi, p.curve().highK());
        }
        if (hi < lo) {
            return "none in common";
        }
        return TemperatureCurve.constant(1, lo, hi).range();
    }

    static String show(Material m, MaterialCatalog catalog) {
        StringBuilder sb = new StringBuilder();
        sb.append(m.id()).append(" — ").append(m.name()).append('\n');
        line(sb, "library", m.library().label() + ", " + m.library().location());
        line(sb, "read from", m.location());
        if (!m.aliases().isEmpty()) {
            line(sb, "aliases", String.join(", ", m.aliases()));
        }
        line(sb, "version", "v" + m.curation().version() + "; " + review(m.curation()));
        if (!m.notes().isEmpty()) {
            line(sb, "notes", m.notes());
        }
        for (Material lower : catalog.replacedBy(m)) {
            line(sb, "replaces", lower.label() + " (" + lower.location() + ")");
        }
        for (MaterialProperty p : m.properties().values()) {
            sb.append('\n').append("  ").append(p.quantity().key()).append(" — ").append(p.quantity().description())
                    .append(", ").append(Units.ofKey(p.quantity().key())).append('\n');
            sb.append("    ").append(curve(p.curve())).append('\n');
            sb.append("    uncertainty ").append(p.uncertaintyRel().isPresent()
                    ? "±" + Numbers.computed(100 * p.uncertaintyRel().getAsDouble()) + " % (1σ, relative)"
                    : "not stated").append('\n');
            sb.append("    source ").append(p.source()).append('\n');
            if (!p.notes().isEmpty()) {
                sb.append("    notes ").append(p.notes()).append('\n');
            }
        }
        if (m.property(MaterialQuantity.HEAT_CAPACITY).isEmpty() && m.property(MaterialQuantity.DENSITY).isPresent()) {
            sb.append("\n  heat_capacity_j_m3k — derived: density × specific heat, J/(m³ K)\n    ");
            try {
                PropertyValue c = m.value(MaterialQuantity.HEAT_CAPACITY, ROOM_K);
                sb.append("at 300 K: ").append(Numbers.computed(c.value()));
            } catch (InputException e) {
                sb.append("not at 300 K: ").append(e.problem());
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    static String review(Curation c) {
        if (c.reviewedBy().isEmpty()) {
            return "not reviewed";
        }
        return "reviewed by " + c.reviewedBy().get() + c.reviewedOn().map(d -> " on " + d).orElse("");
    }

    static String curve(TemperatureCurve c) {
        if (!c.isTable()) {
            return Numbers.plain(c.values()[0]) + (c.lowK() == c.highK() ? " at " : " over ") + c.range();
        }
        double[] t = c.temperatures();
        double[] v = c.values();
        List<String> rows = new ArrayList<>();
        for (int i = 0; i < t.length; i++) {
            rows.add(Numbers.plain(t[i]) + " K: " + Numbers.plain(v[i]));
        }
        return "table (linear between rows): " + String.join(", ", rows);
    }

    private static void line(StringBuilder sb, String label, String text) {
        sb.append("  ").append(label).append(" ".repeat(Math.max(1, 11 - label.length()))).append(text).append('\n');
    }
}
