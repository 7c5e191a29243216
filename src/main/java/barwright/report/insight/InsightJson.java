package barwright.report.insight;

import barwright.insight.BalanceFigures;
import barwright.insight.ChassisPoint;
import barwright.insight.ChassisStudyResult;
import barwright.insight.EnvelopePoint;
import barwright.insight.InputChange;
import barwright.insight.LiftBoundary;
import barwright.insight.LiftEnvelopeResult;
import barwright.insight.LongitudinalRange;
import barwright.insight.SensitivityResult;
import barwright.insight.SensitivityRow;
import barwright.model.TurnDirection;
import barwright.report.ReportJson;
import barwright.report.heading.OutputDocument;
import barwright.units.DisplayUnit;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.List;
import java.util.Locale;

import static barwright.units.Conversions.perDegree;
import static barwright.units.Conversions.toDegreesPerG;
import static barwright.units.Conversions.toG;

/**
 * The JSON the {@code envelope}, {@code sensitivity} and {@code chassis} commands print for scripts (described in
 * docs/insight.md). Units are in the key names; accelerations in g; a lift past 3 g is null, as in the report.
 */
public final class InsightJson {
    public static final int VERSION = 1;
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private InsightJson() {
    }

    /** @param compared a second envelope to print beside it, or null */
    public static ObjectNode envelope(LiftEnvelopeResult envelope, LiftEnvelopeResult compared) {
        ObjectNode node = envelopeBody(envelope);
        if (compared != null) {
            node.set("compared", envelopeBody(compared));
        }
        return node;
    }

    private static ObjectNode envelopeBody(LiftEnvelopeResult envelope) {
        ObjectNode node = header("barwright.envelope", envelope.vehicleName());
        ObjectNode range = node.putObject("longitudinalRangeG");
        range.put("from", toG(envelope.mostBraking()));
        range.put("to", toG(envelope.mostAcceleration()));
        ObjectNode limits = node.putObject("lateralLimitG");
        for (TurnDirection turn : TurnDirection.values()) {
            limits.put(turn.key(), toG(envelope.limit(turn)));
        }
        ArrayNode boundaries = node.putArray("boundaries");
        for (LiftBoundary boundary : envelope.boundaries()) {
            ObjectNode wheel = boundaries.addObject();
            wheel.put("wheel", boundary.wheel().key());
            wheel.put("insideIn", boundary.wheel().insideIn().key());
            putLift(wheel, "liftAtZeroAXG", boundary.straightCornering().lateralAcceleration());
            ArrayNode points = wheel.putArray("points");
            for (EnvelopePoint point : boundary.points()) {
                ObjectNode entry = points.addObject();
                entry.put("aXG", toG(point.longitudinalAcceleration()));
                putLift(entry, "aYG", point.lateralAcceleration());
                entry.put("rollover", point.rollover());
            }
            ArrayNode before = wheel.putArray("liftsBeforeLimit");
            for (LongitudinalRange span : boundary.liftsBeforeLimit()) {
                before.addObject().put("fromAXG", toG(span.from())).put("toAXG", toG(span.to()));
            }
        }
        strings(node, "notes", envelope.notes());
        return node;
    }

    public static ObjectNode sensitivity(SensitivityResult result) {
        ObjectNode node = header("barwright.sensitivity", result.vehicleName());
        node.put("turn", result.turn().key());
        node.set("base", figures(result.base()));
        ArrayNode rows = node.putArray("changes");
        for (SensitivityRow row : result.rows()) {
            ObjectNode entry = rows.addObject();
            InputChange change = row.change();
            entry.put("input", change.key());
            entry.put("subject", change.subject());
            entry.put("change", change.effect());
            DisplayUnit unit = change.quantity().unit(UnitSystem.SI);
            entry.put("unit", unit.symbol());
            entry.put("from", unit.fromSi(change.from()));
            entry.put("to", unit.fromSi(change.to()));
            if (!row.analysed()) {
                entry.put("refused", row.refusal());
                continue;
            }
            entry.set("after", figures(row.after()));
            entry.put("frontLoadTransferShareChange", row.frontShareChange());
            entry.put("rollGradientChangeDegPerG", toDegreesPerG(row.rollGradientChange()));
            entry.put("limitMarginChangeG", toG(row.limitMarginChange()));
            if (row.insideLiftChange().isPresent()) {
                entry.put("insideLiftChangeG", toG(row.insideLiftChange().getAsDouble()));
            } else {
                entry.putNull("insideLiftChangeG");
            }
            entry.put("tendency", row.tendency().name().toLowerCase(Locale.ROOT));
            entry.put("summary", change.effect() + ": " + row.tendency().words());
        }
        strings(node, "notApplicable", result.notApplicable());
        return node;
    }

    private static ObjectNode figures(BalanceFigures figures) {
        ObjectNode node = NODES.objectNode();
        node.put("frontLoadTransferShare", figures.frontLoadTransferShare());
        node.put("rollGradientDegPerG", toDegreesPerG(figures.rollGradient()));
        node.put("limitMarginG", toG(figures.limitMargin()));
        putLift(node, "insideLiftG", figures.insideLift());
        node.put("insideLiftAxle", figures.insideLiftAxle().key());
        return node;
    }

    public static ObjectNode chassis(ChassisStudyResult study) {
        ObjectNode node = header("barwright.chassis", study.vehicleName());
        node.put("totalRollStiffnessNmPerDeg", perDegree(study.totalRollStiffness()));
        node.put("barChange", study.barChange());
        ArrayNode sweep = node.putArray("sweep");
        study.sweep().forEach(point -> sweep.add(chassisPoint(point, study)));
        node.set("rigid", chassisPoint(study.rigid(), study));
        node.set("noChassisStiffness", study.decoupled() == null ? null : chassisPoint(study.decoupled(), study));
        node.set("current", study.current() == null ? null : chassisPoint(study.current(), study));
        if (study.stiffnessForTarget() == null) {
            node.putNull("stiffnessFor80PercentNmPerDeg");
            node.putNull("stiffnessFor80PercentPerTotalRollStiffness");
        } else {
            node.put("stiffnessFor80PercentNmPerDeg", perDegree(study.stiffnessForTarget()));
            node.put("stiffnessFor80PercentPerTotalRollStiffness",
                    study.stiffnessForTarget() / study.totalRollStiffness());
        }
        strings(node, "notes", study.notes());
        return node;
    }

    private static ObjectNode chassisPoint(ChassisPoint point, ChassisStudyResult study) {
        ObjectNode node = NODES.objectNode();
        if (Double.isInfinite(point.chassisStiffness())) {
            node.putNull("chassisStiffnessNmPerDeg");
            node.putNull("perTotalRollStiffness");
        } else {
            node.put("chassisStiffnessNmPerDeg", perDegree(point.chassisStiffness()));
            node.put("perTotalRollStiffness", point.chassisStiffness() / study.totalRollStiffness());
        }
        node.put("frontLoadTransferShare", point.frontShare());
        node.put("rollGradientDegPerG", toDegreesPerG(point.rollGradient()));
        node.put("barChangeDelivered", point.deliveredShare());
        return node;
    }

    private static ObjectNode header(String format, String vehicleName) {
        ObjectNode node = OutputDocument.start(format, VERSION);
        node.put("vehicle", vehicleName);
        return node;
    }

    private static void strings(ObjectNode node, String key, List<String> texts) {
        ArrayNode array = node.putArray(key);
        texts.forEach(array::add);
    }

    private static void putLift(ObjectNode node, String key, double lift) {
        ReportJson.putOrNull(node, key, ReportJson.liftInG(lift));
    }
}
