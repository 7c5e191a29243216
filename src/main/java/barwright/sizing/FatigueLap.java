package barwright.sizing;

import barwright.io.BarFatigueReader;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.BarFatigueSettings;
import barwright.model.FatigueStrength;
import barwright.model.Material;
import barwright.model.MaterialLibrary;
import barwright.model.Vehicle;
import barwright.physics.RollBalance;
import barwright.physics.fatigue.BarStressHistory;
import barwright.physics.fatigue.DefaultSpectrum;
import barwright.physics.fatigue.FatigueLife;
import barwright.physics.fatigue.MeanStressCorrection;
import barwright.physics.fatigue.Rainflow;
import barwright.physics.fatigue.SnCurve;
import barwright.physics.fatigue.StressCycle;

import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * A lap for the fatigue life of bars tried in a search or a comparison (docs/model.md 13), given as the rainflow
 * cycles of its a_y, counted once: each bar's stress per a_y in the candidate car scales them (the quasi-static
 * model, for a log too: replaying the lap for each of thousands of candidates would take seconds each).
 *
 * @param accelerationCycles the lap's a_y cycles (ranges and means in m/s^2)
 * @param settings           surface and K_f of each axle's bar (the vehicle's bar's); the defaults where absent
 * @param correction         Goodman or Gerber
 * @param customStrengths    fatigue strengths of materials that are not built in, by name (the vehicle's own)
 * @param description        what the lap is, for outputs
 */
public record FatigueLap(List<StressCycle> accelerationCycles, Map<AxlePosition, BarFatigueSettings> settings,
                         MeanStressCorrection correction, Map<String, FatigueStrength> customStrengths,
                         String description) {
    public FatigueLap {
        accelerationCycles = List.copyOf(accelerationCycles);
        settings = Map.copyOf(settings);
        customStrengths = Map.copyOf(customStrengths);
    }

    /**
     * @param document      the car, whose bars give the surface, K_f and their own material's strengths
     * @param lapLateral    one lap's a_y history (m/s^2)
     * @param description   what the lap is
     * @throws VehicleFileException naming the key path of a bad fatigue key
     */
    public static FatigueLap of(VehicleDocument document, double[] lapLateral, String description)
            throws VehicleFileException {
        Map<AxlePosition, BarFatigueSettings> settings = new EnumMap<>(AxlePosition.class);
        Map<String, FatigueStrength> custom = new HashMap<>();
        for (AxlePosition axle : AxlePosition.values()) {
            AntiRollBar bar = document.vehicle().axle(axle).bar();
            if (bar == null) {
                continue;
            }
            BarFatigueReader.Given given = BarFatigueReader.given(document, axle);
            settings.put(axle, given.settings());
            if (given.ownStrength() != null) {
                custom.put(bar.material().name(), given.ownStrength());
            }
        }
        return new FatigueLap(Rainflow.count(lapLateral), settings, MeanStressCorrection.GOODMAN, custom,
                description);
    }

    /** @return the invented default lap ({@link DefaultSpectrum}) with the car's bar settings */
    public static FatigueLap onDefaultLap(VehicleDocument document) throws VehicleFileException {
        return of(document, BarStressHistory.fromSpectrum(DefaultSpectrum.CORNERS, 1), DefaultSpectrum.DESCRIPTION);
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

    /**
     * @param state   the axle with the bar tried
     * @param balance the car's roll and transfer per a_y with that bar
     * @return laps to failure of the axle's bar (+infinity where no cycle does damage), or empty where its material
     * has no fatigue data
     */
    public OptionalDouble lapsToFailure(Vehicle vehicle, AxleState state, RollBalance balance) {
        AntiRollBar bar = state.bar();
        Optional<FatigueStrength> strength = strength(bar.material());
        if (strength.isEmpty()) {
            return OptionalDouble.empty();
        }
        double perAcceleration = BarStressHistory.stressPerAcceleration(vehicle, state.position(), bar,
                state.barResult(), state.stiffness(), balance);
        BarFatigueSettings barSettings = settingsOf(state.position());
        SnCurve curve = SnCurve.of(strength.get(), barSettings.surface(), bar.section().outerDiameter());
        double damage = FatigueLife.damage(accelerationCycles, perAcceleration, curve,
                barSettings.stressConcentration(), correction);
        return OptionalDouble.of(damage > 0 ? 1 / damage : Double.POSITIVE_INFINITY);
    }
}
