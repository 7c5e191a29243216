package barwright.sizing;

import barwright.model.Material;
import barwright.sizing.catalogue.StockSize;

import java.util.List;
import java.util.stream.IntStream;

/**
 * What a search may pick for one axle's bar.
 *
 * @param materials the materials to try
 * @param sizes     the stock sizes to try
 * @param holes     0-based arm holes to try; empty for every hole of the bar
 */
public record SizeChoices(List<Material> materials, List<StockSize> sizes, List<Integer> holes) {
    public SizeChoices {
        materials = List.copyOf(materials);
        sizes = List.copyOf(sizes);
        holes = List.copyOf(holes);
        if (materials.isEmpty()) {
            throw new IllegalArgumentException("give at least one material to try");
        }
        if (sizes.isEmpty()) {
            throw new IllegalArgumentException("give at least one stock size to try");
        }
    }

    /** @return the holes to try on a bar with this many */
    public List<Integer> holesOf(int holeCount) {
        if (holes.isEmpty()) {
            return IntStream.range(0, holeCount).boxed().toList();
        }
        for (int hole : holes) {
            if (hole < 0 || hole >= holeCount) {
                throw new IllegalArgumentException("arm hole " + hole + " does not exist: the bar has holes 0 to "
                        + (holeCount - 1));
            }
        }
        return holes;
    }
}
