package barwright.physics;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;

import java.util.List;

/**
 * Everything the model computes for one car (model.md 1-8), in SI base units.
 *
 * @param vehicle                  the car analysed
 * @param masses                   masses and roll axis
 * @param front                    the front axle
 * @param rear                     the rear axle
 * @param roll                     body roll per a_y with the full roll stiffnesses
 * @param suspensionRoll           body roll per a_y with the suspension-only stiffnesses
 * @param frontLoadTransferShare   dF_f / (dF_f + dF_r) before any lift
 * @param frontRollStiffnessShare  K_f / (K_f + K_r)
 * @param understeerGradient       W_f/C_f - W_r/C_r per unit a_y (rad s^2/m)
 * @param leftTurn                 the turn to the left
 * @param rightTurn                the turn to the right
 * @param warnings                 results a person should act on
 * @param frontGrip                the front tyres' grip the turns were worked out with
 * @param rearGrip                 the rear tyres'
 * @param migration                the roll centres' migration the turns followed, or null where no axle has a
 *                                 linkage (model.md 11)
 */
public record AnalysisResult(Vehicle vehicle, MassProperties masses, AxleResult front, AxleResult rear,
                             RollResponse roll, RollResponse suspensionRoll, double frontLoadTransferShare,
                             double frontRollStiffnessShare, double understeerGradient, TurnResult leftTurn,
                             TurnResult rightTurn, List<Warning> warnings, AxleGrip frontGrip, AxleGrip rearGrip,
                             RollCentreMigration migration) {
    public AnalysisResult {
        warnings = List.copyOf(warnings);
        java.util.Objects.requireNonNull(frontGrip, "frontGrip");
        java.util.Objects.requireNonNull(rearGrip, "rearGrip");
    }

    /** The figures of a car with typed roll centres, each axle's grip from its tyre at zero camber to the road. */
    public AnalysisResult(Vehicle vehicle, MassProperties masses, AxleResult front, AxleResult rear,
                          RollResponse roll, RollResponse suspensionRoll, double frontLoadTransferShare,
                          double frontRollStiffnessShare, double understeerGradient, TurnResult leftTurn,
                          TurnResult rightTurn, List<Warning> warnings) {
        this(vehicle, masses, front, rear, roll, suspensionRoll, frontLoadTransferShare, frontRollStiffnessShare,
                understeerGradient, leftTurn, rightTurn, warnings, new AxleGrip(new TyreModel(vehicle.front().tyre())),
                new AxleGrip(new TyreModel(vehicle.rear().tyre())), null);
    }

    /** @return the axle's tyre grip, the one the analysis used */
    public AxleGrip grip(AxlePosition position) {
        return position == AxlePosition.FRONT ? frontGrip : rearGrip;
    }

    public AxleResult axle(AxlePosition position) {
        return position == AxlePosition.FRONT ? front : rear;
    }

    public TurnResult turn(TurnDirection direction) {
        return direction == TurnDirection.LEFT ? leftTurn : rightTurn;
    }

    /** @return the linear stage of this analysis: roll stiffnesses, body roll and load transfer per a_y */
    public RollBalance rollBalance() {
        return new RollBalance(front.stiffness().rollStiffness(), rear.stiffness().rollStiffness(), roll,
                front.loadTransfer(), rear.loadTransfer());
    }

    /** @return roll gradient: body roll per unit a_y (rad s^2/m) */
    public double rollGradient() {
        return roll.rollPerAccel();
    }

    /** @return roll gradient with the suspension-only stiffnesses (rad s^2/m) */
    public double suspensionRollGradient() {
        return suspensionRoll.rollPerAccel();
    }
}
