package barwright.sizing;

import barwright.model.AxlePosition;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * A sizing search: which bars to size, what to aim at, what must hold, and what may be picked.
 *
 * @param axles       the axles whose bars are sized: one, or both at once
 * @param targets     what to aim at
 * @param constraints what every result must satisfy
 * @param choices     what may be picked, for each sized axle
 * @param maxResults  how many of the best results to return
 * @param tieBand     misses are compared after rounding to this many steps, so that near-equal misses are
 *                    ranked by mass (0.1 by default: a tenth of a percentage point of front share)
 */
public record SizingRequest(List<AxlePosition> axles, Targets targets, Constraints constraints,
                            Map<AxlePosition, SizeChoices> choices, int maxResults, double tieBand) {
    public static final double DEFAULT_TIE_BAND = 0.1;
    public static final int DEFAULT_MAX_RESULTS = 10;

    public SizingRequest {
        axles = List.copyOf(axles);
        if (axles.isEmpty() || axles.size() > 2 || axles.stream().distinct().count() != axles.size()) {
            throw new IllegalArgumentException("size the front bar, the rear bar, or both");
        }
        axles = axles.contains(AxlePosition.FRONT) && axles.size() == 2
                ? List.of(AxlePosition.FRONT, AxlePosition.REAR) : axles;
        choices = new EnumMap<>(choices);
        for (AxlePosition axle : axles) {
            if (!choices.containsKey(axle)) {
                throw new IllegalArgumentException("no sizes to try for the " + axle.key() + " bar");
            }
        }
        choices = Map.copyOf(choices);
        if (maxResults < 1) {
            throw new IllegalArgumentException("ask for at least one result, not " + maxResults);
        }
        if (!(tieBand >= 0 && Double.isFinite(tieBand))) {
            throw new IllegalArgumentException("the tie band must be zero or more, was " + tieBand);
        }
    }

    /** @return a one-axle search with the default result count and tie band */
    public static SizingRequest of(AxlePosition axle, Targets targets, Constraints constraints, SizeChoices choices) {
        return new SizingRequest(List.of(axle), targets, constraints, Map.of(axle, choices), DEFAULT_MAX_RESULTS,
                DEFAULT_TIE_BAND);
    }

    public SizingRequest withMaxResults(int count) {
        return new SizingRequest(axles, targets, constraints, choices, count, tieBand);
    }

    /** @return the number of single-bar candidates the search tries (materials x sizes x holes, per axle) */
    public long candidateCount(Map<AxlePosition, Integer> holeCounts) {
        long product = 1;
        for (AxlePosition axle : axles) {
            SizeChoices choice = choices.get(axle);
            product *= (long) choice.materials().size() * choice.sizes().size()
                    * choice.holesOf(holeCounts.get(axle)).size();
        }
        return product;
    }
}
