package barwright.physics;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.linkage.AxleKinematics;
import barwright.physics.linkage.RollState;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;

/**
 * One linkage axle at the car's grip limit (model.md 12): the body roll there and the roll-centre heights solved
 * together (the roll axis moves as the body rolls, and the roll gradient with it), and what the wheels do there.
 * Angles in rad, lengths in m.
 *
 * @param turn                       the turn with the lower limit (the left one on a tie)
 * @param rollAtLimit                body roll at the limit (rad), positive
 * @param rollCentreHeight           static kinematic roll-centre height (m), or null with no roll centre
 * @param rollCentreHeightAtLimit    kinematic roll-centre height at the limit's roll (m), or null where the lines
 *                                   are parallel there
 * @param rollCentreMigrationPerRoll its change per radian of roll from rest to the limit (m/rad), or null
 * @param loadTransferHeightAtLimit  the height that sets the geometric load transfer at the limit's roll (m)
 * @param outsideCamberAtLimit       the outside wheel's camber to the road at the limit (rad), SAE J670
 * @param insideCamberAtLimit        the inside wheel's camber to the road at the limit (rad), SAE J670
 * @param camberChangePerRoll        the outside wheel's camber change per radian of body roll, rest to limit
 */
public record LinkageAtLimit(TurnDirection turn, double rollAtLimit, Double rollCentreHeight,
                             Double rollCentreHeightAtLimit, Double rollCentreMigrationPerRoll,
                             double loadTransferHeightAtLimit, double outsideCamberAtLimit,
                             double insideCamberAtLimit, double camberChangePerRoll) {
    /** Accuracy of the solved roll at the limit (rad). */
    static final double ROLL_ACCURACY = 1e-10;
    /** Evaluations allowed for that solve: each is one roll state per linkage axle and a roll gradient. */
    static final int MAX_EVALUATIONS = 60;

    /**
     * @param result the analysis of the car (its limits and roll stiffnesses)
     * @return the axle at the limit, or null where the axle has no linkage
     * @throws ImpossibleVehicleException where a linkage cannot follow the body's roll to the limit
     */
    public static LinkageAtLimit of(AnalysisResult result, AxlePosition position) {
        Vehicle vehicle = result.vehicle();
        if (!vehicle.axle(position).hasLinkage()) {
            return null;
        }
        TurnDirection turn = result.rightTurn().limit() < result.leftTurn().limit()
                ? TurnDirection.RIGHT : TurnDirection.LEFT;
        double limit = result.turn(turn).limit();
        AxleKinematics front = vehicle.front().hasLinkage() ? LinkageResolution.kinematics(vehicle, AxlePosition.FRONT) : null;
        AxleKinematics rear = vehicle.rear().hasLinkage() ? LinkageResolution.kinematics(vehicle, AxlePosition.REAR) : null;
        double frontStiffness = result.front().stiffness().rollStiffness();
        double rearStiffness = result.rear().stiffness().rollStiffness();
        Vehicle atRest = LinkageResolution.atRideHeight(vehicle);
        // phi = a_y,limit * (roll per a_y with the roll centres at phi): solved for phi with Brent's method
        double firstGuess = limit * result.roll().rollPerAccel();
        org.apache.commons.math3.analysis.UnivariateFunction closure = phi -> phi - limit
                * rollPerAccel(atRest, front, rear, phi, frontStiffness, rearStiffness);
        double roll;
        try {
            roll = firstGuess <= 0 ? 0 : new BracketingNthOrderBrentSolver(1e-14, ROLL_ACCURACY, 0, 5)
                    .solve(MAX_EVALUATIONS, closure, 0, 2 * firstGuess, AllowedSolution.ANY_SIDE);
        } catch (NoBracketingException runaway) {
            throw new ImpossibleVehicleException(position.key() + ".linkage: the roll centres move so far as the body "
                    + "rolls that no steady roll at the limit exists within twice the static estimate");
        }
        AxleKinematics kinematics = position == AxlePosition.FRONT ? front : rear;
        double signed = turn == TurnDirection.LEFT ? roll : -roll;
        RollState rest = LinkageResolution.roll(kinematics, position, 0);
        RollState atLimit = LinkageResolution.roll(kinematics, position, signed);
        double outside = turn == TurnDirection.LEFT ? atLimit.rightCamber() : atLimit.leftCamber();
        double inside = turn == TurnDirection.LEFT ? atLimit.leftCamber() : atLimit.rightCamber();
        double outsideAtRest = turn == TurnDirection.LEFT ? rest.rightCamber() : rest.leftCamber();
        Double staticHeight = rest.hasRollCentre() ? rest.rollCentre().height() : null;
        Double heightAtLimit = atLimit.hasRollCentre() ? atLimit.rollCentre().height() : null;
        Double migration = staticHeight != null && heightAtLimit != null && roll > 0
                ? (heightAtLimit - staticHeight) / roll : null;
        return new LinkageAtLimit(turn, roll, staticHeight, heightAtLimit, migration, atLimit.loadTransferHeight(),
                outside, inside, roll > 0 ? (outside - outsideAtRest) / roll : 0);
    }

    /** @return the body's roll per a_y with each linkage axle's roll centre at its height for the roll phi */
    private static double rollPerAccel(Vehicle atRest, AxleKinematics front, AxleKinematics rear, double phi,
                                       double frontStiffness, double rearStiffness) {
        Vehicle rolled = atRest;
        if (front != null) {
            rolled = rolled.withFront(rolled.front().withRollCentreHeight(
                    LinkageResolution.roll(front, AxlePosition.FRONT, phi).loadTransferHeight()));
        }
        if (rear != null) {
            rolled = rolled.withRear(rolled.rear().withRollCentreHeight(
                    LinkageResolution.roll(rear, AxlePosition.REAR, phi).loadTransferHeight()));
        }
        return RollResponse.of(MassProperties.of(rolled), frontStiffness, rearStiffness,
                rolled.chassisTorsionalStiffness()).rollPerAccel();
    }
}
