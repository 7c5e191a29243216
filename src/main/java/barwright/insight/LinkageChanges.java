package barwright.insight;

import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.DoubleWishbone;
import barwright.model.FrontViewPoint;
import barwright.model.Linkage;
import barwright.model.LiveAxlePanhard;
import barwright.model.LiveAxleWatts;
import barwright.model.Point3;
import barwright.model.SemiTrailingArm;
import barwright.model.Strut;
import barwright.model.SuspensionGeometry;
import barwright.model.TrailingArm;
import barwright.model.Vehicle;
import barwright.units.Quantity;

import java.util.List;

/**
 * The linkage settings of the sensitivity list: 10 mm of a pickup point's height (the one a setter shims: a
 * lower arm's inner pivot, a Panhard rod, a Watt's centre pivot, a trailing arm's pivots) and 10 mm of ride
 * height, for each axle with a linkage.
 */
final class LinkageChanges {
    /** Step of a pickup point's height and of the ride height (m). */
    static final double STEP = 10e-3;

    private LinkageChanges() {
    }

    static void add(Vehicle vehicle, AxlePosition position, List<InputChange> changes) {
        Axle axle = vehicle.axle(position);
        if (!axle.hasLinkage()) {
            return;
        }
        String end = position.key();
        SuspensionGeometry suspension = axle.suspension();
        Linkage linkage = suspension.linkage();
        double height = pickupHeight(linkage);
        changes.add(new InputChange(end + "PickupPointHeight", end + " " + pickupName(linkage) + " height",
                end + " " + pickupName(linkage) + " 10 mm higher", Quantity.LENGTH, height, height + STEP,
                v -> v.withAxle(position, v.axle(position).withSuspension(suspension.withLinkage(raised(linkage))))));
        double ride = suspension.rideHeightChange();
        changes.add(new InputChange(end + "RideHeight", end + " ride height (change from the measured one)",
                end + " ride height 10 mm higher", Quantity.LENGTH, ride, ride + STEP,
                v -> v.withAxle(position, v.axle(position).withSuspension(suspension.withRideHeightChange(ride + STEP)))));
    }

    private static String pickupName(Linkage linkage) {
        if (linkage instanceof LiveAxlePanhard) {
            return "Panhard rod (both ends)";
        }
        if (linkage instanceof LiveAxleWatts) {
            return "Watt's linkage centre pivot";
        }
        if (linkage instanceof TrailingArm || linkage instanceof SemiTrailingArm) {
            return "arm pivots";
        }
        return "lower arm's inner pivot";
    }

    /** @return the height of the point that is raised (m); for two points, the first */
    private static double pickupHeight(Linkage linkage) {
        if (linkage instanceof DoubleWishbone arms) {
            return arms.lowerInner().z();
        }
        if (linkage instanceof Strut strut) {
            return strut.lowerInner().z();
        }
        if (linkage instanceof LiveAxlePanhard rod) {
            return rod.bodyEnd().z();
        }
        if (linkage instanceof LiveAxleWatts watts) {
            return watts.centrePivotHeight();
        }
        if (linkage instanceof TrailingArm arm) {
            return arm.pivotInner().z();
        }
        return ((SemiTrailingArm) linkage).pivotInner().z();
    }

    private static Linkage raised(Linkage linkage) {
        if (linkage instanceof DoubleWishbone arms) {
            return new DoubleWishbone(arms.upperInner(), arms.upperOuter(), up(arms.lowerInner()), arms.lowerOuter());
        }
        if (linkage instanceof Strut strut) {
            return new Strut(strut.strutTop(), strut.strutLower(), up(strut.lowerInner()), strut.lowerOuter());
        }
        if (linkage instanceof LiveAxlePanhard rod) {
            return new LiveAxlePanhard(up(rod.bodyEnd()), up(rod.axleEnd()));
        }
        if (linkage instanceof LiveAxleWatts watts) {
            return new LiveAxleWatts(watts.centrePivotHeight() + STEP, watts.centrePivotMount());
        }
        if (linkage instanceof TrailingArm arm) {
            return new TrailingArm(up(arm.pivotInner()), up(arm.pivotOuter()));
        }
        SemiTrailingArm arm = (SemiTrailingArm) linkage;
        return new SemiTrailingArm(up(arm.pivotInner()), up(arm.pivotOuter()));
    }

    private static FrontViewPoint up(FrontViewPoint point) {
        return new FrontViewPoint(point.y(), point.z() + STEP);
    }

    private static Point3 up(Point3 point) {
        return new Point3(point.x(), point.y(), point.z() + STEP);
    }
}
