package barwright.physics.beam;

import barwright.model.AntiRollBar;
import barwright.model.BarCentreline;
import barwright.model.BarSection;
import barwright.model.Point3;
import barwright.physics.bar.BarModel;
import barwright.physics.bar.BarResult;
import barwright.solver.frame.FrameSolution;
import barwright.solver.frame.FrameSolver;
import barwright.solver.frame.Vector3;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * Rate, stresses and bushing loads of a bar of any shape, from a 3-D frame of Euler-Bernoulli beam elements
 * along its centreline (the direct stiffness method: Przemieniecki, Theory of Matrix Structural Analysis,
 * 1968; see {@link barwright.solver.frame}). Supports and loads are described in {@link BarFrame}; for a
 * plain U-bar with sharp corners the frame carries exactly the loads of the closed form of model.md 2
 * (torsion of the tube, bending of the arms, the overhangs and the span) and gives the same rate.
 *
 * <p>The link rate is found from one solve with unit link forces: k_link = 1 N / (w_left - w_right), the
 * relative travel along z of the link points (model.md 2; with unequal lever arms the forces and the travel
 * are weighted by the arms, {@link BarFrame#unitLinkLoads()}). The analysis is linear, so every force,
 * stress and displacement at the check travel is the unit solution times F = k_link * Delta.
 */
public final class BeamBar {
    /**
     * The default longest element (m). Straight parts need no refinement (cubic elements are exact there
     * for loads at nodes); the element length sets how finely the bends are followed, at least 8 chords
     * per bend. At 10 mm, halving it changes the rate of bars with bend radii from 1 to 3 bar diameters by
     * well under 0.1 % (BeamBarConvergenceTest), and a 1.5 m bar takes about 200 elements.
     */
    public static final double DEFAULT_ELEMENT_LENGTH = 0.010;

    /**
     * Stresses within this fraction of each other count as equal when placing the largest: round-off of
     * a fine mesh reaches a few parts in 10^6, and the two ends of a symmetric bar should report the left.
     */
    private static final double SAME_STRESS = 1e-6;

    private BeamBar() {
    }

    /**
     * @param bar                a bar with a centreline
     * @param relativeLinkTravel relative displacement of the two link points along z, w_left - w_right (m)
     */
    public static BarResult analyse(AntiRollBar bar, double relativeLinkTravel) {
        return solve(bar, relativeLinkTravel).result();
    }

    /**
     * The analysis with the stresses all along the bar, at the default element length.
     *
     * @param bar                a bar with a centreline
     * @param relativeLinkTravel relative displacement of the two link points along z (m)
     */
    public static BeamBarSolution solve(AntiRollBar bar, double relativeLinkTravel) {
        return solve(bar, relativeLinkTravel, DEFAULT_ELEMENT_LENGTH);
    }

    /**
     * @param bar                a bar with a centreline
     * @param relativeLinkTravel relative displacement of the two link points along z (m)
     * @param maxElementLength   the longest element (m); bends get at least 8 elements whatever it is
     * @throws IllegalArgumentException for a bar without a centreline, a centreline that cannot be meshed
     *                                  (bends that do not fit, bushings off the bar or off one axis, a hole
     *                                  setback in a bend) or link points that cannot twist it (on the
     *                                  bushing axis, on opposite sides of it, or at lever arms more than
     *                                  {@link BarFrame#MAX_LEVER_ARM_DIFFERENCE} apart)
     */
    public static BeamBarSolution solve(AntiRollBar bar, double relativeLinkTravel, double maxElementLength) {
        if (!Double.isFinite(relativeLinkTravel)) {
            throw new IllegalArgumentException("relative link travel must be finite, was " + relativeLinkTravel);
        }
        BarFrame frame = frameOf(bar, maxElementLength);
        BarMesh mesh = frame.mesh();
        FrameSolution unit = FrameSolver.solve(frame.model(), frame.unitLinkLoads());
        frame.checkRotationCarriesNoLoad(unit);

        double linkRate = 1 / frame.linkCompliance(unit);
        double linkForce = linkRate * relativeLinkTravel;
        BarSection section = bar.section();
        List<StressStation> stations = BarStresses.stations(mesh, unit, frame.model().elements(), section, linkForce);
        StressStation worst = worstFromTheLeft(stations);
        double torsionalShear = stations.stream().mapToDouble(StressStation::torsionalShearStress).max().orElseThrow();
        double maxVonMises = worst.vonMisesStress();
        double safetyFactor = maxVonMises > 0 ? bar.material().yieldStrength() / maxVonMises
                : Double.POSITIVE_INFINITY;
        double mass = bar.material().density() * section.area() * mesh.path().length();
        BarResult result = new BarResult(BarModel.BEAM, linkRate, mass, relativeLinkTravel, linkForce,
                torsionalShear, maxVonMises, worst.distanceFromLeftLink(), safetyFactor,
                bushingLoads(mesh, unit, linkForce), deflectedShape(mesh, unit, linkForce));
        return new BeamBarSolution(result, stations, mesh.elementCount());
    }

    /**
     * @return the station of the largest von Mises stress; of stations within round-off of it (the mirror
     *         images on a symmetric bar), the one nearest the left link
     */
    private static StressStation worstFromTheLeft(List<StressStation> stations) {
        double largest = stations.stream().mapToDouble(StressStation::vonMisesStress).max().orElseThrow();
        return stations.stream().filter(station -> station.vonMisesStress() >= largest * (1 - SAME_STRESS))
                .min(Comparator.comparingDouble(StressStation::distanceFromLeftLink)).orElseThrow();
    }

    /** @return the radial part (perpendicular to the bar) of each bushing's reaction (N) */
    private static List<Double> bushingLoads(BarMesh mesh, FrameSolution unit, double linkForce) {
        List<Double> loads = new ArrayList<>();
        for (int node : mesh.bushings()) {
            Vector3 reaction = unit.reaction(node).force();
            Vector3 tangent = mesh.tangent(node);
            loads.add(Math.abs(linkForce) * reaction.minus(tangent.times(reaction.dot(tangent))).length());
        }
        return loads;
    }

    /** @return node positions plus their displacements at the check travel (m) */
    private static List<Point3> deflectedShape(BarMesh mesh, FrameSolution unit, double linkForce) {
        List<Point3> shape = new ArrayList<>(mesh.nodes().size());
        for (int node = 0; node < mesh.nodes().size(); node++) {
            Vector3 moved = mesh.nodes().get(node).plus(unit.translation(node).times(linkForce));
            shape.add(new Point3(moved.x(), moved.y(), moved.z()));
        }
        return shape;
    }

    /**
     * The frame a bar is analysed with, for inspection (drawing the mesh and supports) and for comparing
     * solvers on the same equations.
     *
     * @param bar              a bar with a centreline
     * @param maxElementLength the longest element (m)
     */
    public static BarFrame frameOf(AntiRollBar bar, double maxElementLength) {
        BarCentreline centreline = bar.centreline();
        if (centreline == null) {
            throw new IllegalArgumentException("the beam-element model needs the bar's centreline");
        }
        CentrelinePath path = CentrelinePath.of(centreline.points(), centreline.bendRadius());
        BarMesh mesh = BarMesh.build(path, centreline, bar.selectedArm(), maxElementLength);
        return BarFrame.of(mesh, bar.material(), bar.section(), centreline.bushingRadialRate());
    }
}
