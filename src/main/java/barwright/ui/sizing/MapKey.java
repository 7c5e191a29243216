package barwright.ui.sizing;

import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JToggleButton;

/**
 * The arm-hole map's key in one line: a swatch of each axle's tint with the front share the tint is centred on,
 * and a button that shows or hides the whole key (what the tints, the red dashes and the heavy frame mean). The
 * whole key shows at first where the view is tall for its text, and stays hidden where it is short (the largest
 * text on a 1024x768 projector) so that the map keeps the room; once a person has chosen, their choice stays.
 * Event thread.
 */
final class MapKey extends JPanel {
    /** The whole key shows at first where the view is at least this many lines of text high. */
    private static final int TALL_IN_LINES = 25;
    private final JLabel above = new JLabel();
    private final JLabel below = new JLabel("below");
    private final JToggleButton whole = new JToggleButton("Whole key");
    private JComponent explanation;
    private boolean personChose;

    MapKey() {
        super(new WrappingFlow(10, 0));
        setName("map.key");
        above.setName("map.key.above");
        above.setIcon(MapColours.swatch(above, MapColours.FULL_TINT));
        above.setToolTipText("The front axle's colour: more of the load transfer at the front, towards understeer");
        below.setIcon(MapColours.swatch(below, -MapColours.FULL_TINT));
        below.setToolTipText("The rear axle's colour: less of the load transfer at the front, towards oversteer");
        whole.setName("map.key.whole");
        whole.setToolTipText("Shows or hides what the tints, the red dashes and the heavy frame mean");
        whole.addActionListener(event -> {
            personChose = true;
            showWhole(whole.isSelected());
        });
        add(above);
        add(below);
        add(whole);
    }

    /** @param explanation the whole key, shown and hidden by the button */
    void explains(JComponent explanation) {
        this.explanation = explanation;
        showWhole(whole.isSelected());
    }

    /** @param share the reference share in words, e.g. "46.5 %" */
    void show(String share) {
        above.setText("front share above " + share);
    }

    /** Shows the whole key where the view is tall for its text, until a person has chosen. */
    void fitTo(int viewHeight) {
        if (personChose || viewHeight <= 0) {
            return;
        }
        boolean tall = viewHeight >= TALL_IN_LINES * getFontMetrics(getFont()).getHeight();
        if (tall != whole.isSelected()) {
            whole.setSelected(tall);
            showWhole(tall);
        }
    }

    boolean wholeShown() {
        return explanation != null && explanation.isVisible();
    }

    private void showWhole(boolean shown) {
        if (explanation != null && explanation.isVisible() != shown) {
            explanation.setVisible(shown);
            revalidateAncestor();
        }
    }

    private void revalidateAncestor() {
        if (getParent() != null) {
            getParent().revalidate();
            getParent().repaint();
        }
    }
}
