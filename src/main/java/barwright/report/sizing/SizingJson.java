package barwright.report.sizing;

import barwright.io.BarNodes;
import barwright.report.ReportJson;
import barwright.report.heading.OutputDocument;
import barwright.sizing.BarChoice;
import barwright.sizing.BarFigures;
import barwright.sizing.Candidate;
import barwright.sizing.ExactSolution;
import barwright.sizing.Rejection;
import barwright.sizing.SizingRequest;
import barwright.sizing.SizingResult;
import barwright.sizing.TradeFlag;
import barwright.sizing.TradeLimits;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.List;
import java.util.Map;

import static barwright.io.VehicleKeys.MATERIAL;
import static barwright.io.VehicleKeys.SECTION;
import static barwright.io.VehicleKeys.SELECTED_ARM;
import static barwright.units.Conversions.toDegreesPerG;
import static barwright.units.Conversions.toMillimetres;

/**
 * The sizing result for scripts ({@code size FILE --json}): each candidate holds the material, section and
 * selectedArm objects of the vehicle file (files.md), so a script can put them straight into one.
 */
public final class SizingJson {
    public static final String FORMAT = "barwright.sizing";
    public static final int VERSION = 1;
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private SizingJson() {
    }

    /**
     * @param exactSolid the exact solid diameter of a one-axle search, or null (both axles, or not asked)
     * @param exactWall  the exact wall for a given tube diameter, or null where none was asked
     */
    public static ObjectNode of(SizingRequest request, SizingResult result, ExactSolution exactSolid,
                                ExactSolution exactWall) {
        ObjectNode root = OutputDocument.start(FORMAT, VERSION);
        ArrayNode axles = root.putArray("axles");
        request.axles().forEach(axle -> axles.add(axle.key()));
        ReportJson.putOrNull(root, "targetFrontLoadTransferShare", Double.isNaN(result.targetShare()) ? null
                : result.targetShare());
        ReportJson.putOrNull(root, "targetRollGradientDegPerG", request.targets().rollGradient() == null ? null
                : toDegreesPerG(request.targets().rollGradient()));
        if (result.reach() == null) {
            root.putNull("frontShareReach");
        } else {
            ObjectNode reach = root.putObject("frontShareReach");
            reach.put("lowest", result.reach().lowest());
            reach.put("highest", result.reach().highest());
        }
        root.put("targetOutOfReach", result.targetOutOfReach());
        TradeLimits limits = TradeLimits.of(request);
        ObjectNode trade = root.putObject("tradeLimits");
        trade.put("maxBarMassKg", limits.maxBarMass());
        trade.put("maxSolidDiameterMm", toMillimetres(limits.maxSolidDiameter()));
        trade.put("maxTubeDiameterMm", toMillimetres(limits.maxTubeDiameter()));
        trade.put("stressedBelowSafetyFactor", limits.stressFlagBelow());
        root.put("evaluated", result.evaluated());
        root.put("accepted", result.accepted());
        ObjectNode rejected = root.putObject("rejected");
        for (Map.Entry<Rejection, Long> entry : result.rejections().entrySet()) {
            rejected.put(entry.getKey().name(), entry.getValue());
        }
        ArrayNode candidates = root.putArray("candidates");
        int rank = 1;
        for (Candidate candidate : result.candidates()) {
            candidates.add(candidate(candidate, rank++, limits.flags(candidate)));
        }
        ReportJson.putOrNull(root, "exactSolidDiameterMm", exactSolid == null || !exactSolid.found() ? null
                : toMillimetres(exactSolid.dimension()));
        if (exactWall != null) {
            ReportJson.putOrNull(root, "exactTubeWallMm",
                    exactWall.found() ? toMillimetres(exactWall.dimension()) : null);
        }
        return root;
    }

    static ObjectNode candidate(Candidate candidate, int rank, List<TradeFlag> flags) {
        ObjectNode node = NODES.objectNode();
        node.put("rank", rank);
        if (candidate.bars().size() == 1) {
            BarChoice choice = candidate.bars().get(0);
            node.put("axle", choice.axle().key());
            putChoice(node, choice, candidate.figures().bar(choice.axle()));
        } else {
            double lowestSafety = Double.POSITIVE_INFINITY;
            for (BarChoice choice : candidate.bars()) {
                BarFigures bar = candidate.figures().bar(choice.axle());
                putChoice(node.putObject(choice.axle().key()), choice, bar);
                lowestSafety = Math.min(lowestSafety, bar.safetyFactor());
            }
            node.put("barMassKg", candidate.sizedBarMass());
            node.put("barSafetyFactor", lowestSafety);
        }
        Json.putFigures(node, candidate.figures());
        node.put("missSteps", candidate.miss());
        ArrayNode flagNodes = node.putArray("tradeFlags");
        for (TradeFlag flag : flags) {
            flagNodes.add(flag(flag));
        }
        return node;
    }

    /** One flag: its kind, axle, and the figure with where the flag starts, units in the key names. */
    private static ObjectNode flag(TradeFlag flag) {
        ObjectNode node = NODES.objectNode();
        node.put("flag", flag.kind().name());
        node.put("axle", flag.axle().key());
        switch (flag.kind()) {
            case BAR_MASS -> {
                node.put("barMassKg", flag.value());
                node.put("limitKg", flag.limit());
            }
            case OUTER_DIAMETER -> {
                node.put("outerDiameterMm", toMillimetres(flag.value()));
                node.put("limitMm", toMillimetres(flag.limit()));
            }
            case STRESS -> {
                node.put("barSafetyFactor", flag.value());
                node.put("limitSafetyFactor", flag.limit());
            }
        }
        return node;
    }

    private static void putChoice(ObjectNode node, BarChoice choice, BarFigures bar) {
        node.put("sizeLabel", choice.size().label());
        node.set(MATERIAL, BarNodes.material(choice.material()));
        node.set(SECTION, BarNodes.section(choice.size().section()));
        node.put(SELECTED_ARM, choice.selectedArm());
        Json.putBar(node, bar);
    }
}
