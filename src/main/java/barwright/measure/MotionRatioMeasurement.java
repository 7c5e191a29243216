package barwright.measure;

import barwright.solver.LinearFit;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

import static barwright.measure.BarRateMeasurement.plain;

/**
 * Motion ratios (model.md 12.2). From readings: the slope of component travel against wheel travel
 * (least squares), and its change over the travel from a quadratic fit. From geometry: the lever ratio of a
 * mount on a control arm. Either way, a component whose axis leans by an angle from the direction its mount
 * moves sees only the cosine of that motion along its axis; that correction multiplies the ratio (common
 * practice; the lever-and-cosine form is as given on the calculatormom.com "Motion Ratio Calculator" page,
 * read as far as its worked example).
 */
public final class MotionRatioMeasurement {
    /** The quadratic term is reported only with at least this many readings (the program's choice). */
    public static final int QUADRATIC_READINGS = 4;
    /** A ratio changing by more than this over 100 mm of travel is named rising or falling in words. */
    public static final double NOTABLE_CHANGE_PER_100_MM = 0.02;

    private MotionRatioMeasurement() {
    }

    /**
     * @param readings  wheel and component travel, at least 3, at least 2 different wheel positions
     * @param linkAngle the component's lean from the direction its mount moves (rad), or 0 where the travel
     *                  was read along the component's own axis
     */
    public static MotionRatioFit fit(List<TravelReading> readings, double linkAngle) throws MeasurementException {
        if (readings.size() < 3) {
            throw new MeasurementException("a motion ratio needs at least 3 readings; there " + (readings.size() == 1
                    ? "is 1" : "are " + readings.size()));
        }
        double cosine = cosineCorrection(linkAngle);
        double[] wheel = readings.stream().mapToDouble(TravelReading::wheelTravel).toArray();
        double[] component = readings.stream().mapToDouble(TravelReading::componentTravel).toArray();
        double span = Arrays.stream(wheel).max().orElse(0) - Arrays.stream(wheel).min().orElse(0);
        if (span == 0) {
            throw new MeasurementException("every reading has the same wheel travel, " + plain(wheel[0] * 1e3)
                    + " mm: move the wheel between readings");
        }
        LinearFit.Line line = LinearFit.line(wheel, component);
        if (line.slope() == 0) {
            throw new MeasurementException("the component did not move while the wheel moved "
                    + plain(span * 1e3) + " mm: check that the gauge is on the right part");
        }
        double[] residuals = new double[readings.size()];
        for (int i = 0; i < residuals.length; i++) {
            residuals[i] = component[i] - line.at(wheel[i]);
        }
        double largestTravel = Arrays.stream(component).map(Math::abs).max().orElse(0);
        boolean[] far = OutlierRule.flag(residuals, 1e-3 * largestTravel);
        double change = 0;
        long distinctPositions = Arrays.stream(wheel).distinct().count();
        if (readings.size() >= QUADRATIC_READINGS && distinctPositions >= 3) {
            change = 2 * LinearFit.quadratic(wheel, component).c2() * cosine;
        }
        double ratio = line.slope() * cosine;
        List<String> warnings = new ArrayList<>();
        List<Boolean> flags = new ArrayList<>();
        for (int i = 0; i < far.length; i++) {
            flags.add(far[i]);
            if (far[i]) {
                warnings.add(readings.get(i).where() + " is far off the line: read it again");
            }
        }
        if (ratio < 0) {
            warnings.add("the component moves against the wheel (a negative ratio): check the sign of one column");
        }
        if (readings.size() < QUADRATIC_READINGS || distinctPositions < 3) {
            warnings.add("with fewer than " + QUADRATIC_READINGS + " readings at 3 or more heights the change over "
                    + "the travel is not estimated");
        }
        return new MotionRatioFit(ratio, line.rSquared(), change, cosine, readings,
                Arrays.stream(residuals).boxed().toList(), flags, warnings);
    }

    /**
     * The lever ratio of a mount on a control arm, with the cosine correction.
     *
     * @param mountFromPivot distance from the arm's inner pivot to the mount (m)
     * @param wheelFromPivot distance from the arm's inner pivot to the ball joint or wheel centre (m)
     * @param linkAngle      the component's lean from the direction its mount moves (rad)
     */
    public static double lever(double mountFromPivot, double wheelFromPivot, double linkAngle)
            throws MeasurementException {
        if (!(wheelFromPivot > 0) || !(mountFromPivot > 0) || mountFromPivot > wheelFromPivot * 10) {
            throw new MeasurementException("the mount's and the wheel's distances from the pivot must be positive "
                    + "lengths (mount " + plain(mountFromPivot * 1e3) + " mm, wheel " + plain(wheelFromPivot * 1e3)
                    + " mm)");
        }
        return mountFromPivot / wheelFromPivot * cosineCorrection(linkAngle);
    }

    /** @return cos(angle), refusing angles of 80 degrees or more, where the cosine is too sensitive to use */
    static double cosineCorrection(double linkAngle) throws MeasurementException {
        if (!Double.isFinite(linkAngle) || Math.abs(linkAngle) >= Math.toRadians(80)) {
            throw new MeasurementException(String.format(Locale.ROOT, "link angle %s deg: must be under 80 deg "
                    + "from the direction the mount moves", plain(Math.toDegrees(linkAngle))));
        }
        return Math.cos(linkAngle);
    }
}
