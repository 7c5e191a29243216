package barwright.ui.panel;

import barwright.model.AxlePosition;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;

import javax.swing.JComponent;
import javax.swing.JScrollPane;
import javax.swing.JTabbedPane;
import java.awt.Dimension;

/** Everything in the vehicle file, on five pages: the car, each axle, each bar. */
public final class VehicleEditor extends JTabbedPane {
    /** The editor's width at the system text size (pixels); the window widens it with the text. */
    public static final int WIDTH = 370;

    public VehicleEditor(OpenDocument document, ViewSettings view) {
        setName("editor.tabs");
        setTabLayoutPolicy(SCROLL_TAB_LAYOUT);
        page("Car", "Weight, wheelbase, centre of mass, body stiffness, bar check travel", new CarPage(document, view));
        page("Front axle", "Track, roll centre, unsprung parts, springs and tyres at the front",
                new AxlePage(document, view, AxlePosition.FRONT));
        page("Front bar", "The front anti-roll bar", new BarPage(document, view, AxlePosition.FRONT));
        page("Rear axle", "Track, roll centre, unsprung parts, springs and tyres at the rear",
                new AxlePage(document, view, AxlePosition.REAR));
        page("Rear bar", "The rear anti-roll bar", new BarPage(document, view, AxlePosition.REAR));
        setPreferredSize(new Dimension(WIDTH, 600));
        setMinimumSize(new Dimension(320, 300));
    }

    /**
     * @return the width the editor needs to show every page's labels, fields and units whole at the present
     * text size (pixels), scroll bar included
     */
    public int neededWidth() {
        int needed = 0;
        for (int i = 0; i < getTabCount(); i++) {
            if (getComponentAt(i) instanceof JScrollPane scroll && scroll.getViewport().getView() != null) {
                needed = Math.max(needed, scroll.getViewport().getView().getMinimumSize().width
                        + scroll.getVerticalScrollBar().getPreferredSize().width);
            }
        }
        java.awt.Insets insets = getInsets();
        return needed + insets.left + insets.right + 4;
    }

    private void page(String title, String tip, JComponent page) {
        JScrollPane scroll = new JScrollPane(page);
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        // sideways only when a large text makes the form wider than the column (PagePanel)
        scroll.setHorizontalScrollBarPolicy(JScrollPane.HORIZONTAL_SCROLLBAR_AS_NEEDED);
        scroll.getHorizontalScrollBar().setUnitIncrement(16);
        addTab(title, null, scroll, tip);
    }
}
