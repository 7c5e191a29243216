package barwright.ui.linkage;

import barwright.ui.action.WindowContext;
import barwright.ui.action.WindowContribution;
import barwright.ui.task.CorneringProbe;

import java.util.List;

/** The linkage page's part of the main window: one results tab, following the window's cornering slider. */
public final class LinkageViews implements WindowContribution {
    private final LinkagePage page;

    /** @param probe the main window's lateral-acceleration slider, shared with the car picture */
    public LinkageViews(WindowContext context, CorneringProbe probe) {
        page = new LinkagePage(context, probe);
    }

    @Override
    public List<Page> pages() {
        return List.of(new Page("Linkage", "Each axle's pickup points and its front view: instant centres, roll centre "
                + "and cambers as the body rolls", page));
    }

    public LinkagePage page() {
        return page;
    }
}
