package barwright.sizing;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * What a search found.
 *
 * @param candidates  the best results, best first
 * @param evaluated   how many candidates (bars, or pairs of bars) were tried
 * @param accepted    how many of them met every constraint
 * @param rejections  how many were left out, by reason
 * @param targetShare the front share aimed at (offset resolved), or NaN where none was
 * @param reach       the front shares the sized bars can reach at all ({@link ReachableShare}), or null where
 *                    none passes its limits or the body has no stable roll at either end
 */
public record SizingResult(List<Candidate> candidates, long evaluated, long accepted,
                           Map<Rejection, Long> rejections, double targetShare, ShareReach reach) {
    public SizingResult {
        candidates = List.copyOf(candidates);
        rejections = rejections.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(rejections));
    }

    /** @return true where a front share is aimed at and lies outside what the sized bars can reach */
    public boolean targetOutOfReach() {
        return !Double.isNaN(targetShare) && reach != null && !reach.contains(targetShare);
    }
}
