package barwright.physics.dynamics;

import barwright.physics.AnalysisResult;
import barwright.physics.MassProperties;
import barwright.physics.TestCars;
import barwright.physics.VehicleAnalysis;
import org.junit.jupiter.api.Test;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.junit.jupiter.api.Assertions.assertEquals;

/**
 * With no dampers and a held a_y the roll is a conservative system: E = I w^2 / 2 + (K_f + K_r - m_s g h')
 * phi^2 / 2 - m_s h' a_y phi is constant (conservation of energy, derived here from the equation of motion,
 * not taken from the code). Tolerance: 1e-7 of the swing's energy scale K_net phi_ss^2 / 2, a few hundred
 * steps at the integrator's 1e-10 local accuracy.
 */
class UndampedEnergyTest {
    @Test
    void energyStaysConstantWithoutDampers() {
        AnalysisResult steady = VehicleAnalysis.analyse(TestCars.clubCar());
        RollModel model = RollModel.of(steady, DynamicsCars.undamped());
        MassProperties masses = steady.masses();
        double accel = 0.5 * STANDARD_GRAVITY;
        double kNet = steady.front().stiffness().rollStiffness() + steady.rear().stiffness().rollStiffness()
                - masses.sprungMass() * STANDARD_GRAVITY * masses.rollArm();
        double inertia = 300 + masses.sprungMass() * masses.rollArm() * masses.rollArm();
        double drive = masses.sprungMass() * masses.rollArm() * accel;
        double steadyRoll = drive / kNet;
        double scale = kNet * steadyRoll * steadyRoll / 2;

        double[] times = RollSimulation.evenTimes(3, 0.01);
        double[] state = new double[model.dimension()];
        for (int i = 1; i < times.length; i++) {
            RollSimulation.DEFAULT_INTEGRATION.integrate(new org.apache.commons.math3.ode.FirstOrderDifferentialEquations() {
                @Override
                public int getDimension() {
                    return model.dimension();
                }

                @Override
                public void computeDerivatives(double t, double[] y, double[] yDot) {
                    model.derivatives(t, y, new LateralInput.Step(accel, 0), yDot);
                }
            }, times[i - 1], state, times[i], null, java.util.List.of());
            double energy = inertia * state[1] * state[1] / 2 + kNet * state[0] * state[0] / 2 - drive * state[0];
            assertEquals(0, energy, 1e-7 * scale, "energy at " + times[i] + " s (it starts at 0, at rest)");
        }
    }
}
