package barwright.ui.insight;

import barwright.insight.ChassisStudy;
import barwright.insight.LiftEnvelope;
import barwright.insight.LiftEnvelopeResult;
import barwright.insight.Sensitivity;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.Palette;
import barwright.ui.sizing.WhileShown;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.BackgroundWork;
import barwright.ui.task.ResultsModel;

import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTabbedPane;
import java.awt.BorderLayout;

/**
 * The setter's questions: one tab each for the lift envelope, the sensitivity and the chassis study. After every
 * analysis the window accepts, the three are computed again off the event thread while the panel is on screen
 * (the sensitivity alone analyses the car a score of times: while the panel is hidden an edit costs nothing
 * here, and the newest analysis is computed when it is shown again); the envelope keeps the one before as the
 * previous setting. Event thread.
 */
public final class InsightPanel extends JPanel {
    /** The share of the view's height each tab's chart gets at least, as the split it replaced gave it. */
    static final double CHART_SHARE = 0.72;
    private final ResultsModel results;
    private final EnvelopeView envelope;
    private final SensitivityView sensitivity;
    private final ChassisView chassis;
    private final JLabel status = new JLabel(" ");
    private final JTabbedPane tabs = new JTabbedPane();
    private final BackgroundWork<AnalysisOutcome, InsightResults> worker;
    private final WhileShown whileShown;
    private AnalysisOutcome submitted;
    private InsightResults current;

    public InsightPanel(ResultsModel results, ViewSettings view) {
        super(new BorderLayout());
        setName("insight.panel");
        this.results = results;
        envelope = new EnvelopeView(view);
        sensitivity = new SensitivityView(view);
        chassis = new ChassisView(view);
        tabs.setName("insight.tabs");
        tabs.setTabLayoutPolicy(JTabbedPane.SCROLL_TAB_LAYOUT); // one row of tabs, whatever the text size
        tabs.addTab("Where a wheel lifts", envelope);
        tabs.setToolTipTextAt(0, "The lateral acceleration at which each inside wheel lifts, under braking and power");
        tabs.addTab("What moves the balance", sensitivity);
        tabs.setToolTipTextAt(1, "One small change of each setting, the car analysed again each time");
        tabs.addTab("Chassis stiffness", chassis);
        tabs.setToolTipTextAt(2, "How much of a bar change a flexible chassis lets reach the tyres");
        status.setName("insight.status");
        status.setBorder(BorderFactory.createEmptyBorder(2, 8, 2, 8));
        status.setForeground(Palette.warning());
        add(status, BorderLayout.NORTH);
        add(tabs, BorderLayout.CENTER);
        worker = BackgroundWork.newestOnly(InsightPanel::compute, this::arrived, this::failed);
        whileShown = new WhileShown(this, this::submitShown);
        results.addListener(this::resultsChanged);
        view.addListener(this::redraw);
        resultsChanged();
    }

    /** The work, off the event thread: the three views from one accepted analysis. */
    static InsightResults compute(AnalysisOutcome outcome) {
        return new InsightResults(outcome.vehicle(), LiftEnvelope.of(outcome.result()),
                Sensitivity.of(outcome.vehicle(), outcome.result()),
                ChassisStudy.of(outcome.vehicle(), outcome.result()).compute());
    }

    private void resultsChanged() {
        status.setText(results.isStale() ? "Out of date: " + results.staleReason() : " ");
        status.setVisible(results.isStale()); // no empty line of the text's height above the tabs
        whileShown.request();
    }

    private void submitShown() {
        AnalysisOutcome shown = results.shown();
        if (shown == null || !shown.succeeded() || shown == submitted) {
            return;
        }
        submitted = shown;
        worker.submit(shown);
    }

    private void arrived(InsightResults next) {
        LiftEnvelopeResult previous = envelope.previous();
        if (current != null && !current.vehicle().equals(next.vehicle())) {
            previous = current.envelope();
        }
        current = next;
        envelope.show(next.envelope(), previous);
        sensitivity.show(next.sensitivity());
        chassis.show(next.chassis());
    }

    private void failed(String message) {
        status.setText("These views could not be computed for this car: " + message);
        status.setVisible(true);
    }

    private void redraw() {
        if (current != null) {
            envelope.redraw();
            sensitivity.show(current.sensitivity());
            chassis.show(current.chassis());
        }
    }

    /**
     * @return true when no computation runs or waits and the views show the newest accepted analysis (they
     * catch up only while the panel is on screen)
     */
    public boolean isSettled() {
        return worker.isIdle() && current != null && submitted != null
                && current.vehicle().equals(submitted.vehicle()) && submitted == results.shown();
    }

    /** @return what the views show, or null before the first computation */
    public InsightResults current() {
        return current;
    }

    public JTabbedPane tabs() {
        return tabs;
    }

    public EnvelopeView envelope() {
        return envelope;
    }

    public SensitivityView sensitivity() {
        return sensitivity;
    }

    public ChassisView chassis() {
        return chassis;
    }
}
