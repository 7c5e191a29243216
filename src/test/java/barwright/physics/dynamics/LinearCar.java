package barwright.physics.dynamics;

import barwright.model.Damper;
import barwright.physics.MassProperties;
import barwright.physics.TestCars;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * A car whose roll is a linear single-degree-of-freedom oscillator I phi'' + C phi' + K_net phi = m_s h' a_y:
 * rigid tyres, a rigid chassis, linear dampers and no geometric or unsprung transfer, on the test club car's
 * masses. The suspension stiffnesses and the inertia are invented. The oscillator's constants are derived here
 * from the parts, independently of the roll model: K_net = K_f + K_r - m_s g h', and each damper of coefficient
 * c at motion ratio MR gives c MR^2 at the wheel, two wheels at t/2 from the centre C = 2 c MR^2 (t/2)^2 per axle.
 *
 * @param coefficient each damper's coefficient c (N s/m)
 * @param motionRatio MR
 */
record LinearCar(double coefficient, double motionRatio) {
    static final double FRONT_TRACK = 1.46;        // m
    static final double REAR_TRACK = 1.44;
    static final double FRONT_SUSPENSION = 60e3;   // N m/rad, invented
    static final double REAR_SUSPENSION = 45e3;
    static final double INERTIA = 350;             // kg m^2 about the roll axis, invented

    MassProperties masses() {
        return MassProperties.of(TestCars.clubCar());
    }

    RollModel model() {
        return new RollModel(axle(FRONT_TRACK, FRONT_SUSPENSION), axle(REAR_TRACK, REAR_SUSPENSION), masses(),
                INERTIA, null, 0.5);
    }

    /** @return K_net (N m/rad) */
    double netStiffness() {
        MassProperties masses = masses();
        return FRONT_SUSPENSION + REAR_SUSPENSION - masses.sprungMass() * STANDARD_GRAVITY * masses.rollArm();
    }

    /** @return C (N m s/rad) */
    double rollDamping() {
        return 2 * coefficient * motionRatio * motionRatio * (FRONT_TRACK * FRONT_TRACK + REAR_TRACK * REAR_TRACK) / 4;
    }

    /** @return omega_n = sqrt(K_net / I) (rad/s) */
    double naturalFrequency() {
        return Math.sqrt(netStiffness() / INERTIA);
    }

    /** @return zeta = C / (2 sqrt(K_net I)) */
    double dampingRatio() {
        return rollDamping() / (2 * Math.sqrt(netStiffness() * INERTIA));
    }

    /** @return the steady roll at a held a_y, m_s h' a_y / K_net (rad) */
    double steadyRoll(double lateral) {
        MassProperties masses = masses();
        return masses.sprungMass() * masses.rollArm() * lateral / netStiffness();
    }

    private AxleRoll axle(double track, double suspension) {
        return new AxleRoll(track, suspension, Double.POSITIVE_INFINITY,
                new RollDamping(Damper.linear(motionRatio, coefficient), track), 0, Double.POSITIVE_INFINITY);
    }
}
