package barwright.ui;

import java.awt.Component;
import java.awt.Container;

/** Finds a component by its name anywhere under a container (window tests and screenshot tools). */
public final class NamedComponents {
    private NamedComponents() {
    }

    /** @return the first component named {@code name}, depth first, or null */
    public static Component find(Container root, String name) {
        for (Component child : root.getComponents()) {
            if (name.equals(child.getName())) {
                return child;
            }
            if (child instanceof Container container) {
                Component found = find(container, name);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }
}
