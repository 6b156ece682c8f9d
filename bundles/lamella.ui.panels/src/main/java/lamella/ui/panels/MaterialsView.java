package lamella.ui.panels;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import lamella.api.Units;
import lamella.api.material.Material;
import lamella.api.material.MaterialCatalog;
import lamella.api.material.MaterialProperty;
import lamella.api.material.TemperatureCurve;
import lamella.ui.api.PanelView;
import lamella.ui.api.Workbench;
import org.eclipse.swt.SWT;
import org.eclipse.swt.custom.SashForm;
import org.eclipse.swt.layout.GridData;
import org.eclipse.swt.layout.GridLayout;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Label;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.Text;

/**
 * The Materials panel: every entry of the live libraries, highest precedence first, searchable by id, name or
 * alias; the selected entry's values with unit, temperature range, uncertainty, source and library.
 */
final class MaterialsView implements PanelView {

    private final Composite root;
    private final Text search;
    private final Label count;
    private final Table entries;
    private final Label title;
    private final Label provenance;
    private final Table properties;
    private final MaterialCatalog catalog;
    private List<Material> listed = List.of();

    MaterialsView(Composite parent, Workbench workbench) {
        catalog = workbench.materials().orElse(new MaterialCatalog(List.of()));
        root = new Composite(parent, SWT.NONE);
        root.setLayout(new GridLayout(3, false));
        Label sl = new Label(root, SWT.NONE);
        sl.setText("Search:");
        search = new Text(root, SWT.BORDER | SWT.SEARCH | SWT.ICON_CANCEL);
        search.setMessage("id, name or alias");
        search.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        search.addListener(SWT.Modify, e -> filter());
        count = new Label(root, SWT.NONE);
        count.setLayoutData(new GridData(SWT.RIGHT, SWT.CENTER, false, false));
        // Entries above, details below: both tables get the panel's full width, so source and library stay in view.
        SashForm sash = new SashForm(root, SWT.VERTICAL);
        GridData sgd = new GridData(SWT.FILL, SWT.FILL, true, true, 3, 1);
        // Room for both tables, the entries' above the details' (a title, a wrapped source line, the properties).
        sgd.minimumHeight = 3 * Tables.LEAST_HEIGHT;
        sash.setLayoutData(sgd);
        entries = Tables.create(sash);
        entries.addListener(SWT.Selection, e -> details());
        Composite right = new Composite(sash, SWT.NONE);
        right.setLayout(new GridLayout(1, false));
        title = new Label(right, SWT.NONE);
        title.setLayoutData(new GridData(SWT.FILL, SWT.CENTER, true, false));
        title.setFont(Fonts.bold(title));
        provenance = new Label(right, SWT.WRAP);
        GridData pgd = new GridData(SWT.FILL, SWT.CENTER, true, false);
        pgd.widthHint = 300;
        provenance.setLayoutData(pgd);
        properties = Tables.create(right);
        properties.setLayoutData(new GridData(SWT.FILL, SWT.FILL, true, true));
        Tables.keepLeastHeight(properties);
        sash.setWeights(new int[] {45, 55});
        filter();
    }

    @Override
    public Control control() {
        return root;
    }

    Table entries() {
        return entries;
    }

    Table properties() {
        return properties;
    }

    void search(String text) {
        search.setText(text);
    }

    private void filter() {
        String q = search.getText().trim().toLowerCase(Locale.ROOT);
        List<Material> effective = catalog.effective();
        List<Material> out = new ArrayList<>();
        List<String[]> rows = new ArrayList<>();
        for (Material m : catalog.all()) {
            boolean hit = q.isEmpty() || m.names().stream().anyMatch(n -> n.toLowerCase(Locale.ROOT).contains(q))
                    || m.name().toLowerCase(Locale.ROOT).contains(q);
            if (hit) {
                out.add(m);
                rows.add(new String[] {m.id(), m.name(), m.library().label(),
                        effective.contains(m) ? "in effect" : "replaced by a higher tier"});
            }
        }
        listed = out;
        Tables.fill(entries, new String[] {"id", "name", "library (tier)", "precedence"}, rows);
        count.setText(catalog.isEmpty() ? "no material libraries are live"
                : out.size() + " of " + catalog.all().size() + " entries in " + catalog.libraries().size()
                + (catalog.libraries().size() == 1 ? " library" : " libraries"));
        root.layout(true);
        if (!out.isEmpty()) {
            entries.select(0);
        }
        details();
    }

    private void details() {
        int i = entries.getSelectionIndex();
        if (i < 0 || i >= listed.size()) {
            title.setText(catalog.isEmpty() ? "No material libraries are live." : "No entry matches.");
            provenance.setText("");
            Tables.fill(properties, new String[] {"property"}, List.of());
            return;
        }
        Material m = listed.get(i);
        title.setText(m.name() + "  (" + m.id() + ")");
        String reviewed = m.curation().reviewedBy().map(b -> ", reviewed by " + b
                + m.curation().reviewedOn().map(d -> " on " + d).orElse("")).orElse(", not reviewed");
        provenance.setText("From " + m.label() + reviewed + ". Read from " + m.location() + "."
                + (m.aliases().isEmpty() ? "" : " Also called: " + String.join(", ", m.aliases()) + ".")
                + (m.notes().isEmpty() ? "" : " " + m.notes()));
        List<String[]> rows = new ArrayList<>();
        for (MaterialProperty p : m.properties().values()) {
            DisplayUnit u = DisplayUnit.of(p.quantity().key(), false);
            rows.add(new String[] {p.quantity().description(), value(p.curve(), u), u.unit().isEmpty()
                    ? Units.ofKey(p.quantity().key()) : u.unit(), p.curve().range(),
                    p.uncertaintyRel().isPresent() ? NumberText.format(100 * p.uncertaintyRel().getAsDouble()) : "—",
                    p.source() + (p.notes().isEmpty() ? "" : " (" + p.notes() + ")")});
        }
        Tables.fill(properties, new String[] {"property", "value", "unit", "temperature range", "σ (%)", "source"},
                rows);
        root.layout(true, true);
    }

    private static String value(TemperatureCurve c, DisplayUnit u) {
        double[] v = c.values();
        if (!c.isTable()) {
            return NumberText.format(u.shown(v[0]));
        }
        return NumberText.format(u.shown(v[0])) + " … " + NumberText.format(u.shown(v[v.length - 1]))
                + " (table of " + v.length + " rows)";
    }
}
