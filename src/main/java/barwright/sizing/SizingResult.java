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
 */
public record SizingResult(List<Candidate> candidates, long evaluated, long accepted,
                           Map<Rejection, Long> rejections, double targetShare) {
    public SizingResult {
        candidates = List.copyOf(candidates);
        rejections = rejections.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(rejections));
    }
}
