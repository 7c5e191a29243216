package barwright.report.linkage;

import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.Linkage;
import barwright.model.Vehicle;
import barwright.physics.linkage.AxleKinematics;
import barwright.physics.linkage.LinkageLimitException;
import barwright.physics.linkage.RollState;
import barwright.physics.linkage.TravelState;

import java.util.ArrayList;
import java.util.List;

/**
 * One axle's geometry against roll and travel. A row the linkage cannot reach carries the reason instead of
 * figures.
 *
 * @param position                 which axle
 * @param linkage                  the axle's linkage, or null where the roll-centre height is typed in
 * @param staticRollCentreHeight   at the ride height (m): computed, or the typed one; null where the lines are
 *                                 parallel
 * @param roll                     rows against body roll
 * @param travel                   rows against wheel travel
 */
public record GeometryTables(AxlePosition position, Linkage linkage, Double staticRollCentreHeight,
                             List<RollRow> roll, List<TravelRow> travel) {

    /** A roll row: the state, or null with the reason it cannot be reached. */
    public record RollRow(double roll, RollState state, String unreachable) {
    }

    /** A travel row: the state, or null with the reason it cannot be reached. */
    public record TravelRow(double travel, TravelState state, String unreachable) {
    }

    /**
     * @param rolls    body roll angles (rad)
     * @param travels  wheel travels from the ride height (m)
     */
    public static GeometryTables of(Vehicle vehicle, AxlePosition position, List<Double> rolls, List<Double> travels) {
        Axle axle = vehicle.axle(position);
        if (!axle.hasLinkage()) {
            return new GeometryTables(position, null, axle.rollCentreHeight(), List.of(), List.of());
        }
        AxleKinematics kinematics = AxleKinematics.of(axle);
        RollState still = kinematics.atRideHeight();
        List<RollRow> rollRows = new ArrayList<>();
        for (double roll : rolls) {
            try {
                rollRows.add(new RollRow(roll, kinematics.roll(roll), null));
            } catch (LinkageLimitException beyond) {
                rollRows.add(new RollRow(roll, null, beyond.getMessage()));
            }
        }
        List<TravelRow> travelRows = new ArrayList<>();
        for (double travel : travels) {
            try {
                travelRows.add(new TravelRow(travel, kinematics.travel(travel), null));
            } catch (LinkageLimitException beyond) {
                travelRows.add(new TravelRow(travel, null, beyond.getMessage()));
            }
        }
        Double height = still.hasRollCentre() ? still.rollCentre().height() : null;
        return new GeometryTables(position, axle.suspension().linkage(), height, List.copyOf(rollRows),
                List.copyOf(travelRows));
    }
}
