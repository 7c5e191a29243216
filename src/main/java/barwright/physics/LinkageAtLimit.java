package barwright.physics;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.linkage.RollState;

/**
 * One linkage axle at the car's grip limit (model.md 11): the body roll there as the analysis solved it with the
 * roll centres migrating ({@link RollCentreMigration}), and the linkage at that roll: the kinematic roll centre
 * (worked out exactly at that roll, not read from the table), the load-transfer height and the cambers the
 * analysis used. Past the first inside-wheel lift the linkage is taken at the lift's roll, as the analysis takes
 * it. Angles in rad, lengths in m.
 *
 * @param turn                       the turn with the lower limit (the left one on a tie)
 * @param rollAtLimit                body roll at the limit (rad), positive where the body leans out of the turn
 * @param rollCentreHeight           static kinematic roll-centre height (m), or null with no roll centre
 * @param rollCentreHeightAtLimit    kinematic roll-centre height at the limit's roll (m), or null where the lines
 *                                   are parallel there
 * @param rollCentreMigrationPerRoll its change per radian of roll from rest to the limit (m/rad), or null
 * @param loadTransferHeightAtLimit  the height that set the geometric load transfer at the limit in the analysis (m)
 * @param outsideCamberAtLimit       the outside wheel's camber to the road at the limit (rad), SAE J670
 * @param insideCamberAtLimit        the inside wheel's camber to the road at the limit (rad), SAE J670
 * @param camberChangePerRoll        the outside wheel's camber change per radian of body roll, rest to limit
 */
public record LinkageAtLimit(TurnDirection turn, double rollAtLimit, Double rollCentreHeight,
                             Double rollCentreHeightAtLimit, Double rollCentreMigrationPerRoll,
                             double loadTransferHeightAtLimit, double outsideCamberAtLimit,
                             double insideCamberAtLimit, double camberChangePerRoll) {
    /**
     * @param result the analysis of the car (its limits and the roll its turns followed)
     * @return the axle at the limit, or null where the axle has no linkage (or the result carries no migration)
     */
    public static LinkageAtLimit of(AnalysisResult result, AxlePosition position) {
        Vehicle vehicle = result.vehicle();
        RollCentreMigration migration = result.migration();
        if (!vehicle.axle(position).hasLinkage() || migration == null || migration.geometry(position) == null) {
            return null;
        }
        AxleRollGeometry geometry = migration.geometry(position);
        TurnDirection turn = result.rightTurn().limit() < result.leftTurn().limit()
                ? TurnDirection.RIGHT : TurnDirection.LEFT;
        TurnResult atTheLimit = result.turn(turn);
        double limit = atTheLimit.limit();
        // the roll the analysis solved at the limit (model.md 11), and the roll its linkage geometry was taken at
        double roll = atTheLimit.cornering().rollAngle(limit);
        double geometryRoll = atTheLimit.cornering().geometryRoll(limit);
        RollState rest = geometry.exactState(0);
        RollState atLimit = geometry.exactState(geometryRoll);
        double outside = geometry.outsideCamber(geometryRoll);
        double inside = geometry.insideCamber(geometryRoll);
        Double staticHeight = rest.hasRollCentre() ? rest.rollCentre().height() : null;
        Double heightAtLimit = atLimit.hasRollCentre() ? atLimit.rollCentre().height() : null;
        Double migrationPerRoll = staticHeight != null && heightAtLimit != null && geometryRoll != 0
                ? (heightAtLimit - staticHeight) / geometryRoll : null;
        return new LinkageAtLimit(turn, roll, staticHeight, heightAtLimit, migrationPerRoll,
                migration.loadTransferHeight(position, geometryRoll), outside, inside,
                geometryRoll != 0 ? (outside - geometry.outsideCamber(0)) / geometryRoll : 0);
    }
}
