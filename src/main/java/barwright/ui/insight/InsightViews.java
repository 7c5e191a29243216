package barwright.ui.insight;

import barwright.ui.action.WindowContext;
import barwright.ui.action.WindowContribution;

import java.util.List;

/** The insight views' part of the main window: one results tab with where a wheel lifts, balance and chassis. */
public final class InsightViews implements WindowContribution {
    private final InsightPanel panel;

    public InsightViews(WindowContext context) {
        panel = new InsightPanel(context.results(), context.view());
    }

    @Override
    public List<Page> pages() {
        return List.of(new Page("Lift, balance, chassis", "Where an inside wheel lifts, what moves the balance most, "
                + "and what a flexible chassis costs", panel));
    }

    public InsightPanel panel() {
        return panel;
    }
}
