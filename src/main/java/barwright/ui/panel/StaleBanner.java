package barwright.ui.panel;

import barwright.ui.task.ResultsModel;

import javax.swing.BorderFactory;
import javax.swing.JLabel;
import java.awt.Color;

/** A strip above the results that says, while they are out of date, why, and what the figures are for. */
public final class StaleBanner extends JLabel {
    private final ResultsModel results;

    public StaleBanner(ResultsModel results) {
        this.results = results;
        setName("stale.banner");
        setOpaque(true);
        setBorder(BorderFactory.createEmptyBorder(6, 10, 6, 10));
        setVisible(false);
        results.addListener(this::refresh);
    }

    private void refresh() {
        boolean stale = results.isStale();
        setVisible(stale);
        if (stale) {
            setBackground(Palette.staleBackground());
            setForeground(javax.swing.UIManager.getColor("Label.foreground") == null ? Color.BLACK
                    : javax.swing.UIManager.getColor("Label.foreground"));
            setText("<html><body style='width:760px'><b>Out of date.</b> " + Tooltips.escape("The figures "
                    + "and charts show the last car the program accepted. " + results.staleReason())
                    + "</body></html>");
        }
    }
}
