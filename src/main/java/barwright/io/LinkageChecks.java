package barwright.io;

import barwright.model.Axle;
import barwright.model.DoubleWishbone;
import barwright.model.FrontViewPoint;
import barwright.model.Linkage;
import barwright.model.LiveAxlePanhard;
import barwright.model.Point3;
import barwright.model.SemiTrailingArm;
import barwright.model.Strut;
import barwright.model.TrailingArm;

import java.util.Locale;

import static barwright.io.VehicleKeys.LINKAGE;
import static barwright.io.VehicleKeys.LOWER_INNER_MM;
import static barwright.io.VehicleKeys.LOWER_OUTER_MM;
import static barwright.io.VehicleKeys.PANHARD_AXLE_MM;
import static barwright.io.VehicleKeys.PIVOT_INNER_MM;
import static barwright.io.VehicleKeys.PIVOT_OUTER_MM;
import static barwright.io.VehicleKeys.STRUT_LOWER_MM;
import static barwright.io.VehicleKeys.STRUT_TOP_MM;
import static barwright.io.VehicleKeys.UPPER_INNER_MM;
import static barwright.io.VehicleKeys.UPPER_OUTER_MM;

/**
 * The checks of a linkage that need more than one value: points on the wrong side, arms that cross, links too
 * short to be links; then, where those pass, the reader's {@link BuildChecks} (a linkage that cannot be put
 * together at its ride height or locks near it). Each problem names the key path of the point or setting to
 * change.
 */
final class LinkageChecks {
    /** Shortest link accepted (m): closer points are a typing slip, not a link. */
    static final double SHORTEST_LINK = 0.020;
    /** A trailing arm's pivot axis is square to the car within this fore-and-aft difference (m). */
    static final double SQUARE = 0.001;

    private LinkageChecks() {
    }

    static void check(Axle axle, String axlePath, NodeReader reader) {
        String path = NodeReader.child(axlePath, LINKAGE);
        int before = reader.problems().size();
        Linkage linkage = axle.suspension().linkage();
        if (linkage instanceof DoubleWishbone arms) {
            doubleWishbone(arms, path, reader);
        } else if (linkage instanceof Strut strut) {
            strut(strut, path, reader);
        } else if (linkage instanceof LiveAxlePanhard rod) {
            panhard(rod, path, reader);
        } else if (linkage instanceof TrailingArm arm) {
            pivotAxis(arm.pivotInner(), arm.pivotOuter(), path, reader);
            if (Math.abs(arm.pivotInner().x() - arm.pivotOuter().x()) > SQUARE) {
                reader.problem(NodeReader.child(path, PIVOT_OUTER_MM), "is not square to the car (its x differs from pivotInnerMm's by "
                        + mm(arm.pivotOuter().x() - arm.pivotInner().x()) + "): a swept pivot axis is a "
                        + "\"semi-trailing-arm\"");
            }
        } else if (linkage instanceof SemiTrailingArm arm) {
            pivotAxis(arm.pivotInner(), arm.pivotOuter(), path, reader);
            if (Math.abs(arm.pivotInner().x() - arm.pivotOuter().x()) <= SQUARE) {
                reader.problem(NodeReader.child(path, PIVOT_OUTER_MM), "has the same x as pivotInnerMm: a pivot axis square to the car "
                        + "is a \"trailing-arm\"");
            }
        }
        if (reader.problems().size() == before) {
            reader.problems(reader.buildChecks().ofLinkage(axle, axlePath));
        }
    }

    private static void doubleWishbone(DoubleWishbone arms, String path, NodeReader reader) {
        onLeftSide(arms.upperInner(), NodeReader.child(path, UPPER_INNER_MM), reader);
        onLeftSide(arms.lowerInner(), NodeReader.child(path, LOWER_INNER_MM), reader);
        outboard(arms.upperInner(), arms.upperOuter(), NodeReader.child(path, UPPER_OUTER_MM), UPPER_INNER_MM, reader);
        outboard(arms.lowerInner(), arms.lowerOuter(), NodeReader.child(path, LOWER_OUTER_MM), LOWER_INNER_MM, reader);
        above(arms.upperOuter(), arms.lowerOuter(), NodeReader.child(path, UPPER_OUTER_MM), "the upper ball joint", LOWER_OUTER_MM, reader);
        above(arms.upperInner(), arms.lowerInner(), NodeReader.child(path, UPPER_INNER_MM), "the upper arm's pivot", LOWER_INNER_MM, reader);
        if (crosses(arms.upperInner(), arms.upperOuter(), arms.lowerInner(), arms.lowerOuter())) {
            reader.problem(path, "has its upper and lower arms crossing each other: check upperInnerMm and lowerInnerMm");
        }
    }

    private static void strut(Strut strut, String path, NodeReader reader) {
        onLeftSide(strut.lowerInner(), NodeReader.child(path, LOWER_INNER_MM), reader);
        onLeftSide(strut.strutTop(), NodeReader.child(path, STRUT_TOP_MM), reader);
        outboard(strut.lowerInner(), strut.lowerOuter(), NodeReader.child(path, LOWER_OUTER_MM), LOWER_INNER_MM, reader);
        above(strut.strutTop(), strut.strutLower(), NodeReader.child(path, STRUT_TOP_MM), "the top mount", STRUT_LOWER_MM, reader);
        above(strut.strutTop(), strut.lowerOuter(), NodeReader.child(path, STRUT_TOP_MM), "the top mount", LOWER_OUTER_MM, reader);
        double dy = strut.strutLower().y() - strut.strutTop().y();
        double dz = strut.strutLower().z() - strut.strutTop().z();
        if (Math.abs(dy) > Math.abs(dz)) {
            reader.problem(NodeReader.child(path, STRUT_LOWER_MM), "makes the strut lean more than 45 degrees from upright: the strut's "
                    + "axis runs from strutTopMm through strutLowerMm");
        }
    }

    private static void panhard(LiveAxlePanhard rod, String path, NodeReader reader) {
        double dy = rod.axleEnd().y() - rod.bodyEnd().y();
        double dz = rod.axleEnd().z() - rod.bodyEnd().z();
        if (Math.hypot(dy, dz) < 0.2) {
            reader.problem(NodeReader.child(path, PANHARD_AXLE_MM), "is " + mm(Math.hypot(dy, dz)) + " from panhardBodyMm: a Panhard "
                    + "rod is at least 200 mm long");
        } else if (Math.abs(dz) >= Math.abs(dy)) {
            reader.problem(NodeReader.child(path, PANHARD_AXLE_MM), "makes the rod steeper than 45 degrees: a Panhard rod runs across "
                    + "the car to locate the axle sideways");
        }
    }

    private static void pivotAxis(Point3 inner, Point3 outer, String path, NodeReader reader) {
        if (inner.distanceTo(outer) < SHORTEST_LINK) {
            reader.problem(NodeReader.child(path, PIVOT_OUTER_MM), "is " + mm(inner.distanceTo(outer)) + " from pivotInnerMm: the two "
                    + "pivots must be at least 20 mm apart");
            return;
        }
        if (!(outer.y() > inner.y())) {
            reader.problem(NodeReader.child(path, PIVOT_OUTER_MM), "must lie outboard of pivotInnerMm (a larger y)");
        }
        if (Math.abs(inner.x()) < 0.05 && Math.abs(outer.x()) < 0.05) {
            reader.problem(NodeReader.child(path, PIVOT_INNER_MM), "and pivotOuterMm lie within 50 mm of the wheel centre's plane "
                    + "(x = 0): the arm's pivots are ahead of (or behind) the wheel");
        }
    }

    private static void onLeftSide(FrontViewPoint point, String path, NodeReader reader) {
        if (!(point.y() > 0)) {
            reader.problem(path, "= [" + mm(point.y()) + ", " + mm(point.z()) + "]: must lie on the car's left side, "
                    + "y more than 0 (points are given for the left side; the right side is their mirror image)");
        }
    }

    private static void outboard(FrontViewPoint inner, FrontViewPoint outer, String outerPath, String innerKey,
                                 NodeReader reader) {
        if (inner.distanceTo(outer) < SHORTEST_LINK) {
            reader.problem(outerPath, "is " + mm(inner.distanceTo(outer)) + " from " + innerKey
                    + ": an arm is at least 20 mm long");
        } else if (!(outer.y() > inner.y())) {
            reader.problem(outerPath, "y = " + mm(outer.y()) + " is not outboard of " + innerKey + " (y = "
                    + mm(inner.y()) + "): the outer joint is on the wrong side of its pivot");
        }
    }

    private static void above(FrontViewPoint upper, FrontViewPoint lower, String upperPath, String what, String lowerKey,
                              NodeReader reader) {
        if (!(upper.z() > lower.z() + SHORTEST_LINK)) {
            reader.problem(upperPath, "z = " + mm(upper.z()) + ": " + what + " must be at least 20 mm above "
                    + lowerKey + " (z = " + mm(lower.z()) + ")");
        }
    }

    /** @return true where the segments a1-a2 and b1-b2 cross (strictly) */
    private static boolean crosses(FrontViewPoint a1, FrontViewPoint a2, FrontViewPoint b1, FrontViewPoint b2) {
        double d1 = side(b1, b2, a1);
        double d2 = side(b1, b2, a2);
        double d3 = side(a1, a2, b1);
        double d4 = side(a1, a2, b2);
        return d1 * d2 < 0 && d3 * d4 < 0;
    }

    private static double side(FrontViewPoint p, FrontViewPoint q, FrontViewPoint r) {
        return (q.y() - p.y()) * (r.z() - p.z()) - (q.z() - p.z()) * (r.y() - p.y());
    }

    private static String mm(double metres) {
        return String.format(Locale.ROOT, "%.0f mm", metres * 1e3);
    }
}
