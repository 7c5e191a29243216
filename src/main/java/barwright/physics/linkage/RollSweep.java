package barwright.physics.linkage;

import java.util.List;

/**
 * An axle's kinematic roll followed from rest outwards, state by state, for a table of the roll-centre height
 * and the cambers against body roll (model.md 11, "In the analysis").
 *
 * @param states       the roll states, the first at rest, rolls strictly increasing and positive after it
 * @param stopReason   why the sweep ends before the roll asked for, in words ("the upper arm and the upright
 *                     come into line"), or null where it reaches that roll
 * @param linkageStops true where the linkage itself stops the roll there (it locks, or its travel turns back);
 *                     false where the sweep reached the roll asked for or only the range followed ended
 */
public record RollSweep(List<RollState> states, String stopReason, boolean linkageStops) {
    public RollSweep {
        states = List.copyOf(states);
        if (states.isEmpty() || states.get(0).roll() != 0) {
            throw new IllegalArgumentException("a roll sweep starts at rest");
        }
    }

    /** @return the largest roll the sweep reaches (rad) */
    public double lastRoll() {
        return states.get(states.size() - 1).roll();
    }
}
