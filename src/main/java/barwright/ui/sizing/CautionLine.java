package barwright.ui.sizing;

import barwright.report.Cautions;
import barwright.ui.panel.Palette;
import barwright.ui.panel.WrappingText;

import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JScrollPane;
import java.awt.Dimension;

/** The short caution across the views' window, where their results are used; hovering shows what is left out. */
final class CautionLine extends WrappingText {
    CautionLine() {
        super(Cautions.SHORT);
        setName("sizing.caution");
        setForeground(Palette.muted());
        setBorder(BorderFactory.createEmptyBorder(6, 8, 6, 8));
        setToolTipText("<html><body style='width:360px'>" + Cautions.NOT_MODELLED + "</body></html>");
    }

    @Override
    public void updateUI() {
        super.updateUI();
        setForeground(Palette.muted());
    }

    /**
     * @return the caution in a borderless scroll pane that, where the window is short for its text (fewer than 30
     *         lines high: the largest text on a 1024x768 projector), keeps to two lines and scrolls the rest, so
     *         that the results above it keep their room; elsewhere it is the caution's full height
     */
    JComponent scrolledWhereShort(JComponent window) {
        JScrollPane scroll = new JScrollPane(this, JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER) {
            @Override
            public Dimension getPreferredSize() {
                Dimension wanted = super.getPreferredSize();
                int line = CautionLine.this.getFontMetrics(CautionLine.this.getFont()).getHeight();
                if (window.getHeight() <= 0 || window.getHeight() >= 30 * line) {
                    return wanted;
                }
                java.awt.Insets border = CautionLine.this.getInsets();
                return new Dimension(wanted.width, Math.min(wanted.height, 2 * line + border.top + border.bottom));
            }
        };
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        return scroll;
    }
}
