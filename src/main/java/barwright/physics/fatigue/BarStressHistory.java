package barwright.physics.fatigue;

import barwright.model.SpectrumLevel;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.AnalysisPipeline;
import barwright.physics.AxleStiffness;
import barwright.physics.BarAnalysis;
import barwright.physics.RollBalance;
import barwright.physics.bar.BarResult;

import java.util.List;

/**
 * A bar's stress from the quasi-static steady model (docs/model.md 13): at a_y the body end rolls phi = a_y
 * phi/a_y (model.md 5-6); the suspension takes K / K_susp of it (springs and bar in series with the tyres, model.md
 * 3), so the differential wheel travel is track K / K_susp phi; the bar model in use (closed form or beam elements)
 * gives the largest von Mises stress for that travel. Both steps are linear, so the stress is a fixed stress per
 * a_y, signed with a_y. The linear stage ignores a lifted inside wheel.
 */
public final class BarStressHistory {
    /** Travel at which a bar is analysed where the vehicle gives no check travel (m): any size would do. */
    private static final double REFERENCE_TRAVEL = 0.05;

    private BarStressHistory() {
    }

    /**
     * @return the largest von Mises stress of the axle's bar per unit a_y (Pa s^2/m), from the pipeline's linear
     * stage
     * @throws IllegalArgumentException where the axle has no bar
     */
    public static double stressPerAcceleration(AnalysisPipeline pipeline, AxlePosition position) {
        AntiRollBar bar = pipeline.vehicle().axle(position).bar();
        if (bar == null) {
            throw new IllegalArgumentException("the " + position.key() + " axle has no bar");
        }
        AntiRollBar frontBar = pipeline.vehicle().front().bar();
        AntiRollBar rearBar = pipeline.vehicle().rear().bar();
        AxleStiffness front = pipeline.axleStiffness(AxlePosition.FRONT, frontBar, pipeline.barResult(frontBar));
        AxleStiffness rear = pipeline.axleStiffness(AxlePosition.REAR, rearBar, pipeline.barResult(rearBar));
        RollBalance balance = pipeline.balance(front, rear);
        return stressPerAcceleration(pipeline.vehicle(), position, bar, pipeline.barResult(bar),
                position == AxlePosition.FRONT ? front : rear, balance);
    }

    /**
     * The same for a bar fitted in a sizing search: the axle's stiffness with that bar and the car's balance with
     * both candidate bars.
     *
     * @param atCheckTravel the bar's result at the vehicle's check travel
     * @return the bar's largest von Mises stress per unit a_y (Pa s^2/m)
     */
    public static double stressPerAcceleration(Vehicle vehicle, AxlePosition position, AntiRollBar bar,
                                               BarResult atCheckTravel, AxleStiffness axle, RollBalance balance) {
        double rollPerAcceleration = position == AxlePosition.FRONT ? balance.roll().frontRollPerAccel()
                : balance.roll().rearRollPerAccel();
        double suspensionShare = axle.rollStiffness() / axle.suspensionRollStiffness();
        double travelPerAcceleration = vehicle.axle(position).track() * suspensionShare * rollPerAcceleration;
        return stressPerTravel(vehicle, bar, atCheckTravel) * travelPerAcceleration;
    }

    /**
     * @return the bar's largest von Mises stress per metre of differential wheel travel (Pa/m): the bar models
     * are linear in the travel, so the check travel's result scales
     */
    public static double stressPerTravel(Vehicle vehicle, AntiRollBar bar, BarResult atCheckTravel) {
        double travel = vehicle.differentialWheelTravel();
        if (atCheckTravel != null && travel > 0) {
            return atCheckTravel.maxVonMisesStress() / travel;
        }
        return BarAnalysis.analyse(bar, REFERENCE_TRAVEL).maxVonMisesStress() / REFERENCE_TRAVEL;
    }

    /**
     * @return one lap's signed stress history (Pa): from rest, each corner of the spectrum in file order, its
     * count times, up to its peak and back to 0
     */
    public static double[] fromSpectrum(List<SpectrumLevel> spectrum, double stressPerAcceleration) {
        int corners = spectrum.stream().mapToInt(SpectrumLevel::countPerLap).sum();
        double[] history = new double[2 * corners + 1];
        int i = 1;
        for (SpectrumLevel level : spectrum) {
            for (int k = 0; k < level.countPerLap(); k++) {
                history[i++] = level.lateralAcceleration() * stressPerAcceleration;
                history[i++] = 0;
            }
        }
        return history;
    }

    /** @return the signed stress history (Pa) of sampled a_y (m/s^2) */
    public static double[] fromSamples(double[] lateralAcceleration, double stressPerAcceleration) {
        double[] history = new double[lateralAcceleration.length];
        for (int i = 0; i < history.length; i++) {
            history[i] = lateralAcceleration[i] * stressPerAcceleration;
        }
        return history;
    }
}
