package barwright.ui.sizing;

import barwright.io.Problem;
import barwright.ui.field.NumberText;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.IntNode;
import com.fasterxml.jackson.databind.node.LongNode;
import com.fasterxml.jackson.databind.node.NullNode;

import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.stream.Collectors;

/**
 * One change of a variant, as the person chose it: a quantity of the open car ({@link VariantChoices.Choice}) and
 * its new value as the file holds it (an arm hole as the file's index, counted from 0; a number in the file's
 * unit; null for an optional number left out). It says itself in words, in the display unit, and as the edit
 * {@code VehicleLoader.withEdits} makes. No Swing.
 *
 * @param choice what changes
 * @param value  the new value as the file holds it
 */
record VariantChange(VariantChoices.Choice choice, JsonNode value) {

    /**
     * @param typed the text typed in the display unit of the system, in the locale; empty leaves an optional
     *              number out
     * @throws IllegalArgumentException naming the field and what was typed, where it is not a number
     */
    static VariantChange number(VariantChoices.Choice choice, String typed, UnitSystem units, Locale locale) {
        String text = typed.strip();
        if (text.isEmpty()) {
            if (choice.spec().optional()) {
                return new VariantChange(choice, NullNode.getInstance());
            }
            throw new IllegalArgumentException(choice.title() + " is empty: give a number in "
                    + choice.spec().unitSymbol(units));
        }
        OptionalDouble number = NumberText.parse(text, locale);
        if (number.isEmpty()) {
            throw new IllegalArgumentException(choice.title() + ": '" + text + "' is not a number");
        }
        return new VariantChange(choice, fileNumber(choice.spec().toFile(number.getAsDouble(), units)));
    }

    /** @param holeFromOne the hole counted from 1, as the window shows holes */
    static VariantChange hole(VariantChoices.Choice choice, int holeFromOne) {
        return new VariantChange(choice, IntNode.valueOf(holeFromOne - 1)); // the file counts holes from 0
    }

    /** A whole number goes into the file as one (as the editor writes it). */
    private static JsonNode fileNumber(double value) {
        if (value == Math.rint(value) && Math.abs(value) <= Integer.MAX_VALUE) {
            return IntNode.valueOf((int) value);
        }
        return value == Math.rint(value) && Math.abs(value) < 1e15 ? LongNode.valueOf((long) value)
                : DoubleNode.valueOf(value);
    }

    /** @return the edit as {@code VehicleLoader.withEdits} takes it, e.g. {@code rear.bar.selectedArm=2} */
    String edit() {
        return choice.path() + "=" + value;
    }

    /** @return whether the car in the tree already has this value */
    boolean changesNothing(JsonNode tree) {
        JsonNode now = choice.path().get(tree);
        boolean nowMissing = now == null || now.isNull();
        if (value.isNull() || nowMissing) {
            return value.isNull() && nowMissing;
        }
        return now.isNumber() && now.doubleValue() == value.doubleValue();
    }

    /** @return e.g. "Front axle — Spring rate: 70 → 75 N/mm", "Rear bar — Arm hole in use: 2 → 3" (from 1) */
    String words(JsonNode tree, UnitSystem units, Locale locale) {
        return choice.title() + ": " + shown(choice.path().get(tree), units, locale, false) + " → "
                + shown(value, units, locale, true);
    }

    /** @return the new value in words, e.g. "hole 3" or "35 N/mm" */
    String newValue(UnitSystem units, Locale locale) {
        return choice.isHole() ? "hole " + (value.intValue() + 1) : shown(value, units, locale, true);
    }

    private String shown(JsonNode node, UnitSystem units, Locale locale, boolean withUnit) {
        if (node == null || node.isNull() || !node.isNumber()) {
            return "not given";
        }
        if (choice.isHole()) {
            return String.valueOf(node.intValue() + 1);
        }
        String unit = choice.spec().unitSymbol(units);
        return VariantChoices.number(choice.spec(), node.doubleValue(), units, locale)
                + (withUnit && !unit.isEmpty() ? " " + unit : "");
    }

    /**
     * @param problems the core's refusal of the variant with this change made
     * @param choices  the choices of the car, to name each problem's field by its label
     * @return the refusal in words: each field by its label, what was asked for, and the core's allowed range
     */
    String refusal(List<Problem> problems, List<VariantChoices.Choice> choices, UnitSystem units, Locale locale) {
        return problems.stream().map(problem -> {
            String core = problem.message().startsWith("= ") ? problem.message().substring(2) : problem.message();
            if (problem.path().equals(choice.path().toString())) {
                return choice.title() + ": " + newValue(units, locale) + " is refused (in the vehicle file: "
                        + core + ")";
            }
            return choices.stream().filter(other -> problem.path().equals(other.path().toString())).findFirst()
                    .map(other -> other.title() + " (in the vehicle file: " + core + ")")
                    .orElse(problem.toString());
        }).collect(Collectors.joining("; "));
    }
}
