package barwright.model;

import java.util.Objects;

/**
 * Two transverse arms, each from an inner pivot on the body to a ball joint on the upright (front view, left side).
 *
 * @param upperInner upper arm's body pivot (m)
 * @param upperOuter upper ball joint, on the upright (m)
 * @param lowerInner lower arm's body pivot (m)
 * @param lowerOuter lower ball joint, on the upright (m)
 */
public record DoubleWishbone(FrontViewPoint upperInner, FrontViewPoint upperOuter, FrontViewPoint lowerInner,
                             FrontViewPoint lowerOuter) implements Linkage {
    public DoubleWishbone {
        Objects.requireNonNull(upperInner, "upperInner");
        Objects.requireNonNull(upperOuter, "upperOuter");
        Objects.requireNonNull(lowerInner, "lowerInner");
        Objects.requireNonNull(lowerOuter, "lowerOuter");
    }
}
