package barwright.report.work;

import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.report.work.KeyFigure.Kind;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.Consumer;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * The show-the-work derivations: each one's numbers must give its result by its own formula (re-computed
 * here, independently of the core), its result must be the figure the analysis reports, and where a
 * reference figure exists (docs/validation.md) the derivation must reach it.
 */
class DerivationsTest {
    /** Closed forms re-computed from the shown inputs agree to rounding of doubles. */
    private static final double CLOSED_FORM = 1e-9;

    private static ObjectNode sample() throws Exception {
        try (InputStream in = DerivationsTest.class.getResourceAsStream("/barwright/samples/club-hatchback.json")) {
            return (ObjectNode) new ObjectMapper().readTree(in);
        }
    }

    private static AnalysisResult analyse(Consumer<ObjectNode> change) throws Exception {
        ObjectNode tree = sample();
        change.accept(tree);
        return VehicleAnalysis.analyse(VehicleLoader.fromTree(tree).vehicle());
    }

    private static double value(Derivation derivation, String symbol) {
        return derivation.input(symbol).value();
    }

    private static List<KeyFigure> everyFigure() {
        List<KeyFigure> figures = new ArrayList<>();
        for (Kind kind : List.of(Kind.ROLL_GRADIENT, Kind.FRONT_LOAD_TRANSFER_SHARE, Kind.STATIC_FRONT_WEIGHT,
                Kind.UNDERSTEER_GRADIENT)) {
            figures.add(KeyFigure.of(kind));
        }
        for (AxlePosition axle : AxlePosition.values()) {
            for (Kind kind : List.of(Kind.SPRING_ROLL_STIFFNESS, Kind.BAR_ROLL_STIFFNESS, Kind.TYRE_ROLL_STIFFNESS,
                    Kind.AXLE_ROLL_STIFFNESS, Kind.BAR_LINK_RATE, Kind.BAR_MASS, Kind.BAR_SAFETY_FACTOR,
                    Kind.BAR_BUSHING_LOAD)) {
                figures.add(KeyFigure.of(kind, axle));
            }
            for (TurnDirection turn : TurnDirection.values()) {
                figures.add(KeyFigure.of(Kind.INSIDE_LIFT, axle, turn));
            }
        }
        for (TurnDirection turn : TurnDirection.values()) {
            figures.add(KeyFigure.of(Kind.LIMIT, turn));
            figures.add(KeyFigure.of(Kind.BALANCE, turn));
        }
        return figures;
    }

    @Test
    void everyKeyFigureHasAFormulaASourceAndTheAnalysesValue() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        for (KeyFigure figure : everyFigure()) {
            Derivation derivation = Derivations.of(result, figure);
            assertThat(derivation.formula()).as(figure.toString()).isNotBlank();
            assertThat(derivation.source()).as(figure.toString()).contains("model.md");
            String text = WorkText.of(derivation, UnitSystem.SI, Locale.ROOT);
            assertThat(text).contains("Formula").contains("Result").contains("Source:");
        }
        assertThat(Derivations.of(result, KeyFigure.of(Kind.ROLL_GRADIENT)).result().value())
                .isEqualTo(result.rollGradient());
        assertThat(Derivations.of(result, KeyFigure.of(Kind.FRONT_LOAD_TRANSFER_SHARE)).result().value())
                .isEqualTo(result.frontLoadTransferShare());
        assertThat(Derivations.of(result, KeyFigure.of(Kind.LIMIT, TurnDirection.LEFT)).result().value())
                .isEqualTo(result.leftTurn().limit());
        assertThat(Derivations.of(result, KeyFigure.of(Kind.BAR_SAFETY_FACTOR, AxlePosition.REAR)).result().value())
                .isEqualTo(result.rear().bar().safetyFactor());
    }

    @Test
    void theStaticFrontWeightIsTheSampleFilesOwnShareAndItsWheelLoadsAddUpToTheWeight() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        Derivation work = Derivations.of(result, KeyFigure.of(Kind.STATIC_FRONT_WEIGHT));
        // the sample file (sample-vehicles/club-hatchback.json) gives massKg 1020 and frontMassFraction 0.63
        assertThat(work.result().value()).isCloseTo(0.63, within(CLOSED_FORM));
        double weight = value(work, "W_lf") + value(work, "W_rf") + value(work, "W_lr") + value(work, "W_rr");
        // conservation: the four wheels carry the car's weight, m g
        assertThat(weight).isCloseTo(1020 * STANDARD_GRAVITY, withinPercentage(1e-9));
    }

    @Test
    void aClosedFormBarsBushingsHoldTheLinkForcesCouple() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        Derivation work = Derivations.of(result, KeyFigure.of(Kind.BAR_BUSHING_LOAD, AxlePosition.FRONT));
        // moment balance about the car's length axis (statics): the bushings' couple R s equals the links' F L
        double couple = work.step("F").value() * value(work, "L");
        assertThat(work.result().value() * value(work, "s")).isCloseTo(couple, withinPercentage(1e-9));
        assertThat(work.step("F").value()).isCloseTo(value(work, "k_link") * value(work, "Δ"), withinPercentage(1e-9));
    }

    @Test
    void theBalanceIsTheAxleThatReachesItsGripFirst() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        Derivation work = Derivations.of(result, KeyFigure.of(Kind.BALANCE, TurnDirection.LEFT));
        double front = value(work, "a_f");
        double rear = value(work, "a_r");
        assertThat(work.result().value()).isEqualTo(Math.min(front, rear));
        // the sample understeers (the key figures say so): the front lets go first, by more than the band
        assertThat(rear - front).isGreaterThan(value(work, "band"));
        assertThat(work.result().meaning()).contains("understeer");
    }

    @Test
    void rollStiffnessesFollowFromTheirInputs() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        for (AxlePosition axle : AxlePosition.values()) {
            Derivation springs = Derivations.of(result, KeyFigure.of(Kind.SPRING_ROLL_STIFFNESS, axle));
            double wheelRate = value(springs, "k_s") * Math.pow(value(springs, "MR"), 2);
            assertThat(springs.result().value()).isCloseTo(wheelRate * Math.pow(value(springs, "t"), 2) / 2,
                    withinPercentage(CLOSED_FORM * 100));
            Derivation bar = Derivations.of(result, KeyFigure.of(Kind.BAR_ROLL_STIFFNESS, axle));
            assertThat(bar.result().value()).isCloseTo(value(bar, "k_link") * Math.pow(value(bar, "r"), 2)
                    * Math.pow(value(bar, "t"), 2), withinPercentage(CLOSED_FORM * 100));
            Derivation tyres = Derivations.of(result, KeyFigure.of(Kind.TYRE_ROLL_STIFFNESS, axle));
            assertThat(tyres.result().value()).isCloseTo(value(tyres, "k_t") * Math.pow(value(tyres, "t"), 2) / 2,
                    withinPercentage(CLOSED_FORM * 100));
            Derivation whole = Derivations.of(result, KeyFigure.of(Kind.AXLE_ROLL_STIFFNESS, axle));
            double inSeries = 1 / (1 / (value(whole, "K_spr") + value(whole, "K_bar")) + 1 / value(whole, "K_tyre"));
            assertThat(whole.result().value()).isCloseTo(inSeries, withinPercentage(CLOSED_FORM * 100));
        }
    }

    @Test
    void springAndTyreRollStiffnessMatchThePublishedChecks() throws Exception {
        // docs/validation.md, section "Roll stiffness of springs and tyres" (arithmetic): wheel rate 30 N/mm per side on a 1.40 m track gives
        // 513.127 N m/deg; tyres of 200 N/mm each on 1.40 m give 3 420.85 N m/deg (6 digits)
        AnalysisResult result = analyse(tree -> {
            ObjectNode front = (ObjectNode) tree.get("front");
            front.put("springRateNPerMm", 30).put("springMotionRatio", 1.0).put("trackMm", 1400)
                    .put("tyreVerticalRateNPerMm", 200);
        });
        double springs = Derivations.of(result, KeyFigure.of(Kind.SPRING_ROLL_STIFFNESS, AxlePosition.FRONT))
                .result().value() * RADIANS_PER_DEGREE;
        double tyres = Derivations.of(result, KeyFigure.of(Kind.TYRE_ROLL_STIFFNESS, AxlePosition.FRONT))
                .result().value() * RADIANS_PER_DEGREE;
        assertThat(springs).isCloseTo(513.127, within(0.0005));
        assertThat(tyres).isCloseTo(3420.85, within(0.005));
    }

    @Test
    void theBarLinkRateMatchesThePublishedSeriesModelCheck() throws Exception {
        // docs/validation.md, section "Bar rate, series model" (arithmetic): D = 25.4 mm solid, L = 1.0 m, a = 0.25 m, bushings at the bends,
        // G = 80 GPa, E = 205 GPa: 46.2844 N/mm; with r = 0.70 and t = 1.40 m, 775.826 N m/deg (6 digits)
        AnalysisResult result = analyse(tree -> {
            ObjectNode front = (ObjectNode) tree.get("front");
            front.put("trackMm", 1400);
            ObjectNode bar = (ObjectNode) front.get("bar");
            bar.putObject("material").put("name", "check").put("youngsModulusGPa", 205).put("shearModulusGPa", 80)
                    .put("densityKgPerM3", 7850).put("yieldStrengthMPa", 1200);
            bar.putObject("section").put("shape", "solid").put("outerDiameterMm", 25.4);
            bar.put("torsionLengthMm", 1000).put("bushingSpanMm", 1000).put("selectedArm", 0)
                    .put("linkMotionRatio", 0.70);
            bar.putArray("armLengthsMm").add(250);
        });
        Derivation rate = Derivations.of(result, KeyFigure.of(Kind.BAR_LINK_RATE, AxlePosition.FRONT));
        assertThat(rate.result().value() / 1e3).isCloseTo(46.2844, within(0.00005));
        Derivation roll = Derivations.of(result, KeyFigure.of(Kind.BAR_ROLL_STIFFNESS, AxlePosition.FRONT));
        assertThat(roll.result().value() * RADIANS_PER_DEGREE).isCloseTo(775.826, within(0.0005));
    }

    @Test
    void theLinkRateFollowsFromCastiglianosSumOfItsShownInputs() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        for (AxlePosition axle : AxlePosition.values()) {
            Derivation rate = Derivations.of(result, KeyFigure.of(Kind.BAR_LINK_RATE, axle));
            double e = value(rate, "E");
            double g = value(rate, "G");
            double a = value(rate, "a");
            double length = value(rate, "L");
            double span = value(rate, "s");
            double i = rate.step("I").value();
            double j = rate.step("J").value();
            double c = rate.step("c").value();
            assertThat(c).isCloseTo((length - span) / 2, within(1e-15));
            double diameter = value(rate, "D");
            double bore = axle == AxlePosition.REAR ? diameter - 2 * value(rate, "w") : 0;
            // Roark: J = pi (D^4 - d^4) / 32, I = J / 2
            assertThat(j).isCloseTo(Math.PI * (Math.pow(diameter, 4) - Math.pow(bore, 4)) / 32,
                    withinPercentage(CLOSED_FORM * 100));
            assertThat(i).isCloseTo(j / 2, withinPercentage(CLOSED_FORM * 100));
            double compliance = 2 * (a * a * a / (3 * e * i) + a * a * length / (2 * g * j) + c * c * c / (3 * e * i)
                    + c * c * span / (6 * e * i));
            assertThat(rate.result().value()).isCloseTo(1 / compliance, withinPercentage(CLOSED_FORM * 100));

            Derivation mass = Derivations.of(result, KeyFigure.of(Kind.BAR_MASS, axle));
            assertThat(mass.result().value()).isCloseTo(value(mass, "ρ") * mass.step("A").value()
                    * (value(mass, "L") + 2 * value(mass, "a_max")), withinPercentage(CLOSED_FORM * 100));
        }
    }

    @Test
    void theSafetyFactorFollowsFromTheStressesShown() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        for (AxlePosition axle : AxlePosition.values()) {
            Derivation safety = Derivations.of(result, KeyFigure.of(Kind.BAR_SAFETY_FACTOR, axle));
            double travel = value(safety, "r") * value(safety, "travel");
            assertThat(safety.step("Δ").value()).isCloseTo(travel, withinPercentage(CLOSED_FORM * 100));
            double force = value(safety, "k_link") * travel;
            assertThat(safety.step("F").value()).isCloseTo(force, withinPercentage(CLOSED_FORM * 100));
            double tau = safety.step("τ").value();
            double bushing = safety.step("σ_b").value();
            double vonMises = Math.sqrt(bushing * bushing + 3 * tau * tau);
            assertThat(safety.step("σ_vm").value()).isCloseTo(vonMises, withinPercentage(CLOSED_FORM * 100));
            double largest = Math.max(safety.step("σ_a").value(), vonMises);
            assertThat(safety.step("σ_max").value()).isCloseTo(largest, withinPercentage(CLOSED_FORM * 100));
            assertThat(safety.result().value()).isCloseTo(value(safety, "σ_y") / largest,
                    withinPercentage(CLOSED_FORM * 100));
        }
    }

    @Test
    void theRollGradientAndFrontShareFollowFromTheirInputs() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        Derivation roll = Derivations.of(result, KeyFigure.of(Kind.ROLL_GRADIENT));
        double sprung = value(roll, "m_s");
        double arm = value(roll, "h'");
        // model.md 5: phi / a_y = m_s h' / (K_f + K_r - m_s g h')
        double expected = sprung * arm / (value(roll, "K_f") + value(roll, "K_r") - sprung * STANDARD_GRAVITY * arm);
        assertThat(roll.result().value()).isCloseTo(expected, withinPercentage(CLOSED_FORM * 100));

        Derivation share = Derivations.of(result, KeyFigure.of(Kind.FRONT_LOAD_TRANSFER_SHARE));
        double[] transfer = new double[2];
        String[] ends = {"f", "r"};
        for (int k = 0; k < 2; k++) {
            String s = ends[k];
            double track = value(share, "t_" + s);
            transfer[k] = value(share, "m_u" + s) * value(share, "h_u" + s) / track
                    + value(share, "m_s" + s) * value(share, "z_" + s) / track
                    + value(share, "K_" + s) * value(share, "φ_" + s + "/a_y") / track;
            assertThat(share.step("ΔF_" + s).value()).isCloseTo(transfer[k], withinPercentage(CLOSED_FORM * 100));
        }
        assertThat(share.result().value()).isCloseTo(transfer[0] / (transfer[0] + transfer[1]),
                withinPercentage(CLOSED_FORM * 100));
    }

    @Test
    void theUndersteerGradientMatchesThePublishedProblem() throws Exception {
        // docs/validation.md, section "Understeer gradient: a published problem" (a question-and-answer
        // page naming no book; K by arithmetic from its inputs): W = 4520 lb, wheelbase 10.5 ft, CG 0.45 of the wheelbase behind the
        // front axle (front weight 0.55), 8750 lb/rad per front tyre and 8600 lb/rad per rear tyre:
        // K = 1.3637 deg/g. Each tyre's reference load is set to its static load,
        // so that its cornering stiffness there is k_c F_z0 exactly (model.md 8).
        double poundForce = 0.45359237 * STANDARD_GRAVITY;
        double frontWheel = 4520 * 0.55 / 2 * poundForce;
        double rearWheel = 4520 * 0.45 / 2 * poundForce;
        AnalysisResult result = analyse(tree -> {
            ObjectNode body = (ObjectNode) tree.get("vehicle");
            body.put("massKg", 4520 * 0.45359237).put("frontMassFraction", 0.55).put("wheelbaseMm", 10.5 * 304.8);
            ((ObjectNode) tree.at("/front/tyre")).put("nominalLoadN", frontWheel)
                    .put("corneringStiffnessPerLoad", 8750 * poundForce / frontWheel);
            ((ObjectNode) tree.at("/rear/tyre")).put("nominalLoadN", rearWheel)
                    .put("corneringStiffnessPerLoad", 8600 * poundForce / rearWheel);
        });
        Derivation understeer = Derivations.of(result, KeyFigure.of(Kind.UNDERSTEER_GRADIENT));
        double degPerG = understeer.result().value() * STANDARD_GRAVITY / RADIANS_PER_DEGREE;
        assertThat(degPerG).isCloseTo(1.3637, within(0.00005));
        double recomputed = (value(understeer, "W_f") / value(understeer, "C_f")
                - value(understeer, "W_r") / value(understeer, "C_r")) / STANDARD_GRAVITY;
        assertThat(understeer.result().value()).isCloseTo(recomputed, withinPercentage(CLOSED_FORM * 100));
    }

    @Test
    void theGripLimitIsWhereTheAxlesCapacityMeetsWhatItMustCarry() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        for (TurnDirection turn : TurnDirection.values()) {
            Derivation limit = Derivations.of(result, KeyFigure.of(Kind.LIMIT, turn));
            double mu0 = value(limit, "μ0");
            double sensitivity = value(limit, "s");
            double reference = value(limit, "F_z0");
            double outside = limit.step("F_zo").value();
            double inside = limit.step("F_zi").value();
            // model.md 8: mu(F_z) = mu_0 (1 + s (F_z / F_z0 - 1))
            double muOutside = mu0 * (1 + sensitivity * (outside / reference - 1));
            assertThat(limit.step("μ(F_zo)").value()).isCloseTo(muOutside, withinPercentage(CLOSED_FORM * 100));
            double capacity = muOutside * outside + (inside > 0 ? mu0 * (1 + sensitivity * (inside / reference - 1))
                    * inside : 0);
            assertThat(limit.step("capacity").value()).isCloseTo(capacity, withinPercentage(CLOSED_FORM * 100));
            double required = value(limit, "m") * value(limit, "share") * limit.result().value();
            // the limit is solved by Brent to 1e-9 m/s^2, so the balance holds to about 1e-9 relative
            assertThat(required).isCloseTo(capacity, withinPercentage(1e-6));
        }
    }

    @Test
    void theInsideWheelLiftsWhereItsLoadReachesZero() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        // in the sample the inside rear lifts first (a stiff rear bar): a_lift = W_i / (dF/a_y), model.md 7
        Derivation rear = Derivations.of(result, KeyFigure.of(Kind.INSIDE_LIFT, AxlePosition.REAR, TurnDirection.LEFT));
        assertThat(rear.result().value()).isCloseTo(value(rear, "W_i") / value(rear, "ΔF/a_y"),
                withinPercentage(CLOSED_FORM * 100));
        // the front lifts second: then dF_Y t_Y = m a h + m_s g h' phi - W_Xi t_X reaches W_i (model.md 7)
        Derivation front = Derivations.of(result, KeyFigure.of(Kind.INSIDE_LIFT, AxlePosition.FRONT,
                TurnDirection.LEFT));
        double accel = front.result().value();
        double moment = value(front, "m") * accel * value(front, "h") + value(front, "m_s g h'") * front.step("φ").value()
                - value(front, "W_Xi") * value(front, "t_X");
        assertThat(moment / value(front, "t_Y")).isCloseTo(value(front, "W_i"), withinPercentage(CLOSED_FORM * 100));
        assertThat(value(front, "a_X")).isEqualTo(rear.result().value());
    }

    @Test
    void theWorkingIsWrittenInTheChosenUnitsAndLocale() throws Exception {
        AnalysisResult result = analyse(tree -> { });
        Derivation springs = Derivations.of(result, KeyFigure.of(Kind.SPRING_ROLL_STIFFNESS, AxlePosition.FRONT));
        assertThat(WorkText.of(springs, UnitSystem.SI, Locale.ROOT)).contains("70.00 N/mm").contains("1445 mm")
                .contains("N·m/deg");
        // 70 N/mm = 399.7 lbf/in and 1445 mm = 56.89 in (NIST SP 811 factors), four significant digits
        String us = WorkText.of(springs, UnitSystem.US, Locale.GERMANY);
        assertThat(us).contains("399,7 lbf/in").contains("56,89 in").contains("lbf·ft/deg");
    }
}
