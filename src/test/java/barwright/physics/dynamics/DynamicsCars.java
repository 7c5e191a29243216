package barwright.physics.dynamics;

import barwright.model.Damper;
import barwright.model.DynamicsInputs;

import java.util.List;

/** Invented dampers and roll inertias for the tests (invented data, not a real car's). */
final class DynamicsCars {
    private DynamicsCars() {
    }

    /** A digressive damper: stiff at low speed, softer past 100 mm/s, rebound firmer than bump (invented). */
    static Damper digressive(double motionRatio) {
        return new Damper(motionRatio, List.of(-0.5, -0.1, 0.0, 0.1, 0.5),
                List.of(-5200.0, -2600.0, 0.0, 1500.0, 3100.0));
    }

    /** 300 kg m^2 about the sprung CG and digressive dampers at both ends. */
    static DynamicsInputs damped() {
        return new DynamicsInputs(300.0, digressive(0.9), digressive(0.8));
    }

    /** The same inertia, no dampers. */
    static DynamicsInputs undamped() {
        return new DynamicsInputs(300.0, null, null);
    }
}
