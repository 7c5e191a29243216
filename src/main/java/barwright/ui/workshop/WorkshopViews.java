package barwright.ui.workshop;

import barwright.ui.action.WindowContext;
import barwright.ui.action.WindowContribution;

import javax.swing.JTabbedPane;
import java.util.List;

/**
 * The workshop's part of the main window: one results tab holding the four measurements (model.md 12), each
 * on a page of its own: a bar's rate, a motion ratio, the centre-of-mass height and the corner weights.
 */
public final class WorkshopViews implements WindowContribution {
    private final BarRatePage page;
    private final MotionRatioPage motionRatio;
    private final CentreOfMassPage centreOfMass;
    private final CornerWeightsPage corners;
    private final JTabbedPane pages = new JTabbedPane();

    public WorkshopViews(WindowContext context) {
        page = new BarRatePage(context.document(), context.view());
        motionRatio = new MotionRatioPage(context.view());
        centreOfMass = new CentreOfMassPage(context.document(), context.view());
        corners = new CornerWeightsPage(context.document(), context.view());
        pages.setName("workshop.pages");
        pages.setTabLayoutPolicy(JTabbedPane.SCROLL_TAB_LAYOUT); // one row of tabs, whatever the text size
        pages.addTab("Bar rate", page);
        pages.setToolTipTextAt(0, "A bar's rate and free play from load and deflection readings, against the model's");
        pages.addTab("Motion ratio", motionRatio);
        pages.setToolTipTextAt(1, "A motion ratio from wheel travel and spring, damper or link travel readings");
        pages.addTab("Centre of mass", centreOfMass);
        pages.setToolTipTextAt(2, "The centre-of-mass height by weighing the car level and with one axle raised");
        pages.addTab("Corner weights", corners);
        pages.setToolTipTextAt(3, "Four scale readings: the shares, the cross weight and the link change for a target");
    }

    @Override
    public List<Page> pages() {
        return List.of(new Page("Workshop", "Measurements on the car (a bar's rate, a motion ratio, the "
                + "centre-of-mass height, corner weights) turned into the model's inputs", pages));
    }

    public BarRatePage page() {
        return page;
    }

    public MotionRatioPage motionRatio() {
        return motionRatio;
    }

    public CentreOfMassPage centreOfMass() {
        return centreOfMass;
    }

    public CornerWeightsPage corners() {
        return corners;
    }
}
