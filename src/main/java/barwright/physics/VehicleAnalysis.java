package barwright.physics;

import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.bar.BarResult;

import java.util.List;

import static barwright.units.Constants.STANDARD_GRAVITY;

/** One full analysis of a car: model.md 1-8, both turn directions. */
public final class VehicleAnalysis {
    /** Points of each handling curve. */
    public static final int HANDLING_CURVE_POINTS = 50;

    private VehicleAnalysis() {
    }

    /**
     * @throws ImpossibleVehicleException where the car cannot be analysed (no stable roll position, no
     *                                    sprung mass)
     */
    public static AnalysisResult analyse(Vehicle given) {
        // linkage axles: the computed static roll centre and the ride-height changes (model.md 11)
        Vehicle vehicle = LinkageResolution.atRideHeight(given);
        MassProperties masses = MassProperties.of(vehicle);
        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        double frontCornerSprung = AxleStiffness.cornerSprungMass(vehicle.front(), AxlePosition.FRONT, loads.frontAxle());
        double rearCornerSprung = AxleStiffness.cornerSprungMass(vehicle.rear(), AxlePosition.REAR, loads.rearAxle());
        BarResult frontBar = barResult(vehicle.front(), vehicle);
        BarResult rearBar = barResult(vehicle.rear(), vehicle);
        AxleStiffness frontStiffness = AxleStiffness.of(vehicle.front(), frontBar, frontCornerSprung);
        AxleStiffness rearStiffness = AxleStiffness.of(vehicle.rear(), rearBar, rearCornerSprung);
        double frontRoll = frontStiffness.rollStiffness();
        double rearRoll = rearStiffness.rollStiffness();
        Double chassis = vehicle.chassisTorsionalStiffness();

        RollResponse roll = RollResponse.of(masses, frontRoll, rearRoll, chassis);
        RollResponse suspensionRoll = RollResponse.of(masses, frontStiffness.suspensionRollStiffness(),
                rearStiffness.suspensionRollStiffness(), chassis);
        LoadTransferParts frontParts = LoadTransferParts.of(vehicle.front(), masses.frontSprungMass(), frontRoll,
                roll.frontRollPerAccel());
        LoadTransferParts rearParts = LoadTransferParts.of(vehicle.rear(), masses.rearSprungMass(), rearRoll,
                roll.rearRollPerAccel());
        double frontTransfer = frontParts.total();
        double rearTransfer = rearParts.total();

        AxleGrip frontGrip = new AxleGrip(new TyreModel(vehicle.front().tyre()));
        AxleGrip rearGrip = new AxleGrip(new TyreModel(vehicle.rear().tyre()));
        double frontCornering = frontGrip.corneringStiffness(loads.leftFront(), loads.rightFront());
        double rearCornering = rearGrip.corneringStiffness(loads.leftRear(), loads.rightRear());
        // K = W_f/C_f - W_r/C_r in rad per g (Gillespie, Fundamentals of Vehicle Dynamics, ch. 6), per m/s^2 here
        double understeer = (loads.frontAxle() / frontCornering - loads.rearAxle() / rearCornering)
                / STANDARD_GRAVITY;

        TurnResult[] turns = new TurnResult[2];
        for (TurnDirection direction : TurnDirection.values()) {
            SteadyCornering cornering = new SteadyCornering(direction, masses, vehicle.cgHeight(),
                    vehicle.front().track(), vehicle.rear().track(), frontTransfer, rearTransfer, roll,
                    frontRoll, rearRoll, chassis);
            if (direction == TurnDirection.RIGHT && loads.symmetric()) {
                // the same on both sides, the car turns right exactly as it turns left: the limits and the
                // handling curve are the left turn's, number for number (half the work of an analysis)
                turns[direction.ordinal()] = turns[TurnDirection.LEFT.ordinal()].withCornering(cornering);
            } else {
                turns[direction.ordinal()] = TurnAnalysis.analyse(cornering, masses.mass(),
                        masses.frontMassFraction(), frontGrip, rearGrip, HANDLING_CURVE_POINTS);
            }
        }
        AxleResult front = new AxleResult(frontStiffness, frontBar, frontParts, frontCornering, frontCornerSprung);
        AxleResult rear = new AxleResult(rearStiffness, rearBar, rearParts, rearCornering, rearCornerSprung);
        double frontShare = frontTransfer / (frontTransfer + rearTransfer);
        double rollShare = frontRoll / (frontRoll + rearRoll);
        AnalysisResult withoutWarnings = new AnalysisResult(vehicle, masses, front, rear, roll, suspensionRoll,
                frontShare, rollShare, understeer, turns[0], turns[1], List.of());
        return new AnalysisResult(vehicle, masses, front, rear, roll, suspensionRoll, frontShare, rollShare,
                understeer, turns[0], turns[1], Warnings.of(withoutWarnings));
    }

    /**
     * The steady turn of an analysed car with a steady longitudinal acceleration as well (model.md 7): the
     * static wheel loads shifted by m a_x h / l from the front axle to the rear, then the lateral calculation of
     * the analysis. With a_x = 0 it is the analysis's own turn.
     *
     * @param longitudinalAcceleration a_x, forward positive (m/s^2)
     */
    public static SteadyCornering cornering(AnalysisResult result, TurnDirection direction,
                                            double longitudinalAcceleration) {
        Vehicle vehicle = result.vehicle();
        MassProperties shifted = result.masses().withLongitudinalAcceleration(longitudinalAcceleration,
                vehicle.cgHeight());
        return new SteadyCornering(direction, shifted, vehicle.cgHeight(), vehicle.front().track(),
                vehicle.rear().track(), result.front().loadTransfer().total(), result.rear().loadTransfer().total(),
                result.roll(), result.front().stiffness().rollStiffness(), result.rear().stiffness().rollStiffness(),
                vehicle.chassisTorsionalStiffness());
    }

    private static BarResult barResult(Axle axle, Vehicle vehicle) {
        return axle.hasBar() ? BarAnalysis.analyse(axle.bar(), vehicle.differentialWheelTravel()) : null;
    }
}
