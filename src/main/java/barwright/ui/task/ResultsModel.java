package barwright.ui.task;

import java.util.ArrayList;
import java.util.List;

/**
 * What the result views show: the newest successful analysis and, while the open car differs from it (a
 * refused value, an impossible car), why it is out of date. Event thread.
 */
public final class ResultsModel {
    private final List<Runnable> listeners = new ArrayList<>();
    private AnalysisOutcome shown;
    private String staleReason;

    /** @return a model that shows one analysis for good: a pinned setup, drawn beside the live one */
    public static ResultsModel pinned(AnalysisOutcome outcome) {
        ResultsModel model = new ResultsModel();
        model.shown = outcome;
        return model;
    }

    /** @return the analysis on screen (never null once the first has arrived) */
    public AnalysisOutcome shown() {
        return shown;
    }

    /** @return why the results on screen are not for the car as it stands, or null when they are */
    public String staleReason() {
        return staleReason;
    }

    public boolean isStale() {
        return staleReason != null;
    }

    void show(AnalysisOutcome outcome, String reason) {
        shown = outcome;
        staleReason = reason;
        fire();
    }

    void markStale(String reason) {
        staleReason = reason;
        fire();
    }

    public void addListener(Runnable listener) {
        listeners.add(listener);
    }

    /** Stops telling a view that has closed. */
    public void removeListener(Runnable listener) {
        listeners.remove(listener);
    }

    private void fire() {
        List.copyOf(listeners).forEach(Runnable::run);
    }
}
