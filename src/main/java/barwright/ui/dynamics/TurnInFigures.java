package barwright.ui.dynamics;

import barwright.physics.dynamics.RollState;
import barwright.physics.dynamics.TransientResult;
import barwright.ui.field.ViewSettings;
import barwright.units.Figures;
import barwright.units.Quantity;

import java.util.List;
import java.util.Locale;

/** The key figures of a step run in words, in the view's units; a figure that does not apply says why. */
final class TurnInFigures {
    private static final String[] WHEELS = {"left front", "right front", "left rear", "right rear"};
    private final ViewSettings view;

    TurnInFigures(ViewSettings view) {
        this.view = view;
    }

    String html(DynamicsCar car, TransientResult result) {
        StringBuilder text = new StringBuilder("<html>");
        text.append(String.format(Locale.ROOT, "<b>Roll natural frequency %s, damping ratio %s</b> "
                        + "(undamped frequency and share of critical damping, straight ahead)<br>",
                f(result.modes().naturalFrequency(), Quantity.FREQUENCY, 2),
                String.format(view.locale(), "%.2f", result.modes().dampingRatio())));
        text.append("Steady roll ").append(f(Math.abs(result.steadyRoll()), Quantity.ANGLE, 2))
                .append(", peak ").append(f(Math.abs(result.peakRoll()), Quantity.ANGLE, 2))
                .append(String.format(view.locale(), " at %.3f s", result.peakRollTime()));
        if (Double.isFinite(result.overshoot())) {
            text.append(String.format(view.locale(), ": overshoot %.1f %%", result.overshoot() * 100));
        }
        text.append(Double.isFinite(result.timeTo90Percent())
                ? String.format(view.locale(), "; 90 %% of the steady roll at %.3f s", result.timeTo90Percent())
                : "; the roll never reaches 90 % of the steady roll in this run");
        text.append("<br>Peak load transfer: front ").append(f(result.frontPeak().value(), Quantity.FORCE, 0))
                .append(String.format(view.locale(), " at %.3f s", result.frontPeak().time()))
                .append(", rear ").append(f(result.rearPeak().value(), Quantity.FORCE, 0))
                .append(String.format(view.locale(), " at %.3f s", result.rearPeak().time())).append("<br>");
        text.append(lift(result)).append("<br>");
        if (Double.isFinite(result.run().rolloverTime())) {
            text.append(String.format(view.locale(), "<b>Both wheels of one side leave the ground at %.3f s: the "
                    + "car rolls over and the run stops there.</b><br>", result.run().rolloverTime()));
        }
        String dampers = car.missingDampers();
        if (dampers != null) {
            text.append(escape(dampers)).append("<br>");
        }
        return text.append("</html>").toString();
    }

    /** @return the first inside-wheel lift in time, naming the wheel, or that none lifts */
    static String lift(TransientResult result) {
        double first = result.run().firstLift();
        if (!Double.isFinite(first)) {
            return "No inside wheel lifts in this run.";
        }
        List<RollState> states = result.run().states();
        for (RollState state : states) {
            double[] loads = {state.leftFront(), state.rightFront(), state.leftRear(), state.rightRear()};
            for (int wheel = 0; wheel < 4; wheel++) {
                if (loads[wheel] <= 0) {
                    return String.format(Locale.ROOT, "First inside-wheel lift: the %s at %.3f s.", WHEELS[wheel],
                            first);
                }
            }
        }
        return String.format(Locale.ROOT, "First inside-wheel lift at %.3f s.", first);
    }

    private String f(double si, Quantity quantity, int decimals) {
        return Figures.format(si, quantity, view.units(), decimals, view.locale());
    }

    static String escape(String words) {
        return words.replace("&", "&amp;").replace("<", "&lt;").replace(">", "&gt;");
    }
}
