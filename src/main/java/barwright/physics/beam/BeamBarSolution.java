package barwright.physics.beam;

import barwright.physics.bar.BarResult;

import java.util.List;

/**
 * A beam-element bar analysis: the result every bar model returns, and the stresses all along the bar.
 *
 * @param result        rate, mass, stresses, bushing loads and deflected shape at the check travel
 * @param stressProfile two stations per element (its two end sections), left link end first, in order of
 *                      distance along the centreline; where loads or supports act, the two sides of a node
 *                      appear as two stations at the same distance
 * @param elementCount  how many beam elements the bar was cut into
 */
public record BeamBarSolution(BarResult result, List<StressStation> stressProfile, int elementCount) {
    public BeamBarSolution {
        stressProfile = List.copyOf(stressProfile);
    }
}
