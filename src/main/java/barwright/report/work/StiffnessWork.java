package barwright.report.work;

import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.physics.AnalysisResult;
import barwright.physics.AxleStiffness;
import barwright.units.Quantity;

import java.util.List;

/** The working of an axle's roll stiffness: springs, bar, tyres, and the three together (model.md 3). */
final class StiffnessWork {
    static final String SOURCE = "model.md section 3 (axle roll stiffness): each wheel's rate acts at half the "
            + "track, so a rate k gives k t² / 2 per side pair; springs in series add compliances. A standard "
            + "relation of vehicle dynamics (common practice).";

    /** A roll stiffness from rates and a track is a moment per radian of roll; the figures show it per degree. */
    static final String PER_RADIAN = "   (N·m or lbf·ft per radian of roll: × π/180 gives it per degree)";

    private StiffnessWork() {
    }

    static Derivation springs(AnalysisResult result, AxlePosition position) {
        Axle axle = result.vehicle().axle(position);
        AxleStiffness stiffness = result.axle(position).stiffness();
        return new Derivation(capital(position) + " roll stiffness from the springs",
                "K_spr = k_w t² / 2,   with the wheel rate k_w = k_s MR²" + PER_RADIAN,
                List.of(new WorkValue("k_s", "rate of one spring, at the spring", axle.springRate(), Quantity.LINEAR_RATE),
                        new WorkValue("MR", "spring motion ratio (spring travel / wheel travel)",
                                axle.springMotionRatio(), Quantity.RATIO),
                        track(axle)),
                List.of(new Step("k_w = k_s MR²", new WorkValue("k_w", "spring rate at the wheel",
                        stiffness.wheelRate(), Quantity.LINEAR_RATE))),
                new WorkValue("K_spr", "roll stiffness of the springs", stiffness.springRollStiffness(),
                        Quantity.ROLL_STIFFNESS),
                SOURCE, "");
    }

    static Derivation bar(AnalysisResult result, AxlePosition position) {
        Axle axle = result.vehicle().axle(position);
        AxleStiffness stiffness = result.axle(position).stiffness();
        if (!axle.hasBar()) {
            return new Derivation(capital(position) + " roll stiffness from the bar", "K_bar = 0 (no bar fitted)",
                    List.of(), List.of(), new WorkValue("K_bar", "roll stiffness of the bar", 0,
                    Quantity.ROLL_STIFFNESS), "model.md section 2", "This axle has no anti-roll bar.");
        }
        double linkRate = result.axle(position).bar().linkRate();
        return new Derivation(capital(position) + " roll stiffness from the bar",
                "K_bar = k_link r² t²" + PER_RADIAN,
                List.of(new WorkValue("k_link", "bar rate per unit of relative travel of its two link ends",
                                linkRate, Quantity.LINEAR_RATE),
                        new WorkValue("r", "link motion ratio (link travel / wheel travel)",
                                axle.bar().linkMotionRatio(), Quantity.RATIO),
                        track(axle)),
                List.of(),
                new WorkValue("K_bar", "roll stiffness of the bar", stiffness.barRollStiffness(),
                        Quantity.ROLL_STIFFNESS),
                "model.md section 2 (closed-form bar rate, roll stiffness the bar adds to its axle)",
                "In roll the two wheels move opposite ways, so the links' relative travel is r t times the roll "
                        + "angle and the bar's couple acts over the track once more: hence t², not t² / 2.");
    }

    static Derivation tyres(AnalysisResult result, AxlePosition position) {
        Axle axle = result.vehicle().axle(position);
        AxleStiffness stiffness = result.axle(position).stiffness();
        return new Derivation(capital(position) + " roll stiffness of the tyres", "K_tyre = k_t t² / 2" + PER_RADIAN,
                List.of(new WorkValue("k_t", "vertical rate of one tyre", axle.tyreVerticalRate(),
                        Quantity.LINEAR_RATE), track(axle)),
                List.of(),
                new WorkValue("K_tyre", "roll stiffness of the tyres", stiffness.tyreRollStiffness(),
                        Quantity.ROLL_STIFFNESS),
                SOURCE, "");
    }

    static Derivation axle(AnalysisResult result, AxlePosition position) {
        AxleStiffness stiffness = result.axle(position).stiffness();
        return new Derivation(capital(position) + " roll stiffness (springs, bar and tyres)",
                "K = 1 / ( 1/(K_spr + K_bar) + 1/K_tyre )",
                List.of(new WorkValue("K_spr", "roll stiffness of the springs", stiffness.springRollStiffness(),
                                Quantity.ROLL_STIFFNESS),
                        new WorkValue("K_bar", "roll stiffness of the bar", stiffness.barRollStiffness(),
                                Quantity.ROLL_STIFFNESS),
                        new WorkValue("K_tyre", "roll stiffness of the tyres", stiffness.tyreRollStiffness(),
                                Quantity.ROLL_STIFFNESS)),
                List.of(new Step("K_susp = K_spr + K_bar", new WorkValue("K_susp", "roll stiffness of the suspension",
                        stiffness.suspensionRollStiffness(), Quantity.ROLL_STIFFNESS))),
                new WorkValue("K", "roll stiffness of the axle", stiffness.rollStiffness(), Quantity.ROLL_STIFFNESS),
                SOURCE, "The suspension and the tyres are springs in series: the softer one sets most of it.");
    }

    private static WorkValue track(Axle axle) {
        return new WorkValue("t", "track", axle.track(), Quantity.LENGTH);
    }

    static String capital(AxlePosition position) {
        return position == AxlePosition.FRONT ? "Front" : "Rear";
    }
}
