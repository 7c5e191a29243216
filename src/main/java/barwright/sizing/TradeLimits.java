package barwright.sizing;

import barwright.model.SolidSection;
import barwright.physics.Warnings;

import java.util.ArrayList;
import java.util.List;

/**
 * Where a proposed bar stops looking like what the trade fits to a road or club car, in one place
 * (docs/sizing.md "Flags"): a proposal past one of these still met the search's limits, but a setter should
 * look twice before ordering it. The values are common practice, not from a single source.
 *
 * @param maxBarMass              heavier than this is flagged (kg)
 * @param maxSolidDiameter        a solid bar thicker than this is flagged (m)
 * @param maxTubeDiameter         a tube thicker than this is flagged (m)
 * @param leastSafetyFactor       the least safety factor the search asked for
 * @param safetyMargin            a safety factor within this fraction above the least asked for is flagged
 * @param stressedSafetyFactor    a safety factor below this is flagged whatever was asked for (a peak stress
 *                                above 1 / this share of yield)
 */
public record TradeLimits(double maxBarMass, double maxSolidDiameter, double maxTubeDiameter,
                          double leastSafetyFactor, double safetyMargin, double stressedSafetyFactor) {
    /** A road or club car's bar seldom weighs more than about 6 kg (common practice). */
    public static final double COMMON_MAX_BAR_MASS = 6.0;
    /** Solid bars above about 35 mm are rare on such cars: a tube does the job lighter (common practice). */
    public static final double COMMON_MAX_SOLID_DIAMETER = 35e-3;
    /** Tubes above about 40 mm outside seldom fit between the chassis rails (common practice). */
    public static final double COMMON_MAX_TUBE_DIAMETER = 40e-3;
    /** Less than 10 % over the least safety factor leaves no room for a travel past the check (common practice). */
    public static final double COMMON_SAFETY_MARGIN = 0.10;

    public TradeLimits {
        if (!(maxBarMass > 0 && maxSolidDiameter > 0 && maxTubeDiameter > 0 && leastSafetyFactor >= 0
                && safetyMargin >= 0 && stressedSafetyFactor >= 0)) {
            throw new IllegalArgumentException("trade limits are positive (margins and safety factors zero or more)");
        }
    }

    /**
     * The common-practice limits, with the stress flagged within 10 % of the least safety factor asked for, or
     * below the program's own low safety factor of 1.5 (a peak stress above two thirds of yield).
     *
     * @param leastSafetyFactor the least safety factor the search asked for
     */
    public static TradeLimits commonPractice(double leastSafetyFactor) {
        return new TradeLimits(COMMON_MAX_BAR_MASS, COMMON_MAX_SOLID_DIAMETER, COMMON_MAX_TUBE_DIAMETER,
                leastSafetyFactor, COMMON_SAFETY_MARGIN, Warnings.LOW_SAFETY_FACTOR);
    }

    /** @return the common-practice limits for a request */
    public static TradeLimits of(SizingRequest request) {
        return commonPractice(request.constraints().minSafetyFactor());
    }

    /** @return the safety factor below which a bar is flagged as stressed */
    public double stressFlagBelow() {
        return Math.max(leastSafetyFactor * (1 + safetyMargin), stressedSafetyFactor);
    }

    /** @return every flag of every sized bar of the candidate, front bar first, then by kind; empty where none */
    public List<TradeFlag> flags(Candidate candidate) {
        List<TradeFlag> flags = new ArrayList<>();
        for (BarChoice choice : candidate.bars()) {
            BarFigures bar = candidate.figures().bar(choice.axle());
            if (bar.mass() > maxBarMass) {
                flags.add(new TradeFlag(TradeFlag.Kind.BAR_MASS, choice.axle(), bar.mass(), maxBarMass));
            }
            double diameter = choice.size().section().outerDiameter();
            double maxDiameter = choice.size().section() instanceof SolidSection ? maxSolidDiameter : maxTubeDiameter;
            if (diameter > maxDiameter) {
                flags.add(new TradeFlag(TradeFlag.Kind.OUTER_DIAMETER, choice.axle(), diameter, maxDiameter));
            }
            if (bar.safetyFactor() < stressFlagBelow()) {
                flags.add(new TradeFlag(TradeFlag.Kind.STRESS, choice.axle(), bar.safetyFactor(), stressFlagBelow()));
            }
        }
        return flags;
    }
}
