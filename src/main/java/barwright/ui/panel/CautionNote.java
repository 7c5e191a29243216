package barwright.ui.panel;

import barwright.report.Cautions;

import javax.swing.BorderFactory;
import javax.swing.JLabel;

/** The short caution, shown where the results are first seen. */
public final class CautionNote extends JLabel {
    public CautionNote() {
        super(Tooltips.wrap(Cautions.SHORT, 300));
        setName("caution");
        putClientProperty("FlatLaf.styleClass", "small");
        setForeground(Palette.muted());
        setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        setToolTipText(Tooltips.wrap(Cautions.NOT_MODELLED, 360));
    }
}
