package barwright.physics.linkage;

import barwright.model.FrontViewPoint;
import barwright.model.LiveAxleWatts;
import barwright.model.LiveAxlePanhard;
import barwright.model.SuspensionGeometry;

/**
 * A beam axle: both contact points stay on the ground with the axle, so the wheels keep their camber to the
 * road, and the body rolls relative to the axle. The wheel travels are equal and opposite (the axle's
 * mid-point keeps its height in the body's axes); the sideways location fixes the rest. The roll centre is
 * where the Panhard rod's line crosses the body's centreline, or the Watt's linkage's centre pivot (Milliken and
 * Milliken, Race Car Vehicle Dynamics, ch. 17, from memory). The Watt's linkage is taken as ideal: its centre
 * pivot moves straight up and down relative to the part that does not carry it.
 */
final class LiveAxleKinematics implements AxleKinematics {
    private final double track;
    private final double baseTravel;
    private final double staticCamber;
    private final Locator locator;

    /** The sideways location: the body's lateral position for a roll, and the roll centre. */
    private interface Locator {
        /** @return {lateral Y, roll-centre height, roll-centre lateral position} in road axes for the roll */
        double[] locate(double roll, double baseTravel);
    }

    private LiveAxleKinematics(double track, SuspensionGeometry suspension, Locator locator) {
        this.track = track;
        this.baseTravel = -suspension.rideHeightChange();
        this.staticCamber = suspension.staticCamber();
        this.locator = locator;
    }

    static LiveAxleKinematics panhard(LiveAxlePanhard rod, double track, SuspensionGeometry suspension) {
        FrontViewPoint body = rod.bodyEnd();
        FrontViewPoint axle = rod.axleEnd();
        double length = body.distanceTo(axle);
        return new LiveAxleKinematics(track, suspension, (roll, base) -> {
            double cos = Math.cos(roll);
            double sin = Math.sin(roll);
            double tan = sin / cos;
            // the body's height Z = (sin Y - s0) / cos; the rod keeps its length: a quadratic in Y
            double ky = cos * body.y() - sin * body.z() - axle.y();
            double kz = sin * body.y() + cos * body.z() - base / cos - axle.z();
            double a = 1 + tan * tan;
            double b = 2 * (ky + kz * tan);
            double c = ky * ky + kz * kz - length * length;
            double discriminant = b * b - 4 * a * c;
            if (discriminant < 0) {
                throw new LinkageLimitException(0, new TravelLimit(0, "the Panhard rod cannot reach its axle end"));
            }
            double q = -(b + Math.copySign(Math.sqrt(discriminant), b)) / 2;
            double first = q / a;
            double second = q == 0 ? first : c / q;
            double lateral = Math.abs(first) < Math.abs(second) ? first : second;
            double height = (sin * lateral - base) / cos;
            // the rod's line in road axes, and the body's centreline through (lateral, height)
            double[] bodyEnd = {cos * body.y() - sin * body.z() + lateral, sin * body.y() + cos * body.z() + height, 1};
            double[] rodLine = Plane.line(bodyEnd, new double[] {axle.y(), axle.z(), 1});
            double[] centreline = Plane.line(new double[] {lateral, height, 1}, new double[] {-sin, cos, 0});
            double[] centre = Plane.meet(rodLine, centreline);
            return new double[] {lateral, centre[1] / centre[2], centre[0] / centre[2]};
        });
    }

    static LiveAxleKinematics watts(LiveAxleWatts watts, double track, SuspensionGeometry suspension) {
        double pivot = watts.centrePivotHeight();
        if (watts.centrePivotMount() == LiveAxleWatts.Mount.BODY) {
            // the body's pivot stays over the axle's centre
            return new LiveAxleKinematics(track, suspension, (roll, base) -> {
                double lateral = pivot * Math.sin(roll);
                double height = (Math.sin(roll) * lateral - base) / Math.cos(roll);
                return new double[] {lateral, Math.cos(roll) * pivot + height, 0};
            });
        }
        // the axle's pivot stays on the body's centreline
        return new LiveAxleKinematics(track, suspension, (roll, base) -> {
            double along = pivot * Math.cos(roll) + base;
            return new double[] {along * Math.sin(roll), pivot, 0};
        });
    }

    @Override
    public TravelState travel(double travel) {
        if (Math.abs(travel) >= track) {
            throw new LinkageLimitException(travel, new TravelLimit(Math.copySign(track, travel) * 0.999,
                    "one wheel cannot rise a whole track above the other"));
        }
        // one wheel moves, the other stays: the axle turns about the other wheel's contact point
        double turn = Math.asin(travel / track);
        return new TravelState(travel, staticCamber - turn, track, new InstantCentre(-track / 2, 0, false),
                track / 2);
    }

    @Override
    public RollState roll(double roll) {
        double[] located = locator.locate(roll, baseTravel);
        double cos = Math.cos(roll);
        double sin = Math.sin(roll);
        double lateral = located[0];
        double height = (sin * lateral - baseTravel) / cos;
        // the right contact point (-t/2, 0) in the body's axes: its height there, less the ride height's
        double rightTravel = sin * (track / 2 + lateral) - cos * height - baseTravel;
        RollCentre centre = new RollCentre(located[1], located[2]);
        return new RollState(roll, centre, located[1], staticCamber, staticCamber, track, height + baseTravel,
                lateral, rightTravel);
    }

    @Override
    public TravelLimit bumpLimit() {
        return new TravelLimit(track, TravelLimit.BEYOND_RANGE);
    }

    @Override
    public TravelLimit droopLimit() {
        return new TravelLimit(-track, TravelLimit.BEYOND_RANGE);
    }
}
