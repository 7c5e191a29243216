package barwright.report.measure;

import barwright.measure.BarRateFit;
import barwright.measure.CentreOfMassHeight;
import barwright.measure.CornerWeights;
import barwright.measure.MotionRatioFit;
import barwright.report.heading.OutputDocument;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.List;

import static barwright.units.Conversions.perMillimetre;
import static barwright.units.Conversions.toMillimetres;

/** The {@code measure ... --json} output (file-format.md, "Measurement output"). */
public final class MeasureJson {
    public static final String FORMAT = "barwright.measure";
    public static final int VERSION = 1;

    private MeasureJson() {
    }

    /**
     * @param modelRate the model's link rate for the bar and hole (N/m), or null without a car
     */
    public static ObjectNode bar(BarRateFit fit, Double modelRate) {
        ObjectNode node = header("bar");
        node.put("rateNPerMm", perMillimetre(fit.rate()));
        node.put("lashMm", toMillimetres(fit.lash()));
        node.put("rSquared", fit.rSquared());
        ArrayNode residuals = node.putArray("residualsN");
        fit.residuals().forEach(residuals::add);
        ArrayNode roles = node.putArray("readingRoles");
        fit.roles().forEach(role -> roles.add(role.words()));
        if (modelRate == null) {
            node.putNull("modelRateNPerMm");
            node.putNull("effectiveRateFactor");
        } else {
            node.put("modelRateNPerMm", perMillimetre(modelRate));
            node.put("effectiveRateFactor", fit.rate() / modelRate);
        }
        warnings(node, fit.warnings());
        return node;
    }

    public static ObjectNode motionRatio(MotionRatioFit fit) {
        ObjectNode node = header("motion-ratio");
        node.put("ratio", fit.ratio());
        node.put("ratioChangePer100Mm", fit.ratioChangePer100Mm());
        node.put("rSquared", fit.rSquared());
        node.put("cosineCorrection", fit.cosineCorrection());
        ArrayNode residuals = node.putArray("residualsMm");
        fit.residuals().forEach(r -> residuals.add(toMillimetres(r)));
        warnings(node, fit.warnings());
        return node;
    }

    public static ObjectNode centreOfMass(CentreOfMassHeight height) {
        ObjectNode node = header("cg");
        node.put("cgHeightMm", toMillimetres(height.height()));
        node.put("uncertaintyMm", toMillimetres(height.uncertainty()));
        node.put("aboveWheelCentresMm", toMillimetres(height.aboveWheelCentres()));
        node.put("tiltDeg", Math.toDegrees(height.tiltAngle()));
        node.put("loadMovedKg", height.loadMoved());
        warnings(node, height.warnings());
        return node;
    }

    public static ObjectNode corners(CornerWeights weights) {
        ObjectNode node = header("corners");
        node.put("totalKg", weights.total());
        node.put("frontShare", weights.frontShare());
        node.put("leftShare", weights.leftShare());
        node.put("crossWeight", weights.crossWeight());
        if (weights.linkChange() == null) {
            node.putNull("linkChangeMmForTarget");
        } else {
            node.put("linkChangeMmForTarget", toMillimetres(weights.linkChange()));
            node.put("targetCrossWeight", weights.target());
            node.put("axle", weights.axle().key());
            node.put("longerLoads", weights.diagonal().gains());
        }
        warnings(node, weights.warnings());
        return node;
    }

    private static ObjectNode header(String measurement) {
        ObjectNode node = OutputDocument.start(FORMAT, VERSION);
        node.put("measurement", measurement);
        return node;
    }

    private static void warnings(ObjectNode node, List<String> warnings) {
        ArrayNode array = node.putArray("warnings");
        warnings.forEach(array::add);
    }
}
