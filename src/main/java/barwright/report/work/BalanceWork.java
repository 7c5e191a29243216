package barwright.report.work;

import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.physics.AnalysisResult;
import barwright.physics.LoadTransferParts;
import barwright.physics.MassProperties;
import barwright.units.Quantity;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static barwright.units.Conversions.toPercent;

/** The working of the roll gradient, the front share of load transfer and the understeer gradient. */
final class BalanceWork {
    private static final String ROLL_SOURCE = "model.md section 5: Milliken & Milliken, Race Car Vehicle Dynamics, "
            + "ch. 18; Gillespie, Fundamentals of Vehicle Dynamics, ch. 8";
    private static final String FLEXIBLE_SOURCE = ROLL_SOURCE + "; flexible chassis model.md section 6 (its subject: "
            + "Deakin et al., SAE 2000-01-3554); Milliken & Milliken ch. 16";

    private BalanceWork() {
    }

    static Derivation rollGradient(AnalysisResult result) {
        MassProperties masses = result.masses();
        double front = result.front().stiffness().rollStiffness();
        double rear = result.rear().stiffness().rollStiffness();
        List<WorkValue> inputs = new ArrayList<>(List.of(
                new WorkValue("m_s", "sprung mass", masses.sprungMass(), Quantity.MASS),
                new WorkValue("h'", "roll arm: sprung centre of mass above the roll axis", masses.rollArm(),
                        Quantity.LENGTH),
                new WorkValue("K_f", "front roll stiffness (springs, bar, tyres)", front, Quantity.ROLL_STIFFNESS),
                new WorkValue("K_r", "rear roll stiffness (springs, bar, tyres)", rear, Quantity.ROLL_STIFFNESS)));
        List<Step> steps = new ArrayList<>();
        steps.add(new Step("m_s g h'  (the roll moment of the body's own weight per unit of roll angle)",
                new WorkValue("m_s g h'", "gravity's roll moment per unit of roll", masses.gravityRollMoment(),
                        Quantity.ROLL_STIFFNESS)));
        WorkValue gradient = new WorkValue("φ/a_y", "body roll per g", result.rollGradient(), Quantity.ROLL_GRADIENT);
        String note = "Per g of lateral acceleration (g = 9.80665 m/s²): 1 g puts a roll moment m_s g h' on the "
                + "body (N·m; in lbf·ft with the mass in lb), and over stiffnesses per degree the roll comes out in "
                + "degrees. Without the tyres (springs and bars only) the same formula gives the suspension roll "
                + "gradient.";
        Double chassis = result.vehicle().chassisTorsionalStiffness();
        if (chassis == null) {
            // per g: 1 g of cornering puts a roll moment m_s g h' on the body (N·m, or lbf·ft with the mass in
            // lb); over stiffnesses per degree it gives degrees
            return new Derivation("Roll gradient", "φ / a_y = m_s g h' / (K_f + K_r − m_s g h'),   a_y = 1 g",
                    inputs, steps,
                    gradient, ROLL_SOURCE, note);
        }
        inputs.add(new WorkValue("K_c", "body twist stiffness between the axles", chassis, Quantity.ROLL_STIFFNESS));
        inputs.add(new WorkValue("m_sf", "sprung mass carried at the front", masses.frontSprungMass(), Quantity.MASS));
        inputs.add(new WorkValue("m_sr", "sprung mass carried at the rear", masses.rearSprungMass(), Quantity.MASS));
        steps.add(new Step("(K_f + K_c − m_sf g h') φ_f − K_c φ_r = m_sf h' a_y, and the same at the rear",
                new WorkValue("φ_f/a_y", "front body end's roll per g", result.roll().frontRollPerAccel(),
                        Quantity.ROLL_GRADIENT)));
        steps.add(new Step("solved together with the front equation",
                new WorkValue("φ_r/a_y", "rear body end's roll per g", result.roll().rearRollPerAccel(),
                        Quantity.ROLL_GRADIENT)));
        return new Derivation("Roll gradient (flexible body)", "φ = (m_sf φ_f + m_sr φ_r) / m_s", inputs, steps,
                gradient, FLEXIBLE_SOURCE, note);
    }

    static Derivation frontShare(AnalysisResult result) {
        List<WorkValue> inputs = new ArrayList<>();
        List<Step> steps = new ArrayList<>();
        for (AxlePosition position : AxlePosition.values()) {
            String s = position == AxlePosition.FRONT ? "f" : "r";
            String word = position.key();
            Axle axle = result.vehicle().axle(position);
            double sprung = position == AxlePosition.FRONT ? result.masses().frontSprungMass()
                    : result.masses().rearSprungMass();
            double roll = position == AxlePosition.FRONT ? result.roll().frontRollPerAccel()
                    : result.roll().rearRollPerAccel();
            inputs.add(new WorkValue("m_u" + s, word + " unsprung mass", axle.unsprungMass(), Quantity.MASS));
            inputs.add(new WorkValue("h_u" + s, word + " unsprung centre height", axle.unsprungCgHeight(), Quantity.LENGTH));
            inputs.add(new WorkValue("m_s" + s, "sprung mass carried at the " + word, sprung, Quantity.MASS));
            inputs.add(new WorkValue("z_" + s, word + " roll centre height", axle.rollCentreHeight(), Quantity.LENGTH));
            inputs.add(new WorkValue("K_" + s, word + " roll stiffness", result.axle(position).stiffness().rollStiffness(),
                    Quantity.ROLL_STIFFNESS));
            inputs.add(new WorkValue("t_" + s, word + " track", axle.track(), Quantity.LENGTH));
            inputs.add(new WorkValue("φ_" + s + "/a_y", "body roll at the " + word + " per g", roll,
                    Quantity.ROLL_GRADIENT));
            LoadTransferParts parts = result.axle(position).loadTransfer();
            // per g of a_y: a mass m pushes sideways with m g (N; lbf with m in lb), so each part is N or lbf per g
            steps.add(new Step("ΔF_u" + s + " = m_u" + s + " g h_u" + s + " / t_" + s, new WorkValue("ΔF_u" + s,
                    word + " unsprung part", parts.unsprung(), Quantity.FORCE_PER_G)));
            steps.add(new Step("ΔF_g" + s + " = m_s" + s + " g z_" + s + " / t_" + s, new WorkValue("ΔF_g" + s,
                    word + " geometric part (through the roll centre)", parts.geometric(), Quantity.FORCE_PER_G)));
            steps.add(new Step("ΔF_e" + s + " = K_" + s + " (φ_" + s + "/a_y) / t_" + s, new WorkValue("ΔF_e" + s,
                    word + " elastic part (through springs, bar, tyres)", parts.elastic(), Quantity.FORCE_PER_G)));
            steps.add(new Step("ΔF_" + s + " = ΔF_u" + s + " + ΔF_g" + s + " + ΔF_e" + s, new WorkValue("ΔF_" + s,
                    word + " load transfer", parts.total(), Quantity.FORCE_PER_G)));
        }
        return new Derivation("Front share of lateral load transfer",
                "share = ΔF_f / (ΔF_f + ΔF_r),   each ΔF per g of lateral acceleration (g = 9.80665 m/s²)", inputs, steps,
                new WorkValue("share", "front share of the load transfer", result.frontLoadTransferShare(),
                        Quantity.SHARE),
                ROLL_SOURCE,
                "Each load transfer is the outside wheel's gain per g (the inside wheel's loss), before any wheel "
                        + "lifts. Compare the share with the static front weight, "
                        + String.format(Locale.ROOT, "%.1f %%", toPercent(result.masses().frontMassFraction()))
                        + ": a front share above it loads the front tyres harder in a corner and leans the car "
                        + "toward understeer; below it, toward oversteer.");
    }

    static Derivation staticFrontWeight(AnalysisResult result) {
        MassProperties.StaticWheelLoads loads = result.masses().staticLoads();
        double front = loads.leftFront() + loads.rightFront();
        double rear = loads.leftRear() + loads.rightRear();
        return new Derivation("Static front weight", "share = W_f / (W_f + W_r)",
                List.of(new WorkValue("W_lf", "left front wheel load, standing", loads.leftFront(), Quantity.FORCE),
                        new WorkValue("W_rf", "right front wheel load, standing", loads.rightFront(), Quantity.FORCE),
                        new WorkValue("W_lr", "left rear wheel load, standing", loads.leftRear(), Quantity.FORCE),
                        new WorkValue("W_rr", "right rear wheel load, standing", loads.rightRear(), Quantity.FORCE)),
                List.of(new Step("W_f = W_lf + W_rf", new WorkValue("W_f", "front axle load", front, Quantity.FORCE)),
                        new Step("W_r = W_lr + W_rr", new WorkValue("W_r", "rear axle load", rear, Quantity.FORCE))),
                new WorkValue("share", "static front weight", result.masses().frontMassFraction(), Quantity.SHARE),
                "model.md section 1 (masses): the wheel loads from the scales, or the total and the front share "
                        + "as the file gives them",
                "The yardstick for the front share of load transfer: a share above it loads the front tyres "
                        + "harder in a corner than standing, and leans the car toward understeer.");
    }

    static Derivation understeer(AnalysisResult result) {
        MassProperties.StaticWheelLoads loads = result.masses().staticLoads();
        double frontStiffness = result.front().corneringStiffness();
        double rearStiffness = result.rear().corneringStiffness();
        return new Derivation("Understeer gradient", "K_us = W_f / C_f − W_r / C_r   (per g)",
                List.of(new WorkValue("W_f", "static load on the front axle", loads.frontAxle(), Quantity.FORCE),
                        new WorkValue("C_f", "cornering stiffness of both front tyres at static load",
                                frontStiffness, Quantity.CORNERING_STIFFNESS),
                        new WorkValue("W_r", "static load on the rear axle", loads.rearAxle(), Quantity.FORCE),
                        new WorkValue("C_r", "cornering stiffness of both rear tyres at static load",
                                rearStiffness, Quantity.CORNERING_STIFFNESS)),
                List.of(new Step("α_f = W_f / C_f", new WorkValue("α_f", "front slip angle at 1 g, linear",
                                loads.frontAxle() / frontStiffness, Quantity.ANGLE)),
                        new Step("α_r = W_r / C_r", new WorkValue("α_r", "rear slip angle at 1 g, linear",
                                loads.rearAxle() / rearStiffness, Quantity.ANGLE))),
                new WorkValue("K_us", "understeer gradient", result.understeerGradient(), Quantity.ROLL_GRADIENT),
                "model.md section 8: Gillespie, Fundamentals of Vehicle Dynamics, ch. 6; SAE J670 defines the term",
                "Positive is understeer: the front tyres need more slip angle than the rear for the same g, so "
                        + "the driver adds steering as the corner tightens. The cornering stiffnesses include the "
                        + "tyres' load sensitivity at the static loads. Per g: g = "
                        + STANDARD_GRAVITY + " m/s².");
    }
}
