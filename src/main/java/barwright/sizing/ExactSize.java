package barwright.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.BarSection;
import barwright.model.Material;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.RollBalance;
import barwright.solver.RootFinder;

import java.util.function.DoubleFunction;
import java.util.function.DoubleUnaryOperator;

/**
 * The exact solid diameter, or the exact wall of a tube of given outside diameter, at which one axle's bar
 * meets a target: the front share where one is aimed at, else the roll gradient. The figure is scanned over
 * the whole range first (the car may have no stable roll with a thin bar), then the first bracket is closed
 * with Brent's method ({@link RootFinder}).
 */
public final class ExactSize {
    /** Diameters tried: the range a vehicle file allows, 3 to 200 mm (m). */
    static final double MIN_DIAMETER = 3e-3;
    static final double MAX_DIAMETER = 200e-3;
    private static final int SCAN_POINTS = 160;
    /**
     * Accuracy in the logarithm of the dimension: 1e-12 moves a share by about 1e-11, far below the 1e-6 asked;
     * a figure within 1e-13 of its target is met; at most 500 evaluations.
     */
    private static final RootFinder EXACT_SIZE = new RootFinder("the bar size that meets the target", 1e-12, 1e-14,
            1e-13, 500);

    private ExactSize() {
    }

    /**
     * @param hole 0-based arm hole of the vehicle's bar on that axle
     */
    public static ExactSolution solidDiameter(SetupEvaluator evaluator, AxlePosition axle, Material material,
                                              int hole, Targets targets) {
        return solve(evaluator, axle, material, hole, targets, SolidSection::new,
                Math.log(MIN_DIAMETER), Math.log(MAX_DIAMETER));
    }

    /**
     * @param outerDiameter the tube's outside diameter (m)
     */
    public static ExactSolution tubeWall(SetupEvaluator evaluator, AxlePosition axle, Material material, int hole,
                                         double outerDiameter, Targets targets) {
        // walls from half a percent of the diameter to just under the radius, where the tube becomes solid
        double thinnest = outerDiameter * 0.005;
        double thickest = outerDiameter * 0.5 * (1 - 1e-9);
        return solve(evaluator, axle, material, hole, targets, wall -> new TubeSection(outerDiameter, wall),
                Math.log(thinnest), Math.log(thickest));
    }

    private static ExactSolution solve(SetupEvaluator evaluator, AxlePosition axle, Material material, int hole,
                                       Targets targets, DoubleFunction<BarSection> section, double logLow,
                                       double logHigh) {
        AntiRollBar base = BarSearch.requireBar(evaluator.vehicle(), axle).withMaterial(material).withSelectedArm(hole);
        AxleState other = evaluator.axle(axle.other());
        boolean share = targets.hasShare();
        ExactSolution.TargetFigure figure = share ? ExactSolution.TargetFigure.FRONT_SHARE
                : ExactSolution.TargetFigure.ROLL_GRADIENT;
        double target = share ? targets.shareFor(evaluator.masses().frontMassFraction()) : targets.rollGradient();
        // the figure minus its target, against the logarithm of the dimension; NaN where the body is unstable
        DoubleUnaryOperator missOf = logDimension -> {
            AxleState state = evaluator.axle(axle, base.withSection(section.apply(Math.exp(logDimension))));
            try {
                RollBalance balance = axle == AxlePosition.FRONT ? evaluator.balance(state, other)
                        : evaluator.balance(other, state);
                return (share ? balance.frontLoadTransferShare() : balance.rollGradient()) - target;
            } catch (ImpossibleVehicleException unstable) {
                return Double.NaN;
            }
        };
        double lowest = Double.POSITIVE_INFINITY;
        double highest = Double.NEGATIVE_INFINITY;
        double previousX = Double.NaN;
        double previousY = Double.NaN;
        for (int i = 0; i < SCAN_POINTS; i++) {
            double x = logLow + (logHigh - logLow) * i / (SCAN_POINTS - 1);
            double y = missOf.applyAsDouble(x);
            if (Double.isNaN(y)) {
                previousX = Double.NaN;
                continue;
            }
            lowest = Math.min(lowest, y + target);
            highest = Math.max(highest, y + target);
            if (y == 0) {
                return new ExactSolution(Math.exp(x), figure, target, target, lowest, highest);
            }
            if (!Double.isNaN(previousX) && Math.signum(y) != Math.signum(previousY)) {
                double root = EXACT_SIZE.solve(missOf, previousX, x);
                return new ExactSolution(Math.exp(root), figure, target, missOf.applyAsDouble(root) + target, lowest,
                        highest);
            }
            previousX = x;
            previousY = y;
        }
        return new ExactSolution(Double.NaN, figure, target, Double.NaN, lowest, highest);
    }
}
