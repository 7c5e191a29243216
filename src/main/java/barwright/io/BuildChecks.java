package barwright.io;

import barwright.model.AntiRollBar;
import barwright.model.Axle;

import java.util.List;

/**
 * The checks of a car read from a vehicle file that need the calculation: whether a shaped bar can be built into
 * the beam model, whether a linkage can be put together and moved. The file format computes nothing, so the
 * reader is handed these (by {@code barwright.loading.VehicleLoader}, the one way the program loads a car) and
 * runs them where the part has read well, so their problems stand among the others in the file's order.
 */
public interface BuildChecks {
    /**
     * @param bar     a shaped bar (one with a centreline) that read well
     * @param barPath its key path, e.g. {@code front.bar}
     * @return its problems, each with its key path; none where it builds
     */
    List<Problem> ofShapedBar(AntiRollBar bar, String barPath);

    /**
     * @param axle     an axle whose linkage read well point by point
     * @param axlePath its key path, {@code front} or {@code rear}
     * @return its problems, each with its key path; none where the linkage is sound
     */
    List<Problem> ofLinkage(Axle axle, String axlePath);
}
