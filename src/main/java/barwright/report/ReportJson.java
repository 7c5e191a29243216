package barwright.report;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.AxleResult;
import barwright.physics.AxleStiffness;
import barwright.physics.GripLostToTransfer;
import barwright.physics.LoadTransferParts;
import barwright.physics.TurnResult;
import barwright.physics.Warning;
import barwright.physics.bar.BarResult;
import barwright.report.heading.OutputDocument;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import barwright.report.linkage.LinkageFigures;

import static barwright.units.Conversions.perDegree;
import static barwright.units.Conversions.perG;
import static barwright.units.Conversions.perMillimetre;
import static barwright.units.Conversions.toDegreesPerG;
import static barwright.units.Conversions.toG;
import static barwright.units.Conversions.toMegapascals;
import static barwright.units.Conversions.toMillimetres;

/** The analysis report of files.md ({@code analyze FILE --json}), units as the key names say. */
public final class ReportJson {
    public static final String FORMAT = "barwright.report";
    public static final int VERSION = 1;
    /** A lift beyond this lateral acceleration (g) is reported as null: the wheel stays loaded (files.md). */
    public static final double LIFT_REPORT_CEILING_G = 3.0;

    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private ReportJson() {
    }

    public static ObjectNode of(AnalysisResult result) {
        ObjectNode report = OutputDocument.start(FORMAT, VERSION);
        ObjectNode vehicle = report.putObject("vehicle");
        vehicle.put("massKg", result.masses().mass());
        vehicle.put("frontMassFraction", result.masses().frontMassFraction());
        vehicle.put("sprungMassKg", result.masses().sprungMass());
        vehicle.put("sprungCgHeightMm", toMillimetres(result.masses().sprungCgHeight()));
        vehicle.put("rollAxisHeightAtCgMm", toMillimetres(result.masses().rollAxisHeightAtCg()));
        vehicle.put("rollArmMm", toMillimetres(result.masses().rollArm()));
        LinkageFigures linkages = LinkageFigures.of(result);
        for (AxlePosition axle : AxlePosition.values()) {
            ObjectNode node = axle(result.axle(axle));
            linkages.putInto(node, axle);
            RateCalibrationOutput.putJson(node, result.vehicle().axle(axle).bar());
            report.set(axle.key(), node);
        }
        report.put("rollGradientDegPerG", toDegreesPerG(result.rollGradient()));
        report.put("suspensionRollGradientDegPerG", toDegreesPerG(result.suspensionRollGradient()));
        report.put("frontLoadTransferShare", result.frontLoadTransferShare());
        report.put("frontRollStiffnessShare", result.frontRollStiffnessShare());
        report.put("understeerGradientDegPerG", toDegreesPerG(result.understeerGradient()));
        for (TurnDirection direction : TurnDirection.values()) {
            report.set(direction.key(), turn(result, direction));
        }
        ArrayNode warnings = report.putArray("warnings");
        for (Warning warning : result.warnings()) {
            warnings.addObject().put("code", warning.code()).put("message", warning.message());
        }
        return report;
    }

    private static ObjectNode axle(AxleResult axle) {
        AxleStiffness stiffness = axle.stiffness();
        BarResult bar = axle.bar();
        ObjectNode node = NODES.objectNode();
        node.put("springRollStiffnessNmPerDeg", perDegree(stiffness.springRollStiffness()));
        putOrNull(node, "barRollStiffnessNmPerDeg", bar == null ? null : perDegree(stiffness.barRollStiffness()));
        node.put("tyreRollStiffnessNmPerDeg", perDegree(stiffness.tyreRollStiffness()));
        node.put("suspensionRollStiffnessNmPerDeg", perDegree(stiffness.suspensionRollStiffness()));
        node.put("rollStiffnessNmPerDeg", perDegree(stiffness.rollStiffness()));
        node.put("heaveRateNPerMm", perMillimetre(stiffness.heaveRate()));
        node.put("singleWheelBumpRateNPerMm", perMillimetre(stiffness.singleWheelBumpRate()));
        node.put("rideRateNPerMm", perMillimetre(stiffness.rideRate()));
        node.put("rideFrequencyHz", stiffness.rideFrequency());
        putOrNull(node, "barLinkRateNPerMm", bar == null ? null : perMillimetre(bar.linkRate()));
        putOrNull(node, "barMassKg", bar == null ? null : bar.mass());
        putOrNull(node, "barTorsionalShearStressMPa", bar == null ? null : toMegapascals(bar.torsionalShearStress()));
        putOrNull(node, "barMaxVonMisesStressMPa", bar == null ? null : toMegapascals(bar.maxVonMisesStress()));
        putOrNull(node, "barSafetyFactor", bar == null ? null : bar.safetyFactor());
        if (bar == null) {
            node.putNull("barModel");
            node.putNull("barMaxStressAtMm");
            node.putNull("barBushingLoadsN");
        } else {
            node.put("barModel", bar.model().key());
            node.put("barMaxStressAtMm", toMillimetres(bar.maxStressAt()));
            ArrayNode loads = node.putArray("barBushingLoadsN");
            bar.bushingLoads().forEach(loads::add);
        }
        LoadTransferParts transfer = axle.loadTransfer();
        ObjectNode perG = node.putObject("loadTransferNPerG");
        perG.put("unsprung", perG(transfer.unsprung()));
        perG.put("geometric", perG(transfer.geometric()));
        perG.put("elastic", perG(transfer.elastic()));
        perG.put("total", perG(transfer.total()));
        node.put("corneringStiffnessNPerDeg", perDegree(axle.corneringStiffness()));
        return node;
    }

    private static ObjectNode turn(AnalysisResult result, TurnDirection direction) {
        TurnResult turn = result.turn(direction);
        ObjectNode node = NODES.objectNode();
        putOrNull(node, "frontInsideLiftG", liftInG(turn.frontInsideLift()));
        putOrNull(node, "rearInsideLiftG", liftInG(turn.rearInsideLift()));
        node.put("frontLimitG", toG(turn.frontLimit()));
        node.put("rearLimitG", toG(turn.rearLimit()));
        node.put("limitG", toG(turn.limit()));
        node.put("limitBalance", turn.balance().key());
        node.put("frontGripLostToTransferPercent",
                100 * GripLostToTransfer.atLimit(result, AxlePosition.FRONT, direction));
        node.put("rearGripLostToTransferPercent",
                100 * GripLostToTransfer.atLimit(result, AxlePosition.REAR, direction));
        return node;
    }

    /** @return the lift in g, or null where the wheel stays loaded up to 3 g */
    public static Double liftInG(double lift) {
        double inG = toG(lift);
        return inG <= LIFT_REPORT_CEILING_G ? inG : null;
    }

    /** Puts the value, or null where there is none. */
    public static void putOrNull(ObjectNode node, String key, Double value) {
        if (value == null) {
            node.putNull(key);
        } else {
            node.put(key, value);
        }
    }
}
