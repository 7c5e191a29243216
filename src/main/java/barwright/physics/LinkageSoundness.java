package barwright.physics;

import barwright.model.Axle;
import barwright.physics.linkage.AxleKinematics;
import barwright.physics.linkage.LinkageLimitException;
import barwright.physics.linkage.TravelLimit;
import barwright.physics.linkage.TravelState;

import java.util.ArrayList;
import java.util.List;

/**
 * The checks of an axle's linkage that need its kinematics: whether it can be put together at its ride height,
 * whether it locks near it, and whether its front-view instant centre stands almost straight above the contact
 * point. Found here as plain findings; the loader words them with the file's key paths. The thresholds are
 * this project's plausibility limits for a typing slip, not design rules.
 */
public final class LinkageSoundness {
    /** Travel a suspension must have each way from its ride height (m): less is a linkage that cannot be driven. */
    public static final double MINIMUM_TRAVEL = 0.030;
    /** Shortest front-view swing arm accepted (m): an instant centre almost straight above the contact point. */
    public static final double SHORTEST_SWING_ARM = 0.050;

    private LinkageSoundness() {
    }

    /** What is wrong with a linkage that reads well point by point. */
    public sealed interface Finding permits CannotAssemble, LocksEarly, InstantCentreOverContact {
    }

    /** @param reason why the linkage cannot be put together at its ride height */
    public record CannotAssemble(String reason) implements Finding {
    }

    /**
     * @param travel how far it moves before it locks (m, signed: bump positive)
     * @param bump   true for bump, false for droop
     * @param reason what locks it
     */
    public record LocksEarly(double travel, boolean bump, String reason) implements Finding {
    }

    /** @param swingArm the front-view swing arm's length at ride height (m, unsigned) */
    public record InstantCentreOverContact(double swingArm) implements Finding {
    }

    /**
     * @param axle an axle with a linkage whose points are each acceptable
     * @return what is wrong, none where the linkage is sound
     */
    public static List<Finding> check(Axle axle) {
        AxleKinematics kinematics;
        try {
            kinematics = AxleKinematics.of(axle);
        } catch (LinkageLimitException beyond) {
            return List.of(new CannotAssemble(beyond.getMessage()));
        }
        List<Finding> findings = new ArrayList<>();
        locks(kinematics.bumpLimit(), true, findings);
        locks(kinematics.droopLimit(), false, findings);
        TravelState still = kinematics.travel(0);
        if (!still.instantCentre().atInfinity() && Math.abs(still.swingArmLength()) < SHORTEST_SWING_ARM) {
            findings.add(new InstantCentreOverContact(Math.abs(still.swingArmLength())));
        }
        return findings;
    }

    private static void locks(TravelLimit limit, boolean bump, List<Finding> findings) {
        if (limit.locks() && Math.abs(limit.travel()) < MINIMUM_TRAVEL) {
            findings.add(new LocksEarly(limit.travel(), bump, limit.reason()));
        }
    }
}
