package barwright.ui.sizing;

import barwright.report.Cautions;
import barwright.ui.panel.Palette;
import barwright.ui.panel.WrappingText;

import javax.swing.BorderFactory;

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
}
