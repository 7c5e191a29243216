package barwright.ui.field;

import barwright.units.Quantity;
import barwright.units.UnitSystem;

/**
 * How many decimals a figure of each kind is shown with, in each unit system: enough to see the effect of a
 * one-step change of a bar (0.5 mm of diameter), no more. Typed values keep every digit typed.
 */
public final class Precision {
    private Precision() {
    }

    /** @return decimals for a result figure */
    public static int figure(Quantity quantity, UnitSystem system) {
        boolean us = system == UnitSystem.US;
        return switch (quantity) {
            case LENGTH -> us ? 3 : 1;
            case MASS -> us ? 1 : 1;
            case FORCE, FORCE_PER_G, CORNERING_STIFFNESS, ROLL_STIFFNESS -> 0;
            case LINEAR_RATE -> 1;
            case STRESS -> us ? 1 : 0;
            case MODULUS -> us ? 2 : 1;
            case DENSITY -> us ? 4 : 0;
            case ANGLE, ROLL_GRADIENT, FREQUENCY -> 2;
            case ACCELERATION -> 3;
            case SHARE -> 1;
            case RATIO -> 3;
            case AREA, SECOND_MOMENT_OF_AREA -> us ? 4 : 0;
        };
    }

    /** @return the most decimals an input field shows its stored value with (trailing zeros dropped) */
    public static int field(Quantity quantity, UnitSystem system) {
        boolean us = system == UnitSystem.US;
        return switch (quantity) {
            case LENGTH -> us ? 4 : 2;
            case MASS, FORCE -> us ? 2 : 1;
            case LINEAR_RATE -> 2;
            case ROLL_STIFFNESS -> 1;
            case STRESS -> us ? 2 : 1;
            case MODULUS -> us ? 3 : 2;
            case DENSITY -> us ? 5 : 1;
            case ANGLE, ROLL_GRADIENT, FREQUENCY, FORCE_PER_G, CORNERING_STIFFNESS -> 2;
            case ACCELERATION -> 3;
            case SHARE -> 2;
            case RATIO -> 4;
            case AREA, SECOND_MOMENT_OF_AREA -> us ? 5 : 1;
        };
    }
}
