package barwright.ui.dynamics;

import barwright.physics.dynamics.LapReplay;
import barwright.physics.dynamics.RollState;
import barwright.physics.dynamics.TransientResult;
import barwright.ui.field.ViewSettings;
import barwright.units.Figures;
import barwright.units.Quantity;

/** A replayed lap's figures in words: the lift risk over the lap, and the car at the cursor. */
final class LapFigures {
    private final ViewSettings view;

    LapFigures(ViewSettings view) {
        this.view = view;
    }

    /** @param dampers words on a missing damper, or null */
    String liftRisk(LapReplay replay, String dampers) {
        TransientResult.WheelFigures lifted = replay.secondsLifted();
        TransientResult.WheelFigures near = replay.secondsNearLift();
        TransientResult.WheelFigures least = replay.result().leastLoads();
        StringBuilder text = new StringBuilder("<html><b>Lift risk over the lap</b><table cellpadding=1>"
                + "<tr><th align=left>wheel</th><th>lifted</th><th>near lift*</th><th>least load</th></tr>");
        row(text, "left front", lifted.leftFront(), near.leftFront(), least.leftFront());
        row(text, "right front", lifted.rightFront(), near.rightFront(), least.rightFront());
        row(text, "left rear", lifted.leftRear(), near.leftRear(), least.leftRear());
        row(text, "right rear", lifted.rightRear(), near.rightRear(), least.rightRear());
        text.append("</table>* below ").append(Math.round(LapReplay.NEAR_LIFT * 100))
                .append(" % of the load standing still, lifted included.<br>")
                .append(String.format(view.locale(), "Most grip used: front %.0f %%, rear %.0f %% of the axle's limit.",
                        replay.peakFrontGripUsed() * 100, replay.peakRearGripUsed() * 100));
        if (dampers != null) {
            text.append("<br>").append(TurnInFigures.escape(dampers));
        }
        return text.append("</html>").toString();
    }

    private void row(StringBuilder text, String wheel, double lifted, double near, double least) {
        text.append(String.format(view.locale(), "<tr><td>%s</td><td align=right>%.2f s</td>"
                + "<td align=right>%.2f s</td><td align=right>%s</td></tr>", wheel, lifted, near,
                Figures.format(least, Quantity.FORCE, view.units(), 0, view.locale())));
    }

    String atCursor(RollState state, double frontGrip, double rearGrip) {
        return String.format(view.locale(), "<html>At the cursor (arrow keys move it; Shift for %d samples): "
                        + "front share of load transfer %.0f %%, grip used front %.0f %%, rear %.0f %%</html>",
                LapView.BIG_STEP, state.frontShare() * 100, frontGrip * 100, rearGrip * 100);
    }
}
