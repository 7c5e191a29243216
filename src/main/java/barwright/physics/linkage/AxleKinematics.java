package barwright.physics.linkage;

import barwright.model.Axle;
import barwright.model.DoubleWishbone;
import barwright.model.FrontViewPoint;
import barwright.model.Linkage;
import barwright.model.LiveAxlePanhard;
import barwright.model.LiveAxleWatts;
import barwright.model.SemiTrailingArm;
import barwright.model.Strut;
import barwright.model.SuspensionGeometry;
import barwright.model.TrailingArm;

/**
 * The front-view kinematics of one axle's linkage at its ride height (after {@code rideHeightChange}): one
 * wheel's travel, and the body's roll with both tyres on the ground.
 */
public sealed interface AxleKinematics permits IndependentKinematics, LiveAxleKinematics {

    /**
     * @param axle an axle with a linkage
     * @return its kinematics
     * @throws LinkageLimitException where the linkage cannot reach the ride height it is set to
     */
    static AxleKinematics of(Axle axle) {
        SuspensionGeometry suspension = axle.suspension();
        if (!suspension.hasLinkage()) {
            throw new IllegalArgumentException("the axle has no linkage: its roll-centre height is typed in");
        }
        double track = axle.track();
        FrontViewPoint contact = new FrontViewPoint(track / 2, 0);
        Linkage linkage = suspension.linkage();
        if (linkage instanceof DoubleWishbone points) {
            return new IndependentKinematics(new DoubleWishboneSide(points, contact), track, suspension);
        }
        if (linkage instanceof Strut points) {
            return new IndependentKinematics(new StrutSide(points, contact), track, suspension);
        }
        if (linkage instanceof TrailingArm arm) {
            return new IndependentKinematics(new SwingingArmSide(arm.pivotInner(), arm.pivotOuter(), contact),
                    track, suspension);
        }
        if (linkage instanceof SemiTrailingArm arm) {
            return new IndependentKinematics(new SwingingArmSide(arm.pivotInner(), arm.pivotOuter(), contact),
                    track, suspension);
        }
        if (linkage instanceof LiveAxlePanhard rod) {
            return LiveAxleKinematics.panhard(rod, track, suspension);
        }
        return LiveAxleKinematics.watts((LiveAxleWatts) linkage, track, suspension);
    }

    /**
     * @param travel the left wheel's travel from the ride height (m), bump positive
     * @throws LinkageLimitException where the linkage cannot reach it
     */
    TravelState travel(double travel);

    /**
     * @param roll body roll phi (rad), positive for a left turn
     * @throws LinkageLimitException where a wheel would have to travel past what the linkage reaches
     */
    RollState roll(double roll);

    /** @return how far the wheel can rise from the ride height, and what stops it */
    TravelLimit bumpLimit();

    /** @return how far the wheel can drop from the ride height (a negative travel), and what stops it */
    TravelLimit droopLimit();

    /**
     * The body's roll followed from rest in steps of about {@code step}, to the first state at or past
     * {@code maxRoll} or to where the linkage stops the roll.
     *
     * @param maxRoll the roll to reach (rad), positive
     * @param step    about how far apart the states are (rad), positive
     */
    default RollSweep rollSweep(double maxRoll, double step) {
        java.util.List<RollState> states = new java.util.ArrayList<>();
        states.add(roll(0));
        for (int k = 1; ; k++) {
            double roll = Math.min(k * step, maxRoll);
            try {
                states.add(roll(roll));
            } catch (LinkageLimitException beyond) {
                return new RollSweep(states, beyond.limit().reason(), beyond.limit().locks());
            }
            if (roll >= maxRoll) {
                return new RollSweep(states, null, false);
            }
        }
    }

    /** @return the static kinematic roll centre at the ride height */
    default RollState atRideHeight() {
        return roll(0);
    }
}
