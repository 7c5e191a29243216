package barwright.sizing.preload;

import barwright.model.AxlePosition;

import java.util.Locale;

/**
 * What a change of one bar link's length does to a car at rest (model.md 9), in SI.
 *
 * @param axle                    the axle whose link changes
 * @param diagonal                the diagonal that gains load when the link gets longer
 * @param linkChange              the link made longer by this much (m; negative is shorter)
 * @param preloadAnglePerLength   phi_0 per metre of link length, 1 / (r t_X) (rad/m)
 * @param lockedMomentPerLength   roll moment locked between the axles per metre of link length (N m/m)
 * @param changePerLength         each wheel's load change per metre of link length (N/m)
 * @param staticLoads             the wheel loads with the link at its neutral length (N)
 * @param loads                   the wheel loads with the link changed by linkChange (N)
 */
public record PreloadResult(AxlePosition axle, GainingDiagonal diagonal, double linkChange,
                            double preloadAnglePerLength, double lockedMomentPerLength, CornerLoads changePerLength,
                            CornerLoads staticLoads, CornerLoads loads) {

    /** @return the locked roll moment at the link change (N m) */
    public double lockedMoment() {
        return lockedMomentPerLength * linkChange;
    }

    /** @return the change of cross weight (share of the total) per metre of link length */
    public double crossWeightChangePerLength() {
        return (changePerLength.leftFront() + changePerLength.rightRear()) / staticLoads.total();
    }

    /** @return what lengthening the link by one millimetre does, in words */
    public String inWords() {
        double perMm = 1e-3;
        return String.format(Locale.ROOT, "Making the %s bar link 1 mm longer loads the %s wheels by %.1f N (%s) "
                        + "and %.1f N (%s), unloads the %s wheels by the same, and moves the cross weight by "
                        + "%+.2f percentage points.", axle.key(), diagonal.gains(),
                Math.abs(changePerLength.leftFront() * perMm), "front", Math.abs(changePerLength.leftRear() * perMm),
                "rear", diagonal.loses(), crossWeightChangePerLength() * perMm * 100);
    }
}
