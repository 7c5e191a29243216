package barwright.model;

import java.util.Objects;

/**
 * A telescopic strut fixed to the upright, with one lower arm (front view, left side).
 *
 * @param strutTop   the strut's top mount, on the body (m)
 * @param strutLower a second point on the strut's axis, fixed to the upright (m)
 * @param lowerInner lower arm's body pivot (m)
 * @param lowerOuter lower ball joint, on the upright (m)
 */
public record Strut(FrontViewPoint strutTop, FrontViewPoint strutLower, FrontViewPoint lowerInner,
                    FrontViewPoint lowerOuter) implements Linkage {
    public Strut {
        Objects.requireNonNull(strutTop, "strutTop");
        Objects.requireNonNull(strutLower, "strutLower");
        Objects.requireNonNull(lowerInner, "lowerInner");
        Objects.requireNonNull(lowerOuter, "lowerOuter");
    }
}
