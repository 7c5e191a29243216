package barwright.model;

/** Guards for record constructors: a violated one is a programming error, since files are validated first. */
final class Checks {
    private Checks() {
    }

    static double positive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, was " + value);
        }
        return value;
    }

    static double nonNegative(String name, double value) {
        if (!(value >= 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be zero or more and finite, was " + value);
        }
        return value;
    }

    static double finite(String name, double value) {
        if (!Double.isFinite(value)) {
            throw new IllegalArgumentException(name + " must be finite, was " + value);
        }
        return value;
    }
}
