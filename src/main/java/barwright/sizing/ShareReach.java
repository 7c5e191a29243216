package barwright.sizing;

/**
 * The front shares of lateral load transfer a search can reach: from the sized bar(s) at their softest (none
 * fitted) to their stiffest (the stiffest stock size, material and hole the search may propose), the other
 * axle as the car has it. With both bars sized the ends are front softest with rear stiffest, and the reverse.
 *
 * @param lowest  the least front share reached (fraction)
 * @param highest the largest front share reached (fraction), not less than lowest
 */
public record ShareReach(double lowest, double highest) {
    /** The most a default aim stays inside an end of the range: one percentage point. */
    public static final double MARGIN = 0.01;

    public ShareReach {
        if (!(Double.isFinite(lowest) && Double.isFinite(highest) && lowest <= highest)) {
            throw new IllegalArgumentException("a reachable range runs from a finite share up to a larger one, was "
                    + lowest + " to " + highest);
        }
    }

    /** @return true where the share lies within the range (ends included) */
    public boolean contains(double share) {
        return share >= lowest && share <= highest;
    }

    /**
     * A share to aim at instead of one out of reach: the nearest end, moved inside by a percentage point or a
     * tenth of the range where that is narrower, so that stock sizes can land on either side of it.
     *
     * @param wanted the share wanted (fraction)
     * @return wanted where it is in reach, else the nearest end moved inside
     */
    public double aimFor(double wanted) {
        if (contains(wanted)) {
            return wanted;
        }
        double margin = Math.min(MARGIN, 0.1 * (highest - lowest));
        return wanted > highest ? highest - margin : lowest + margin;
    }
}
