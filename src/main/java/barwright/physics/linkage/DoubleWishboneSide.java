package barwright.physics.linkage;

import barwright.model.DoubleWishbone;
import barwright.model.FrontViewPoint;

import java.util.List;

/**
 * A double wishbone's loop closure with the lower arm's angle given: the lower ball joint lies on its arm's
 * circle, the upper ball joint where the upper arm's circle meets the circle of the upright about the lower ball
 * joint (the branch of the measured assembly), and the upright is rigid.
 */
final class DoubleWishboneSide implements SideLinkage {
    private final DoubleWishbone points;
    private final FrontViewPoint contact;
    private final double lowerArm;
    private final double upperArm;
    private final double upright;
    private final double branch;
    private final double staticAngle;
    private final double staticUprightAngle;

    /** @param contact the tyre contact point at the measured ride height (m) */
    DoubleWishboneSide(DoubleWishbone points, FrontViewPoint contact) {
        this.points = points;
        this.contact = contact;
        FrontViewPoint li = points.lowerInner();
        FrontViewPoint lo = points.lowerOuter();
        FrontViewPoint ui = points.upperInner();
        FrontViewPoint uo = points.upperOuter();
        lowerArm = li.distanceTo(lo);
        upperArm = ui.distanceTo(uo);
        upright = lo.distanceTo(uo);
        branch = Math.signum(Plane.crossZ(ui.y() - lo.y(), ui.z() - lo.z(), uo.y() - lo.y(), uo.z() - lo.z()));
        staticAngle = Math.atan2(lo.z() - li.z(), lo.y() - li.y());
        staticUprightAngle = Math.atan2(uo.z() - lo.z(), uo.y() - lo.y());
    }

    @Override
    public double staticCoordinate() {
        return staticAngle;
    }

    @Override
    public double[] contactAt(double angle) {
        FrontViewPoint li = points.lowerInner();
        double loY = li.y() + lowerArm * Math.cos(angle);
        double loZ = li.z() + lowerArm * Math.sin(angle);
        double[] uo = Circles.meet(loY, loZ, upright, points.upperInner().y(), points.upperInner().z(), upperArm, branch);
        if (uo == null) {
            return null;
        }
        double rotation = Math.atan2(uo[1] - loZ, uo[0] - loY) - staticUprightAngle;
        return Plane.plusRotated(loY, loZ, contact.y() - points.lowerOuter().y(), contact.z() - points.lowerOuter().z(),
                rotation);
    }

    @Override
    public SidePose poseAt(double angle) {
        FrontViewPoint li = points.lowerInner();
        FrontViewPoint ui = points.upperInner();
        FrontViewPoint lo = new FrontViewPoint(li.y() + lowerArm * Math.cos(angle), li.z() + lowerArm * Math.sin(angle));
        FrontViewPoint uo = Circles.meet(lo, upright, ui, upperArm, branch);
        if (uo == null) {
            return null;
        }
        double rotation = Plane.wrap(Math.atan2(uo.z() - lo.z(), uo.y() - lo.y()) - staticUprightAngle);
        FrontViewPoint movedContact = Plane.plusRotated(lo, contact.y() - points.lowerOuter().y(),
                contact.z() - points.lowerOuter().z(), rotation);
        double[] upperLine = Plane.line(Plane.point(ui), Plane.point(uo));
        double[] lowerLine = Plane.line(Plane.point(li), Plane.point(lo));
        InstantCentre centre = InstantCentre.of(Plane.meet(upperLine, lowerLine));
        return new SidePose(movedContact.z() - contact.z(), movedContact, rotation, centre, List.of(uo, lo));
    }

    @Override
    public String whyItLocks() {
        return "the upper arm and the upright come into line";
    }
}
