package barwright.ui.panel;

import barwright.ui.task.ResultsModel;

import javax.swing.BorderFactory;
import javax.swing.UIManager;

/** A strip above the results that says, while they are out of date, why, and what the figures are for. */
public final class StaleBanner extends WrappingText {
    private final ResultsModel results;

    public StaleBanner(ResultsModel results) {
        super("");
        this.results = results;
        setName("stale.banner");
        setBorder(BorderFactory.createEmptyBorder(6, 10, 6, 10));
        setVisible(false);
        results.addListener(this::refresh);
    }

    private void refresh() {
        boolean stale = results.isStale();
        setVisible(stale);
        if (stale) {
            setOpaque(true);
            setBackground(Palette.staleBackground());
            setForeground(UIManager.getColor("Label.foreground"));
            setFont(UIManager.getFont("Label.font").deriveFont(java.awt.Font.BOLD));
            setText("Out of date: the figures and charts show the last car the program accepted. "
                    + results.staleReason());
        }
    }
}
