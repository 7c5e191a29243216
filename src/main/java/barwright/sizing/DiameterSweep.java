package barwright.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.model.SolidSection;
import barwright.physics.ImpossibleVehicleException;

import java.util.ArrayList;
import java.util.List;

/**
 * The figures of one axle's bar made solid over a range of diameters, for one material and hole: the line
 * on which the exact diameter lies, and a table a setter can read a size off.
 */
public final class DiameterSweep {
    private DiameterSweep() {
    }

    /**
     * One diameter of the sweep.
     *
     * @param diameter the solid bar's diameter (m)
     * @param figures  the car's figures, or null where it has no stable roll position
     */
    public record Point(double diameter, SetupFigures figures) {
    }

    /**
     * @param from  first diameter (m)
     * @param to    last diameter (m), more than from
     * @param steps number of intervals (at least 1)
     */
    public static List<Point> of(SetupEvaluator evaluator, AxlePosition axle, Material material, int hole,
                                 double from, double to, int steps) {
        if (!(from > 0 && to > from) || steps < 1) {
            throw new IllegalArgumentException("a sweep runs from a positive diameter up to a larger one, in at least "
                    + "one step");
        }
        AntiRollBar base = BarSearch.requireBar(evaluator.vehicle(), axle).withMaterial(material).withSelectedArm(hole);
        AxleState other = evaluator.axle(axle.other());
        List<Point> points = new ArrayList<>(steps + 1);
        for (int i = 0; i <= steps; i++) {
            double diameter = from + (to - from) * i / steps;
            AxleState state = evaluator.axle(axle, base.withSection(new SolidSection(diameter)));
            SetupFigures figures;
            try {
                figures = axle == AxlePosition.FRONT ? evaluator.figures(state, other) : evaluator.figures(other, state);
            } catch (ImpossibleVehicleException unstable) {
                figures = null;
            }
            points.add(new Point(diameter, figures));
        }
        return points;
    }
}
