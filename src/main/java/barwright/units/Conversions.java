package barwright.units;

import static barwright.units.Constants.METRES_PER_FOOT;
import static barwright.units.Constants.NEWTONS_PER_POUND_FORCE;
import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * Named conversions from the core's SI base units to the fixed units of the output files and texts (keys such
 * as {@code rideRateNPerMm}, {@code barMaxVonMisesStressMPa}, {@code limitG}). The figures a person reads in a
 * chosen unit system go through {@link Quantity} instead. Each method keeps the arithmetic of one factor, so
 * a value written before these names existed is written bit for bit the same.
 */
public final class Conversions {
    /*
     * The SI prefixes milli = 10^-3 and mega = 10^6 (NIST Physical Measurement Laboratory web page "SI
     * prefixes", Table 5, physics.nist.gov/cuu/Units/prefixes.html, read). Both directions are kept as their
     * own constants because x * 1e-3 and x / 1e3 can differ in the last bit.
     */
    /** Millimetres in one metre. */
    public static final double MILLIMETRES_PER_METRE = 1e3;
    /** Metres in one millimetre. */
    public static final double METRES_PER_MILLIMETRE = 1e-3;
    /** Megapascals in one pascal. */
    public static final double MEGAPASCALS_PER_PASCAL = 1e-6;
    /** One percent is 0.01 (NIST SP 811, section 7.10.2; from memory). */
    public static final double PERCENT_PER_UNIT = 100;

    private Conversions() {
    }

    /** @return metres in millimetres */
    public static double toMillimetres(double metres) {
        return metres * MILLIMETRES_PER_METRE;
    }

    /** @return a figure per metre (N/m, N m/m, rad/m, 1/m) per millimetre */
    public static double perMillimetre(double perMetre) {
        return perMetre * METRES_PER_MILLIMETRE;
    }

    /** @return pascals in megapascals */
    public static double toMegapascals(double pascals) {
        return pascals * MEGAPASCALS_PER_PASCAL;
    }

    /** @return radians in degrees */
    public static double toDegrees(double radians) {
        return radians / RADIANS_PER_DEGREE;
    }

    /** @return a figure per radian (N m/rad, N/rad) per degree */
    public static double perDegree(double perRadian) {
        return perRadian * RADIANS_PER_DEGREE;
    }

    /** @return an acceleration (m/s^2) in multiples of standard gravity */
    public static double toG(double accel) {
        return accel / STANDARD_GRAVITY;
    }

    /** @return multiples of standard gravity as an acceleration (m/s^2) */
    public static double fromG(double inG) {
        return inG * STANDARD_GRAVITY;
    }

    /** @return a figure per m/s^2 (N per m/s^2) per g */
    public static double perG(double perAccel) {
        return perAccel * STANDARD_GRAVITY;
    }

    /** @return a roll gradient in rad per m/s^2 as deg/g */
    public static double toDegreesPerG(double radiansPerAccel) {
        return radiansPerAccel * STANDARD_GRAVITY / RADIANS_PER_DEGREE;
    }

    /** @return a moment in N m as lbf ft */
    public static double toPoundForceFeet(double newtonMetres) {
        return newtonMetres / (NEWTONS_PER_POUND_FORCE * METRES_PER_FOOT);
    }

    /** @return a fraction (1 = the whole) in percent */
    public static double toPercent(double fraction) {
        return fraction * PERCENT_PER_UNIT;
    }

    /** @return a speed in m/s from km/h (1 km/h = 1000 m / 3600 s, by definition) */
    public static double fromKilometresPerHour(double kilometresPerHour) {
        return kilometresPerHour / 3.6;
    }
}
