package barwright.physics.beam;

import barwright.model.BarSection;
import barwright.model.Material;
import barwright.solver.frame.BeamElement;
import barwright.solver.frame.FrameModel;
import barwright.solver.frame.FrameSolution;
import barwright.solver.frame.NodalForce;
import barwright.solver.frame.SectionProperties;
import barwright.solver.frame.Support;
import barwright.solver.frame.Vector3;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A meshed bar as a frame: its supports and its link loads.
 *
 * <p>Each bushing holds the bar radially (perpendicular to the centreline's tangent there), rigidly or by a
 * spring of the bushing's radial rate in every radial direction, and leaves it free to turn (rotations
 * free: the simple supports of the closed form, model.md 2). The first bushing also holds the bar along its
 * axis, rigidly (the bushings' collars; an axial rate is not an input).
 *
 * <p>Such supports leave one motion free: the bar turning as a rigid body about the bushing axis, which
 * moves each link point along z by its lever arm m (the moment of a unit z force there about the axis)
 * times the angle. It is stopped by a rigid rotation constraint about that axis at the first bushing. The
 * links push along z with forces that have no moment about the axis, so the constraint carries nothing:
 * +m_R/m and -m_L/m newtons at the left and right link points, m = (m_L + m_R)/2 (model.md 2, "Unequal
 * lever arms"). With equal lever arms that is the +1 N / -1 N pair of the closed form.
 * {@link #checkRotationCarriesNoLoad} verifies from the solution that the constraint carries nothing.
 */
public final class BarFrame {
    /** How far (m) a bushing centre may sit off the line through the first and last bushings. */
    static final double BUSHING_AXIS_TOLERANCE = 1e-3;
    /**
     * The largest moment about the bushing axis the rotation constraint may carry, as a fraction of the link
     * force times the mean lever arm. 0.1 % admits the rounding of coordinates typed in millimetres and
     * affects the rate by far less than the model's own idealisations.
     */
    static final double FREE_ROTATION_MOMENT_FRACTION = 1e-3;
    /**
     * The two lever arms may differ by at most this fraction of their mean. Within it the bar's resistance to
     * both wheels rising together, which the roll-only link rate leaves out, changes the roll stiffness by a
     * part in a hundred or less (model.md 2, "Unequal lever arms"); beyond it a bar is refused.
     */
    public static final double MAX_LEVER_ARM_DIFFERENCE = 0.10;

    private final BarMesh mesh;
    private final FrameModel model;
    private final Vector3 bushingAxis;
    private final double leftLeverArm;
    private final double rightLeverArm;

    private BarFrame(BarMesh mesh, FrameModel model, Vector3 bushingAxis) {
        this.mesh = mesh;
        this.model = model;
        this.bushingAxis = bushingAxis;
        this.leftLeverArm = leverArm(mesh.leftLink());
        this.rightLeverArm = leverArm(mesh.rightLink());
        checkLeverArms();
    }

    /**
     * @param mesh              the meshed bar
     * @param material          its material
     * @param section           its cross-section, the same all along
     * @param bushingRadialRate radial rate of each bushing (N/m), or null for rigid bushings
     */
    static BarFrame of(BarMesh mesh, Material material, BarSection section, Double bushingRadialRate) {
        SectionProperties properties = SectionProperties.round(material.youngsModulus(), material.shearModulus(),
                section.area(), section.bendingMoment(), section.polarMoment());
        List<BeamElement> elements = new ArrayList<>(mesh.elementCount());
        for (int node = 0; node < mesh.elementCount(); node++) {
            elements.add(BeamElement.between(node, node + 1, properties));
        }
        int[] bushings = mesh.bushings();
        Vector3 axis = bushingAxis(mesh, bushings);
        List<Support> supports = new ArrayList<>();
        for (int node : bushings) {
            Vector3 tangent = mesh.tangent(node);
            Vector3 radial = tangent.perpendicular();
            for (Vector3 direction : List.of(radial, tangent.cross(radial))) {
                supports.add(bushingRadialRate == null ? Support.rigidTranslation(node, direction)
                        : Support.translationSpring(node, direction, bushingRadialRate));
            }
        }
        supports.add(Support.rigidTranslation(bushings[0], mesh.tangent(bushings[0])));
        supports.add(Support.rigidRotation(bushings[0], axis));
        return new BarFrame(mesh, new FrameModel(mesh.nodes(), elements, supports), axis);
    }

    private static Vector3 bushingAxis(BarMesh mesh, int[] bushings) {
        if (bushings.length < 2) {
            throw new IllegalArgumentException("a bar needs at least two bushings to turn in, had " + bushings.length);
        }
        List<Vector3> nodes = mesh.nodes();
        Vector3 first = nodes.get(bushings[0]);
        Vector3 span = nodes.get(bushings[bushings.length - 1]).minus(first);
        if (!(span.length() > BUSHING_AXIS_TOLERANCE)) {
            throw new IllegalArgumentException("the first and last bushings are at the same place: they need a span");
        }
        Vector3 axis = span.unit();
        for (int i = 1; i < bushings.length - 1; i++) {
            Vector3 offset = nodes.get(bushings[i]).minus(first);
            double off = offset.minus(axis.times(offset.dot(axis))).length();
            if (off > BUSHING_AXIS_TOLERANCE) {
                throw new IllegalArgumentException("bushing " + i + " is " + LengthText.of(off) + " off the axis through the"
                        + " first and last bushings: the bushings must share one axis for the bar to turn");
            }
        }
        return axis;
    }

    /** @return the frame: nodes from the left end to the right end, elements, bushing supports */
    public FrameModel model() {
        return model;
    }

    BarMesh mesh() {
        return mesh;
    }

    /** @return unit vector along the bushing axis, from the first bushing towards the last */
    Vector3 bushingAxis() {
        return bushingAxis;
    }

    /**
     * @return link forces along z with no moment about the bushing axis: +m_R/m at the left link point and
     *     -m_L/m at the right one (N), +1 N and -1 N where the lever arms are equal
     */
    public List<NodalForce> unitLinkLoads() {
        double mean = signedMeanLeverArm();
        return List.of(NodalForce.force(mesh.leftLink(), Vector3.UNIT_Z.times(rightLeverArm / mean)),
                NodalForce.force(mesh.rightLink(), Vector3.UNIT_Z.times(-leftLeverArm / mean)));
    }

    /**
     * The relative link travel under {@link #unitLinkLoads()}: (m_R w_L - m_L w_R) / m, which a rigid turn of
     * the bar in its bushings leaves unchanged; w_L - w_R where the lever arms are equal (model.md 2).
     *
     * @param unit the solution under {@link #unitLinkLoads()}
     * @return the compliance 1 / k_link (m/N)
     */
    double linkCompliance(FrameSolution unit) {
        double left = unit.translation(mesh.leftLink()).z();
        double right = unit.translation(mesh.rightLink()).z();
        return (rightLeverArm * left - leftLeverArm * right) / signedMeanLeverArm();
    }

    /**
     * @param unit the solution under {@link #unitLinkLoads()}
     * @return the moment about the bushing axis carried by the rotation constraint (N m per N of link force)
     */
    double rotationConstraintMoment(FrameSolution unit) {
        return unit.reaction(mesh.bushings()[0]).moment().dot(bushingAxis);
    }

    /** @return the mean lever arm of the two link forces about the bushing axis, |m_L + m_R| / 2 (m) */
    double meanLeverArm() {
        return Math.abs(signedMeanLeverArm());
    }

    /** @return (m_L + m_R) / 2 with its sign, which depends on the direction of the axis (m) */
    private double signedMeanLeverArm() {
        return (leftLeverArm + rightLeverArm) / 2;
    }

    /** @return m: the moment about the bushing axis of a unit z force at the node, axis . (r x z) (m) */
    private double leverArm(int linkNode) {
        Vector3 fromAxis = mesh.nodes().get(linkNode).minus(mesh.nodes().get(mesh.bushings()[0]));
        return bushingAxis.dot(fromAxis.cross(Vector3.UNIT_Z));
    }

    /**
     * Refuses link points the link forces cannot twist the bar through: on the bushing axis, on opposite
     * sides of it (arms pointing opposite ways: the bar turns freely in roll and resists only both wheels
     * rising together), or at lever arms that differ by more than {@link #MAX_LEVER_ARM_DIFFERENCE}.
     */
    private void checkLeverArms() {
        double left = Math.abs(leftLeverArm);
        double right = Math.abs(rightLeverArm);
        if (!(Math.min(left, right) > BUSHING_AXIS_TOLERANCE)) {
            throw new IllegalArgumentException("a link point lies on the bushing axis (lever arms: left "
                    + LengthText.of(left) + ", right " + LengthText.of(right)
                    + "): vertical link forces cannot twist this bar");
        }
        if (leftLeverArm * rightLeverArm < 0) {
            throw new IllegalArgumentException("the arms point opposite ways from the bushing axis (left link "
                    + LengthText.of(left) + " on one side, right link " + LengthText.of(right) + " on the other): "
                    + "such a bar turns freely in its bushings as the car rolls and resists only both wheels "
                    + "rising together, so it is no anti-roll bar; point both arms the same way");
        }
        if (Math.abs(left - right) > MAX_LEVER_ARM_DIFFERENCE * meanLeverArm()) {
            throw new IllegalArgumentException(String.format(Locale.ROOT, "the link points sit at "
                    + "unequal lever arms about the bushing axis (left %s, right %s, %.0f %% apart; at most %.0f %% "
                    + "is modelled): such a bar also resists both wheels rising together, which this model "
                    + "leaves out", LengthText.of(left), LengthText.of(right),
                    100 * Math.abs(left - right) / meanLeverArm(), 100 * MAX_LEVER_ARM_DIFFERENCE));
        }
    }

    /**
     * Confirms that the constraint against turning about the bushing axis carries (almost) nothing, as the
     * free rotation of a real bar in its bushings demands: the link forces were chosen with no moment about
     * the axis, so a moment here means the solution is not to be trusted.
     *
     * @throws IllegalStateException where the constraint carries a moment past round-off
     */
    void checkRotationCarriesNoLoad(FrameSolution unit) {
        double moment = rotationConstraintMoment(unit);
        if (!(Math.abs(moment) <= FREE_ROTATION_MOMENT_FRACTION * meanLeverArm())) {
            throw new IllegalStateException("the constraint against turning in the bushings carries "
                    + moment + " N m per N of link force (lever arms: left " + LengthText.of(leftLeverArm)
                    + ", right " + LengthText.of(rightLeverArm) + "): the frame solution is not in equilibrium");
        }
    }
}
