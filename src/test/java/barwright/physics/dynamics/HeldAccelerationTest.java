package barwright.physics.dynamics;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.SteadyCornering;
import barwright.physics.TestCars;
import barwright.physics.VehicleAnalysis;
import barwright.physics.WheelLoads;
import org.junit.jupiter.api.Test;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * A held a_y must end where the steady analysis (model.md 5-7) is: the issue's requirement, and a limit case
 * of the dynamics (every rate zero, the dampers carry nothing). Tolerance 1e-6 relative (the issue's); the
 * runs are long enough that the slowest mode has decayed by far more than that (e^-zeta omega_n t < 1e-9).
 */
class HeldAccelerationTest {
    private static final double RELATIVE = 1e-6;
    private static final double HOLD_SECONDS = 15;

    @Test
    void rigidChassisReachesTheSteadyRollAndLoads() {
        check(TestCars.clubCar(), 0.6 * STANDARD_GRAVITY);
        check(TestCars.clubCar(), -0.6 * STANDARD_GRAVITY);
    }

    @Test
    void cornerWeightedCarReachesTheSteadyLoadsInBothTurns() {
        check(TestCars.asymmetricClubCar(), 0.7 * STANDARD_GRAVITY);
        check(TestCars.asymmetricClubCar(), -0.7 * STANDARD_GRAVITY);
    }

    @Test
    void flexibleChassisReachesTheSteadyRollAndLoads() {
        Vehicle flexible = TestCars.clubCar().withChassisTorsionalStiffness(3000 / Math.toRadians(1));
        check(flexible, 0.8 * STANDARD_GRAVITY);
    }

    @Test
    void carThatLiftsAWheelReachesTheSteadyPostLiftFigures() {
        Vehicle car = TestCars.clubCar();
        AnalysisResult steady = VehicleAnalysis.analyse(car);
        SteadyCornering left = steady.leftTurn().cornering();
        double lift = Math.min(left.insideLift(AxlePosition.FRONT), left.insideLift(AxlePosition.REAR));
        // a third of the way from the first lift to the roll-over, reached gently (a sudden step would overshoot
        // into a roll-over that the steady model does not have)
        double held = lift + (left.rollover() - lift) / 3;
        TransientResult result = check(car, held, 4);
        assertTrue(Double.isNaN(result.run().rolloverTime()), "no roll-over");
        assertTrue(result.run().firstLift() > 0, "the lift is found as an event");
    }

    private static TransientResult check(Vehicle car, double held) {
        return check(car, held, 0.2);
    }

    private static TransientResult check(Vehicle car, double held, double riseTime) {
        AnalysisResult steady = VehicleAnalysis.analyse(car);
        TransientResult result = TransientAnalysis.step(steady, DynamicsCars.damped(),
                new LateralInput.Step(held, riseTime), HOLD_SECONDS);
        RollState last = result.run().states().get(result.run().states().size() - 1);
        double roll = TransientAnalysis.steadyRoll(steady, held);
        assertEquals(roll, last.roll(), RELATIVE * Math.abs(roll), "roll");
        WheelLoads loads = TransientAnalysis.steadyTurn(steady, held).wheelLoads(Math.abs(held));
        boolean leftTurn = held > 0;
        double scale = loads.total() / 4;
        assertEquals(leftTurn ? loads.frontInside() : loads.frontOutside(), last.leftFront(), RELATIVE * scale, "LF");
        assertEquals(leftTurn ? loads.frontOutside() : loads.frontInside(), last.rightFront(), RELATIVE * scale, "RF");
        assertEquals(leftTurn ? loads.rearInside() : loads.rearOutside(), last.leftRear(), RELATIVE * scale, "LR");
        assertEquals(leftTurn ? loads.rearOutside() : loads.rearInside(), last.rightRear(), RELATIVE * scale, "RR");
        return result;
    }
}
