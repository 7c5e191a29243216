package barwright.ui.workshop;

import barwright.ui.action.WindowContext;
import barwright.ui.action.WindowContribution;

import java.util.List;

/** The workshop page's part of the main window: one results tab. */
public final class WorkshopViews implements WindowContribution {
    private final BarRatePage page;

    public WorkshopViews(WindowContext context) {
        page = new BarRatePage(context.document(), context.view());
    }

    @Override
    public List<Page> pages() {
        return List.of(new Page("Workshop", "A bar's rate from load and deflection readings, against the model's, "
                + "and the measured factor put into the car", page));
    }

    public BarRatePage page() {
        return page;
    }
}
