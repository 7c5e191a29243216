package barwright.physics.beam;

import barwright.model.BarSection;
import barwright.solver.frame.BeamElement;
import barwright.solver.frame.ElementEndForces;
import barwright.solver.frame.FrameSolution;
import barwright.solver.frame.SectionForces;

import java.util.ArrayList;
import java.util.List;

/**
 * Outer-fibre stresses of a round bar or tube from its stress resultants. On a round section the normal
 * stress peaks at the fibre furthest along the resultant bending moment, sigma = |N| / A + M R / I, and the
 * torsional shear tau = |T| R / J is the same all round the outer fibre, so both act together there:
 * von Mises sqrt(sigma^2 + 3 tau^2) (Roark's Formulas for Stress and Strain, torsion of circular sections
 * and combined stresses; Shigley's Mechanical Engineering Design, ch. 3 and 5).
 *
 * <p>Neglected: the transverse shear V / A, which is zero at that outer fibre and largest at the neutral
 * axis (for a bar, a few percent of the bending stress); stress raisers at bends and ends (curved-beam
 * effects, ovalisation of bent tubes, splines and holes), which model.md 10 leaves out and the screen must
 * mention.
 */
final class BarStresses {
    private BarStresses() {
    }

    /**
     * @param mesh      the meshed bar
     * @param unit      the frame's solution under unit link forces (1 N)
     * @param elements  the frame's elements, to place each one's ends along the centreline
     * @param section   the bar's section
     * @param linkForce the link force at the check travel (N): every resultant scales with it
     * @return two stations per element, left end first
     */
    static List<StressStation> stations(BarMesh mesh, FrameSolution unit, List<BeamElement> elements,
                                        BarSection section, double linkForce) {
        double leftLink = mesh.station(mesh.leftLink());
        List<StressStation> stations = new ArrayList<>(2 * elements.size());
        for (ElementEndForces forces : unit.elementForces()) {
            BeamElement element = elements.get(forces.element());
            stations.add(station(mesh.station(element.startNode()) - leftLink, forces.start(), section, linkForce));
            stations.add(station(mesh.station(element.endNode()) - leftLink, forces.end(), section, linkForce));
        }
        return stations;
    }

    private static StressStation station(double distance, SectionForces unit, BarSection section, double force) {
        double radius = section.outerRadius();
        double normal = Math.abs(force) * (Math.abs(unit.axial()) / section.area()
                + unit.bendingMoment() * radius / section.bendingMoment());
        double shear = Math.abs(force * unit.torque()) * radius / section.polarMoment();
        return new StressStation(distance, Math.sqrt(normal * normal + 3 * shear * shear), normal, shear);
    }
}
