package barwright.physics.linkage;

import barwright.model.Axle;
import barwright.model.DoubleWishbone;
import barwright.model.FrontViewPoint;
import barwright.model.Linkage;
import barwright.model.LiveAxlePanhard;
import barwright.model.LiveAxleWatts;
import barwright.model.Point3;
import barwright.model.SemiTrailingArm;
import barwright.model.Strut;
import barwright.model.TrailingArm;

import java.util.ArrayList;
import java.util.List;

/**
 * An axle's linkage at a body roll with every point in the road's axes, for drawing the front view: y to the
 * car's left from the mid-point of the two contact points, z up from the ground (m). It is the same solve as
 * {@link AxleKinematics#roll}, with the parts the roll state leaves out: where each link and joint is. Built once
 * per car (each side's travel table), then asked for any roll.
 */
public final class FrontViewFigure {
    /** What a drawn part of the linkage is. */
    public enum Kind {
        /** a transverse arm from a body pivot to a ball joint on the upright */
        ARM,
        /** a strut's axis, from its top mount to its point on the upright */
        STRUT,
        /** a trailing or semi-trailing arm's pivot axis, seen from the front */
        PIVOT_AXIS,
        /** a Panhard rod, from its body end to its axle end */
        PANHARD_ROD,
        /** a Watt's linkage's centre link, about its centre pivot */
        WATTS_CENTRE_LINK
    }

    /**
     * A drawn part: a straight line between two points (road axes, m).
     *
     * @param kind what it is
     * @param from its first end: the body end where it has one
     * @param to   its second end
     */
    public record Member(Kind kind, FrontViewPoint from, FrontViewPoint to) {
    }

    /**
     * A point a person measures and may move (road axes, m).
     *
     * @param index the point's place in the linkage's own order (double wishbone: upper inner, upper outer, lower
     *              inner, lower outer; strut: top, lower, lower inner, lower outer; Panhard rod: body end, axle
     *              end; trailing arms: pivot inner, pivot outer; Watt's linkage: the centre pivot)
     * @param left  true for the left side's point as measured, false for its mirror image on the right
     * @param at    where it is drawn
     */
    public record Pickup(int index, boolean left, FrontViewPoint at) {
    }

    /**
     * A line that defines a side's instant centre: through an anchor point in a direction (road axes).
     *
     * @param anchor    a point of the line (m)
     * @param directionY the line's direction, y component (unit vector)
     * @param directionZ the line's direction, z component (unit vector)
     */
    public record ConstructionLine(FrontViewPoint anchor, double directionY, double directionZ) {
    }

    /**
     * One side of the axle.
     *
     * @param contact       the tyre contact point (m)
     * @param camber        the wheel's camber to the road (rad), SAE J670 sign
     * @param instantCentre the front-view instant centre in road axes, a direction where at infinity; null for a
     *                      beam axle, whose wheels have none of their own
     * @param construction  the lines that meet at the instant centre (none for a beam axle)
     */
    public record Side(FrontViewPoint contact, double camber, InstantCentre instantCentre,
                       List<ConstructionLine> construction) {
        public Side {
            construction = List.copyOf(construction);
        }
    }

    /**
     * The body's place: a point p of the body, in the axes the points were measured in, is at
     * R(roll) p + (lateralShift, height) on the road.
     *
     * @param roll         body roll (rad), positive for a left turn
     * @param lateralShift the body's sideways move (m)
     * @param height       the body's rise from where the points were measured (m)
     */
    public record BodyPlace(double roll, double lateralShift, double height) {
        /** @return a point fixed in the body, as measured, in road axes */
        public FrontViewPoint toRoad(FrontViewPoint body) {
            double cos = Math.cos(roll);
            double sin = Math.sin(roll);
            return new FrontViewPoint(cos * body.y() - sin * body.z() + lateralShift,
                    sin * body.y() + cos * body.z() + height);
        }
    }

    /**
     * The whole axle at one roll.
     *
     * @param state   the roll state (roll centre, cambers, track) the analysis uses
     * @param body    where the body is
     * @param left    the left side
     * @param right   the right side
     * @param members the drawn parts, both sides
     * @param pickups the measured points, both sides
     */
    public record Figure(RollState state, BodyPlace body, Side left, Side right, List<Member> members,
                         List<Pickup> pickups) {
        public Figure {
            members = List.copyOf(members);
            pickups = List.copyOf(pickups);
        }
    }

    private final Axle axle;
    private final AxleKinematics kinematics;
    private final SideSolver side;
    private final double baseTravel;

    private FrontViewFigure(Axle axle) {
        this.axle = axle;
        this.kinematics = AxleKinematics.of(axle);
        this.baseTravel = -axle.suspension().rideHeightChange();
        SideLinkage linkage = sideLinkage(axle.suspension().linkage(), new FrontViewPoint(axle.track() / 2, 0));
        this.side = linkage == null ? null : new SideSolver(linkage);
    }

    /**
     * @param axle an axle with a linkage
     * @return its figure, ready to be asked for any roll
     * @throws LinkageLimitException where the linkage cannot reach its ride height
     * @throws IllegalArgumentException where the axle has no linkage
     */
    public static FrontViewFigure of(Axle axle) {
        return new FrontViewFigure(axle);
    }

    /** @return the kinematics the figure is drawn from */
    public AxleKinematics kinematics() {
        return kinematics;
    }

    /**
     * @param roll body roll (rad), positive for a left turn
     * @return the axle at that roll
     * @throws LinkageLimitException where a wheel would have to travel past what the linkage reaches
     */
    public Figure at(double roll) {
        RollState state = kinematics.roll(roll);
        BodyPlace body = new BodyPlace(roll, state.lateralShift(), state.heave() - baseTravel);
        Linkage linkage = axle.suspension().linkage();
        List<Member> members = new ArrayList<>();
        List<Pickup> pickups = new ArrayList<>();
        if (side == null) {
            return beamAxle(linkage, state, body, members, pickups);
        }
        SidePose left = side.pose(baseTravel - state.rightTravel());
        SidePose right = side.pose(baseTravel + state.rightTravel());
        Side leftSide = independentSide(linkage, left, true, state.leftCamber(), body, members, pickups);
        Side rightSide = independentSide(linkage, right, false, state.rightCamber(), body, members, pickups);
        return new Figure(state, body, leftSide, rightSide, members, pickups);
    }

    private Side independentSide(Linkage linkage, SidePose pose, boolean isLeft, double camber, BodyPlace body,
                                 List<Member> members, List<Pickup> pickups) {
        List<FrontViewPoint> bodyPoints = new ArrayList<>();
        List<Integer> bodyIndices = new ArrayList<>();
        List<ConstructionLine> construction = new ArrayList<>();
        List<FrontViewPoint> joints = new ArrayList<>();
        for (FrontViewPoint joint : pose.joints()) {
            joints.add(body.toRoad(mirror(joint, isLeft)));
        }
        if (linkage instanceof DoubleWishbone arms) {
            FrontViewPoint upperInner = body.toRoad(mirror(arms.upperInner(), isLeft));
            FrontViewPoint lowerInner = body.toRoad(mirror(arms.lowerInner(), isLeft));
            members.add(new Member(Kind.ARM, upperInner, joints.get(0)));
            members.add(new Member(Kind.ARM, lowerInner, joints.get(1)));
            construction.add(along(upperInner, joints.get(0)));
            construction.add(along(lowerInner, joints.get(1)));
            addPickups(pickups, isLeft, upperInner, joints.get(0), lowerInner, joints.get(1));
        } else if (linkage instanceof Strut strut) {
            FrontViewPoint top = body.toRoad(mirror(strut.strutTop(), isLeft));
            FrontViewPoint lowerInner = body.toRoad(mirror(strut.lowerInner(), isLeft));
            members.add(new Member(Kind.STRUT, top, joints.get(0)));
            members.add(new Member(Kind.ARM, lowerInner, joints.get(1)));
            construction.add(along(lowerInner, joints.get(1)));
            // the top mount's instant centre line is square to the strut's axis (Reimpell, from memory)
            ConstructionLine axis = along(top, joints.get(0));
            construction.add(new ConstructionLine(top, -axis.directionZ(), axis.directionY()));
            addPickups(pickups, isLeft, top, joints.get(0), lowerInner, joints.get(1));
        } else {
            Point3[] axis = pivotAxis(linkage);
            FrontViewPoint inner = body.toRoad(mirror(new FrontViewPoint(axis[0].y(), axis[0].z()), isLeft));
            FrontViewPoint outer = body.toRoad(mirror(new FrontViewPoint(axis[1].y(), axis[1].z()), isLeft));
            members.add(new Member(Kind.PIVOT_AXIS, inner, outer));
            if (inner.distanceTo(outer) > 0) {
                construction.add(along(inner, outer));
            }
            addPickups(pickups, isLeft, inner, outer);
        }
        return new Side(body.toRoad(mirror(pose.contact(), isLeft)), camber,
                toRoad(pose.instantCentre(), isLeft, body), construction);
    }

    private Figure beamAxle(Linkage linkage, RollState state, BodyPlace body, List<Member> members,
                            List<Pickup> pickups) {
        double half = state.track() / 2;
        Side left = new Side(new FrontViewPoint(half, 0), state.leftCamber(), null, List.of());
        Side right = new Side(new FrontViewPoint(-half, 0), state.rightCamber(), null, List.of());
        if (linkage instanceof LiveAxlePanhard rod) {
            FrontViewPoint bodyEnd = body.toRoad(rod.bodyEnd());
            // the axle stays on the road: its end of the rod is where it was measured
            FrontViewPoint axleEnd = new FrontViewPoint(rod.axleEnd().y(), rod.axleEnd().z());
            members.add(new Member(Kind.PANHARD_ROD, bodyEnd, axleEnd));
            addPickups(pickups, true, bodyEnd, axleEnd);
        } else {
            LiveAxleWatts watts = (LiveAxleWatts) linkage;
            RollCentre pivot = state.rollCentre();
            FrontViewPoint centre = new FrontViewPoint(pivot.offset(), pivot.height());
            // the centre link, drawn upright on the part that carries it, 100 mm each way of the pivot
            double tilt = watts.centrePivotMount() == LiveAxleWatts.Mount.BODY ? body.roll() : 0;
            double dy = -Math.sin(tilt) * DRAWN_CENTRE_LINK;
            double dz = Math.cos(tilt) * DRAWN_CENTRE_LINK;
            members.add(new Member(Kind.WATTS_CENTRE_LINK, new FrontViewPoint(centre.y() - dy, centre.z() - dz),
                    new FrontViewPoint(centre.y() + dy, centre.z() + dz)));
            pickups.add(new Pickup(0, true, centre));
        }
        return new Figure(state, body, left, right, members, pickups);
    }

    /** Half the length a Watt's centre link is drawn with (m): the file gives only its pivot's height. */
    private static final double DRAWN_CENTRE_LINK = 0.1;

    private static void addPickups(List<Pickup> pickups, boolean isLeft, FrontViewPoint... points) {
        for (int i = 0; i < points.length; i++) {
            pickups.add(new Pickup(i, isLeft, points[i]));
        }
    }

    private static Point3[] pivotAxis(Linkage linkage) {
        if (linkage instanceof TrailingArm arm) {
            return new Point3[] {arm.pivotInner(), arm.pivotOuter()};
        }
        SemiTrailingArm arm = (SemiTrailingArm) linkage;
        return new Point3[] {arm.pivotInner(), arm.pivotOuter()};
    }

    private static ConstructionLine along(FrontViewPoint from, FrontViewPoint through) {
        double length = from.distanceTo(through);
        return new ConstructionLine(from, (through.y() - from.y()) / length, (through.z() - from.z()) / length);
    }

    private static FrontViewPoint mirror(FrontViewPoint point, boolean isLeft) {
        return isLeft ? point : new FrontViewPoint(-point.y(), point.z());
    }

    private static InstantCentre toRoad(InstantCentre centre, boolean isLeft, BodyPlace body) {
        double y = isLeft ? centre.y() : -centre.y();
        if (!centre.atInfinity()) {
            FrontViewPoint road = body.toRoad(new FrontViewPoint(y, centre.z()));
            return new InstantCentre(road.y(), road.z(), false);
        }
        double cos = Math.cos(body.roll());
        double sin = Math.sin(body.roll());
        return new InstantCentre(cos * y - sin * centre.z(), sin * y + cos * centre.z(), true);
    }

    /** @return the side's loop closure for an independent linkage, null for a beam axle */
    private static SideLinkage sideLinkage(Linkage linkage, FrontViewPoint contact) {
        if (linkage instanceof DoubleWishbone arms) {
            return new DoubleWishboneSide(arms, contact);
        }
        if (linkage instanceof Strut strut) {
            return new StrutSide(strut, contact);
        }
        if (linkage.isLiveAxle()) {
            return null;
        }
        Point3[] axis = pivotAxis(linkage);
        return new SwingingArmSide(axis[0], axis[1], contact);
    }
}
