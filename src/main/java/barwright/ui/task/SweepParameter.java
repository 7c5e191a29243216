package barwright.ui.task;

/** What the bar sweep varies on one bar. */
public enum SweepParameter {
    DIAMETER("outside diameter"),
    WALL("tube wall"),
    ARM_HOLE("arm hole");

    private final String words;

    SweepParameter(String words) {
        this.words = words;
    }

    /** @return the parameter in words, for menus and chart titles */
    public String words() {
        return words;
    }
}
