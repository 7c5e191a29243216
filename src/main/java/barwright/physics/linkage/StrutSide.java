package barwright.physics.linkage;

import barwright.model.FrontViewPoint;
import barwright.model.Strut;

import java.util.List;

/**
 * A strut's loop closure with the lower arm's angle given: the strut's axis, fixed to the upright, passes
 * through the top mount and keeps its perpendicular distance from the lower ball joint, so its direction follows
 * in closed form; the upright is rigid.
 */
final class StrutSide implements SideLinkage {
    private final Strut points;
    private final FrontViewPoint contact;
    private final double lowerArm;
    private final double offset;
    private final double staticAngle;
    private final double staticAxisAngle;

    StrutSide(Strut points, FrontViewPoint contact) {
        this.points = points;
        this.contact = contact;
        FrontViewPoint top = points.strutTop();
        FrontViewPoint lower = points.strutLower();
        FrontViewPoint lo = points.lowerOuter();
        lowerArm = points.lowerInner().distanceTo(lo);
        double length = top.distanceTo(lower);
        double axisY = (lower.y() - top.y()) / length;
        double axisZ = (lower.z() - top.z()) / length;
        offset = Plane.crossZ(axisY, axisZ, lo.y() - top.y(), lo.z() - top.z());
        staticAngle = Math.atan2(lo.z() - points.lowerInner().z(), lo.y() - points.lowerInner().y());
        staticAxisAngle = Math.atan2(axisZ, axisY);
    }

    @Override
    public double staticCoordinate() {
        return staticAngle;
    }

    @Override
    public double[] contactAt(double angle) {
        double rotation = rotationAt(angle);
        if (Double.isNaN(rotation)) {
            return null;
        }
        FrontViewPoint li = points.lowerInner();
        double loY = li.y() + lowerArm * Math.cos(angle);
        double loZ = li.z() + lowerArm * Math.sin(angle);
        return Plane.plusRotated(loY, loZ, contact.y() - points.lowerOuter().y(), contact.z() - points.lowerOuter().z(),
                rotation);
    }

    /** @return the upright's rotation at the lower arm's angle, NaN (internal only) where it cannot be put together */
    private double rotationAt(double angle) {
        FrontViewPoint li = points.lowerInner();
        FrontViewPoint top = points.strutTop();
        double loY = li.y() + lowerArm * Math.cos(angle);
        double loZ = li.z() + lowerArm * Math.sin(angle);
        double vy = loY - top.y();
        double vz = loZ - top.z();
        double reach = Math.sqrt(vy * vy + vz * vz);
        if (!(reach > Math.abs(offset))) {
            return Double.NaN;
        }
        double axisAngle = Math.atan2(vz, vy) - Math.asin(offset / reach);
        double rotation = axisAngle - staticAxisAngle;
        double[] lower = Plane.plusRotated(loY, loZ, points.strutLower().y() - points.lowerOuter().y(),
                points.strutLower().z() - points.lowerOuter().z(), rotation);
        double extension = (lower[0] - top.y()) * Math.cos(axisAngle) + (lower[1] - top.z()) * Math.sin(axisAngle);
        return extension > 0 ? rotation : Double.NaN;
    }

    @Override
    public SidePose poseAt(double angle) {
        FrontViewPoint li = points.lowerInner();
        FrontViewPoint top = points.strutTop();
        FrontViewPoint lo = new FrontViewPoint(li.y() + lowerArm * Math.cos(angle), li.z() + lowerArm * Math.sin(angle));
        double vy = lo.y() - top.y();
        double vz = lo.z() - top.z();
        double reach = Math.hypot(vy, vz);
        if (!(reach > Math.abs(offset))) {
            return null;
        }
        // cross(axis, v) = reach sin(angle(v) - angle(axis)) = offset, on the branch where the axis points at v
        double axisAngle = Math.atan2(vz, vy) - Math.asin(offset / reach);
        double rotation = Plane.wrap(axisAngle - staticAxisAngle);
        FrontViewPoint lower = Plane.plusRotated(lo, points.strutLower().y() - points.lowerOuter().y(),
                points.strutLower().z() - points.lowerOuter().z(), rotation);
        double extension = (lower.y() - top.y()) * Math.cos(axisAngle) + (lower.z() - top.z()) * Math.sin(axisAngle);
        if (!(extension > 0)) {
            return null; // the strut's lower point would pass its top mount
        }
        FrontViewPoint movedContact = Plane.plusRotated(lo, contact.y() - points.lowerOuter().y(),
                contact.z() - points.lowerOuter().z(), rotation);
        double[] lowerLine = Plane.line(Plane.point(li), Plane.point(lo));
        // the top mount moves along the strut's axis: its line of motion seen by the upright is square to the axis
        double[] topLine = Plane.lineThrough(top, -Math.sin(axisAngle), Math.cos(axisAngle));
        InstantCentre centre = InstantCentre.of(Plane.meet(topLine, lowerLine));
        return new SidePose(movedContact.z() - contact.z(), movedContact, rotation, centre, List.of(lower, lo));
    }

    @Override
    public String whyItLocks() {
        return "the lower arm and the strut come into line, or the strut closes up";
    }
}
