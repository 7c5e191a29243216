package barwright.physics.fatigue;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;

class RainflowTest {
    /** Counts by range, summed. */
    private static Map<Double, Double> byRange(List<StressCycle> cycles) {
        Map<Double, Double> out = new TreeMap<>();
        cycles.forEach(c -> out.merge(c.range(), c.count(), Double::sum));
        return out;
    }

    /**
     * The history -2, 1, -3, 5, -1, 3, -4, 4, -2 quoted as ASTM E1049-85's rainflow example and its counts by range
     * (docs/validation.md, Fatigue, [R2], a GitHub issue quoting the standard) and its table of count, range and mean
     * as a reference library prints it ([R1], MathWorks' rainflow page, which says it follows E1049). The standard
     * itself was not read. Exact: counting involves no rounding.
     */
    @Test
    void countsOfThePublishedExample() {
        double[] history = {-2, 1, -3, 5, -1, 3, -4, 4, -2};
        Map<Double, Double> expected = new TreeMap<>(Map.of(3.0, 0.5, 4.0, 1.5, 6.0, 0.5, 8.0, 1.0, 9.0, 0.5));
        assertEquals(expected, byRange(Rainflow.count(history)));
    }

    /** [R1]'s table, row by row (count, range, mean), compared as a set of rows. */
    @Test
    void rowsOfThePublishedTable() {
        List<List<Double>> expected = new ArrayList<>(List.of(List.of(0.5, 3.0, -0.5), List.of(0.5, 4.0, -1.0),
                List.of(1.0, 4.0, 1.0), List.of(0.5, 8.0, 1.0), List.of(0.5, 9.0, 0.5), List.of(0.5, 8.0, 0.0),
                List.of(0.5, 6.0, 1.0)));
        List<List<Double>> counted = new ArrayList<>();
        for (StressCycle cycle : Rainflow.count(new double[]{-2, 1, -3, 5, -1, 3, -4, 4, -2})) {
            counted.add(List.of(cycle.count(), cycle.range(), cycle.mean() + 0.0));
        }
        Comparator<List<Double>> rows = Comparator.comparing((List<Double> row) -> row.get(0))
                .thenComparing(row -> row.get(1)).thenComparing(row -> row.get(2));
        expected.sort(rows);
        counted.sort(rows);
        assertEquals(expected, counted);
    }

    /** Hand count (same rule): the one full cycle is the -1 to 3 pair, mean +1; the half cycles' means too. */
    @Test
    void meansOfTheHandCount() {
        List<StressCycle> cycles = Rainflow.count(new double[]{-2, 1, -3, 5, -1, 3, -4, 4, -2});
        StressCycle full = cycles.stream().filter(c -> c.count() == 1).findFirst().orElseThrow();
        assertEquals(4, full.range());
        assertEquals(1, full.mean());
        double meanOfNine = cycles.stream().filter(c -> c.range() == 9).findFirst().orElseThrow().mean();
        assertEquals(0.5, meanOfNine);
    }

    /** A constant-amplitude history of N cycles gives exactly N cycles of that range (definition of a cycle). */
    @Test
    void constantAmplitudeGivesExactlyNCycles() {
        int n = 1000;
        double[] history = new double[2 * n + 1];
        for (int i = 0; i < history.length; i++) {
            history[i] = i % 2 == 0 ? -150 : 150;
        }
        Map<Double, Double> counted = byRange(Rainflow.count(history));
        assertEquals(Map.of(300.0, (double) n), counted);
    }

    /** Points between a peak and a valley, and repeated points, are not reversals (E1049 terminology). */
    @Test
    void intermediatePointsAreDropped() {
        assertArrayEquals(new double[]{0, 5, -3, 2}, Rainflow.reversals(new double[]{0, 1, 5, 5, 2, -3, -3, 2}));
    }

    @Test
    void aHistoryOfOnePointIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> Rainflow.count(new double[]{3}));
    }
}
