package barwright.ui.tyre;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.ResultsModel;
import barwright.ui.field.ViewSettings;
import barwright.ui.sizing.WhileShown;

import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTabbedPane;
import java.awt.BorderLayout;
import java.awt.FlowLayout;

/**
 * The tyre page of the main window: a tab per axle ({@link AxleTyreView}), the turn whose limit the loads are
 * taken at and "Fit from data..." (the caution closes each axle's page). Follows the analysis on screen and the unit switch at once.
 * Event thread.
 */
public final class TyrePage extends JPanel {
    private final ResultsModel results;
    private final JTabbedPane axles = new JTabbedPane();
    private final AxleTyreView front;
    private final AxleTyreView rear;
    private final JComboBox<String> turn = new JComboBox<>(new String[]{"left turn", "right turn"});

    /** @param fitFromData opens the fit dialog */
    TyrePage(ResultsModel results, ViewSettings view, Runnable fitFromData) {
        super(new BorderLayout(4, 4));
        this.results = results;
        setName("tyre.page");
        front = new AxleTyreView(AxlePosition.FRONT, view);
        rear = new AxleTyreView(AxlePosition.REAR, view);
        axles.setName("tyre.axles");
        axles.addTab("Front tyre", scrolled(front));
        axles.addTab("Rear tyre", scrolled(rear));
        turn.setName("tyre.turn");
        turn.setToolTipText("The wheel loads are those at the grip limit of this turn (they differ only for a "
                + "car that is not the same left and right)");
        turn.addActionListener(event -> refresh());
        JButton fit = new JButton("Fit from data…");
        fit.setName("tyre.fitFromData");
        fit.setToolTipText("Fit a tyre to measured lateral force curves (a CSV file), see the fit, then put it on "
                + "an axle as one undoable step");
        fit.addActionListener(event -> fitFromData.run());
        JPanel top = new JPanel(new FlowLayout(FlowLayout.LEADING, 6, 2));
        top.add(new JLabel("Loads at the limit of the"));
        top.add(turn);
        top.add(fit);
        add(top, BorderLayout.NORTH);
        add(axles, BorderLayout.CENTER);
        // redrawn only while on screen: a hidden page costs an edit nothing and catches up when it is shown
        WhileShown whileShown = new WhileShown(this, this::refresh);
        results.addListener(whileShown::request);
        view.addListener(whileShown::request);
        refresh();
    }

    private static JScrollPane scrolled(AxleTyreView view) {
        JScrollPane scroll = new JScrollPane(view);
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(24);
        return scroll;
    }

    /** Redraws both axles from the analysis on screen (nothing before the first has arrived). */
    void refresh() {
        AnalysisOutcome shown = results.shown();
        if (shown == null || shown.result() == null) {
            return;
        }
        TurnDirection direction = turn.getSelectedIndex() == 1 ? TurnDirection.RIGHT : TurnDirection.LEFT;
        front.show(shown.result(), direction, results.isStale());
        rear.show(shown.result(), direction, results.isStale());
    }

    AxlePosition selectedAxle() {
        return axles.getSelectedIndex() == 1 ? AxlePosition.REAR : AxlePosition.FRONT;
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (front != null) {
            front.restyle();
            rear.restyle();
        }
    }

    AxleTyreView front() {
        return front;
    }

    AxleTyreView rear() {
        return rear;
    }

    JTabbedPane axles() {
        return axles;
    }

    JComboBox<String> turn() {
        return turn;
    }
}
