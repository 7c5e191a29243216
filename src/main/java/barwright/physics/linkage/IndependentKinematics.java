package barwright.physics.linkage;

import barwright.model.FrontViewPoint;
import barwright.model.SuspensionGeometry;
import barwright.solver.RootFinder;

/**
 * An axle with two independent, mirror-image sides. Kinematic roll: with wheel travels s_0 - s (left) and
 * s_0 + s (right) in the body's axes, rolling the body by phi puts both contact points on the ground when
 * s = tan(phi) (y_c(s_0 - s) + y_c(s_0 + s)) / 2, y_c being a contact point's distance from the centreline;
 * that equation is solved for s by Brent's method. The roll centre is where the lines from each contact point
 * through its side's instant centre meet (Milliken and Milliken, Race Car Vehicle Dynamics, ch. 17, from memory).
 */
final class IndependentKinematics implements AxleKinematics {
    /** Accuracy of the solved wheel travel in roll (m). */
    static final double TRAVEL_ACCURACY = 1e-12;
    private static final RootFinder TRAVEL_ROOT =
            RootFinder.of("the wheel travel of a body roll", TRAVEL_ACCURACY, 200);
    /** Contact points closer to a line than this lie on it (m). */
    private static final double ON_LINE = 1e-9;
    /** How far inside the end of the followed travel a sweep stops (m), so rounding never steps past it. */
    private static final double INSIDE_END = 1e-9;

    private final SideSolver side;
    private final double track;
    private final double baseTravel;
    private final double staticCamber;
    private final SidePose rideHeight;
    private final double rideHeightContactY;

    IndependentKinematics(SideLinkage linkage, double track, SuspensionGeometry suspension) {
        this.side = new SideSolver(linkage);
        this.track = track;
        // lowering the body by d moves each wheel d into bump
        this.baseTravel = -suspension.rideHeightChange();
        this.staticCamber = suspension.staticCamber();
        this.rideHeight = side.pose(baseTravel);
        this.rideHeightContactY = rideHeight.contact().y();
    }

    @Override
    public TravelLimit bumpLimit() {
        return new TravelLimit(side.bumpLimit().travel() - baseTravel, side.bumpLimit().reason());
    }

    @Override
    public TravelLimit droopLimit() {
        return new TravelLimit(side.droopLimit().travel() - baseTravel, side.droopLimit().reason());
    }

    @Override
    public TravelState travel(double travel) {
        SidePose pose = pose(baseTravel + travel);
        InstantCentre centre = pose.instantCentre();
        InstantCentre aboveGround = centre.atInfinity() ? centre
                : new InstantCentre(centre.y(), centre.z() - baseTravel, false);
        return new TravelState(travel, staticCamber - pose.uprightRotation(), 2 * pose.contact().y(), aboveGround,
                pose.contact().y());
    }

    private SidePose pose(double travel) {
        try {
            return side.pose(travel);
        } catch (LinkageLimitException beyond) {
            TravelLimit limit = beyond.limit();
            throw new LinkageLimitException(travel - baseTravel,
                    new TravelLimit(limit.travel() - baseTravel, limit.reason()));
        }
    }

    @Override
    public RollState roll(double roll) {
        if (roll < 0) {
            return roll(-roll).mirrored();
        }
        double tan = Math.tan(roll);
        double reach = Math.min(side.bumpLimit().travel() - baseTravel, baseTravel - side.droopLimit().travel());
        double s = 0;
        if (roll > 0) {
            double atReach = closure(reach, tan);
            if (atReach > 0) {
                // a wheel would have to go past the limit: say which
                boolean bumpFirst = side.bumpLimit().travel() - baseTravel <= baseTravel - side.droopLimit().travel();
                double wanted = reach + atReach;
                pose(bumpFirst ? baseTravel + wanted : baseTravel - wanted);
            }
            // search 20 % either side of the small-roll guess first, where the closure changes sign there
            double guess = tan * rideHeightContactY;
            double low = Math.max(0, guess * 0.8);
            double high = Math.min(reach, guess * 1.2);
            boolean narrow = low < high && closure(low, tan) * closure(high, tan) <= 0;
            s = TRAVEL_ROOT.solve(x -> closure(x, tan), narrow ? low : 0, narrow ? high : reach);
        }
        return state(roll, s);
    }

    /**
     * The sweep follows the wheel travel s instead of the roll: for a given s the roll that puts both contact
     * points on the ground is explicit, tan(phi) = 2 s / (y_c(s_0 - s) + y_c(s_0 + s)) (the closure above, solved
     * for phi), so each state costs two travel solves instead of a root search over s. The travels are spaced
     * so that the rolls come about {@code step} apart (s = tan(k step) y_c at rest).
     */
    @Override
    public RollSweep rollSweep(double maxRoll, double step) {
        double bump = side.bumpLimit().travel() - baseTravel;
        double droop = baseTravel - side.droopLimit().travel();
        TravelLimit binding = bump <= droop ? side.bumpLimit() : side.droopLimit();
        // a hair inside the end of the followed motion, so that rounding never asks for a travel past it
        double reach = Math.min(bump, droop) - INSIDE_END;
        java.util.List<RollState> states = new java.util.ArrayList<>();
        states.add(state(0, 0));
        double lastRoll = 0;
        for (int k = 1; ; k++) {
            double s = Math.min(reach, Math.tan(Math.min(k * step, Math.PI / 4)) * rideHeightContactY);
            if (!(s > 0)) {
                return new RollSweep(states, binding.reason(), binding.locks());
            }
            double roll = Math.atan(2 * s / (side.contactY(baseTravel - s) + side.contactY(baseTravel + s)));
            if (!(roll > lastRoll)) {
                return new RollSweep(states, "the body cannot roll further with both tyres on the ground", true);
            }
            states.add(state(roll, s));
            lastRoll = roll;
            if (roll >= maxRoll) {
                return new RollSweep(states, null, false);
            }
            if (s >= reach) {
                return new RollSweep(states, binding.reason(), binding.locks());
            }
        }
    }

    /** The loop closure of the two contact points on the ground: zero at the wheel travel s of the roll. */
    private double closure(double s, double tan) {
        double left = side.contactY(baseTravel - s);
        double right = side.contactY(baseTravel + s);
        return tan * (left + right) / 2 - s;
    }

    private RollState state(double roll, double s) {
        SidePose left = side.pose(baseTravel - s);
        SidePose right = side.pose(baseTravel + s);
        double cos = Math.cos(roll);
        double sin = Math.sin(roll);
        FrontViewPoint leftBody = left.contact();
        FrontViewPoint rightBody = new FrontViewPoint(-right.contact().y(), right.contact().z());
        // body to road: p_road = R(roll) p_body + (lateral, height), with the left contact point on the ground
        double height = -(sin * leftBody.y() + cos * leftBody.z());
        double leftRoadY = cos * leftBody.y() - sin * leftBody.z();
        double rightRoadY = cos * rightBody.y() - sin * rightBody.z();
        double lateral = -(leftRoadY + rightRoadY) / 2;
        FrontViewPoint leftContact = new FrontViewPoint(leftRoadY + lateral, 0);
        FrontViewPoint rightContact = new FrontViewPoint(rightRoadY + lateral, 0);
        double[] leftLine = roadLine(left.instantCentre(), leftContact, roll, lateral, height, false);
        double[] rightLine = roadLine(right.instantCentre(), rightContact, roll, lateral, height, true);
        double roadTrack = leftContact.y() - rightContact.y();
        // slopes rising towards the car's centre: left line dz/dy = -a/b, rising inward is minus that
        double leftSlope = leftLine[0] / leftLine[1];
        double rightSlope = -rightLine[0] / rightLine[1];
        double loadTransferHeight = roadTrack * (leftSlope + rightSlope) / 4;
        RollCentre centre = meet(leftLine, rightLine, rightContact);
        double leftCamber = staticCamber - roll - left.uprightRotation();
        double rightCamber = staticCamber + roll - right.uprightRotation();
        return new RollState(roll, centre, loadTransferHeight, leftCamber, rightCamber, roadTrack,
                height + baseTravel, lateral, s);
    }

    /** @return the normalised road-axes line from a contact point through its side's instant centre */
    private static double[] roadLine(InstantCentre centre, FrontViewPoint contactRoad,
                                     double roll, double lateral, double height, boolean mirror) {
        double[] h = centre.homogeneous();
        double y = mirror ? -h[0] : h[0];
        double z = h[1];
        double cos = Math.cos(roll);
        double sin = Math.sin(roll);
        double[] road = {cos * y - sin * z + lateral * h[2], sin * y + cos * z + height * h[2], h[2]};
        return Plane.line(Plane.point(contactRoad), road);
    }

    private static RollCentre meet(double[] left, double[] right, FrontViewPoint rightContact) {
        double[] point = Plane.meet(left, right);
        if (Math.abs(point[2]) <= InstantCentre.PARALLEL_SINE) {
            double distance = left[0] * rightContact.y() + left[1] * rightContact.z() + left[2];
            // one line through both contact points is the ground itself: the roll centre is on the ground,
            // at the mid-point by symmetry; otherwise the lines are parallel and there is no roll centre
            return Math.abs(distance) <= ON_LINE ? new RollCentre(0, 0) : null;
        }
        return new RollCentre(point[1] / point[2], point[0] / point[2]);
    }
}
