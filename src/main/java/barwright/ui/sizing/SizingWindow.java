package barwright.ui.sizing;

import javax.swing.JDialog;
import javax.swing.JFrame;
import javax.swing.JPanel;
import javax.swing.JTabbedPane;
import javax.swing.WindowConstants;
import java.awt.BorderLayout;
import java.awt.Dimension;

/**
 * The sizing and setup views in a window of their own beside the main one (their tables need the room): one
 * tab each, the caution under them. It stays open while the car is edited in the main window. Event thread.
 */
final class SizingWindow extends JDialog {
    /** The tabs, in order. */
    enum Tab {
        SEARCH("Size a bar", "Stock sizes that meet a front share or roll gradient, ranked"),
        TUBES("Tube or solid", "Tubes from the catalogues with the rate of a solid bar, and what they save"),
        MAP("Arm-hole map", "Every front arm hole against every rear one"),
        COMPARE("Compare setups", "Two to four setups side by side"),
        PRELOAD("Link preload", "What a bar link made longer or shorter does to the corner weights");

        final String title;
        final String help;

        Tab(String title, String help) {
            this.title = title;
            this.help = help;
        }
    }

    /** The window's size where the screen has room for it (pixels). */
    static final int DEFAULT_WIDTH = 1180;
    static final int DEFAULT_HEIGHT = 800;
    private final JTabbedPane tabs = new JTabbedPane();
    private final SearchView search;
    private final TubeView tubes;
    private final MapView map;
    private final CompareView compare;
    private final PreloadView preload;

    SizingWindow(JFrame owner, SizingContext context, Exports exports) {
        super(owner, "Sizing and setup — Barwright", ModalityType.MODELESS);
        setName("sizing.window");
        setDefaultCloseOperation(WindowConstants.HIDE_ON_CLOSE);
        search = new SearchView(context);
        tabs.setName("sizing.tabs");
        tabs.setTabLayoutPolicy(JTabbedPane.SCROLL_TAB_LAYOUT); // one row of tabs, whatever the text size
        add(Tab.SEARCH, search);
        tubes = new TubeView(context);
        add(Tab.TUBES, tubes);
        map = new MapView(context, exports);
        add(Tab.MAP, map);
        compare = new CompareView(context);
        add(Tab.COMPARE, compare);
        preload = new PreloadView(context);
        add(Tab.PRELOAD, preload);
        JPanel content = new JPanel(new BorderLayout());
        content.add(tabs, BorderLayout.CENTER);
        content.add(new CautionLine().scrolledWhereShort(content), BorderLayout.SOUTH);
        setContentPane(content);
        setMinimumSize(new Dimension(900, 600));
        // its usual size, or the screen's room where that is smaller (a shop laptop or projector at 1024 x 768)
        java.awt.Rectangle room = java.awt.GraphicsEnvironment.getLocalGraphicsEnvironment().getMaximumWindowBounds();
        setSize(new Dimension(Math.min(DEFAULT_WIDTH, room.width), Math.min(DEFAULT_HEIGHT, room.height)));
        if (owner != null) {
            // placed beside the owner's corner here, where it is made (toolchain.md: reliable clicks under Xvfb)
            setLocation(owner.getX() + 40, owner.getY() + 40);
        }
    }

    private void add(Tab tab, java.awt.Component view) {
        tabs.addTab(tab.title, view);
        tabs.setToolTipTextAt(tabs.getTabCount() - 1, tab.help);
    }

    /** Shows the window on a tab. */
    void open(Tab tab) {
        if (tab.ordinal() < tabs.getTabCount()) {
            tabs.setSelectedIndex(tab.ordinal());
        }
        setVisible(true);
        toFront();
    }

    JTabbedPane tabs() {
        return tabs;
    }

    SearchView search() {
        return search;
    }

    TubeView tubes() {
        return tubes;
    }

    MapView map() {
        return map;
    }

    CompareView compare() {
        return compare;
    }

    PreloadView preload() {
        return preload;
    }
}
