package barwright.physics.linkage;

import barwright.model.FrontViewPoint;
import barwright.model.Point3;
import org.apache.commons.math3.geometry.euclidean.threed.Rotation;
import org.apache.commons.math3.geometry.euclidean.threed.RotationConvention;
import org.apache.commons.math3.geometry.euclidean.threed.Vector3D;

import java.util.List;

/**
 * A trailing or semi-trailing arm: the wheel turns with the arm about its pivot axis, fixed in the body. The
 * coordinate is the arm's angle about the axis. The front-view instant centre is where the pivot axis crosses
 * the transverse plane through the wheel centre (x = 0); it is fixed in the body. The contact point's small
 * fore-and-aft movement is left out of the front view.
 */
final class SwingingArmSide implements SideLinkage {
    private final Vector3D pivot;
    private final Vector3D axis;
    private final Vector3D contact;
    private final InstantCentre centre;

    SwingingArmSide(Point3 pivotInner, Point3 pivotOuter, FrontViewPoint contactPoint) {
        pivot = new Vector3D(pivotInner.x(), pivotInner.y(), pivotInner.z());
        axis = new Vector3D(pivotOuter.x() - pivotInner.x(), pivotOuter.y() - pivotInner.y(),
                pivotOuter.z() - pivotInner.z()).normalize();
        contact = new Vector3D(0, contactPoint.y(), contactPoint.z());
        // the axis P + u D crosses x = 0 at u = -P_x / D_x: homogeneous (P_y D_x - P_x D_y, P_z D_x - P_x D_z, D_x)
        centre = InstantCentre.of(new double[] {
                pivot.getY() * axis.getX() - pivot.getX() * axis.getY(),
                pivot.getZ() * axis.getX() - pivot.getX() * axis.getZ(),
                axis.getX()});
    }

    @Override
    public double staticCoordinate() {
        return 0;
    }

    @Override
    public double[] contactAt(double angle) {
        Vector3D moved = pivot.add(new Rotation(axis, angle, RotationConvention.VECTOR_OPERATOR)
                .applyTo(contact.subtract(pivot)));
        return new double[] {moved.getY(), moved.getZ()};
    }

    @Override
    public SidePose poseAt(double angle) {
        Rotation turn = new Rotation(axis, angle, RotationConvention.VECTOR_OPERATOR);
        Vector3D moved = pivot.add(turn.applyTo(contact.subtract(pivot)));
        Vector3D spin = turn.applyTo(Vector3D.PLUS_J);
        double rotation = Math.atan2(spin.getZ(), spin.getY());
        FrontViewPoint movedContact = new FrontViewPoint(moved.getY(), moved.getZ());
        return new SidePose(moved.getZ() - contact.getZ(), movedContact, rotation, centre, List.of());
    }

    @Override
    public String whyItLocks() {
        return "the arm swings past straight down";
    }
}
