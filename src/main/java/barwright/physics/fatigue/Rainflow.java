package barwright.physics.fatigue;

import java.util.ArrayList;
import java.util.List;

/**
 * Rainflow counting as the three-point procedure of ASTM E1049-85, "Standard Practices for Cycle Counting in
 * Fatigue Analysis", section 5.4.4 (the procedure recalled from memory; the standard was not read, its example
 * history and counts were read as two pages reproduce them, see RainflowTest and docs/validation.md). Cycles still
 * open at the end of the history are counted as half cycles.
 */
public final class Rainflow {
    private Rainflow() {
    }

    /** @return the history reduced to its peaks and valleys (repeated and intermediate points dropped) */
    static double[] reversals(double[] history) {
        double[] out = new double[history.length];
        int n = 0;
        for (double value : history) {
            if (n > 0 && value == out[n - 1]) {
                continue;
            }
            if (n >= 2 && (out[n - 1] - out[n - 2]) * (value - out[n - 1]) > 0) {
                out[n - 1] = value; // still rising (or falling): the last point was not a reversal
                continue;
            }
            out[n++] = value;
        }
        double[] reversals = new double[n];
        System.arraycopy(out, 0, reversals, 0, n);
        return reversals;
    }

    /**
     * @param history the stress (or any load) at each sample, at least two points
     * @return the counted cycles in the order found; a half cycle has count 0.5
     */
    public static List<StressCycle> count(double[] history) {
        if (history.length < 2) {
            throw new IllegalArgumentException("a history needs at least two points, got " + history.length);
        }
        double[] points = reversals(history);
        List<StressCycle> cycles = new ArrayList<>();
        double[] stack = new double[points.length];
        int size = 0;
        int start = 0; // index in the stack of the starting point S
        for (double point : points) {
            stack[size++] = point;
            while (size - start >= 3) {
                double x = Math.abs(stack[size - 1] - stack[size - 2]);
                double y = Math.abs(stack[size - 2] - stack[size - 3]);
                if (x < y) {
                    break;
                }
                double a = stack[size - 3];
                double b = stack[size - 2];
                if (size - 3 == start) {
                    // Y contains the starting point: a half cycle, and S moves on
                    cycles.add(new StressCycle(y, (a + b) / 2, 0.5));
                    start++;
                } else {
                    // a full cycle: drop both points of Y
                    cycles.add(new StressCycle(y, (a + b) / 2, 1));
                    stack[size - 3] = stack[size - 1];
                    size -= 2;
                }
            }
        }
        for (int i = start; i + 1 < size; i++) {
            cycles.add(new StressCycle(Math.abs(stack[i + 1] - stack[i]), (stack[i + 1] + stack[i]) / 2, 0.5));
        }
        return cycles;
    }
}
