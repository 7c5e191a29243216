package barwright.io;

import barwright.model.AxlePosition;
import barwright.model.CornerMasses;
import barwright.model.Material;
import barwright.model.RateCalibration;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.IntNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.Iterator;
import java.util.List;
import java.util.Map;

import static barwright.io.VehicleKeys.BAR;
import static barwright.io.VehicleKeys.CG_HEIGHT_MM;
import static barwright.io.VehicleKeys.CORNER_MASSES_KG;
import static barwright.io.VehicleKeys.FRONT_MASS_FRACTION;
import static barwright.io.VehicleKeys.LEFT_FRONT;
import static barwright.io.VehicleKeys.LEFT_REAR;
import static barwright.io.VehicleKeys.MASS_KG;
import static barwright.io.VehicleKeys.RIGHT_FRONT;
import static barwright.io.VehicleKeys.RIGHT_REAR;
import static barwright.io.VehicleKeys.VEHICLE;
import static barwright.io.VehicleKeys.MATERIAL;
import static barwright.io.VehicleKeys.SECTION;
import static barwright.io.VehicleKeys.SELECTED_ARM;
import static barwright.io.VehicleKeys.TYRE;

/**
 * The one place that changes a vehicle file's tree: a chosen bar put in place (the window, the sizing views,
 * {@code size --apply} and {@code map --candidates} all go through {@link #putBar}), the workshop's measurements
 * put in place ({@code measure ... --apply}), a fitted tyre put on an axle ({@link #putTyre}), and key-path
 * edits ({@code compare --variant}, the window's compare view). Changes are made on a copy and validated as a
 * whole, so a change keeps every unknown key and a bad value is refused with its key path like a bad file.
 */
public final class VehicleEdits {
    private VehicleEdits() {
    }

    /**
     * @param checks the checks that need the calculation ({@code barwright.loading.VehicleLoader#withBars} has them)
     * @return the document with each bar in place, validated as a whole
     */
    public static VehicleDocument withBars(VehicleDocument document, List<BarSetting> bars, BuildChecks checks)
            throws VehicleFileException {
        ObjectNode tree = document.editableTree();
        for (BarSetting bar : bars) {
            putBar(tree, bar, null);
        }
        return VehicleFileReader.fromTree(tree, checks);
    }

    /**
     * Puts a bar's material, section and arm hole into the tree; the rest of the bar stays.
     *
     * @param keptMaterial where the setting's material equals this one, the material object stays as the file
     *                     wrote it (by name, or in full); null writes the material in full always
     * @throws VehicleFileException where the file gives no bar object on that axle
     */
    public static void putBar(ObjectNode tree, BarSetting bar, Material keptMaterial) throws VehicleFileException {
        putBar(tree, bar.axle(), bar.material().equals(keptMaterial) ? null : BarNodes.material(bar.material()),
                BarNodes.section(bar.section()), IntNode.valueOf(bar.selectedArm()));
    }

    /**
     * Puts a bar's material, section and arm hole as JSON (e.g. read from a sizing result) into the tree.
     *
     * @param material the material object, or null to keep the file's
     * @throws VehicleFileException where the file gives no bar object on that axle
     */
    public static void putBar(ObjectNode tree, AxlePosition axle, JsonNode material, JsonNode section,
                              JsonNode selectedArm) throws VehicleFileException {
        ObjectNode barNode = barObject(tree, axle);
        if (material != null) {
            barNode.set(MATERIAL, material);
        }
        barNode.set(SECTION, section);
        barNode.set(SELECTED_ARM, selectedArm);
    }

    /** @return the axle's bar object, refused where the file gives none */
    private static ObjectNode barObject(ObjectNode tree, AxlePosition axle) throws VehicleFileException {
        JsonNode bar = tree.path(axle.key()).path(BAR);
        if (!(bar instanceof ObjectNode barNode)) {
            throw new VehicleFileException(List.of(new Problem(axle.key() + "." + BAR,
                    bar.isMissingNode() || bar.isNull() ? "is missing: a bar can only be put where the file gives "
                            + "one, with its geometry" : "is not a bar object {...}")));
        }
        return barNode;
    }

    /**
     * Puts a measured rate calibration into the axle's bar, or takes it out (null).
     *
     * @throws VehicleFileException where the file gives no bar object on that axle
     */
    public static void putRateCalibration(ObjectNode tree, AxlePosition axle, RateCalibration calibration)
            throws VehicleFileException {
        RateCalibrationKeys.put(barObject(tree, axle), calibration);
    }

    /**
     * Puts a measured centre-of-mass height into the body.
     *
     * @param height the height above the ground (m), written in mm to 0.1 mm
     */
    public static void putCentreOfMassHeight(ObjectNode tree, double height) {
        ((ObjectNode) tree.path(VEHICLE)).put(CG_HEIGHT_MM, Math.round(height * 1e4) / 10.0);
    }

    /** Puts the four corner masses (kg) into the body; the mass and front share then follow from them. */
    public static void putCornerMasses(ObjectNode tree, CornerMasses corners) {
        ObjectNode vehicle = (ObjectNode) tree.path(VEHICLE);
        ObjectNode scales = vehicle.putObject(CORNER_MASSES_KG);
        scales.put(LEFT_FRONT, corners.leftFront());
        scales.put(RIGHT_FRONT, corners.rightFront());
        scales.put(LEFT_REAR, corners.leftRear());
        scales.put(RIGHT_REAR, corners.rightRear());
        // the mass and front share follow from the corners (file-format.md)
        vehicle.remove(MASS_KG);
        vehicle.remove(FRONT_MASS_FRACTION);
    }

    /**
     * Puts a tyre object (as {@link TyreWriter#toJson} writes it) on an axle in place of the one there, and raises
     * an older file to the current version: the tyre's points and camber keys are keys of version 2, and the
     * upgrade changes the meaning of nothing else ({@link FileVersion}).
     */
    public static void putTyre(ObjectNode tree, AxlePosition axle, ObjectNode tyre) {
        if (tree.path("version").asInt(FileVersion.CURRENT) < FileVersion.CURRENT) {
            tree.put("version", FileVersion.CURRENT);
        }
        JsonNode axleNode = tree.get(axle.key());
        ObjectNode axleObject = axleNode instanceof ObjectNode object ? object : tree.putObject(axle.key());
        axleObject.set(TYRE, tyre.deepCopy());
    }

    /**
     * @param edits changes as {@code key.path=value}, e.g. {@code front.bar.selectedArm=2} or
     *              {@code rear.bar.armLengthsMm[0]=160}; the value is JSON (a number, null, an object...) or
     *              else taken as text
     * @param checks the checks that need the calculation ({@code barwright.loading.VehicleLoader#withEdits} has
     *               them)
     * @return the document with every change made, validated as a whole
     * @throws VehicleFileException where a change is malformed, names no key the program knows (the nearest
     *                              key is suggested), or the result is refused
     */
    public static VehicleDocument withEdits(VehicleDocument document, List<String> edits, BuildChecks checks)
            throws VehicleFileException {
        ObjectNode tree = document.editableTree();
        for (String edit : edits) {
            int equals = edit.indexOf('=');
            if (equals <= 0) {
                throw refused(edit, "is not a change of the form key.path=value");
            }
            String pathText = edit.substring(0, equals).trim();
            KeyPath path = keyPath(pathText);
            JsonNode value = value(pathText, edit.substring(equals + 1).trim());
            String noEntry = path.missingEntry(tree);
            if (noEntry != null) {
                throw refused(pathText, noEntry);
            }
            if (path.get(document.tree()) == null) {
                refuseUnknownKey(document, path, value, checks);
            }
            try {
                path.set(tree, value);
            } catch (IllegalArgumentException notThere) {
                throw refused(pathText, "does not name a key of the vehicle file");
            }
        }
        return VehicleFileReader.fromTree(tree, checks);
    }

    /**
     * A key the file does not have is accepted only where it means something to the program (an optional key):
     * a key that changes nothing is a typo, refused with the nearest key the file has.
     */
    private static void refuseUnknownKey(VehicleDocument document, KeyPath path, JsonNode value, BuildChecks checks)
            throws VehicleFileException {
        ObjectNode alone = document.editableTree();
        try {
            path.set(alone, value);
            if (!VehicleFileReader.fromTree(alone, checks).vehicle().equals(document.vehicle())) {
                return; // an optional key the program reads
            }
        } catch (IllegalArgumentException | VehicleFileException refusedAnyway) {
            return; // refused with its own reason when the whole edit is validated
        }
        String nearest = nearestKey(document.tree(), path.toString());
        throw refused(path.toString(), "is not a key the program knows, so it would change nothing"
                + (nearest == null ? "" : "; did you mean " + nearest + "?"));
    }

    /** @return the key path of the tree closest to the text (fewest letters changed), or null */
    static String nearestKey(JsonNode tree, String text) {
        List<String> paths = new ArrayList<>();
        collectPaths(tree, "", paths);
        return paths.stream().min(Comparator.comparingInt((String candidate) -> editDistance(candidate, text))
                .thenComparing(Comparator.naturalOrder())).orElse(null);
    }

    private static void collectPaths(JsonNode node, String prefix, List<String> paths) {
        if (node.isObject()) {
            for (Iterator<Map.Entry<String, JsonNode>> fields = node.fields(); fields.hasNext(); ) {
                Map.Entry<String, JsonNode> field = fields.next();
                String path = prefix.isEmpty() ? field.getKey() : prefix + "." + field.getKey();
                paths.add(path);
                collectPaths(field.getValue(), path, paths);
            }
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                String path = prefix + "[" + i + "]";
                paths.add(path);
                collectPaths(node.get(i), path, paths);
            }
        }
    }

    /** @return the Levenshtein distance: the fewest single-letter insertions, deletions and changes */
    static int editDistance(String a, String b) {
        int[] previous = new int[b.length() + 1];
        int[] current = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            previous[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            current[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int change = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                current[j] = Math.min(Math.min(current[j - 1] + 1, previous[j] + 1), previous[j - 1] + change);
            }
            int[] swap = previous;
            previous = current;
            current = swap;
        }
        return previous[b.length()];
    }

    private static KeyPath keyPath(String text) throws VehicleFileException {
        try {
            return KeyPath.of(text);
        } catch (IllegalArgumentException malformed) {
            throw refused(text, "is not a key path: keys joined by dots, with [n] for a list entry, "
                    + "e.g. front.bar.armLengthsMm[0]");
        }
    }

    /** @return the value as JSON where it reads as JSON, else as text */
    private static JsonNode value(String path, String text) throws VehicleFileException {
        try {
            return JsonInput.parseText(text);
        } catch (JsonInputException notJson) {
            if (text.startsWith("{") || text.startsWith("[")) {
                throw refused(path, "= " + text + ": " + notJson.getMessage());
            }
            return TextNode.valueOf(text);
        }
    }

    private static VehicleFileException refused(String path, String message) {
        return new VehicleFileException(List.of(new Problem(path, message)));
    }
}
