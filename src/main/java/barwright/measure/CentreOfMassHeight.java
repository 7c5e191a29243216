package barwright.measure;

import java.util.List;

/**
 * The centre-of-mass height found by raising one axle (model.md 12.3).
 *
 * @param height               above the ground, level (m)
 * @param aboveWheelCentres    above the line through the wheel centres (m)
 * @param uncertainty          expanded uncertainty, coverage factor 2 (about 95 %), from the scale and raise
 *                             resolutions (m)
 * @param tiltAngle            the car's pitch while raised (rad)
 * @param loadMoved            the mass that moved to the lower axle (kg)
 * @param warnings             things the person should look at, in words
 */
public record CentreOfMassHeight(double height, double aboveWheelCentres, double uncertainty, double tiltAngle,
                                 double loadMoved, List<String> warnings) {
    public CentreOfMassHeight {
        warnings = List.copyOf(warnings);
    }
}
