package barwright.sizing.preload;

/** A vertical load (or a change of one) at each wheel (N). */
public record CornerLoads(double leftFront, double rightFront, double leftRear, double rightRear) {
    public double total() {
        return leftFront + rightFront + leftRear + rightRear;
    }

    /** @return (left front + right rear) / total: the cross weight as a share */
    public double crossWeight() {
        return (leftFront + rightRear) / total();
    }

    public CornerLoads plus(CornerLoads change) {
        return new CornerLoads(leftFront + change.leftFront, rightFront + change.rightFront,
                leftRear + change.leftRear, rightRear + change.rightRear);
    }

    public CornerLoads times(double factor) {
        return new CornerLoads(leftFront * factor, rightFront * factor, leftRear * factor, rightRear * factor);
    }
}
