package barwright.report.sizing;

import barwright.io.BarNodes;
import barwright.physics.bar.BarResult;
import barwright.report.heading.OutputDocument;
import barwright.sizing.TubeEquivalents;
import barwright.sizing.TubeLives;
import barwright.sizing.TubeMatch;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.Locale;
import java.util.OptionalDouble;

import static barwright.io.VehicleKeys.MATERIAL;
import static barwright.io.VehicleKeys.SECTION;
import static barwright.io.VehicleKeys.SELECTED_ARM;
import static barwright.units.Conversions.perMillimetre;
import static barwright.units.Conversions.toMegapascals;
import static barwright.units.Conversions.toPercent;

/** Tubes of equal rate to a solid bar, for people and for scripts. */
public final class TubeOutput {
    public static final String FORMAT = "barwright.tubes";
    public static final int VERSION = 1;

    private TubeOutput() {
    }

    /** @param lives each bar's fatigue life on a lap (model.md 13) */
    public static ObjectNode json(TubeEquivalents.Comparison comparison, TubeLives lives) {
        ObjectNode root = OutputDocument.start(FORMAT, VERSION);
        BarResult solid = comparison.solid();
        ObjectNode solidNode = root.putObject("solid");
        solidNode.set(MATERIAL, BarNodes.material(comparison.solidBar().material()));
        solidNode.set(SECTION, BarNodes.section(comparison.solidBar().section()));
        solidNode.put(SELECTED_ARM, comparison.solidBar().selectedArm());
        solidNode.put("barLinkRateNPerMm", perMillimetre(solid.linkRate()));
        solidNode.put("barMassKg", solid.mass());
        solidNode.put("barMaxVonMisesStressMPa", toMegapascals(solid.maxVonMisesStress()));
        solidNode.put("barSafetyFactor", solid.safetyFactor());
        putLife(solidNode, lives.solid());
        root.put("fatigueLap", lives.lap().description());
        ArrayNode tubes = root.putArray("tubes");
        for (int i = 0; i < comparison.matches().size(); i++) {
            TubeMatch match = comparison.matches().get(i);
            ObjectNode node = tubes.addObject();
            node.put("sizeLabel", match.size().label());
            node.set(MATERIAL, BarNodes.material(match.material()));
            node.set(SECTION, BarNodes.section(match.size().section()));
            node.put("barLinkRateNPerMm", perMillimetre(match.linkRate()));
            node.put("rateDifference", match.rateDifference());
            node.put("barMassKg", match.mass());
            node.put("massSavedKg", match.massSaved());
            node.put("barMaxVonMisesStressMPa", toMegapascals(match.maxStress()));
            node.put("barSafetyFactor", match.safetyFactor());
            putLife(node, lives.tubes().get(i));
        }
        return root;
    }

    /**
     * {@code lapsToFailure}: a number, or null with {@code fatigueLife} saying why ("no damage": no cycle reaches
     * the endurance limit; "no fatigue data": the material has none), never Infinity.
     */
    private static void putLife(ObjectNode node, OptionalDouble laps) {
        if (laps.isPresent() && Double.isFinite(laps.getAsDouble())) {
            node.put("lapsToFailure", laps.getAsDouble());
            node.put("fatigueLife", "finite");
        } else {
            node.putNull("lapsToFailure");
            node.put("fatigueLife", laps.isPresent() ? "no damage" : "no fatigue data");
        }
    }

    /** @return laps to failure as the text shows it */
    public static String lifeText(OptionalDouble laps) {
        if (laps.isEmpty()) {
            return "no data";
        }
        double value = laps.getAsDouble();
        if (!Double.isFinite(value)) {
            return "no damage";
        }
        return value >= 1e6 ? String.format(Locale.ROOT, "%.2g laps", value)
                : String.format(Locale.ROOT, "%.0f laps", value);
    }

    public static String text(TubeEquivalents.Comparison comparison, TubeLives lives, UnitSystem units) {
        BarResult solid = comparison.solid();
        StringBuilder out = new StringBuilder();
        out.append(String.format(Locale.ROOT, "Solid bar %s %s, hole %d: link rate %s, mass %s, largest stress %s, "
                        + "safety factor %.2f, fatigue life %s%n", TextTable.figure(comparison.solidBar().section().outerDiameter(),
                        Quantity.LENGTH, units, units == UnitSystem.US ? 3 : 1),
                comparison.solidBar().material().name(), comparison.solidBar().selectedArm() + 1,
                TextTable.figure(solid.linkRate(), Quantity.LINEAR_RATE, units, 1),
                TextTable.figure(solid.mass(), Quantity.MASS, units, 2),
                TextTable.figure(solid.maxVonMisesStress(), Quantity.STRESS, units, 0), solid.safetyFactor(),
                lifeText(lives.solid())));
        out.append("Fatigue life on ").append(lives.lap().description()).append(", each bar in the car.\n");
        if (comparison.matches().isEmpty()) {
            out.append("No catalogue tube comes within 2 % of its rate.\n");
            return out.toString();
        }
        out.append("Tubes within 2 % of its rate, lightest first:\n");
        TextTable table = new TextTable("tube", "material", "rate", "vs solid", "mass", "saved", "largest stress",
                "safety", "fatigue life");
        for (int i = 0; i < comparison.matches().size(); i++) {
            TubeMatch match = comparison.matches().get(i);
            table.add(match.size().label(), match.material().name(),
                    TextTable.figure(match.linkRate(), Quantity.LINEAR_RATE, units, 1),
                    String.format(Locale.ROOT, "%+.1f %%", toPercent(match.rateDifference())),
                    TextTable.figure(match.mass(), Quantity.MASS, units, 2),
                    String.format(Locale.ROOT, "%s (%.0f %%)", TextTable.figure(match.massSaved(), Quantity.MASS,
                            units, 2), 100 * match.massSaved() / solid.mass()),
                    TextTable.figure(match.maxStress(), Quantity.STRESS, units, 0),
                    String.format(Locale.ROOT, "%.2f", match.safetyFactor()), lifeText(lives.tubes().get(i)));
        }
        out.append(table.render());
        out.append("A tube stresses more than the solid bar of the same rate: check its safety factor and its "
                + "fatigue life.\n");
        return out.toString();
    }
}
