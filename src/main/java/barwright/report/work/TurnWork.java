package barwright.report.work;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.Balance;
import barwright.physics.MassProperties;
import barwright.physics.SteadyCornering;
import barwright.physics.TurnResult;
import barwright.physics.TyreModel;
import barwright.physics.WheelLoads;
import barwright.report.ReportJson;
import barwright.units.Quantity;

import java.util.List;
import java.util.Locale;

import static barwright.units.Conversions.toG;


/** The working of a turn's grip limit and of an inside wheel's lift (model.md 7 and 8). */
final class TurnWork {
    private static final String LIMIT_SOURCE = "model.md section 8: load-sensitive friction and the Magic Formula "
            + "(Pacejka, Tyre and Vehicle Dynamics); wheel loads from model.md sections 5 and 7";
    private static final String LIFT_SOURCE = "model.md section 7 (inside-wheel lift), with the load transfer of "
            + "section 5 (Milliken & Milliken, Race Car Vehicle Dynamics, ch. 18)";

    private TurnWork() {
    }

    static Derivation balance(AnalysisResult result, TurnDirection direction) {
        TurnResult turn = result.turn(direction);
        double difference = turn.rearLimit() - turn.frontLimit();
        return new Derivation("Balance at the limit in a " + direction.word() + " turn",
                "a_r − a_f: above +0.01 g understeer, below −0.01 g oversteer, between neutral",
                List.of(new WorkValue("a_f", "lateral acceleration at which the front axle reaches its grip",
                                turn.frontLimit(), Quantity.ACCELERATION),
                        new WorkValue("a_r", "lateral acceleration at which the rear axle reaches its grip",
                                turn.rearLimit(), Quantity.ACCELERATION),
                        new WorkValue("band", "neutral band", Balance.NEUTRAL_BAND, Quantity.ACCELERATION)),
                List.of(new Step("a_r − a_f", new WorkValue("a_r − a_f", "how much later the rear lets go",
                        difference, Quantity.ACCELERATION))),
                new WorkValue("limit", "grip limit, the lower of the two: " + turn.balance().key(), turn.limit(),
                        Quantity.ACCELERATION),
                "model.md section 8: each axle's limit from its tyres' grip at their loads in the turn",
                "The axle that reaches its grip first decides: the front first is understeer (the car runs wide), "
                        + "the rear first is oversteer. A stiffer front bar moves load transfer to the front and "
                        + "the front limit down.");
    }

    static Derivation limit(AnalysisResult result, TurnDirection direction) {
        TurnResult turn = result.turn(direction);
        AxlePosition axle = turn.frontLimit() <= turn.rearLimit() ? AxlePosition.FRONT : AxlePosition.REAR;
        String word = axle.key();
        double limit = turn.limit();
        MassProperties masses = result.masses();
        double share = axle == AxlePosition.FRONT ? masses.frontMassFraction() : 1 - masses.frontMassFraction();
        WheelLoads loads = turn.cornering().wheelLoads(limit);
        double outside = axle == AxlePosition.FRONT ? loads.frontOutside() : loads.rearOutside();
        double inside = axle == AxlePosition.FRONT ? loads.frontInside() : loads.rearInside();
        TyreModel tyre = new TyreModel(result.vehicle().axle(axle).tyre());
        var tyreData = result.vehicle().axle(axle).tyre();
        String title = "Grip limit in a " + direction.word() + " turn";
        String note = String.format(Locale.ROOT, "The %s axle reaches its grip first (front limit %.3f g, rear "
                        + "%.3f g): the balance at the limit is %s. A heavily loaded outside tyre grips less per "
                        + "unit of load, so the axle that transfers more load loses grip sooner.", word,
                toG(turn.frontLimit()), toG(turn.rearLimit()), turn.balance().key());
        boolean points = tyreData.hasFrictionPoints();
        // the tyre's grip as the analysis uses it: from its law or its points, at zero camber to the road
        String rule = points ? "from the tyre's peak friction points (model.md 8.1)" : null;
        List<WorkValue> inputs = points
                ? List.of(new WorkValue("m", "car mass", masses.mass(), Quantity.MASS),
                        new WorkValue("share", "share of the car's mass this axle must turn", share, Quantity.SHARE),
                        new WorkValue("F_z,low", "lowest load of the tyre's friction points",
                                tyreData.frictionByLoad().lowestLoad(), Quantity.FORCE),
                        new WorkValue("F_z,high", "highest load of the tyre's friction points",
                                tyreData.frictionByLoad().highestLoad(), Quantity.FORCE))
                : List.of(new WorkValue("m", "car mass", masses.mass(), Quantity.MASS),
                        new WorkValue("share", "share of the car's mass this axle must turn", share, Quantity.SHARE),
                        new WorkValue("μ0", "tyre peak grip at the reference load", tyreData.frictionAtNominalLoad(),
                                Quantity.RATIO),
                        new WorkValue("s", "tyre grip change with load", tyreData.frictionLoadSensitivity(),
                                Quantity.RATIO),
                        new WorkValue("F_z0", "tyre reference load", tyreData.nominalLoad(), Quantity.FORCE));
        return new Derivation(title, "share × m × a_y = μ(F_zo) F_zo + μ(F_zi) F_zi, solved for a_y (in g: a_y = capacity / (share m g))",
                inputs,
                List.of(new Step("F_zo = static load + load transfer at the limit", new WorkValue("F_zo",
                                word + " outside wheel load at the limit", outside, Quantity.FORCE)),
                        new Step("F_zi = static load − load transfer at the limit", new WorkValue("F_zi",
                                word + " inside wheel load at the limit", inside, Quantity.FORCE)),
                        new Step(points ? "μ(F_zo) " + rule : "μ(F_zo) = μ0 (1 + s (F_zo/F_z0 − 1))",
                                new WorkValue("μ(F_zo)", "outside tyre's grip", tyre.friction(outside, 0),
                                        Quantity.RATIO)),
                        new Step(points ? "μ(F_zi) " + rule : "μ(F_zi) = μ0 (1 + s (F_zi/F_z0 − 1))",
                                new WorkValue("μ(F_zi)", "inside tyre's grip", inside > 0 ? tyre.friction(inside, 0) : 0,
                                        Quantity.RATIO)),
                        new Step("capacity = μ(F_zo) F_zo + μ(F_zi) F_zi", new WorkValue("capacity",
                                word + " axle's sideways grip at the limit",
                                tyre.peakForce(outside, 0) + tyre.peakForce(inside, 0), Quantity.FORCE))),
                new WorkValue("a_y", "lateral acceleration at the limit", limit, Quantity.ACCELERATION),
                LIMIT_SOURCE, note);
    }

    static Derivation lift(AnalysisResult result, AxlePosition axle, TurnDirection direction) {
        TurnResult turn = result.turn(direction);
        SteadyCornering cornering = turn.cornering();
        MassProperties masses = result.masses();
        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        double lift = cornering.insideLift(axle);
        String word = axle.key();
        String title = "Inside " + word + " wheel lift in a " + direction.word() + " turn";
        WorkValue staticInside = new WorkValue("W_i", "static load of the inside " + word + " wheel",
                inside(loads, axle, direction), Quantity.FORCE);
        WorkValue liftValue = new WorkValue("a_lift", "lateral acceleration at which the wheel's load reaches zero",
                lift, Quantity.ACCELERATION);
        if (ReportJson.liftInG(lift) == null) {
            return new Derivation(title, "W_i − ΔF(a_y) > 0 for every a_y up to 3 g", List.of(staticInside), List.of(),
                    liftValue, LIFT_SOURCE, "This wheel stays on the ground up to 3 g: it does not lift.");
        }
        if (axle == cornering.firstLiftAxle()) {
            // with migrating roll centres the transfer is not linear in a_y: its mean slope up to the lift
            // (the same number as the transfer per g for typed roll centres)
            WorkValue slope = new WorkValue("ΔF/a_y", word + " load transfer per g up to the lift, with the roll "
                    + "centres where they are at the lift's roll", cornering.loadTransfer(axle, lift) / lift,
                    Quantity.FORCE_PER_G);
            return new Derivation(title, "a_lift = W_i / (ΔF/a_y)", List.of(staticInside, slope), List.of(),
                    liftValue, LIFT_SOURCE, liftNote(turn, lift));
        }
        AxlePosition first = cornering.firstLiftAxle();
        double firstLift = cornering.insideLift(first);
        return new Derivation(title,
                "ΔF_Y t_Y = m a_y h + m_s g h' φ(a_y) − W_Xi t_X reaches W_i (X: the axle that lifted first)",
                List.of(staticInside,
                        new WorkValue("W_Xi", "static load of the inside " + first.key() + " wheel, lifted first",
                                inside(loads, first, direction), Quantity.FORCE),
                        new WorkValue("a_X", "the " + first.key() + " inside wheel lifted at", firstLift,
                                Quantity.ACCELERATION),
                        new WorkValue("m", "car mass", masses.mass(), Quantity.MASS),
                        new WorkValue("h", "centre of mass height", result.vehicle().cgHeight(), Quantity.LENGTH),
                        new WorkValue("m_s g h'", "gravity's roll moment per radian (h' at the first lift's roll)",
                                cornering.liftGravityRollMoment(), Quantity.ROLL_STIFFNESS),
                        new WorkValue("t_X", first.key() + " track", result.vehicle().axle(first).track(),
                                Quantity.LENGTH),
                        new WorkValue("t_Y", word + " track", result.vehicle().axle(axle).track(), Quantity.LENGTH)),
                List.of(new Step("φ(a_lift): body roll, stiffer before the first lift, softer after it",
                        new WorkValue("φ", "body roll at a_lift", cornering.rollAngle(lift), Quantity.ANGLE))),
                liftValue, LIFT_SOURCE, liftNote(turn, lift) + " Once the " + first.key() + " inside wheel is off "
                + "the ground its load transfer stays at that wheel's static load, and this axle takes the rest.");
    }

    private static String liftNote(TurnResult turn, double lift) {
        return lift < turn.limit()
                ? String.format(Locale.ROOT, "This is below the grip limit (%.3f g): the wheel leaves the ground "
                + "before the car slides.", toG(turn.limit()))
                : String.format(Locale.ROOT, "This is above the grip limit (%.3f g): the tyres slide first.",
                toG(turn.limit()));
    }

    private static double inside(MassProperties.StaticWheelLoads loads, AxlePosition axle, TurnDirection direction) {
        return axle == AxlePosition.FRONT ? loads.frontInside(direction) : loads.rearInside(direction);
    }
}
