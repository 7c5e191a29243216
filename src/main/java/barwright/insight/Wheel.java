package barwright.insight;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.MassProperties;

/** One of the four wheels, and the turn in which it is on the inside (a left turn has the left wheels inside). */
public enum Wheel {
    LEFT_FRONT("leftFront", "left front", AxlePosition.FRONT, TurnDirection.LEFT),
    RIGHT_FRONT("rightFront", "right front", AxlePosition.FRONT, TurnDirection.RIGHT),
    LEFT_REAR("leftRear", "left rear", AxlePosition.REAR, TurnDirection.LEFT),
    RIGHT_REAR("rightRear", "right rear", AxlePosition.REAR, TurnDirection.RIGHT);

    private final String key;
    private final String words;
    private final AxlePosition axle;
    private final TurnDirection insideIn;

    Wheel(String key, String words, AxlePosition axle, TurnDirection insideIn) {
        this.key = key;
        this.words = words;
        this.axle = axle;
        this.insideIn = insideIn;
    }

    /** @return the key in JSON output, as the vehicle file names corners: "leftFront" ... */
    public String key() {
        return key;
    }

    /** @return e.g. "left front" */
    public String words() {
        return words;
    }

    public AxlePosition axle() {
        return axle;
    }

    /** @return the turn in which this wheel is on the inside and can lift */
    public TurnDirection insideIn() {
        return insideIn;
    }

    /** @return this wheel's static load (N) */
    public double staticLoad(MassProperties.StaticWheelLoads loads) {
        return switch (this) {
            case LEFT_FRONT -> loads.leftFront();
            case RIGHT_FRONT -> loads.rightFront();
            case LEFT_REAR -> loads.leftRear();
            case RIGHT_REAR -> loads.rightRear();
        };
    }
}
