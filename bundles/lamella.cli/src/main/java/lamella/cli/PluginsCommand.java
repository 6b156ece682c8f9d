package lamella.cli;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

import org.osgi.framework.Bundle;
import org.osgi.framework.BundleContext;
import org.osgi.framework.InvalidSyntaxException;
import org.osgi.framework.ServiceReference;
import org.osgi.service.component.annotations.Activate;
import org.osgi.service.component.annotations.Component;

import lamella.api.command.Command;
import lamella.api.command.CommandIO;

/** {@code lamella plugins}: every live geometry, technique and command, with the bundle that provides it. */
@Component(service = Command.class, property = {Command.NAME_PROPERTY + "=" + PluginsCommand.NAME,
        Command.SUMMARY_PROPERTY + "=" + PluginsCommand.SUMMARY})
public final class PluginsCommand implements Command {

    static final String NAME = "plugins";
    static final String SUMMARY = "Lists the live geometries, techniques and commands and the bundle of each.";

    /** The kinds listed, in this order. A new kind of contribution is one more row. */
    static final List<ServiceKind> KINDS = List.of(
            new ServiceKind("geometry", "lamella.api.HeatingGeometry", "type"),
            new ServiceKind("technique", "lamella.api.Technique", "type"),
            new ServiceKind("command", "lamella.api.command.Command", "name"),
            new ServiceKind("importer", "lamella.api.data.DataImporter", "id"),
            new ServiceKind("material library", "lamella.api.material.MaterialLibrary", "id"));

    static final String PLUGINS_DIR_PROPERTY = "lamella.plugins.dir";

    private BundleContext context;

    @Activate
    void activate(BundleContext bundleContext) {
        this.context = bundleContext;
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
                usage: lamella plugins

                Lists every live heating geometry, technique and command with the bundle and version that
                provides it, and the folder where dropped-in bundles are picked up while Lamella runs.
                """;
    }

    @Override
    public int run(List<String> args, CommandIO io) {
        if (!args.isEmpty()) {
            io.err().println("lamella plugins: takes no arguments, got: " + String.join(" ", args));
            return BAD_INPUT;
        }
        io.out().print(render(rows(), context.getProperty(PLUGINS_DIR_PROPERTY)));
        return OK;
    }

    static String render(List<ServiceRow> rows, String pluginsDir) {
        TextTable table = new TextTable("kind", "name", "bundle", "version", "summary");
        rows.forEach(r -> table.add(r.kind(), r.name(), r.bundle(), r.version(), r.summary()));
        return table.render("") + "\nplugins folder: " + (pluginsDir == null ? "(not set)" : pluginsDir) + "\n";
    }

    private List<ServiceRow> rows() {
        List<ServiceRow> rows = new ArrayList<>();
        for (ServiceKind kind : KINDS) {
            List<ServiceRow> ofKind = new ArrayList<>();
            for (ServiceReference<?> reference : references(kind)) {
                describe(kind, reference, ofKind);
            }
            ofKind.sort(Comparator.comparing(ServiceRow::name));
            rows.addAll(ofKind);
        }
        return rows;
    }

    /** All references, also from bundles wired to another copy of the interface: the listing hides nothing. */
    private ServiceReference<?>[] references(ServiceKind kind) {
        try {
            ServiceReference<?>[] found = context.getAllServiceReferences(kind.interfaceName(), null);
            return found == null ? new ServiceReference<?>[0] : found;
        } catch (InvalidSyntaxException e) {
            throw new IllegalStateException("a null filter cannot be invalid", e);
        }
    }

    private void describe(ServiceKind kind, ServiceReference<?> reference, List<ServiceRow> into) {
        Bundle bundle = reference.getBundle();
        if (bundle == null) {
            return;
        }
        Object service = context.getService(reference);
        if (service == null) {
            return;
        }
        try {
            Class<?> type = bundle.loadClass(kind.interfaceName());
            into.add(kind.describe(service, type, bundle.getSymbolicName(), bundle.getVersion().toString()));
        } catch (ClassNotFoundException e) {
            into.add(new ServiceRow(kind.label(), "?", "(its bundle cannot load " + kind.interfaceName() + ")",
                    bundle.getSymbolicName(), bundle.getVersion().toString()));
        } finally {
            context.ungetService(reference);
        }
    }
}
