package barwright.physics;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.bar.BarResult;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Optional;

import static barwright.units.Constants.STANDARD_GRAVITY;

/** The warnings of an analysis, each with a stable code and a message in words. */
public final class Warnings {
    /** Below this static safety factor a bar is flagged (common practice for a part that fails at speed). */
    public static final double LOW_SAFETY_FACTOR = 1.5;

    private Warnings() {
    }

    static List<Warning> of(AnalysisResult result) {
        List<Warning> warnings = new ArrayList<>();
        for (AxlePosition axle : AxlePosition.values()) {
            liftWarning(result, axle).ifPresent(warnings::add);
        }
        rolloverWarning(result).ifPresent(warnings::add);
        warnings.addAll(TyreWarnings.of(result));
        warnings.addAll(LinkageWarnings.of(result));
        for (AxlePosition axle : AxlePosition.values()) {
            BarResult bar = result.axle(axle).bar();
            if (bar == null) {
                continue;
            }
            String prefix = axle.key().toUpperCase(Locale.ROOT);
            if (bar.safetyFactor() < 1) {
                warnings.add(new Warning(prefix + "_BAR_YIELDS_AT_CHECK_TRAVEL", String.format(Locale.ROOT,
                        "The %s bar is stressed past yield at the check travel (%.0f MPa against a yield strength "
                                + "of %.0f MPa): it will take a set or break.", axle.key(),
                        bar.maxVonMisesStress() / 1e6, result.vehicle().axle(axle).bar().material().yieldStrength() / 1e6)));
            } else if (bar.safetyFactor() < LOW_SAFETY_FACTOR) {
                warnings.add(new Warning(prefix + "_BAR_SAFETY_FACTOR_LOW", String.format(Locale.ROOT,
                        "The %s bar's safety factor against yield is %.2f at the check travel, below %.1f.",
                        axle.key(), bar.safetyFactor(), LOW_SAFETY_FACTOR)));
            }
        }
        ModelRangeWarnings.addTo(warnings, result);
        return warnings;
    }

    private static Optional<Warning> liftWarning(AnalysisResult result, AxlePosition axle) {
        List<String> cases = new ArrayList<>();
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult turn = result.turn(direction);
            double lift = axle == AxlePosition.FRONT ? turn.frontInsideLift() : turn.rearInsideLift();
            if (lift < turn.limit()) {
                cases.add(String.format(Locale.ROOT, "in a %s turn at %.2f g (limit %.2f g)", direction.word(),
                        lift / STANDARD_GRAVITY, turn.limit() / STANDARD_GRAVITY));
            }
        }
        if (cases.isEmpty()) {
            return Optional.empty();
        }
        String code = axle.key().toUpperCase(Locale.ROOT) + "_INSIDE_LIFT_BEFORE_LIMIT";
        return Optional.of(new Warning(code, "The inside " + axle.key()
                + " wheel lifts before the grip limit, " + String.join(" and ", cases) + "."));
    }

    private static Optional<Warning> rolloverWarning(AnalysisResult result) {
        List<String> cases = new ArrayList<>();
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult turn = result.turn(direction);
            if (turn.rollsOverBeforeSliding()) {
                cases.add(String.format(Locale.ROOT, "in a %s turn at %.2f g", direction.word(),
                        turn.rollover() / STANDARD_GRAVITY));
            }
        }
        if (cases.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new Warning("ROLLOVER_BEFORE_LIMIT",
                "Both inside wheels leave the ground before the tyres reach their grip: the car would roll over "
                        + String.join(" and ", cases) + "."));
    }
}
