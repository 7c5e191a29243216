package barwright.ui.task;

import barwright.io.Problem;
import barwright.model.AxlePosition;
import barwright.ui.document.OpenDocument;

/**
 * Keeps the results in step with the open document: each accepted edit is analysed in the background; a
 * refused one, or a car the model cannot balance, leaves the last results on screen marked out of date.
 */
public final class AnalysisController {
    private final OpenDocument document;
    private final ResultsModel results;
    private final AnalysisScheduler scheduler;
    private SweepRequest sweep = new SweepRequest(AxlePosition.FRONT, SweepParameter.DIAMETER);
    private long lastDelivered;
    private boolean sweepWanted;
    /** How long a refused value may stand before the results are marked out of date (ms). */
    static final int STALE_GRACE_MS = 400;
    private final javax.swing.Timer staleGrace = new javax.swing.Timer(STALE_GRACE_MS, event -> markRefused());

    public AnalysisController(OpenDocument document, ResultsModel results) {
        this.document = document;
        this.results = results;
        this.scheduler = new AnalysisScheduler(this::arrived);
        staleGrace.setRepeats(false);
        document.addListener(event -> refresh());
    }

    /** Analyses the document as it stands, or marks the results out of date where the core refuses it. */
    public void refresh() {
        if (document.isValid()) {
            staleGrace.stop();
            scheduler.submit(document.lastValid().vehicle(), sweepWanted ? sweep : null);
        } else if (!results.isStale()) {
            staleGrace.restart();
        } else {
            markRefused();
        }
    }

    /**
     * Typing "25" passes through "2", which is refused: the results are marked out of date only when a refused
     * value stays a moment, so that the window does not flash while a person types (the field itself shows
     * the message at once).
     */
    private void markRefused() {
        if (document.isValid()) {
            return;
        }
        Problem first = document.problems().get(0);
        int more = document.problems().size() - 1;
        results.markStale("A value is refused: " + first + (more > 0 ? " (and " + more + " more)" : ""));
    }

    /** Chooses what the sweep chart varies, and analyses again. */
    public void setSweep(SweepRequest request) {
        sweep = request;
        refresh();
    }

    /**
     * Says whether the sweep chart is on screen: the sweep is worked out only then, so that edits elsewhere
     * cost one analysis, not a score.
     */
    public void setSweepWanted(boolean wanted) {
        boolean missing = wanted && (results.shown() == null || results.shown().sweep() == null
                || !results.shown().sweep().request().equals(sweep));
        sweepWanted = wanted;
        if (missing) {
            refresh();
        }
    }

    public SweepRequest sweep() {
        return sweep;
    }

    /** @return true when no analysis runs or waits, and no out-of-date mark is pending */
    public boolean isIdle() {
        return scheduler.isIdle() && !staleGrace.isRunning();
    }

    private void arrived(AnalysisOutcome outcome) {
        if (outcome.revision() < lastDelivered) {
            return;
        }
        lastDelivered = outcome.revision();
        boolean newest = outcome.revision() == scheduler.latestRevision();
        if (!outcome.succeeded()) {
            if (newest) {
                results.markStale("This car cannot be analysed: " + outcome.failure());
            }
            return;
        }
        String reason = null;
        if (newest && !document.isValid()) {
            reason = results.staleReason();
        }
        results.show(outcome, reason);
    }
}
