package barwright.sizing;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * What a search aims at: a front share of lateral load transfer (given outright, or as an offset from the
 * static front weight fraction), and/or a roll gradient. At least one is given.
 *
 * <p>How far a setup misses is measured in steps: one step is one percentage point of front share, or
 * 0.1 deg/g of roll gradient; with both targets the miss is the root of the sum of the squared steps.
 *
 * @param frontShare       wanted dF_f / (dF_f + dF_r), or null
 * @param frontShareOffset wanted front share minus the static front weight fraction, or null
 * @param rollGradient     wanted roll gradient (rad s^2/m), or null
 */
public record Targets(Double frontShare, Double frontShareOffset, Double rollGradient) {
    /** One step of front share: a percentage point. */
    public static final double SHARE_STEP = 0.01;
    /** One step of roll gradient: 0.1 deg/g, in rad s^2/m. */
    public static final double GRADIENT_STEP = 0.1 * RADIANS_PER_DEGREE / STANDARD_GRAVITY;

    public Targets {
        if (frontShare != null && frontShareOffset != null) {
            throw new IllegalArgumentException("give the front share or its offset from the static weight, not both");
        }
        if (frontShare == null && frontShareOffset == null && rollGradient == null) {
            throw new IllegalArgumentException("give a target: a front share of load transfer, an offset from the "
                    + "static front weight, or a roll gradient");
        }
        if (frontShare != null && !(frontShare > 0 && frontShare < 1)) {
            throw new IllegalArgumentException("the target front share must lie between 0 and 1, was " + frontShare);
        }
        if (frontShareOffset != null && !(Math.abs(frontShareOffset) < 1)) {
            throw new IllegalArgumentException("the front share offset must lie between -1 and 1, was "
                    + frontShareOffset);
        }
        if (rollGradient != null && !(rollGradient > 0 && Double.isFinite(rollGradient))) {
            throw new IllegalArgumentException("the target roll gradient must be positive, was " + rollGradient);
        }
    }

    public static Targets share(double frontShare) {
        return new Targets(frontShare, null, null);
    }

    public static Targets gradient(double rollGradient) {
        return new Targets(null, null, rollGradient);
    }

    /** @return true where a front share is aimed at (outright or as an offset) */
    public boolean hasShare() {
        return frontShare != null || frontShareOffset != null;
    }

    /**
     * @param staticFrontFraction the car's static front weight fraction
     * @return the wanted front share, or NaN where none is aimed at
     */
    public double shareFor(double staticFrontFraction) {
        if (frontShare != null) {
            return frontShare;
        }
        return frontShareOffset != null ? staticFrontFraction + frontShareOffset : Double.NaN;
    }

    /**
     * @return how far a setup misses, in steps (see the class comment)
     */
    public double miss(double frontLoadTransferShare, double gradient, double staticFrontFraction) {
        double sum = 0;
        if (hasShare()) {
            double steps = (frontLoadTransferShare - shareFor(staticFrontFraction)) / SHARE_STEP;
            sum += steps * steps;
        }
        if (rollGradient != null) {
            double steps = (gradient - rollGradient) / GRADIENT_STEP;
            sum += steps * steps;
        }
        return Math.sqrt(sum);
    }
}
