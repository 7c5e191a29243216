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

/**
 * A meshed bar as a frame: its supports and its link loads.
 *
 * <p>Each bushing holds the bar radially (perpendicular to the centreline's tangent there), rigidly or by a
 * spring of the bushing's radial rate in every radial direction, and leaves it free to turn (rotations
 * free: the simple supports of the closed form, model.md 2). The first bushing also holds the bar along its
 * axis, rigidly (the bushings' collars; an axial rate is not an input). The links push along z at the link
 * points: +1 N at the left one and -1 N at the right one, the equal and opposite pair of model.md 2.
 *
 * <p>Such supports leave one motion free: the bar turning as a rigid body about the bushing axis. It is
 * stopped by a rigid rotation constraint about that axis at the first bushing. For a bar whose link points
 * sit at equal lever arms about the axis the pair of link forces has no moment about it, so the constraint
 * carries nothing and changes nothing; {@link #checkRotationCarriesNoLoad} verifies that from the solution.
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

    private final BarMesh mesh;
    private final FrameModel model;
    private final Vector3 bushingAxis;

    private BarFrame(BarMesh mesh, FrameModel model, Vector3 bushingAxis) {
        this.mesh = mesh;
        this.model = model;
        this.bushingAxis = bushingAxis;
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

    /** @return +1 N along z at the left link point, -1 N at the right one */
    public List<NodalForce> unitLinkLoads() {
        return List.of(NodalForce.force(mesh.leftLink(), Vector3.UNIT_Z),
                NodalForce.force(mesh.rightLink(), Vector3.UNIT_Z.times(-1)));
    }

    /**
     * @param unit the solution under {@link #unitLinkLoads()}
     * @return the moment about the bushing axis carried by the rotation constraint (N m per N of link force)
     */
    double rotationConstraintMoment(FrameSolution unit) {
        return unit.reaction(mesh.bushings()[0]).moment().dot(bushingAxis);
    }

    /** @return the mean lever arm of the two link forces about the bushing axis (m) */
    double meanLeverArm() {
        return (leverArm(mesh.leftLink()) + leverArm(mesh.rightLink())) / 2;
    }

    private double leverArm(int linkNode) {
        Vector3 fromAxis = mesh.nodes().get(linkNode).minus(mesh.nodes().get(mesh.bushings()[0]));
        return Math.abs(bushingAxis.dot(fromAxis.cross(Vector3.UNIT_Z)));
    }

    /**
     * Confirms that the constraint against turning about the bushing axis carries (almost) nothing, as the
     * free rotation of a real bar in its bushings demands.
     *
     * @throws IllegalArgumentException where the link forces have a moment about the bushing axis: the link
     *                                  points are not at equal lever arms, so equal and opposite link forces
     *                                  (model.md 2) would turn the bar
     */
    void checkRotationCarriesNoLoad(FrameSolution unit) {
        double lever = meanLeverArm();
        if (!(lever > BUSHING_AXIS_TOLERANCE)) {
            throw new IllegalArgumentException("the link points lie on the bushing axis (lever arm "
                    + LengthText.of(lever) + "): vertical link forces cannot twist this bar");
        }
        double moment = rotationConstraintMoment(unit);
        if (Math.abs(moment) > FREE_ROTATION_MOMENT_FRACTION * lever) {
            throw new IllegalArgumentException("the link points sit at unequal lever arms about the bushing axis"
                    + " (left " + LengthText.of(leverArm(mesh.leftLink())) + ", right "
                    + LengthText.of(leverArm(mesh.rightLink())) + "): equal and opposite link forces would turn the bar in its bushings; this model"
                    + " needs the two link points at equal lever arms");
        }
    }
}
