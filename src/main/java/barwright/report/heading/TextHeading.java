package barwright.report.heading;

import barwright.units.UnitSystem;

/** The first line of every text the program prints about a car: what it is, the car's name and the units. */
public final class TextHeading {
    private TextHeading() {
    }

    /**
     * @param what        what the text is, e.g. {@code analysis} or {@code sensitivity}
     * @param vehicleName the car's name
     * @return e.g. {@code Barwright analysis: Club hatchback   (units: SI)}, without a line end
     */
    public static String of(String what, String vehicleName, UnitSystem units) {
        return "Barwright " + what + ": " + vehicleName + "   (units: " + units.label() + ")";
    }
}
