package barwright.model;

import java.util.Objects;

/**
 * An arm swinging about a pivot axis square to the car (left side; x forward from the wheel centre).
 *
 * @param pivotInner the pivot axis's inner point (m)
 * @param pivotOuter the pivot axis's outer point (m)
 */
public record TrailingArm(Point3 pivotInner, Point3 pivotOuter) implements Linkage {
    public TrailingArm {
        Objects.requireNonNull(pivotInner, "pivotInner");
        Objects.requireNonNull(pivotOuter, "pivotOuter");
    }
}
