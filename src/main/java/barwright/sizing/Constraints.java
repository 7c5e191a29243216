package barwright.sizing;

import barwright.model.AxlePosition;

import java.util.EnumSet;
import java.util.Set;

/**
 * What every bar a search returns must satisfy. The bar limits apply to each bar being sized.
 *
 * @param minSafetyFactor        least static safety factor against yield at the check travel
 * @param mustNotLiftBeforeLimit axles whose inside wheel must stay down up to the limit (either turn)
 * @param maxBarMass             heaviest bar allowed (kg), or null for no limit
 * @param maxOuterDiameter       largest outside diameter allowed (m), or null for no limit
 * @param minimumLife            the least fatigue life of each sized bar, or null for no limit
 */
public record Constraints(double minSafetyFactor, Set<AxlePosition> mustNotLiftBeforeLimit, Double maxBarMass,
                          Double maxOuterDiameter, FatigueLimit minimumLife) {
    /** No fatigue limit. */
    public Constraints(double minSafetyFactor, Set<AxlePosition> mustNotLiftBeforeLimit, Double maxBarMass,
                       Double maxOuterDiameter) {
        this(minSafetyFactor, mustNotLiftBeforeLimit, maxBarMass, maxOuterDiameter, null);
    }

    public Constraints {
        if (!(minSafetyFactor >= 0 && Double.isFinite(minSafetyFactor))) {
            throw new IllegalArgumentException("the least safety factor must be zero or more, was " + minSafetyFactor);
        }
        mustNotLiftBeforeLimit = mustNotLiftBeforeLimit.isEmpty() ? Set.of()
                : Set.copyOf(EnumSet.copyOf(mustNotLiftBeforeLimit));
        if (maxBarMass != null && !(maxBarMass > 0)) {
            throw new IllegalArgumentException("the largest bar mass must be positive, was " + maxBarMass);
        }
        if (maxOuterDiameter != null && !(maxOuterDiameter > 0)) {
            throw new IllegalArgumentException("the largest outside diameter must be positive, was " + maxOuterDiameter);
        }
    }

    /** @return these constraints with a least fatigue life (null for none) */
    public Constraints withMinimumLife(FatigueLimit limit) {
        return new Constraints(minSafetyFactor, mustNotLiftBeforeLimit, maxBarMass, maxOuterDiameter, limit);
    }

    /** @return only a safety factor, nothing else */
    public static Constraints safetyFactor(double minSafetyFactor) {
        return new Constraints(minSafetyFactor, Set.of(), null, null);
    }
}
