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

    /**
     * A ramp of a_y over 40 s: at each a_y the roll is the steady analysis's, within the lag a damped system
     * has behind a ramp. A linear I phi'' + C phi' + K phi = F t follows F (t - C/K) / K once its transient has
     * decayed (from memory: the ramp response of a second-order system), so the relative lag at time t is
     * (C/K)/t, with C the dampers' roll damping at low speed, MR^2 t^2/4 (bump slope + rebound slope) per axle
     * (derived here from the damper curve) and K the stiffness left after gravity. The check allows 1.5 times
     * that (the tyres in series make the true lag a little smaller, never larger); 1e-6 is out of reach for any
     * finite ramp, which is why the held-a_y tests above carry the tight check.
     */
    @Test
    void verySlowRampFollowsTheSteadyRollAtEachAcceleration() {
        Vehicle car = TestCars.clubCar();
        AnalysisResult steady = VehicleAnalysis.analyse(car);
        double target = 0.8 * STANDARD_GRAVITY;
        double rampSeconds = 40;
        TransientResult result = TransientAnalysis.step(steady, DynamicsCars.damped(),
                new LateralInput.Step(target, rampSeconds), rampSeconds);
        // digressive(MR): bump 1500 N and rebound 2600 N at 0.1 m/s, so 15000 + 26000 N s/m at low speed
        double lowSpeedSlopes = 15000 + 26000;
        double damping = lowSpeedSlopes * (0.9 * 0.9 * 1.46 * 1.46 + 0.8 * 0.8 * 1.44 * 1.44) / 4;
        double stiffness = steady.front().stiffness().rollStiffness() + steady.rear().stiffness().rollStiffness()
                - steady.masses().gravityRollMoment();
        double lag = damping / stiffness;
        for (RollState state : result.run().states()) {
            if (state.time() >= 5 && Math.round(state.time() * 1000) % 5000 == 0) {
                double roll = TransientAnalysis.steadyRoll(steady, state.lateral());
                assertEquals(roll, state.roll(), 1.5 * lag / state.time() * roll, "roll at " + state.time() + " s");
                assertTrue(state.roll() < roll, "the roll lags behind the ramp");
            }
        }
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
