package barwright.physics.beam;

import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.Locale;

/** Lengths in error messages, in the millimetres the vehicle files use (one decimal). */
final class LengthText {
    private static final DisplayUnit MILLIMETRES = Quantity.LENGTH.unit(UnitSystem.SI);

    private LengthText() {
    }

    /** @return e.g. "212.5 mm" for 0.2125 m */
    static String of(double metres) {
        return String.format(Locale.ROOT, "%.1f %s", MILLIMETRES.fromSi(metres), MILLIMETRES.symbol());
    }

    /** @return a point as "(x, y, z) mm" */
    static String point(double x, double y, double z) {
        return String.format(Locale.ROOT, "(%.1f, %.1f, %.1f) %s", MILLIMETRES.fromSi(x), MILLIMETRES.fromSi(y),
                MILLIMETRES.fromSi(z), MILLIMETRES.symbol());
    }
}
