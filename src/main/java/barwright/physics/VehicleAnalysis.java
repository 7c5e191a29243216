package barwright.physics;

import barwright.model.TurnDirection;
import barwright.model.Vehicle;

/** One full analysis of a car: model.md 1-8, both turn directions, through the one {@link AnalysisPipeline}. */
public final class VehicleAnalysis {
    /** Points of each handling curve. */
    public static final int HANDLING_CURVE_POINTS = AnalysisPipeline.HANDLING_CURVE_POINTS;

    private VehicleAnalysis() {
    }

    /**
     * @throws ImpossibleVehicleException where the car cannot be analysed (no stable roll position, no
     *                                    sprung mass)
     */
    public static AnalysisResult analyse(Vehicle vehicle) {
        return new AnalysisPipeline(vehicle).analyse();
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
        return AnalysisPipeline.cornering(vehicle, shifted, direction, result.rollBalance(), result.migration());
    }
}
