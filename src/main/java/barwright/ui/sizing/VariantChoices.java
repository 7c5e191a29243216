package barwright.ui.sizing;

import barwright.io.KeyPath;
import barwright.model.AxlePosition;
import barwright.ui.field.FieldCatalogue;
import barwright.ui.field.FieldSpec;
import barwright.ui.field.NumberText;
import barwright.ui.field.Precision;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.io.VehicleKeys.ANALYSIS;
import static barwright.io.VehicleKeys.ARM_LENGTHS_MM;
import static barwright.io.VehicleKeys.BAR;
import static barwright.io.VehicleKeys.CORNER_MASSES_KG;
import static barwright.io.VehicleKeys.GEOMETRY;
import static barwright.io.VehicleKeys.HOLE_SETBACKS_MM;
import static barwright.io.VehicleKeys.LINKAGE;
import static barwright.io.VehicleKeys.MATERIAL;
import static barwright.io.VehicleKeys.ROLL_CENTRE_HEIGHT_MM;
import static barwright.io.VehicleKeys.SECTION;
import static barwright.io.VehicleKeys.SELECTED_ARM;
import static barwright.io.VehicleKeys.TORSION_LENGTH_MM;
import static barwright.io.VehicleKeys.TYRE;
import static barwright.io.VehicleKeys.VEHICLE;

/**
 * What a variant of the open car may change: the numbers of its vehicle file under the editor's labels
 * ({@link FieldCatalogue}), grouped as the editor's pages are (car, each axle, each bar), and each bar's arm hole
 * in use. Only what the car has is offered: no rear bar, no rear bar fields; a shaped bar has no lengths to
 * change; a roll centre the linkage sets is not offered. No Swing: tested without a display.
 */
final class VariantChoices {
    static final String ARM_HOLE = "Arm hole in use";

    private VariantChoices() {
    }

    /**
     * One quantity a variant may change.
     *
     * @param group the editor page it is on, e.g. "Rear bar"
     * @param label its label, e.g. "Spring rate"
     * @param path  its key path in the vehicle file
     * @param spec  its unit and help, or null for the arm hole
     * @param holes for the arm hole, each hole's length in mm (arm length, or set-back on a shaped bar); else empty
     * @param holeMeasure for the arm hole, what the lengths are ("arm" or "set back"); else empty
     */
    record Choice(String group, String label, KeyPath path, FieldSpec spec, List<Double> holes, String holeMeasure) {
        Choice {
            holes = List.copyOf(holes);
        }

        /** @return e.g. "Rear bar — Outside diameter" */
        String title() {
            return group + " — " + label;
        }

        boolean isHole() {
            return spec == null;
        }

        /** @return e.g. "Hole 2 (arm 175 mm)", counted from 1 */
        String holeText(int index, UnitSystem units, Locale locale) {
            String name = "Hole " + (index + 1);
            Double length = holes.get(index);
            return length == null ? name : name + " (" + holeMeasure + " " + number(FieldCatalogue.ARM, length,
                    units, locale) + " " + FieldCatalogue.ARM.unitSymbol(units) + ")";
        }

        @Override
        public String toString() {
            return title();
        }
    }

    /** @return what a variant of the car in this vehicle file tree may change, in the editor's order */
    static List<Choice> of(JsonNode tree) {
        List<Choice> choices = new ArrayList<>();
        KeyPath vehicle = KeyPath.of(VEHICLE);
        numbers(choices, tree, "Car", vehicle.child(CORNER_MASSES_KG), FieldCatalogue.CORNERS);
        numbers(choices, tree, "Car", vehicle, FieldCatalogue.WEIGHT);
        numbers(choices, tree, "Car", vehicle, FieldCatalogue.BODY);
        numbers(choices, tree, "Car", KeyPath.of(ANALYSIS), FieldCatalogue.CHECK);
        for (AxlePosition axle : AxlePosition.values()) {
            String end = axle == AxlePosition.FRONT ? "Front" : "Rear";
            axle(choices, tree, end + " axle", KeyPath.of(axle.key()));
            bar(choices, tree, end + " bar", KeyPath.of(axle.key()).child(BAR));
        }
        return List.copyOf(choices);
    }

    private static void axle(List<Choice> choices, JsonNode tree, String group, KeyPath axle) {
        JsonNode linkage = axle.child(LINKAGE).get(tree);
        boolean linkageSetsRollCentre = linkage != null && linkage.isObject();
        for (FieldSpec spec : FieldCatalogue.AXLE_GEOMETRY) {
            if (!(linkageSetsRollCentre && spec.key().equals(ROLL_CENTRE_HEIGHT_MM))) {
                number(choices, tree, group, axle, spec);
            }
        }
        numbers(choices, tree, group, axle, FieldCatalogue.AXLE_UNSPRUNG);
        numbers(choices, tree, group, axle, FieldCatalogue.AXLE_SPRINGS);
        numbers(choices, tree, group, axle.child(TYRE), FieldCatalogue.TYRE);
    }

    private static void bar(List<Choice> choices, JsonNode tree, String group, KeyPath bar) {
        JsonNode node = bar.get(tree);
        if (node == null || !node.isObject()) {
            return;
        }
        KeyPath section = bar.child(SECTION);
        number(choices, tree, group, section, FieldCatalogue.DIAMETER);
        number(choices, tree, group, section, FieldCatalogue.WALL);
        numbers(choices, tree, group, bar.child(MATERIAL), FieldCatalogue.MATERIAL);
        boolean straight = isNumber(bar.child(TORSION_LENGTH_MM).get(tree));
        List<Double> holes = new ArrayList<>();
        JsonNode lengths = (straight ? bar.child(ARM_LENGTHS_MM) : bar.child(GEOMETRY).child(HOLE_SETBACKS_MM))
                .get(tree);
        if (lengths != null && lengths.isArray()) {
            lengths.forEach(length -> holes.add(isNumber(length) ? length.doubleValue() : null));
        }
        if (straight) {
            numbers(choices, tree, group, bar, FieldCatalogue.BAR_LENGTHS);
            for (int hole = 0; hole < holes.size(); hole++) {
                String key = ARM_LENGTHS_MM + "[" + hole + "]";
                number(choices, tree, group, bar, FieldCatalogue.ARM.withKey(key, "Hole " + (hole + 1)
                        + " arm length"));
            }
        }
        number(choices, tree, group, bar, FieldCatalogue.LINK_RATIO);
        if (holes.size() > 1) {
            choices.add(new Choice(group, ARM_HOLE, bar.child(SELECTED_ARM), null, holes,
                    straight ? "arm" : "set back"));
        }
    }

    private static void numbers(List<Choice> choices, JsonNode tree, String group, KeyPath parent,
                                List<FieldSpec> specs) {
        specs.forEach(spec -> number(choices, tree, group, parent, spec));
    }

    /** Adds the number where the file gives it, or where it may be given (optional) and its object is there. */
    private static void number(List<Choice> choices, JsonNode tree, String group, KeyPath parent, FieldSpec spec) {
        KeyPath path = KeyPath.of(parent + "." + spec.key());
        JsonNode object = parent.get(tree);
        if (isNumber(path.get(tree)) || (spec.optional() && object != null && object.isObject())) {
            choices.add(new Choice(group, spec.label(), path, spec, List.of(), ""));
        }
    }

    private static boolean isNumber(JsonNode node) {
        return node != null && node.isNumber();
    }

    /** @return a file value in the display unit, as the editor's fields show it (no unit) */
    static String number(FieldSpec spec, double fileValue, UnitSystem units, Locale locale) {
        return NumberText.format(spec.toDisplay(fileValue, units), Precision.field(spec.quantity(), units), locale);
    }
}
