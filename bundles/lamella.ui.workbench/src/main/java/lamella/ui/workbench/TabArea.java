package lamella.ui.workbench;

import java.util.ArrayList;
import java.util.List;

/**
 * A tabbed area: panel ids in tab order, the one in front, and optionally the default {@link lamella.ui.api.Area}
 * it stands for, where panels without a saved place open. Ids of panels whose bundle is gone stay here, so that
 * the panel returns to its place with its bundle.
 */
final class TabArea extends Part {

    final List<String> panels = new ArrayList<>();
    String front;
    String role;
    /**
     * The panel the standard arrangement puts in front once it arrives, whichever panel's bundle started first
     * (the Stack among the inputs, the Signal among the plots); not saved, so the user's own choice stays.
     */
    String opening;

    TabArea(String role) {
        this.role = role;
    }
}
