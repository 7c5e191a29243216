package barwright.model;

import java.util.Objects;

/**
 * An arm swinging about a pivot axis swept in plan view (and perhaps tilted): left side, x forward from the wheel
 * centre.
 *
 * @param pivotInner the pivot axis's inner point (m)
 * @param pivotOuter the pivot axis's outer point (m)
 */
public record SemiTrailingArm(Point3 pivotInner, Point3 pivotOuter) implements Linkage {
    public SemiTrailingArm {
        Objects.requireNonNull(pivotInner, "pivotInner");
        Objects.requireNonNull(pivotOuter, "pivotOuter");
    }
}
