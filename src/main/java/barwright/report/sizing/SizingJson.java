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
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

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
        root.put("evaluated", result.evaluated());
        root.put("accepted", result.accepted());
        ObjectNode rejected = root.putObject("rejected");
        for (Map.Entry<Rejection, Long> entry : result.rejections().entrySet()) {
            rejected.put(entry.getKey().name(), entry.getValue());
        }
        ArrayNode candidates = root.putArray("candidates");
        int rank = 1;
        for (Candidate candidate : result.candidates()) {
            candidates.add(candidate(candidate, rank++));
        }
        ReportJson.putOrNull(root, "exactSolidDiameterMm", exactSolid == null || !exactSolid.found() ? null
                : toMillimetres(exactSolid.dimension()));
        if (exactWall != null) {
            ReportJson.putOrNull(root, "exactTubeWallMm",
                    exactWall.found() ? toMillimetres(exactWall.dimension()) : null);
        }
        return root;
    }

    static ObjectNode candidate(Candidate candidate, int rank) {
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
