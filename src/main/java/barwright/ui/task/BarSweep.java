package barwright.ui.task;

import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.model.BarSection;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.model.Vehicle;
import barwright.model.AxlePosition;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.RollBalance;
import barwright.sizing.AxleState;
import barwright.sizing.SetupEvaluator;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleFunction;

/**
 * The sweep chart's data: the car analysed again with one bar's diameter, wall or arm hole changed, the rest
 * as it is. Plain computation, run off the event thread.
 */
public final class BarSweep {
    /** Points of a diameter or wall sweep. */
    static final int POINTS = 17;
    /** A diameter sweep spans this factor below and above the current diameter. */
    static final double DIAMETER_SPAN = 0.35;
    /** The thinnest wall a sweep tries (m) and the least bore it leaves (m). */
    static final double THINNEST_WALL = 0.5e-3;
    static final double LEAST_BORE = 1e-3;
    /** The smallest diameter a sweep tries (m): the file's lower bound. */
    static final double SMALLEST_DIAMETER = 3e-3;

    private BarSweep() {
    }

    public static SweepResult run(Vehicle vehicle, SweepRequest request) {
        Axle axle = vehicle.axle(request.axle());
        if (!axle.hasBar()) {
            return SweepResult.unavailable(request, "There is no " + request.axle().key() + " bar to sweep.");
        }
        AntiRollBar bar = axle.bar();
        BarSection section = bar.section();
        return switch (request.parameter()) {
            case DIAMETER -> diameterSweep(vehicle, request, bar, section);
            case WALL -> section instanceof TubeSection tube ? wallSweep(vehicle, request, bar, tube)
                    : SweepResult.unavailable(request, "The " + request.axle().key()
                    + " bar is solid: choose a tube section to sweep its wall.");
            case ARM_HOLE -> bar.isShaped()
                    ? SweepResult.unavailable(request, "The " + request.axle().key() + " bar is a shaped bar; "
                    + "its holes are set back along the ends. Sweep its diameter instead.")
                    : holeSweep(vehicle, request, bar);
        };
    }

    private static SweepResult diameterSweep(Vehicle vehicle, SweepRequest request, AntiRollBar bar,
                                             BarSection section) {
        double current = section.outerDiameter();
        double wall = section instanceof TubeSection tube ? tube.wall() : 0;
        double low = Math.max(Math.max(SMALLEST_DIAMETER, current * (1 - DIAMETER_SPAN)), 2 * wall + LEAST_BORE);
        double high = current * (1 + DIAMETER_SPAN);
        DoubleFunction<BarSection> sectionOf = diameter -> section instanceof TubeSection
                ? new TubeSection(diameter, wall) : new SolidSection(diameter);
        return sweep(vehicle, request, bar, low, high, current, value -> bar.withSection(sectionOf.apply(value)));
    }

    private static SweepResult wallSweep(Vehicle vehicle, SweepRequest request, AntiRollBar bar, TubeSection tube) {
        double thickest = (tube.outerDiameter() - LEAST_BORE) / 2;
        double low = Math.min(THINNEST_WALL, tube.wall());
        return sweep(vehicle, request, bar, low, thickest, tube.wall(),
                value -> bar.withSection(new TubeSection(tube.outerDiameter(), value)));
    }

    private static SweepResult sweep(Vehicle vehicle, SweepRequest request, AntiRollBar bar, double low, double high,
                                     double current, DoubleFunction<AntiRollBar> barAt) {
        List<SweepResult.Point> points = new ArrayList<>(POINTS);
        for (int i = 0; i < POINTS; i++) {
            double value = low + (high - low) * i / (POINTS - 1);
            point(vehicle, request, barAt.apply(value), value, points);
        }
        return new SweepResult(request, points, current, null);
    }

    private static SweepResult holeSweep(Vehicle vehicle, SweepRequest request, AntiRollBar bar) {
        List<Double> arms = bar.dimensions().armLengths();
        List<SweepResult.Point> points = new ArrayList<>(arms.size());
        List<Integer> order = new ArrayList<>();
        for (int hole = 0; hole < arms.size(); hole++) {
            order.add(hole);
        }
        order.sort((first, second) -> Double.compare(arms.get(first), arms.get(second)));
        for (int hole : order) {
            point(vehicle, request, bar.withSelectedArm(hole), arms.get(hole), points);
        }
        return new SweepResult(request, points, bar.selectedArmLength(), null);
    }

    /**
     * Front share and roll gradient are the linear part of the analysis (model.md 5-6): the evaluator works out
     * just that part, the same numbers as a full analysis without its limits and handling curves.
     */
    private static void point(Vehicle vehicle, SweepRequest request, AntiRollBar bar, double value,
                              List<SweepResult.Point> points) {
        try {
            SetupEvaluator evaluator = new SetupEvaluator(vehicle);
            AxlePosition swept = request.axle();
            AxleState sweptAxle = evaluator.axle(swept, bar);
            AxleState otherAxle = evaluator.axle(swept.other());
            RollBalance balance = swept == AxlePosition.FRONT ? evaluator.balance(sweptAxle, otherAxle)
                    : evaluator.balance(otherAxle, sweptAxle);
            points.add(new SweepResult.Point(value, balance.frontLoadTransferShare(), balance.rollGradient()));
        } catch (ImpossibleVehicleException impossible) {
            // no stable roll with this bar: the point is left out
        }
    }
}
