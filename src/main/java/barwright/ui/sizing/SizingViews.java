package barwright.ui.sizing;

import barwright.ui.action.CommandAction;
import barwright.ui.app.MainWindow;

import javax.swing.JMenu;
import javax.swing.JMenuBar;
import java.awt.event.KeyEvent;

/**
 * Hooks the sizing and setup views into the main window: a Tools menu that opens each view, and the setup
 * sheet and map exports in the File menu. The one call the main window makes is {@link #install}.
 */
public final class SizingViews {
    private final MainWindow window;
    private final SizingContext context;
    private final Exports exports;
    private SizingWindow views;
    private String lastMessage;

    private SizingViews(MainWindow window) {
        this.window = window;
        this.context = new SizingContext(window.document(), window.view(), window.files().dialogs(), window);
        this.exports = new Exports(context);
    }

    /**
     * Adds the menus to a main window whose menu bar is in place.
     *
     * @return the installed views, for tests
     */
    public static SizingViews install(MainWindow window) {
        SizingViews installed = new SizingViews(window);
        installed.addMenus(window.getJMenuBar());
        window.getRootPane().putClientProperty(SizingViews.class, installed);
        return installed;
    }

    private void addMenus(JMenuBar bar) {
        JMenu tools = new JMenu("Tools");
        tools.setMnemonic(KeyEvent.VK_T);
        tools.setName("menu.tools");
        tools.add(open(SizingWindow.Tab.SEARCH, "Size a bar to a target…", KeyEvent.VK_S));
        tools.add(open(SizingWindow.Tab.TUBES, "Tube or solid bar of the same rate…", KeyEvent.VK_T));
        tools.add(open(SizingWindow.Tab.MAP, "Arm-hole map…", KeyEvent.VK_M));
        tools.add(open(SizingWindow.Tab.COMPARE, "Compare setups…", KeyEvent.VK_C));
        tools.add(open(SizingWindow.Tab.PRELOAD, "Link preload and cross weight…", KeyEvent.VK_L));
        // the Help menu stays last
        bar.add(tools, Math.max(0, bar.getMenuCount() - 1));
        JMenu file = bar.getMenu(0);
        if (file == null || !"File".equals(file.getText())) {
            throw new IllegalStateException("the main window's first menu is not File");
        }
        // before the separator and Quit at the end of the File menu
        int at = Math.max(0, file.getMenuComponentCount() - 2);
        file.insert(new CommandAction("Export setup sheet as PDF…", "Write the setup sheet of the car as it stands "
                + "to take to the track", null, KeyEvent.VK_D, () -> exports.setupSheet(this::said)), at);
        file.insert(new CommandAction("Export arm-hole map as CSV…", "Write every front hole against every rear hole "
                + "as a table for a spreadsheet", null, KeyEvent.VK_M, () -> exports.mapCsv(this::said)), at + 1);
        file.insertSeparator(at + 2);
    }

    /** Keeps what an export said, and shows it on the views' map tab where their window has been opened. */
    private void said(String message) {
        if (views != null) {
            views.map().work().say(message, false);
        }
        lastMessage = message;
    }

    private CommandAction open(SizingWindow.Tab tab, String name, int mnemonic) {
        return new CommandAction(name, tab.help, null, mnemonic, () -> views().open(tab));
    }

    /** @return the views' window, made on first use */
    SizingWindow views() {
        if (views == null) {
            views = new SizingWindow(window, context, exports);
        }
        return views;
    }

    /** @return what the last export said, e.g. "Wrote /tmp/car-setup-sheet.pdf", or null */
    String lastMessage() {
        return lastMessage;
    }

    /** @return the installed views of a main window */
    static SizingViews of(MainWindow window) {
        return (SizingViews) window.getRootPane().getClientProperty(SizingViews.class);
    }
}
