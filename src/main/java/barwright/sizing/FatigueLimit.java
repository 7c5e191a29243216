package barwright.sizing;

import barwright.model.AxlePosition;
import barwright.model.BarFatigueSettings;
import barwright.model.FatigueStrength;
import barwright.model.Material;
import barwright.model.MaterialLibrary;
import barwright.physics.fatigue.MeanStressCorrection;
import barwright.physics.fatigue.StressCycle;

import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The least fatigue life a sized bar must have (docs/model.md 13): at least {@code minLaps} laps of a lap given as
 * the rainflow cycles of its a_y, counted once; each bar's stress per a_y in the candidate car scales them (the
 * quasi-static model, for a log too: replaying the lap for each of thousands of candidates would take seconds
 * each).
 *
 * @param minLaps             the least laps to failure
 * @param accelerationCycles  the lap's a_y cycles (ranges and means in m/s^2)
 * @param settings            surface and K_f of each sized axle's bar (the vehicle's bar's)
 * @param correction          Goodman or Gerber
 * @param customStrengths     fatigue strengths of materials that are not built in, by name (the vehicle's own)
 * @param lapDescription      what the lap is, for messages
 */
public record FatigueLimit(double minLaps, List<StressCycle> accelerationCycles,
                           Map<AxlePosition, BarFatigueSettings> settings,
                           MeanStressCorrection correction, Map<String, FatigueStrength> customStrengths,
                           String lapDescription) {
    public FatigueLimit {
        if (!(minLaps >= 1 && minLaps <= 1e9)) {
            throw new IllegalArgumentException("the least laps must be 1 to 1000000000, was " + minLaps);
        }
        accelerationCycles = List.copyOf(accelerationCycles);
        customStrengths = Map.copyOf(customStrengths);
        settings = Map.copyOf(settings);
    }

    /** @return the material's fatigue strength: built in, or given for the vehicle's own material */
    public Optional<FatigueStrength> strength(Material material) {
        Optional<FatigueStrength> builtIn = MaterialLibrary.byName(material.name()).filter(material::equals)
                .flatMap(known -> MaterialLibrary.fatigueStrength(known.name()));
        return builtIn.isPresent() ? builtIn : Optional.ofNullable(customStrengths.get(material.name()));
    }

    /** @return the surface and K_f of that axle's bar; the defaults where none were given */
    public BarFatigueSettings settingsOf(AxlePosition position) {
        return settings.getOrDefault(position, BarFatigueSettings.DEFAULT);
    }
}
