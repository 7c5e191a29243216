package barwright.report.sizing;

import barwright.sizing.BarFigures;
import barwright.sizing.SetupFigures;
import com.fasterxml.jackson.databind.node.ObjectNode;

import static barwright.report.ReportJson.liftInG;
import static barwright.report.ReportJson.putOrNull;
import static barwright.units.Conversions.perDegree;
import static barwright.units.Conversions.perMillimetre;
import static barwright.units.Conversions.toDegreesPerG;
import static barwright.units.Conversions.toG;
import static barwright.units.Conversions.toMegapascals;

/** The shared figure keys of the sizing outputs (units in the key names). */
final class Json {
    private Json() {
    }

    /** The figures of a setup that every sizing output shares. */
    static void putFigures(ObjectNode node, SetupFigures figures) {
        node.put("frontLoadTransferShare", figures.frontLoadTransferShare());
        node.put("rollGradientDegPerG", toDegreesPerG(figures.rollGradient()));
        node.put("limitG", toG(figures.limit()));
        node.put("limitBalance", figures.balance().key());
        putOrNull(node, "frontInsideLiftG", liftInG(figures.frontInsideLift()));
        putOrNull(node, "rearInsideLiftG", liftInG(figures.rearInsideLift()));
        node.put("frontLiftsBeforeLimit", figures.frontLiftsBeforeLimit());
        node.put("rearLiftsBeforeLimit", figures.rearLiftsBeforeLimit());
    }

    /** The figures of one bar. */
    static void putBar(ObjectNode node, BarFigures bar) {
        node.put("barMassKg", bar.mass());
        node.put("barSafetyFactor", bar.safetyFactor());
        node.put("barMaxVonMisesStressMPa", toMegapascals(bar.maxStress()));
        node.put("barLinkRateNPerMm", perMillimetre(bar.linkRate()));
        node.put("barRollStiffnessNmPerDeg", perDegree(bar.rollStiffness()));
    }
}
