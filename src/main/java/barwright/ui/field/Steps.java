package barwright.ui.field;

import barwright.units.Quantity;
import barwright.units.UnitSystem;

/**
 * How far one press of an arrow key or one notch of the mouse wheel moves a number field, in the display
 * unit: a round step a person would make by hand at the workshop (1 mm of bar diameter or track, 1 kg, 5 N/mm
 * of spring rate). Shift moves ten steps. The sizes are common practice, chosen for this program; no single
 * source gives them.
 */
public final class Steps {
    private Steps() {
    }

    /** @return the step in the display unit of the system */
    public static double of(Quantity quantity, UnitSystem system) {
        boolean us = system == UnitSystem.US;
        return switch (quantity) {
            case LENGTH -> us ? 0.05 : 1;
            case MASS -> 1;
            case FORCE -> us ? 5 : 10;
            case LINEAR_RATE -> us ? 25 : 5;
            case ROLL_STIFFNESS, CORNERING_STIFFNESS -> 10;
            case STRESS -> us ? 1 : 10;
            case MODULUS -> us ? 0.1 : 1;
            case DENSITY -> us ? 0.001 : 10;
            case ANGLE -> 0.5;
            case ROLL_GRADIENT -> 0.05;
            case FREQUENCY -> 0.1;
            case FORCE_PER_G -> us ? 5 : 10;
            case ACCELERATION -> 0.01;
            case SHARE -> 1;
            case RATIO -> 0.01;
            case AREA -> us ? 0.01 : 1;
            case SECOND_MOMENT_OF_AREA -> us ? 0.001 : 100;
        };
    }

    /**
     * @return the value moved by steps and rounded to a whole number of steps, so that 21.7 mm goes up to
     *         22 mm, not 22.7 mm
     */
    public static double move(double value, double step, int steps) {
        double count = value / step;
        boolean onAStep = Math.abs(count - Math.rint(count)) < 1e-9; // 0.3 / 0.1 is 2.9999999999999996
        double moved = onAStep ? (Math.rint(count) + steps) * step
                : (steps > 0 ? Math.floor(count) + steps : Math.ceil(count) + steps) * step;
        // the product of a decimal step and a count carries binary noise: round to the step's own decimals
        double scale = Math.pow(10, Math.max(0, (int) Math.ceil(-Math.log10(step)) + 1));
        return Math.round(moved * scale) / scale;
    }
}
