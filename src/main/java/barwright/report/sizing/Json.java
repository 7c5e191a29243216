package barwright.report.sizing;

import barwright.sizing.BarFigures;
import barwright.sizing.SetupFigures;
import com.fasterxml.jackson.databind.node.ObjectNode;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;

/** Unit conversions and the shared figure keys of the sizing outputs (units in the key names). */
final class Json {
    /** A lift beyond this (g) is written as null: the wheel stays loaded, as in the report (files.md). */
    static final double LIFT_CEILING_G = 3.0;

    private Json() {
    }

    static double degPerG(double radPerAccel) {
        return radPerAccel * STANDARD_GRAVITY / RADIANS_PER_DEGREE;
    }

    static double nmPerDeg(double nmPerRad) {
        return nmPerRad * RADIANS_PER_DEGREE;
    }

    static double inG(double accel) {
        return accel / STANDARD_GRAVITY;
    }

    /** @return the lift in g, or null where the wheel stays down to 3 g */
    static Double liftInG(double accel) {
        double g = accel / STANDARD_GRAVITY;
        return g <= LIFT_CEILING_G ? g : null;
    }

    static void putOrNull(ObjectNode node, String key, Double value) {
        if (value == null) {
            node.putNull(key);
        } else {
            node.put(key, value);
        }
    }

    /** The figures of a setup that every sizing output shares. */
    static void putFigures(ObjectNode node, SetupFigures figures) {
        node.put("frontLoadTransferShare", figures.frontLoadTransferShare());
        node.put("rollGradientDegPerG", degPerG(figures.rollGradient()));
        node.put("limitG", inG(figures.limit()));
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
        node.put("barMaxVonMisesStressMPa", bar.maxStress() * 1e-6);
        node.put("barLinkRateNPerMm", bar.linkRate() * 1e-3);
        node.put("barRollStiffnessNmPerDeg", nmPerDeg(bar.rollStiffness()));
    }
}
