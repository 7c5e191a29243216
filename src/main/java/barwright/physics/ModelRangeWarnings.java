package barwright.physics;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * Warnings for a car whose every input is within its allowed range but whose answers leave what the model
 * describes or what a racer would believe (model.md, "When the answer leaves the model"): an axle that
 * moves load onto its inside wheel, an outside wheel that would carry less than nothing, a grip limit of
 * almost nothing, a body that leans into the turn or rolls past any suspension's travel.
 */
final class ModelRangeWarnings {
    /** A grip limit below this (m/s^2) is called out: 0.05 g (model.md, the same section). */
    static final double LOW_LIMIT = 0.05 * STANDARD_GRAVITY;
    /** A roll gradient above this (rad per m/s^2) is called out: 15 deg/g (model.md, the same section). */
    static final double LARGE_ROLL_GRADIENT = 15 * RADIANS_PER_DEGREE / STANDARD_GRAVITY;

    private ModelRangeWarnings() {
    }

    static void addTo(List<Warning> warnings, AnalysisResult result) {
        for (AxlePosition axle : AxlePosition.values()) {
            reversedTransfer(result, axle).ifPresent(warnings::add);
        }
        for (AxlePosition axle : AxlePosition.values()) {
            outsideWheelUnloaded(result, axle).ifPresent(warnings::add);
        }
        lowLimit(result).ifPresent(warnings::add);
        rollGradient(result).ifPresent(warnings::add);
    }

    private static Optional<Warning> reversedTransfer(AnalysisResult result, AxlePosition axle) {
        LoadTransferParts parts = result.axle(axle).loadTransfer();
        if (parts.total() >= 0) {
            return Optional.empty();
        }
        double perG = STANDARD_GRAVITY;
        return Optional.of(new Warning(code(axle, "LOAD_TRANSFER_REVERSED"), String.format(Locale.ROOT,
                "The %s axle's load transfer is negative (%.0f N per g: unsprung %.0f, through the roll centre "
                        + "%.0f, through springs, bar and tyres %.0f): as the car corners, load moves onto the "
                        + "inside %s wheel instead of the outside one, the opposite of what an axle normally does. The front share of "
                        + "load transfer, %.0f %%, lies outside 0-100 %%. Check the roll centre heights (%s %.0f mm) "
                        + "and the CG height.",
                axle.key(), parts.total() * perG, parts.unsprung() * perG, parts.geometric() * perG,
                parts.elastic() * perG, axle.key(), 100 * result.frontLoadTransferShare(), axle.key(),
                result.vehicle().axle(axle).rollCentreHeight() * 1e3)));
    }

    /**
     * The outside wheel's load is piecewise linear in a_y, with corners only where an inside wheel lifts (gently
     * curved before the first lift where the roll centres migrate, model.md 11), so its lowest value up to the
     * limit is at 0, at a lift or at the limit.
     */
    private static Optional<Warning> outsideWheelUnloaded(AnalysisResult result, AxlePosition axle) {
        List<String> cases = new ArrayList<>();
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult turn = result.turn(direction);
            double worstAccel = 0;
            double worstLoad = Double.POSITIVE_INFINITY;
            for (double accel : new double[]{turn.frontInsideLift(), turn.rearInsideLift(), turn.limit()}) {
                if (!(accel <= turn.limit())) {
                    continue;
                }
                WheelLoads loads = turn.cornering().wheelLoads(accel);
                double outside = axle == AxlePosition.FRONT ? loads.frontOutside() : loads.rearOutside();
                if (outside < worstLoad) {
                    worstLoad = outside;
                    worstAccel = accel;
                }
            }
            if (worstLoad < 0) {
                cases.add(String.format(Locale.ROOT, "in a %s turn %.0f N at %.2f g (limit %.2f g)", direction.word(),
                        worstLoad, worstAccel / STANDARD_GRAVITY, turn.limit() / STANDARD_GRAVITY));
            }
        }
        if (cases.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Warning(code(axle, "OUTSIDE_WHEEL_UNLOADED_BEFORE_LIMIT"), "The outside "
                + axle.key() + " wheel's load falls below zero before the grip limit, " + String.join(" and ", cases)
                + ": a tyre cannot pull the car down onto the road, so the figures from there on are not "
                + "meaningful. The " + axle.key() + " axle moves load the wrong way (see its load transfer)."));
    }

    private static Optional<Warning> lowLimit(AnalysisResult result) {
        List<String> cases = new ArrayList<>();
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult turn = result.turn(direction);
            if (turn.limit() < LOW_LIMIT) {
                cases.add(String.format(Locale.ROOT, "%.3f g in a %s turn", turn.limit() / STANDARD_GRAVITY,
                        direction.word()));
            }
        }
        if (cases.isEmpty()) {
            return Optional.empty();
        }
        double lowest = Math.min(result.leftTurn().limit(), result.rightTurn().limit());
        // v = sqrt(a_y r) on a 20 m radius, in km/h
        double speed = Math.sqrt(Math.max(0, lowest) * 20) * 3.6;
        return Optional.of(new Warning("GRIP_LIMIT_VERY_LOW", "The car reaches its grip limit at only "
                + String.join(" and ", cases) + ", below 0.05 g: it could take a 20 m radius bend at no more than "
                + String.format(Locale.ROOT, "%.0f", speed) + " km/h. "
                + frictionAtStaticLoad(result)
                + "Check the tyre friction and its load sensitivity, the masses and the roll centre heights."));
    }

    /** @return the lower friction coefficient of each axle's tyres at their static loads, as a sentence */
    private static String frictionAtStaticLoad(AnalysisResult result) {
        MassProperties.StaticWheelLoads loads = result.masses().staticLoads();
        double front = Math.min(friction(result, AxlePosition.FRONT, loads.leftFront()),
                friction(result, AxlePosition.FRONT, loads.rightFront()));
        double rear = Math.min(friction(result, AxlePosition.REAR, loads.leftRear()),
                friction(result, AxlePosition.REAR, loads.rightRear()));
        return String.format(Locale.ROOT, "At their static loads the tyres' friction coefficient is %.2f front "
                + "and %.2f rear (model.md 8). ", front, rear);
    }

    private static double friction(AnalysisResult result, AxlePosition axle, double load) {
        return result.grip(axle).tyre().friction(load);
    }

    private static Optional<Warning> rollGradient(AnalysisResult result) {
        double gradient = result.rollGradient();
        double degPerG = gradient * STANDARD_GRAVITY / RADIANS_PER_DEGREE;
        if (gradient < 0) {
            return Optional.of(new Warning("BODY_LEANS_INTO_TURN", String.format(Locale.ROOT,
                    "The body leans into the turn (roll gradient %.2f deg/g): the roll axis passes %.0f mm above "
                            + "the sprung mass's centre of gravity, so the body hangs from it like a pendulum. Few "
                            + "cars are built so; check the roll centre and CG heights.",
                    degPerG, -result.masses().rollArm() * 1e3)));
        }
        if (gradient > LARGE_ROLL_GRADIENT) {
            double limit = Math.min(result.leftTurn().limit(), result.rightTurn().limit());
            return Optional.of(new Warning("ROLL_GRADIENT_VERY_LARGE", String.format(Locale.ROOT,
                    "The body rolls %.1f deg per g, more than 15 deg/g: at the grip limit of %.2f g it would lean "
                            + "about %.0f deg, past the travel of an ordinary suspension, where bump stops and "
                            + "geometry change everything this model assumes. The springs and bars are very soft "
                            + "for this car.", degPerG, limit / STANDARD_GRAVITY, degPerG * limit / STANDARD_GRAVITY)));
        }
        return Optional.empty();
    }

    private static String code(AxlePosition axle, String what) {
        return axle.key().toUpperCase(Locale.ROOT) + "_" + what;
    }
}
