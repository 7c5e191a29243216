package barwright.physics;

/**
 * Vertical loads of the four wheels in a steady turn (N), never negative: a lifted wheel carries zero.
 */
public record WheelLoads(double frontOutside, double frontInside, double rearOutside, double rearInside) {
    /** @return the axle's outside wheel's load (N) */
    public double outside(barwright.model.AxlePosition axle) {
        return axle == barwright.model.AxlePosition.FRONT ? frontOutside : rearOutside;
    }

    /** @return the axle's inside wheel's load (N) */
    public double inside(barwright.model.AxlePosition axle) {
        return axle == barwright.model.AxlePosition.FRONT ? frontInside : rearInside;
    }

    /** @return the sum of the four loads (N) */
    public double total() {
        return frontOutside + frontInside + rearOutside + rearInside;
    }
}
