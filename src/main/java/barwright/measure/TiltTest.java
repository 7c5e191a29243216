package barwright.measure;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;

/**
 * The readings of a centre-of-mass height measurement by raising one axle (model.md 12.3).
 *
 * @param totalMass              the car's mass on the scales, level (kg)
 * @param levelFrontAxleMass     the front axle's scale reading, level (kg)
 * @param raisedAxle             the axle lifted
 * @param raise                  how far that axle's wheel centres were lifted (m)
 * @param raisedFrontAxleMass    the front axle's scale reading with the car tilted (kg)
 * @param wheelbase              the wheelbase, level (m)
 * @param wheelCentreHeight      height of the wheel centres above the ground, level (m)
 * @param scaleResolution        the scales' resolution: each reading is good to half of it (kg)
 * @param raiseResolution        the resolution of the raise reading, tape or ruler (m)
 */
public record TiltTest(double totalMass, double levelFrontAxleMass, AxlePosition raisedAxle, double raise,
                       double raisedFrontAxleMass, double wheelbase, double wheelCentreHeight,
                       double scaleResolution, double raiseResolution) {

    /**
     * The test on a car as its file gives it: the level readings are the file's mass and front share, the
     * wheelbase its own.
     */
    public static TiltTest on(Vehicle car, AxlePosition raisedAxle, double raise, double raisedFrontAxleMass,
                              double wheelCentreHeight, double scaleResolution, double raiseResolution) {
        return new TiltTest(car.mass(), car.mass() * car.frontMassFraction(), raisedAxle, raise, raisedFrontAxleMass,
                car.wheelbase(), wheelCentreHeight, scaleResolution, raiseResolution);
    }

    /**
     * @return the wheel centre height taken where none is measured: the mean of the two axles' unsprung
     *         centre-of-mass heights, which sit about at the wheel centres (m)
     */
    public static double assumedWheelCentreHeight(Vehicle car) {
        return (car.front().unsprungCgHeight() + car.rear().unsprungCgHeight()) / 2;
    }
}
