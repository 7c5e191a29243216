package barwright.io;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.FatigueStrength;
import barwright.model.MaterialLibrary;
import barwright.model.BarFatigueInputs;
import barwright.model.BarFatigueSettings;
import barwright.model.SurfaceFinish;
import com.fasterxml.jackson.databind.JsonNode;

import java.util.Arrays;
import java.util.stream.Collectors;

import static barwright.io.VehicleKeys.BAR;
import static barwright.io.VehicleKeys.ENDURANCE_LIMIT_MPA;
import static barwright.io.VehicleKeys.FATIGUE;
import static barwright.io.VehicleKeys.MATERIAL;
import static barwright.io.VehicleKeys.STRESS_CONCENTRATION;
import static barwright.io.VehicleKeys.SURFACE;
import static barwright.io.VehicleKeys.ULTIMATE_STRENGTH_MPA;

/**
 * The optional fatigue keys of a bar (docs/file-format.md): {@code material.ultimateStrengthMPa} and
 * {@code material.enduranceLimitMPa} (both or neither; a built-in material has its own), and
 * {@code fatigue.surface} and {@code fatigue.stressConcentration} (defaults: machined, 1.5).
 */
public final class BarFatigueReader {
    private BarFatigueReader() {
    }

    /**
     * @return the fatigue inputs of the axle's bar
     * @throws VehicleFileException naming the key path where a value is missing, out of range or inconsistent
     */
    public static BarFatigueInputs read(VehicleDocument document, AxlePosition position) throws VehicleFileException {
        AntiRollBar bar = document.vehicle().axle(position).bar();
        String barPath = position.key() + "." + BAR;
        JsonNode barNode = document.tree().path(position.key()).path(BAR);
        if (bar == null || !barNode.isObject()) {
            throw new VehicleFileException(barPath + " is missing: the fatigue check needs a bar");
        }
        NodeReader reader = new NodeReader();
        FatigueStrength strength = strength(barNode, barPath, bar, reader);
        BarFatigueSettings settings = settings(barNode, barPath, reader);
        if (reader.hasProblems()) {
            throw new VehicleFileException(reader.problems());
        }
        return new BarFatigueInputs(strength, settings);
    }

    /**
     * @return the surface and K_f of the axle's bar, and its material's own fatigue strength where the file gives
     * one (a built-in material's is not repeated here), for the sizing search's least life
     * @throws VehicleFileException naming the key path of a bad value
     */
    public static Given given(VehicleDocument document, AxlePosition position) throws VehicleFileException {
        String barPath = position.key() + "." + BAR;
        JsonNode barNode = document.tree().path(position.key()).path(BAR);
        NodeReader reader = new NodeReader();
        JsonNode material = barNode.path(MATERIAL);
        FatigueStrength strength = material.isObject() && (!NodeReader.isAbsent(material, ULTIMATE_STRENGTH_MPA)
                || !NodeReader.isAbsent(material, ENDURANCE_LIMIT_MPA))
                ? given(material, barPath + "." + MATERIAL, reader) : null;
        BarFatigueSettings settings = barNode.isObject() ? settings(barNode, barPath, reader)
                : BarFatigueSettings.DEFAULT;
        if (reader.hasProblems()) {
            throw new VehicleFileException(reader.problems());
        }
        return new Given(strength, settings);
    }

    /**
     * What a bar's keys give for fatigue.
     *
     * @param ownStrength the material's own strengths, or null where the file gives none
     * @param settings    surface and K_f
     */
    public record Given(FatigueStrength ownStrength, BarFatigueSettings settings) {
    }

    /** @return the bar material's fatigue strength (its own keys, or the built-in one's); a problem for each bad key */
    static FatigueStrength strength(JsonNode barNode, String barPath, AntiRollBar bar, NodeReader reader) {
        String path = barPath + "." + MATERIAL;
        JsonNode material = barNode.path(MATERIAL);
        boolean hasUltimate = material.isObject() && !NodeReader.isAbsent(material, ULTIMATE_STRENGTH_MPA);
        boolean hasEndurance = material.isObject() && !NodeReader.isAbsent(material, ENDURANCE_LIMIT_MPA);
        if (!hasUltimate && !hasEndurance) {
            String name = bar.material().name();
            var builtIn = MaterialLibrary.byName(name).filter(m -> m.equals(bar.material()))
                    .flatMap(m -> MaterialLibrary.fatigueStrength(m.name()));
            if (builtIn.isEmpty()) {
                reader.problem(path + "." + ULTIMATE_STRENGTH_MPA, "is missing: the fatigue check of a custom "
                        + "material needs ultimateStrengthMPa and enduranceLimitMPa (the maker's data)");
            }
            return builtIn.orElse(null);
        }
        return given(material, path, reader);
    }

    /**
     * Checks every bar's optional fatigue keys as the vehicle file is read, so that a custom material whose
     * endurance limit is not below its ultimate strength (or a bad surface or K_f) refuses the file with its key
     * path, not only the fatigue command. A custom material without fatigue data is still accepted here: only
     * the fatigue check needs it.
     */
    static void check(JsonNode tree, NodeReader reader) {
        for (AxlePosition position : AxlePosition.values()) {
            String barPath = position.key() + "." + BAR;
            JsonNode barNode = tree.path(position.key()).path(BAR);
            if (!barNode.isObject()) {
                continue;
            }
            JsonNode material = barNode.path(MATERIAL);
            if (material.isObject() && (!NodeReader.isAbsent(material, ULTIMATE_STRENGTH_MPA)
                    || !NodeReader.isAbsent(material, ENDURANCE_LIMIT_MPA))) {
                given(material, barPath + "." + MATERIAL, reader);
            }
            settings(barNode, barPath, reader);
        }
    }

    /** @return the strengths given in the material object (both required once either is), or null with problems */
    private static FatigueStrength given(JsonNode material, String path, NodeReader reader) {
        int before = reader.problems().size();
        boolean hasUltimate = !NodeReader.isAbsent(material, ULTIMATE_STRENGTH_MPA);
        boolean hasEndurance = !NodeReader.isAbsent(material, ENDURANCE_LIMIT_MPA);
        double ultimate = reader.number(material, path, ULTIMATE_STRENGTH_MPA, Range.between(10, 5000, "MPa"));
        double endurance = reader.number(material, path, ENDURANCE_LIMIT_MPA, Range.between(1, 3000, "MPa"));
        if (hasUltimate && hasEndurance && endurance >= ultimate) {
            reader.problem(path + "." + ENDURANCE_LIMIT_MPA, "= " + NodeReader.shown(material.get(ENDURANCE_LIMIT_MPA))
                    + ": must be below the ultimate strength " + NodeReader.shown(material.get(ULTIMATE_STRENGTH_MPA))
                    + " MPa (an endurance limit is a fraction of it, about half for steels)");
            return null;
        }
        if (reader.problems().size() > before) {
            return null;
        }
        return new FatigueStrength(ultimate * 1e6, endurance * 1e6, FatigueStrength.STEEL_KNEE_CYCLES);
    }

    private static BarFatigueSettings settings(JsonNode barNode, String barPath, NodeReader reader) {
        JsonNode fatigue = reader.object(barNode, barPath, FATIGUE, false);
        if (fatigue == null) {
            return BarFatigueSettings.DEFAULT;
        }
        String path = barPath + "." + FATIGUE;
        SurfaceFinish surface = BarFatigueSettings.DEFAULT.surface();
        String surfaceText = reader.text(fatigue, path, SURFACE, false);
        if (!surfaceText.isEmpty()) {
            surface = SurfaceFinish.byKey(surfaceText).orElse(null);
            if (surface == null) {
                reader.problem(path + "." + SURFACE, "= \"" + surfaceText + "\": use one of "
                        + Arrays.stream(SurfaceFinish.values()).map(SurfaceFinish::key).collect(Collectors.joining(", ")));
                surface = BarFatigueSettings.DEFAULT.surface();
            }
        }
        double kf = reader.optionalNumber(fatigue, path, STRESS_CONCENTRATION, Range.between(1, 10, ""),
                BarFatigueSettings.DEFAULT_STRESS_CONCENTRATION);
        return new BarFatigueSettings(surface, kf);
    }
}
