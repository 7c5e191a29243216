package barwright.sizing.preload;

/**
 * Which diagonal pair of wheels gains load when the chosen link is made longer. It depends on which link
 * (left or right) is changed and on whether the bar end sits above or below the link's other mount, so the
 * user says it (model.md 9); the program repeats it in words.
 */
public enum GainingDiagonal {
    LEFT_FRONT_RIGHT_REAR("left front and right rear", "right front and left rear"),
    RIGHT_FRONT_LEFT_REAR("right front and left rear", "left front and right rear");

    private final String gains;
    private final String loses;

    GainingDiagonal(String gains, String loses) {
        this.gains = gains;
        this.loses = loses;
    }

    /** @return the wheels that gain load, in words */
    public String gains() {
        return gains;
    }

    /** @return the wheels that lose load, in words */
    public String loses() {
        return loses;
    }

    /** @return +1 where the left front is on the gaining diagonal, else -1 */
    int leftFrontSign() {
        return this == LEFT_FRONT_RIGHT_REAR ? 1 : -1;
    }
}
