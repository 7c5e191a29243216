package barwright.model;

/** Which end of the car. */
public enum AxlePosition {
    FRONT("front"),
    REAR("rear");

    private final String key;

    AxlePosition(String key) {
        this.key = key;
    }

    /** @return the key of this axle in the vehicle file and report: "front" or "rear" */
    public String key() {
        return key;
    }

    public AxlePosition other() {
        return this == FRONT ? REAR : FRONT;
    }
}
