package barwright.physics.fatigue;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Palmgren-Miner damage of counted cycles on an S-N line, with the mean-stress correction and the fatigue
 * stress-concentration factor K_f applied to both the alternating and the mean stress (Shigley's conservative
 * treatment for ductile parts, from memory). The history is the signed von Mises stress at the bar's most
 * stressed station, so a cycle's alternating von Mises stress is half its range and its mean von Mises stress
 * is the magnitude of its mean (Shigley's combined-stress treatment for stresses in proportion, from memory).
 */
public final class FatigueLife {
    private FatigueLife() {
    }

    /**
     * @param cycles              the counted cycles of one lap, nominal stresses (Pa)
     * @param curve               the bar's S-N line
     * @param stressConcentration K_f
     * @param correction          Goodman or Gerber
     * @param checkStress         the largest nominal von Mises stress at the check travel (Pa)
     * @param lapSeconds          the lap's duration (s)
     */
    public static FatigueResult assess(List<StressCycle> cycles, SnCurve curve, double stressConcentration,
                                       MeanStressCorrection correction, double checkStress, double lapSeconds) {
        double damage = 0;
        for (StressCycle cycle : cycles) {
            damage += cycle.count() / cyclesToFailure(cycle, curve, stressConcentration, correction);
        }
        double laps = damage > 0 ? 1 / damage : Double.POSITIVE_INFINITY;
        double safety = goodmanSafetyFactor(stressConcentration * checkStress, 0, curve);
        return new FatigueResult(damage, laps, laps * lapSeconds / 3600, safety, merged(cycles), curve);
    }

    /**
     * The Miner damage of cycles counted on a history that is to be scaled: cycles of a lap's a_y, say, times a
     * bar's stress per a_y. Scaling a history by a constant scales each rainflow cycle's range and mean and keeps
     * its count, so a search counts the lap once and scales for each bar.
     *
     * @param cycles the counted cycles of the unscaled history
     * @param scale  the factor that turns them into nominal stresses (Pa per unit of the history)
     * @return the damage sum of one lap
     */
    public static double damage(List<StressCycle> cycles, double scale, SnCurve curve, double stressConcentration,
                                MeanStressCorrection correction) {
        double size = Math.abs(scale);
        double damage = 0;
        for (StressCycle cycle : cycles) {
            double amplitude = stressConcentration * size * cycle.amplitude();
            double mean = stressConcentration * size * Math.abs(cycle.mean());
            damage += cycle.count() / curve.cyclesToFailure(correction.equivalentAmplitude(amplitude, mean,
                    curve.ultimateStrength()));
        }
        return damage;
    }

    /** @return the cycles that one cycle of that kind lasts */
    static double cyclesToFailure(StressCycle cycle, SnCurve curve, double stressConcentration,
                                  MeanStressCorrection correction) {
        double amplitude = stressConcentration * cycle.amplitude();
        double mean = stressConcentration * Math.abs(cycle.mean());
        return curve.cyclesToFailure(correction.equivalentAmplitude(amplitude, mean, curve.ultimateStrength()));
    }

    /**
     * The Goodman line's safety factor n = 1 / (sigma_a / S_e + sigma_m / S_ut) (Shigley, fatigue chapter, from
     * memory); +infinity where both stresses are zero.
     */
    public static double goodmanSafetyFactor(double alternating, double mean, SnCurve curve) {
        double utilisation = alternating / curve.enduranceLimit() + Math.max(0, mean) / curve.ultimateStrength();
        return utilisation > 0 ? 1 / utilisation : Double.POSITIVE_INFINITY;
    }

    /** @return the cycles with equal range and mean (to 0.01 MPa) merged, counts added, in first-found order */
    static List<StressCycle> merged(List<StressCycle> cycles) {
        Map<List<Long>, double[]> byKey = new LinkedHashMap<>();
        for (StressCycle cycle : cycles) {
            List<Long> key = List.of(Math.round(cycle.range() / 1e4), Math.round(cycle.mean() / 1e4));
            double[] sum = byKey.computeIfAbsent(key, k -> new double[]{cycle.range(), cycle.mean(), 0});
            sum[2] += cycle.count();
        }
        List<StressCycle> out = new ArrayList<>();
        for (double[] sum : byKey.values()) {
            out.add(new StressCycle(sum[0], sum[1], sum[2]));
        }
        return out;
    }
}
