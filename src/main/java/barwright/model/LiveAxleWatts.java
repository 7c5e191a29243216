package barwright.model;

import java.util.Objects;

/**
 * A beam axle located sideways by a Watt's linkage, whose centre pivot sits on the car's centreline.
 *
 * @param centrePivotHeight height of the centre pivot above the ground at static ride height (m)
 * @param centrePivotMount  whether the centre pivot (the short link) is carried by the axle or the body
 */
public record LiveAxleWatts(double centrePivotHeight, Mount centrePivotMount) implements Linkage {
    /** Which part carries the Watt's linkage's centre pivot. */
    public enum Mount { AXLE, BODY }

    public LiveAxleWatts {
        Checks.finite("centrePivotHeight", centrePivotHeight);
        Objects.requireNonNull(centrePivotMount, "centrePivotMount");
    }
}
