package barwright.ui.action;

import javax.swing.Action;
import javax.swing.JComponent;
import java.util.List;

/**
 * What a group of views adds to the main window: commands for its menus and pages for its results tabs. The main
 * window asks each contribution once, while it builds its menus, and places what it is given; a contribution never
 * reaches into the finished window. Event thread.
 */
public interface WindowContribution {
    /** Where in the main window's menus a contributed command goes. */
    enum Place {
        /** the File menu, among the exports, before Quit */
        FILE_EXPORTS,
        /** the Tools menu, before Help */
        TOOLS
    }

    /**
     * @param place  where it goes
     * @param action the command itself, with its name, tooltip and mnemonic
     */
    record Command(Place place, Action action) {
    }

    /**
     * @param title   the tab's title
     * @param tooltip what the tab shows, in a sentence
     * @param view    the tab's content
     */
    record Page(String title, String tooltip, JComponent view) {
    }

    /** @return the commands, in the order they appear within each place */
    default List<Command> commands() {
        return List.of();
    }

    /** @return pages for the main window's results tabs, in order */
    default List<Page> pages() {
        return List.of();
    }
}
