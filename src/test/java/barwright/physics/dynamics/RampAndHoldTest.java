package barwright.physics.dynamics;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The integrated roll against the closed-form forced response of a damped oscillator, through the whole run
 * and not only at its peak: a linear car (rigid tyres and chassis, linear dampers, no wheel lifting) under a_y
 * that ramps to a target over a rise time and is then held, so the run crosses the input's corner at the end
 * of the rise, where the integration restarts.
 *
 * <p>The car is {@link LinearCar}: I phi'' + C phi' + K_net phi = m_s h' a_y(t), its constants derived from
 * its parts. Its response from rest to a unit ramp of the right-hand side, written for
 * x'' + 2 zeta omega x' + omega^2 x = omega^2 t, is derived here (a particular solution t - 2 zeta / omega plus
 * the free motion fitted to x(0) = x'(0) = 0; the standard ramp response, from memory, as in any vibrations
 * text, not checked against a book):
 * x(t) = t - 2 zeta / omega + e^(-zeta omega t) [(2 zeta / omega) cos(omega_d t) + ((2 zeta^2 - 1) / omega_d)
 * sin(omega_d t)], omega_d = omega sqrt(1 - zeta^2). The ramp-then-hold is the ramp less the same ramp delayed by
 * the rise time (superposition, the system being linear and time-invariant), scaled by phi_ss / T_rise.
 *
 * <p>Tolerance: 1e-6 of the steady roll at every recorded millisecond. The integrator holds each step's local
 * error to 1e-10 of the state (relative, RollSimulation.DEFAULT_INTEGRATION); a damped car does not let the
 * error grow, so after the few hundred steps of a 3 s run the global error is at most some 1e-8, and the
 * dense output between steps is of the same order (the worst seen when this was written: 2.5e-10). 1e-6 leaves
 * a wide margin for that, yet an inertia wrong by 0.01 % already misses by 1.2e-5 to 8.5e-5 of the steady roll
 * in these four cases (tried when this was written).
 */
class RampAndHoldTest {
    private static final double TOLERANCE = 1e-6;

    @ParameterizedTest(name = "c = {0} N s/m, rise {1} s")
    @CsvSource({"1500, 0.05", "1500, 0.3", "3000, 0.137", "800, 1.0"})
    void rollFollowsTheClosedFormForcedResponse(double coefficient, double riseTime) {
        LinearCar car = new LinearCar(coefficient, 0.9);
        RollModel model = car.model();
        double target = 0.5 * STANDARD_GRAVITY;
        double omega = car.naturalFrequency();
        double zeta = car.dampingRatio();
        double steady = car.steadyRoll(target);

        RollSimulation.Run run = RollSimulation.run(model, new LateralInput.Step(target, riseTime),
                RollSimulation.evenTimes(3, 1e-3), RollSimulation.DEFAULT_INTEGRATION);

        assertTrue(Double.isNaN(run.firstLift()), "every wheel stays down: the car is linear throughout");
        assertEquals(3001, run.states().size());
        for (RollState state : run.states()) {
            double t = state.time();
            double expected = steady / riseTime * (ramp(t, omega, zeta) - ramp(t - riseTime, omega, zeta));
            assertEquals(expected, state.roll(), TOLERANCE * steady, "roll at " + t + " s");
        }
    }

    /** @return the response x(t) to a unit ramp from rest (s, as the ramp's own unit); 0 before it starts */
    private static double ramp(double t, double omega, double zeta) {
        if (t <= 0) {
            return 0;
        }
        double damped = omega * Math.sqrt(1 - zeta * zeta);
        return t - 2 * zeta / omega + Math.exp(-zeta * omega * t)
                * (2 * zeta / omega * Math.cos(damped * t) + (2 * zeta * zeta - 1) / damped * Math.sin(damped * t));
    }
}
