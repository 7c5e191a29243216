package barwright.model;

/**
 * The static mass on each wheel, as read from corner scales (kg).
 */
public record CornerMasses(double leftFront, double rightFront, double leftRear, double rightRear) {
    public CornerMasses {
        Checks.positive("leftFront", leftFront);
        Checks.positive("rightFront", rightFront);
        Checks.positive("leftRear", leftRear);
        Checks.positive("rightRear", rightRear);
    }

    /** @return the total (kg) */
    public double total() {
        return leftFront + rightFront + leftRear + rightRear;
    }

    /** @return the front axle's share of the total */
    public double frontFraction() {
        return (leftFront + rightFront) / total();
    }
}
