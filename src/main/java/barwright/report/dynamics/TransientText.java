package barwright.report.dynamics;

import barwright.physics.dynamics.LapReplay;
import barwright.physics.dynamics.TransientResult;
import barwright.report.Cautions;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.Locale;

/** The {@code transient} command's readable summary, in the chosen units. */
public final class TransientText {
    /** The roll model's own caution, beside the steady model's. */
    public static final String CAUTION = "The roll in motion is a one-degree-of-freedom body on its roll axis "
            + "(two ends where a chassis stiffness is given): no heave, pitch, tyre lag or steering. Use it to "
            + "compare set-ups, not to predict a wheel lift to the millisecond.";

    private final UnitSystem units;

    public TransientText(UnitSystem units) {
        this.units = units;
    }

    /** @param replay the lap's replay, or null for a step or a sine */
    public String of(String vehicleName, String drive, TransientResult result, LapReplay replay) {
        StringBuilder out = new StringBuilder();
        out.append("Barwright roll in motion: ").append(vehicleName).append('\n');
        out.append("Input: ").append(drive).append("\n\n");
        line(out, "Roll natural frequency (undamped, straight ahead)",
                String.format(Locale.ROOT, "%.2f Hz", result.modes().naturalFrequency()));
        line(out, "Roll damping ratio (straight ahead)",
                String.format(Locale.ROOT, "%.2f (1 = critically damped)", result.modes().dampingRatio()));
        if (Double.isFinite(result.steadyRoll())) {
            line(out, "Steady roll (the steady analysis)", format(Quantity.ANGLE, result.steadyRoll()));
        }
        line(out, "Peak roll", format(Quantity.ANGLE, result.peakRoll()) + " at "
                + seconds(result.peakRollTime()));
        if (Double.isFinite(result.overshoot())) {
            line(out, "Overshoot", String.format(Locale.ROOT, "%.1f %%", 100 * result.overshoot()));
        }
        if (Double.isFinite(result.timeTo90Percent())) {
            line(out, "Time to 90 % of the steady roll", seconds(result.timeTo90Percent()));
        }
        line(out, "Front peak load transfer", format(Quantity.FORCE, result.frontPeak().value()) + " at "
                + seconds(result.frontPeak().time()));
        line(out, "Rear peak load transfer", format(Quantity.FORCE, result.rearPeak().value()) + " at "
                + seconds(result.rearPeak().time()));
        TransientResult.WheelFigures least = result.leastLoads();
        line(out, "Least wheel load LF / RF / LR / RR", format(Quantity.FORCE, least.leftFront()) + " / "
                + format(Quantity.FORCE, least.rightFront()) + " / " + format(Quantity.FORCE, least.leftRear())
                + " / " + format(Quantity.FORCE, least.rightRear()));
        line(out, "First inside-wheel lift", Double.isNaN(result.run().firstLift()) ? "none"
                : "at " + seconds(result.run().firstLift()));
        if (!Double.isNaN(result.run().rolloverTime())) {
            line(out, "ROLL-OVER", "both wheels of one side off the ground at "
                    + seconds(result.run().rolloverTime()) + "; the run stops there");
        }
        if (replay != null) {
            out.append('\n');
            TransientResult.WheelFigures lifted = replay.secondsLifted();
            TransientResult.WheelFigures near = replay.secondsNearLift();
            line(out, "Time lifted LF / RF / LR / RR", String.format(Locale.ROOT, "%.2f / %.2f / %.2f / %.2f s",
                    lifted.leftFront(), lifted.rightFront(), lifted.leftRear(), lifted.rightRear()));
            line(out, "Time under 10 % of static load", String.format(Locale.ROOT,
                    "%.2f / %.2f / %.2f / %.2f s", near.leftFront(), near.rightFront(), near.leftRear(),
                    near.rightRear()));
            line(out, "Most grip used front / rear", String.format(Locale.ROOT, "%.0f %% / %.0f %%",
                    100 * replay.peakFrontGripUsed(), 100 * replay.peakRearGripUsed()));
        }
        out.append('\n').append(CAUTION).append('\n').append(Cautions.SHORT).append('\n');
        return out.toString();
    }

    private static void line(StringBuilder out, String label, String value) {
        out.append(String.format(Locale.ROOT, "%-52s %s%n", label, value));
    }

    private String format(Quantity quantity, double si) {
        var unit = quantity.unit(units);
        String pattern = quantity == Quantity.ANGLE ? "%.2f %s" : "%.0f %s";
        return String.format(Locale.ROOT, pattern, unit.fromSi(si), unit.symbol()).trim();
    }

    private static String seconds(double time) {
        return String.format(Locale.ROOT, "%.3f s", time);
    }
}
