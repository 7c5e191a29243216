package barwright.report.dynamics;

import barwright.physics.dynamics.LapReplay;
import barwright.physics.dynamics.RollState;
import barwright.physics.dynamics.TransientResult;

import java.util.List;
import java.util.Locale;

import static barwright.units.Conversions.toDegrees;
import static barwright.units.Conversions.toG;

/**
 * Every recorded state of a run as CSV (file-format.md, "transient CSV"), in the fixed units of the files:
 * s, g, deg, N. A lap's replay adds each axle's grip used.
 */
public final class TransientCsv {
    private TransientCsv() {
    }

    /** @param replay the lap's replay for the grip columns, or null for a step or a sine */
    public static String of(TransientResult result, LapReplay replay) {
        StringBuilder out = new StringBuilder("timeS,lateralAccelerationG,rollDeg,frontRollDeg,rearRollDeg,"
                + "leftFrontN,rightFrontN,leftRearN,rightRearN,frontLoadTransferN,rearLoadTransferN,frontSharePercent");
        out.append(replay == null ? "\n" : ",frontGripUsedPercent,rearGripUsedPercent\n");
        List<RollState> states = result.run().states();
        for (int i = 0; i < states.size(); i++) {
            RollState s = states.get(i);
            out.append(String.format(Locale.ROOT, "%.4f,%.4f,%.4f,%.4f,%.4f,%.1f,%.1f,%.1f,%.1f,%.1f,%.1f,%.2f",
                    s.time(), toG(s.lateral()), toDegrees(s.roll()), toDegrees(s.frontRoll()),
                    toDegrees(s.rearRoll()), s.leftFront(), s.rightFront(), s.leftRear(), s.rightRear(),
                    s.frontTransfer(), s.rearTransfer(), 100 * s.frontShare()));
            if (replay != null) {
                out.append(String.format(Locale.ROOT, ",%.1f,%.1f", 100 * replay.frontGripUsed()[i],
                        100 * replay.rearGripUsed()[i]));
            }
            out.append('\n');
        }
        return out.toString();
    }
}
