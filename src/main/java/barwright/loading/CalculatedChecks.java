package barwright.loading;

import barwright.io.BuildChecks;
import barwright.io.KeyPath;
import barwright.io.Problem;
import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.physics.LinkageSoundness;
import barwright.physics.beam.BeamBuildCheck;

import java.util.List;
import java.util.Locale;

import static barwright.io.VehicleKeys.GEOMETRY;
import static barwright.io.VehicleKeys.HOLE_SETBACKS_MM;
import static barwright.io.VehicleKeys.LINKAGE;
import static barwright.io.VehicleKeys.RIDE_HEIGHT_CHANGE_MM;

/** The physics side's findings on a shaped bar and a linkage, worded as vehicle-file problems with key paths. */
final class CalculatedChecks implements BuildChecks {
    static final CalculatedChecks INSTANCE = new CalculatedChecks();

    private CalculatedChecks() {
    }

    @Override
    public List<Problem> ofShapedBar(AntiRollBar bar, String barPath) {
        return BeamBuildCheck.firstUnbuildableHole(bar).map(unbuildable -> {
            String which = bar.holeCount() > 1 ? " (with hole " + unbuildable.hole() + ", " + HOLE_SETBACKS_MM
                    + "[" + unbuildable.hole() + "])" : "";
            return List.of(new Problem(KeyPath.of(barPath).child(GEOMETRY).toString(), "cannot be built into a beam model"
                    + which + ": " + unbuildable.reason()));
        }).orElse(List.of());
    }

    @Override
    public List<Problem> ofLinkage(Axle axle, String axlePath) {
        String path = KeyPath.of(axlePath).child(LINKAGE).toString();
        return LinkageSoundness.check(axle).stream().map(finding -> {
            if (finding instanceof LinkageSoundness.CannotAssemble cannot) {
                double change = axle.suspension().rideHeightChange();
                return change != 0
                        ? new Problem(KeyPath.of(axlePath).child(RIDE_HEIGHT_CHANGE_MM).toString(), "= " + mm(change)
                        + ": the linkage cannot be put together at this ride height (" + cannot.reason() + ")")
                        : new Problem(path, "cannot be put together: " + cannot.reason());
            }
            if (finding instanceof LinkageSoundness.LocksEarly locks) {
                return new Problem(path, "locks after " + mm(Math.abs(locks.travel())) + " of "
                        + (locks.bump() ? "bump" : "droop") + " (" + locks.reason() + "): a suspension needs at least "
                        + mm(LinkageSoundness.MINIMUM_TRAVEL) + " each way from its ride height");
            }
            LinkageSoundness.InstantCentreOverContact over = (LinkageSoundness.InstantCentreOverContact) finding;
            return new Problem(path, "puts the front-view instant centre " + mm(over.swingArm())
                    + " from straight above or below the tyre contact point: no real linkage does; check the points");
        }).toList();
    }

    private static String mm(double metres) {
        return String.format(Locale.ROOT, "%.0f mm", metres * 1e3);
    }
}
