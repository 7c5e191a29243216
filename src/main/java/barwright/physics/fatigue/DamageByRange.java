package barwright.physics.fatigue;

import java.util.List;

/**
 * Where a lap's fatigue damage comes from: the Miner damage of the counted cycles summed in equal bins of stress
 * range, from 0 to the largest range (docs/model.md 13). A picture of which corners wear the bar.
 *
 * @param binWidth the width of each bin of nominal stress range (Pa)
 * @param damage   the damage of one lap in each bin, bin i holding ranges from i to i + 1 bin widths
 * @param cycles   the cycles counted in each bin (half cycles as 0.5)
 */
public record DamageByRange(double binWidth, double[] damage, double[] cycles) {
    /**
     * @param counted             a lap's counted cycles (nominal stress, Pa)
     * @param stressConcentration K_f
     * @param bins                how many bins, at least 1
     */
    public static DamageByRange of(List<StressCycle> counted, SnCurve curve, double stressConcentration,
                                   MeanStressCorrection correction, int bins) {
        double largest = 0;
        for (StressCycle cycle : counted) {
            largest = Math.max(largest, cycle.range());
        }
        double width = largest > 0 ? largest / bins : 1;
        double[] damage = new double[bins];
        double[] cycles = new double[bins];
        for (StressCycle cycle : counted) {
            int bin = Math.min(bins - 1, (int) (cycle.range() / width));
            cycles[bin] += cycle.count();
            damage[bin] += FatigueLife.damage(List.of(cycle), 1, curve, stressConcentration, correction);
        }
        return new DamageByRange(width, damage, cycles);
    }
}
