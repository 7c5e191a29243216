package barwright.report;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.AxleResult;
import barwright.physics.AxleStiffness;
import barwright.physics.LoadTransferParts;
import barwright.physics.TurnResult;
import barwright.physics.Warning;
import barwright.physics.bar.BarResult;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;

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
        ObjectNode report = NODES.objectNode();
        report.put("format", FORMAT);
        report.put("version", VERSION);
        ObjectNode vehicle = report.putObject("vehicle");
        vehicle.put("massKg", result.masses().mass());
        vehicle.put("frontMassFraction", result.masses().frontMassFraction());
        vehicle.put("sprungMassKg", result.masses().sprungMass());
        vehicle.put("sprungCgHeightMm", result.masses().sprungCgHeight() * 1e3);
        vehicle.put("rollAxisHeightAtCgMm", result.masses().rollAxisHeightAtCg() * 1e3);
        vehicle.put("rollArmMm", result.masses().rollArm() * 1e3);
        for (AxlePosition axle : AxlePosition.values()) {
            report.set(axle.key(), axle(result.axle(axle)));
        }
        report.put("rollGradientDegPerG", perG(result.rollGradient()));
        report.put("suspensionRollGradientDegPerG", perG(result.suspensionRollGradient()));
        report.put("frontLoadTransferShare", result.frontLoadTransferShare());
        report.put("frontRollStiffnessShare", result.frontRollStiffnessShare());
        report.put("understeerGradientDegPerG", perG(result.understeerGradient()));
        for (TurnDirection direction : TurnDirection.values()) {
            report.set(direction.key(), turn(result.turn(direction)));
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
        node.put("springRollStiffnessNmPerDeg", nmPerDeg(stiffness.springRollStiffness()));
        putOrNull(node, "barRollStiffnessNmPerDeg", bar == null ? null : nmPerDeg(stiffness.barRollStiffness()));
        node.put("tyreRollStiffnessNmPerDeg", nmPerDeg(stiffness.tyreRollStiffness()));
        node.put("suspensionRollStiffnessNmPerDeg", nmPerDeg(stiffness.suspensionRollStiffness()));
        node.put("rollStiffnessNmPerDeg", nmPerDeg(stiffness.rollStiffness()));
        node.put("heaveRateNPerMm", stiffness.heaveRate() * 1e-3);
        node.put("singleWheelBumpRateNPerMm", stiffness.singleWheelBumpRate() * 1e-3);
        node.put("rideRateNPerMm", stiffness.rideRate() * 1e-3);
        node.put("rideFrequencyHz", stiffness.rideFrequency());
        putOrNull(node, "barLinkRateNPerMm", bar == null ? null : bar.linkRate() * 1e-3);
        putOrNull(node, "barMassKg", bar == null ? null : bar.mass());
        putOrNull(node, "barTorsionalShearStressMPa", bar == null ? null : bar.torsionalShearStress() * 1e-6);
        putOrNull(node, "barMaxVonMisesStressMPa", bar == null ? null : bar.maxVonMisesStress() * 1e-6);
        putOrNull(node, "barSafetyFactor", bar == null ? null : bar.safetyFactor());
        if (bar == null) {
            node.putNull("barModel");
            node.putNull("barMaxStressAtMm");
            node.putNull("barBushingLoadsN");
        } else {
            node.put("barModel", bar.model().key());
            node.put("barMaxStressAtMm", bar.maxStressAt() * 1e3);
            ArrayNode loads = node.putArray("barBushingLoadsN");
            bar.bushingLoads().forEach(loads::add);
        }
        LoadTransferParts transfer = axle.loadTransfer();
        ObjectNode perG = node.putObject("loadTransferNPerG");
        perG.put("unsprung", transfer.unsprung() * STANDARD_GRAVITY);
        perG.put("geometric", transfer.geometric() * STANDARD_GRAVITY);
        perG.put("elastic", transfer.elastic() * STANDARD_GRAVITY);
        perG.put("total", transfer.total() * STANDARD_GRAVITY);
        node.put("corneringStiffnessNPerDeg", axle.corneringStiffness() * RADIANS_PER_DEGREE);
        return node;
    }

    private static ObjectNode turn(TurnResult turn) {
        ObjectNode node = NODES.objectNode();
        putOrNull(node, "frontInsideLiftG", liftInG(turn.frontInsideLift()));
        putOrNull(node, "rearInsideLiftG", liftInG(turn.rearInsideLift()));
        node.put("frontLimitG", turn.frontLimit() / STANDARD_GRAVITY);
        node.put("rearLimitG", turn.rearLimit() / STANDARD_GRAVITY);
        node.put("limitG", turn.limit() / STANDARD_GRAVITY);
        node.put("limitBalance", turn.balance().key());
        return node;
    }

    /** @return the lift in g, or null where the wheel stays loaded up to 3 g */
    public static Double liftInG(double lift) {
        double inG = lift / STANDARD_GRAVITY;
        return inG <= LIFT_REPORT_CEILING_G ? inG : null;
    }

    private static void putOrNull(ObjectNode node, String key, Double value) {
        if (value == null) {
            node.putNull(key);
        } else {
            node.put(key, value);
        }
    }

    private static double nmPerDeg(double nmPerRad) {
        return nmPerRad * RADIANS_PER_DEGREE;
    }

    /** rad per m/s^2 to deg per g */
    private static double perG(double radPerAccel) {
        return radPerAccel * STANDARD_GRAVITY / RADIANS_PER_DEGREE;
    }
}
