package barwright.insight;

import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.BarSection;
import barwright.model.CornerMasses;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.model.Vehicle;
import barwright.physics.BarAnalysis;
import barwright.units.Quantity;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.UnaryOperator;

/**
 * The small changes of issue 6 for one car: one arm hole, 1 mm of bar diameter or wall, 10 % of spring rate
 * each end, 10 mm of roll-centre height (or, where an axle has a linkage, 10 mm of a pickup point's height and of
 * ride height: {@link LinkageChanges}), 10 % of tyre vertical rate, 10 kg of ballast moved forward and 5 mm
 * of CG height. SI values inside.
 */
public final class InputChanges {
    /** Step of a bar's outside diameter or wall (m). */
    public static final double BAR_STEP = 1e-3;
    /** Relative step of spring and tyre rates. */
    public static final double RATE_STEP = 0.10;
    /** Step of a roll-centre height (m). */
    public static final double ROLL_CENTRE_STEP = 10e-3;
    /**
     * Ballast moved forward (kg): taken from over the rear axle and put over the front axle, at the height of the
     * car's centre of mass, so that only the weight split changes.
     */
    public static final double BALLAST = 10;
    /** Step of the CG height (m). */
    public static final double CG_HEIGHT_STEP = 5e-3;

    /**
     * @param changes       the changes that apply to this car
     * @param notApplicable the changes left out, each with why (e.g. "rear bar wall: the rear bar is solid")
     */
    public record Catalogue(List<InputChange> changes, List<String> notApplicable) {
        public Catalogue {
            changes = List.copyOf(changes);
            notApplicable = List.copyOf(notApplicable);
        }
    }

    private InputChanges() {
    }

    public static Catalogue of(Vehicle vehicle) {
        List<InputChange> changes = new ArrayList<>();
        List<String> notApplicable = new ArrayList<>();
        for (AxlePosition position : AxlePosition.values()) {
            barChanges(vehicle, position, changes, notApplicable);
        }
        for (AxlePosition position : AxlePosition.values()) {
            String end = position.key();
            Axle axle = vehicle.axle(position);
            double spring = axle.springRate();
            changes.add(axleChange(position, end + "SpringRate", end + " spring rate", "stiffer " + end + " springs",
                    Quantity.LINEAR_RATE, spring, spring * (1 + RATE_STEP), a -> a.withSpringRate(spring * (1 + RATE_STEP))));
            double rollCentre = axle.rollCentreHeight();
            if (axle.hasLinkage()) {
                // the roll centre comes from the linkage: its points and ride height are what a setter changes
                LinkageChanges.add(vehicle, position, changes);
            } else {
                changes.add(axleChange(position, end + "RollCentreHeight", end + " roll-centre height",
                        "higher " + end + " roll centre", Quantity.LENGTH, rollCentre, rollCentre + ROLL_CENTRE_STEP,
                        a -> a.withRollCentreHeight(rollCentre + ROLL_CENTRE_STEP)));
            }
            double tyre = axle.tyreVerticalRate();
            changes.add(axleChange(position, end + "TyreVerticalRate", end + " tyre vertical rate",
                    "stiffer " + end + " tyres (vertical rate)", Quantity.LINEAR_RATE, tyre, tyre * (1 + RATE_STEP),
                    a -> a.withTyreVerticalRate(tyre * (1 + RATE_STEP))));
        }
        ballast(vehicle, changes, notApplicable);
        double cg = vehicle.cgHeight();
        changes.add(new InputChange("cgHeight", "height of the centre of mass", "higher centre of mass",
                Quantity.LENGTH, cg, cg + CG_HEIGHT_STEP, v -> v.withCgHeight(cg + CG_HEIGHT_STEP)));
        return new Catalogue(changes, notApplicable);
    }

    private static InputChange axleChange(AxlePosition position, String key, String subject, String effect,
                                          Quantity quantity, double from, double to, UnaryOperator<Axle> change) {
        return new InputChange(key, subject, effect, quantity, from, to,
                v -> v.withAxle(position, change.apply(v.axle(position))));
    }

    private static InputChange barChange(AxlePosition position, String key, String subject, String effect,
                                         Quantity quantity, double from, double to, UnaryOperator<AntiRollBar> change) {
        return axleChange(position, key, subject, effect, quantity, from, to,
                axle -> axle.withBar(change.apply(axle.bar())));
    }

    private static void barChanges(Vehicle vehicle, AxlePosition position, List<InputChange> changes,
                                   List<String> notApplicable) {
        String end = position.key();
        AntiRollBar bar = vehicle.axle(position).bar();
        if (bar == null) {
            notApplicable.add(end + " bar changes: the car has no " + end + " bar");
            return;
        }
        armHole(bar, position, changes, notApplicable);
        BarSection section = bar.section();
        if (section instanceof SolidSection solid) {
            double diameter = solid.outerDiameter();
            changes.add(barChange(position, end + "BarDiameter", end + " bar diameter", "thicker " + end + " bar",
                    Quantity.LENGTH, diameter, diameter + BAR_STEP,
                    b -> b.withSection(new SolidSection(diameter + BAR_STEP))));
            notApplicable.add(end + " bar wall: the " + end + " bar is solid");
        } else if (section instanceof TubeSection tube) {
            double diameter = tube.outerDiameter();
            double wall = tube.wall();
            changes.add(barChange(position, end + "BarDiameter", end + " bar outside diameter (same wall)",
                    "thicker " + end + " bar", Quantity.LENGTH, diameter, diameter + BAR_STEP,
                    b -> b.withSection(new TubeSection(diameter + BAR_STEP, wall))));
            if (wall + BAR_STEP < diameter / 2) {
                changes.add(barChange(position, end + "BarWall", end + " bar wall", "thicker-walled " + end + " bar",
                        Quantity.LENGTH, wall, wall + BAR_STEP,
                        b -> b.withSection(new TubeSection(diameter, wall + BAR_STEP))));
            } else {
                notApplicable.add(end + " bar wall: 1 mm more would close the tube's bore");
            }
        }
    }

    /** One hole towards a stiffer setting where there is one, else one towards a softer setting. */
    private static void armHole(AntiRollBar bar, AxlePosition position, List<InputChange> changes,
                                List<String> notApplicable) {
        String end = position.key();
        if (bar.holeCount() < 2) {
            notApplicable.add(end + " bar arm hole: the " + end + " bar has one hole");
            return;
        }
        int hole = bar.selectedArm();
        if (bar.isShaped()) {
            int next = hole > 0 ? hole - 1 : hole + 1;
            // which way a hole of a shaped bar goes is the beam model's answer, at no travel
            double before = BarAnalysis.analyse(bar, 0).linkRate();
            double after = BarAnalysis.analyse(bar.withSelectedArm(next), 0).linkRate();
            String effect = (after > before ? "stiffer " : "softer ") + end + " bar (hole " + (next + 1) + ")";
            changes.add(barChange(position, end + "BarArmHole", end + " bar link hole (number)", effect,
                    Quantity.RATIO, hole + 1, next + 1, b -> b.withSelectedArm(next)));
            return;
        }
        List<Double> arms = bar.dimensions().armLengths();
        double arm = arms.get(hole);
        int shorter = nearest(arms, arm, true);
        int chosen = shorter >= 0 ? shorter : nearest(arms, arm, false);
        if (chosen < 0) {
            notApplicable.add(end + " bar arm hole: every hole has the same arm length");
            return;
        }
        String effect = shorter >= 0 ? "stiffer " + end + " bar (shorter arm)" : "softer " + end + " bar (longer arm)";
        changes.add(barChange(position, end + "BarArmHole", end + " bar arm length (next hole)", effect,
                Quantity.LENGTH, arm, arms.get(chosen), b -> b.withSelectedArm(chosen)));
    }

    /** @return the index of the hole with the arm length next below (or above) the given one, or -1 */
    private static int nearest(List<Double> arms, double arm, boolean below) {
        int best = -1;
        for (int i = 0; i < arms.size(); i++) {
            double candidate = arms.get(i);
            boolean onSide = below ? candidate < arm : candidate > arm;
            if (onSide && (best < 0 || Math.abs(candidate - arm) < Math.abs(arms.get(best) - arm))) {
                best = i;
            }
        }
        return best;
    }

    private static void ballast(Vehicle vehicle, List<InputChange> changes, List<String> notApplicable) {
        CornerMasses corners = vehicle.cornerMasses();
        double mass = corners != null ? corners.total() : vehicle.mass();
        double fraction = corners != null ? corners.frontFraction() : vehicle.frontMassFraction();
        double frontMass = mass * fraction;
        double half = BALLAST / 2;
        if (mass * (1 - fraction) <= BALLAST || (corners != null
                && (corners.leftRear() <= half || corners.rightRear() <= half))) {
            notApplicable.add("ballast: too little mass rests on the rear wheels to move");
            return;
        }
        changes.add(new InputChange("ballastForward", "mass on the front axle",
                String.format(Locale.ROOT, "%.0f kg of ballast moved forward", BALLAST), Quantity.MASS,
                frontMass, frontMass + BALLAST, InputChanges::withBallastForward));
    }

    /** The car with {@link #BALLAST} moved from over the rear axle to over the front, half a side. */
    static Vehicle withBallastForward(Vehicle vehicle) {
        CornerMasses corners = vehicle.cornerMasses();
        if (corners == null) {
            return vehicle.withMassDistribution(vehicle.mass(), vehicle.frontMassFraction() + BALLAST / vehicle.mass());
        }
        double half = BALLAST / 2;
        CornerMasses moved = new CornerMasses(corners.leftFront() + half, corners.rightFront() + half,
                corners.leftRear() - half, corners.rightRear() - half);
        return new Vehicle(vehicle.name(), moved.total(), moved.frontFraction(), moved, vehicle.cgHeight(),
                vehicle.wheelbase(), vehicle.chassisTorsionalStiffness(), vehicle.front(), vehicle.rear(),
                vehicle.differentialWheelTravel());
    }
}
