package barwright.measure;

import barwright.model.AxlePosition;
import barwright.solver.RootFinder;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.measure.BarRateMeasurement.plain;

/**
 * Centre-of-mass height by raising one axle (model.md 12.3). With the car pitched by theta, sin theta = H / l,
 * the centre of mass, a height h' above the wheel centres, moves towards the lower axle by h' sin theta while
 * the wheelbase shortens to l cos theta; the moment balance about the lower axle's wheel centres gives
 * <pre>h' = l dW / (W tan theta)</pre>
 * with dW the mass gained by the lower axle and W the total (the derivation as written out on the
 * physicsforums.com "Centre of gravity of a car" thread and the geocities "cgrav" page, both read as far as the
 * excerpt of each that was seen, which holds the whole derivation;
 * the method itself is common practice). The height above the ground adds the wheel centre height.
 *
 * <p>Uncertainty, first order (the law of propagation of the GUM, JCGM 100:2008, from memory): each scale
 * reading is taken as uniform within half its resolution, standard uncertainty resolution / sqrt 12; an
 * axle's reading is two scales, the total four; dW is the difference of two axle readings. The raise reading
 * is uniform within half its resolution. The expanded uncertainty is twice the combined one.
 */
public final class TiltMethod {
    /** A result less certain than this (expanded, m) is refused with the raise that would do (the program's choice). */
    public static final double LARGEST_USEFUL_UNCERTAINTY = 0.025;
    /** The raise that would bring the uncertainty down to the useful one: to 0.1 mm, in 100 evaluations. */
    private static final RootFinder RAISE_NEEDED = RootFinder.of("the raise that makes the height certain enough",
            1e-4, 100);
    /** Coverage factor of the expanded uncertainty (about 95 % for normal scatter). */
    public static final double COVERAGE = 2;

    /** The method's usual cautions (common practice; the first three as listed on Longacre Racing's
     * "Center of Gravity Height" page, read as far as its list of steps). */
    public static final List<String> CAUTIONS = List.of(
            "Fill the fuel and every fluid as the car will run, with the driver or equal ballast aboard.",
            "Lock the suspension (solid links in place of the dampers) so the car cannot pitch on its springs.",
            "Pump the tyres hard so the sidewalls do not squash as the load moves.",
            "Release the brakes and leave the car in neutral on the scales, so the wheels can roll a little.",
            "Raise as far as is safe, on stands under the wheels, never on a jack alone; nobody under or in the car.");

    private TiltMethod() {
    }

    public static CentreOfMassHeight height(TiltTest test) throws MeasurementException {
        check(test);
        double l = test.wheelbase();
        double w = test.totalMass();
        double gained = loadGainedByLowerAxle(test);
        double aboveWheelCentres = aboveWheelCentres(l, w, gained, test.raise());
        if (!(aboveWheelCentres > 0)) {
            throw new MeasurementException(String.format(Locale.ROOT, "the readings put the centre of mass %s mm "
                    + "below the wheel centres: with the %s axle raised, the front axle should read %s than level "
                    + "(level %s kg, raised %s kg). Check which axle was raised and the two readings",
                    plain(-aboveWheelCentres * 1e3), test.raisedAxle().key(),
                    test.raisedAxle() == AxlePosition.REAR ? "more" : "less",
                    plain(test.levelFrontAxleMass()), plain(test.raisedFrontAxleMass())));
        }
        double uncertainty = uncertainty(test, aboveWheelCentres, test.raise());
        if (uncertainty > LARGEST_USEFUL_UNCERTAINTY) {
            throw new MeasurementException(tooSmall(test, aboveWheelCentres, uncertainty));
        }
        double height = aboveWheelCentres + test.wheelCentreHeight();
        List<String> warnings = new ArrayList<>();
        if (height > 0.3 * l) {
            warnings.add(String.format(Locale.ROOT, "a centre of mass %s mm high is more than 30 %% of the "
                    + "wheelbase: check that the suspension was locked and the readings are of the same axle",
                    plain(Math.round(height * 1e3))));
        }
        return new CentreOfMassHeight(height, aboveWheelCentres, uncertainty, Math.asin(test.raise() / l), gained,
                warnings);
    }

    /** h' = l dW / (W tan theta), sin theta = H / l (m) */
    static double aboveWheelCentres(double wheelbase, double totalMass, double gained, double raise) {
        return wheelbase * gained / (totalMass * tanOf(raise, wheelbase));
    }

    private static double tanOf(double raise, double wheelbase) {
        return raise / Math.sqrt(wheelbase * wheelbase - raise * raise);
    }

    /** @return the mass gained by the axle left on the ground (kg) */
    private static double loadGainedByLowerAxle(TiltTest test) {
        double frontGain = test.raisedFrontAxleMass() - test.levelFrontAxleMass();
        return test.raisedAxle() == AxlePosition.REAR ? frontGain : -frontGain;
    }

    /** @return the expanded uncertainty of h' (m) at a raise, with h' taken as found */
    static double uncertainty(TiltTest test, double aboveWheelCentres, double raise) {
        double l = test.wheelbase();
        double w = test.totalMass();
        double tan = tanOf(raise, l);
        double perReading = test.scaleResolution() / Math.sqrt(12);
        double axle = Math.sqrt(2) * perReading;       // two scales under one axle
        double gained = Math.sqrt(2) * axle;           // the difference of two axle readings
        double total = 2 * perReading;                 // four scales
        double raiseReading = test.raiseResolution() / Math.sqrt(12);
        double byGained = l / (w * tan) * gained;
        double byTotal = aboveWheelCentres / w * total;
        // d(tan theta)/dH / tan theta = l^2 / (H (l^2 - H^2))
        double byRaise = aboveWheelCentres * l * l / (raise * (l * l - raise * raise)) * raiseReading;
        return COVERAGE * Math.sqrt(byGained * byGained + byTotal * byTotal + byRaise * byRaise);
    }

    private static String tooSmall(TiltTest test, double aboveWheelCentres, double uncertainty) {
        double l = test.wheelbase();
        double highest = 0.5 * l; // 30 degrees: past any raise that is safe on stands
        String advice;
        if (uncertainty(test, aboveWheelCentres, highest) > LARGEST_USEFUL_UNCERTAINTY) {
            advice = "no safe raise reaches that with these scales: use scales that read finer than "
                    + plain(test.scaleResolution()) + " kg";
        } else {
            // the uncertainty falls as the raise grows over this range; Brent's method to 0.1 mm, 100 evaluations
            double needed = RAISE_NEEDED.solve(
                    h -> uncertainty(test, aboveWheelCentres, h) - LARGEST_USEFUL_UNCERTAINTY, test.raise(), highest);
            advice = String.format(Locale.ROOT, "raise the %s axle at least %.0f mm", test.raisedAxle().key(),
                    Math.ceil(needed * 1e3));
        }
        return String.format(Locale.ROOT, "a raise of %s mm moves too little load (%s kg) for these scales: the "
                        + "height would be uncertain by ±%.0f mm, more than the ±%.0f mm that is useful; %s",
                plain(test.raise() * 1e3), plain(Math.abs(loadGainedByLowerAxle(test))), uncertainty * 1e3,
                LARGEST_USEFUL_UNCERTAINTY * 1e3, advice);
    }

    private static void check(TiltTest test) throws MeasurementException {
        if (!(test.raise() > 0)) {
            throw new MeasurementException("raise " + plain(test.raise() * 1e3) + " mm: the axle must be raised "
                    + "(more than 0 mm) for the load to move");
        }
        if (!(test.raise() < 0.5 * test.wheelbase())) {
            throw new MeasurementException("raise " + plain(test.raise() * 1e3) + " mm: must be less than half the "
                    + "wheelbase (" + plain(0.5 * test.wheelbase() * 1e3) + " mm)");
        }
        if (!(test.scaleResolution() > 0) || !(test.raiseResolution() > 0)) {
            throw new MeasurementException("the scale and raise resolutions must be more than 0");
        }
        if (!(test.raisedFrontAxleMass() > 0) || !(test.raisedFrontAxleMass() < test.totalMass())) {
            throw new MeasurementException("front axle raised " + plain(test.raisedFrontAxleMass()) + " kg: must "
                    + "be more than 0 and less than the car's " + plain(test.totalMass()) + " kg");
        }
        if (!(test.wheelCentreHeight() >= 0)) {
            throw new MeasurementException("wheel centre height " + plain(test.wheelCentreHeight() * 1e3)
                    + " mm: must be 0 or more");
        }
    }
}
