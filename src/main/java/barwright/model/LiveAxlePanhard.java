package barwright.model;

import java.util.Objects;

/**
 * A beam axle located sideways by a Panhard rod (front view; y signed from the centreline, positive to the left).
 *
 * @param bodyEnd the rod's end on the body (m)
 * @param axleEnd the rod's end on the axle (m)
 */
public record LiveAxlePanhard(FrontViewPoint bodyEnd, FrontViewPoint axleEnd) implements Linkage {
    public LiveAxlePanhard {
        Objects.requireNonNull(bodyEnd, "bodyEnd");
        Objects.requireNonNull(axleEnd, "axleEnd");
    }
}
