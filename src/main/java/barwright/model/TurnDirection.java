package barwright.model;

/** A steady turn; in a left turn the left wheels are on the inside. */
public enum TurnDirection {
    LEFT("leftTurn", "left"),
    RIGHT("rightTurn", "right");

    private final String key;
    private final String word;

    TurnDirection(String key, String word) {
        this.key = key;
        this.word = word;
    }

    /** @return the report key: "leftTurn" or "rightTurn" */
    public String key() {
        return key;
    }

    /** @return "left" or "right" */
    public String word() {
        return word;
    }
}
