package lamella.ui.workbench;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Predicate;
import org.eclipse.swt.widgets.Button;
import org.eclipse.swt.widgets.Composite;
import org.eclipse.swt.widgets.Control;
import org.eclipse.swt.widgets.Group;
import org.eclipse.swt.widgets.Shell;
import org.eclipse.swt.widgets.Table;
import org.eclipse.swt.widgets.TableColumn;

/**
 * Finds controls as a user does, by what they show — a button's label, a table's column heading, a group's title —
 * among the controls visible now. Used by {@link WindowControl} to act as the user's gestures would.
 */
final class WidgetFinder {

    private WidgetFinder() {
    }

    /** Every visible control under root, depth first. */
    static List<Control> visible(Composite root) {
        List<Control> out = new ArrayList<>();
        collect(root, out);
        return out;
    }

    private static void collect(Composite c, List<Control> out) {
        for (Control child : c.getChildren()) {
            if (child.isDisposed() || !child.isVisible()) {
                continue;
            }
            out.add(child);
            if (child instanceof Composite k) {
                collect(k, out);
            }
        }
    }

    static <T extends Control> Optional<T> first(Composite root, Class<T> type, Predicate<T> which) {
        for (Control c : visible(root)) {
            if (type.isInstance(c) && which.test(type.cast(c))) {
                return Optional.of(type.cast(c));
            }
        }
        return Optional.empty();
    }

    static Optional<Button> button(Composite root, String label) {
        return first(root, Button.class, b -> plain(b.getText()).equals(label));
    }

    static Optional<Table> tableWithColumn(Composite root, String heading) {
        return first(root, Table.class, t -> {
            for (TableColumn c : t.getColumns()) {
                if (c.getText().equals(heading) || c.getText().startsWith(heading + " (")) {
                    return true;
                }
            }
            return false;
        });
    }

    static Optional<Group> group(Composite root, String title) {
        return first(root, Group.class, g -> plain(g.getText()).equals(title));
    }

    /** The dialog open over the window, if any: the newest visible child shell. */
    static Optional<Shell> dialog(Shell window) {
        Shell[] shells = window.getShells();
        for (int i = shells.length - 1; i >= 0; i--) {
            if (!shells[i].isDisposed() && shells[i].isVisible()) {
                return Optional.of(shells[i]);
            }
        }
        return Optional.empty();
    }

    /** A label without mnemonic marks and without the key a menu item shows after a tab. */
    static String plain(String label) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < label.length(); i++) {
            char c = label.charAt(i);
            if (c == '\t') {
                break;
            }
            if (c == '&' && i + 1 < label.length() && label.charAt(i + 1) == '&') {
                sb.append('&');
                i++;
            } else if (c != '&') {
                sb.append(c);
            }
        }
        return sb.toString();
    }
}
