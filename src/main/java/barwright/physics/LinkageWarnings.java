package barwright.physics;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * Warnings where a linkage's geometry stops following the body's roll before the grip limit (model.md, "When the
 * answer leaves the model"): the linkage locks or flips over, the roll passes what Barwright follows for the car,
 * or the roll centres fall so fast that the roll runs away. Past that roll the analysis holds the roll centres
 * and cambers where they were; the warning says at what roll and a_y that happens.
 */
final class LinkageWarnings {
    static final String LOCKS = "LINKAGE_LOCKS_BEFORE_LIMIT";
    static final String HELD = "ROLL_CENTRE_HELD_BEFORE_LIMIT";
    static final String RUNS_AWAY = "ROLL_RUNS_AWAY_BEFORE_LIMIT";

    private LinkageWarnings() {
    }

    static List<Warning> of(AnalysisResult result) {
        List<Warning> warnings = new ArrayList<>();
        RollCentreMigration migration = result.migration();
        if (migration == null) {
            return warnings;
        }
        double worstRoll = 0;
        TurnDirection worstTurn = TurnDirection.LEFT;
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult turn = result.turn(direction);
            double roll = Math.abs(turn.cornering().geometryRoll(turn.limit()));
            if (roll > worstRoll) {
                worstRoll = roll;
                worstTurn = direction;
            }
        }
        double limit = result.turn(worstTurn).limit();
        for (AxlePosition axle : AxlePosition.values()) {
            AxleRollGeometry geometry = migration.geometry(axle);
            if (geometry == null || !(worstRoll > geometry.endRoll())) {
                continue;
            }
            String where = where(migration, geometry.endRoll(), worstRoll, limit, worstTurn);
            if (geometry.linkageStops()) {
                warnings.add(new Warning(code(axle, LOCKS), String.format(Locale.ROOT,
                        "The %s linkage cannot follow the body's roll to the grip limit: %s, at %s. Past that "
                                + "the analysis holds the %s roll centre and cambers where they are there; in the "
                                + "car the suspension would bind or hit its stops, and the balance at the limit "
                                + "would not be what is shown. Check the pickup points, or stiffen the roll.",
                        axle.key(), geometry.stopReason(), where, axle.key())));
            } else {
                warnings.add(new Warning(code(axle, HELD), String.format(Locale.ROOT,
                        "The body rolls further at the grip limit than Barwright follows the %s linkage for this "
                                + "car (%s): from %s on the %s roll centre and cambers are held where they are "
                                + "there, so the limit and balance are rougher than usual.",
                        axle.key(), geometry.stopReason() != null ? geometry.stopReason()
                                : String.format(Locale.ROOT, "it is followed to %.1f deg",
                                Math.toDegrees(geometry.endRoll())), where, axle.key())));
            }
        }
        if (migration.heldBecause() != null && worstRoll > migration.heldFromRoll()) {
            warnings.add(new Warning(RUNS_AWAY, String.format(Locale.ROOT,
                    "Past %s %s: the analysis holds both roll centres where they are there. In the car the "
                            + "body would keep rolling onto its bump stops; treat the limit and balance shown as "
                            + "rough, and look at the roll-centre heights and the springs and bars.",
                    where(migration, migration.heldFromRoll(), worstRoll, limit, worstTurn),
                    migration.heldBecause())));
        }
        return warnings;
    }

    private static String where(RollCentreMigration migration, double roll, double rollAtLimit, double limit,
                                TurnDirection turn) {
        double accel = migration.accelForRoll(roll);
        String at = Double.isFinite(accel) && accel <= limit
                ? String.format(Locale.ROOT, "%.2f g", accel / STANDARD_GRAVITY) : "the first inside-wheel lift";
        return String.format(Locale.ROOT, "%.1f deg of body roll (reached at %s in a %s turn; the limit is %.2f g "
                + "with %.1f deg)", Math.toDegrees(roll), at, turn.word(), limit / STANDARD_GRAVITY,
                Math.toDegrees(rollAtLimit));
    }

    private static String code(AxlePosition axle, String what) {
        return axle.key().toUpperCase(Locale.ROOT) + "_" + what;
    }
}
