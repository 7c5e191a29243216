package barwright.physics;

import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.model.CornerMasses;
import barwright.model.Material;
import barwright.model.MaterialLibrary;
import barwright.model.SolidSection;
import barwright.model.Tyre;
import barwright.model.UBarDimensions;
import barwright.model.Vehicle;

import java.util.List;
import java.util.Random;

/**
 * Invented cars for the tests, built in code (SI). Invented data, not a real car: only the checks built on
 * them carry sources, never these inputs.
 */
public final class TestCars {
    private TestCars() {
    }

    /** A road-tyre-like tyre (invented figures in the range of files.md's example). */
    public static Tyre tyre() {
        return new Tyre(3500, 1.20, -0.15, 16.0, 2.0, 1.3, -0.5);
    }

    /** A solid spring-steel U-bar. Lengths in m. */
    public static AntiRollBar solidBar(double diameter, double torsionLength, double bushingSpan, double arm,
                                       double linkMotionRatio) {
        return bar(MaterialLibrary.SPRING_STEEL, diameter, torsionLength, bushingSpan, arm, linkMotionRatio);
    }

    public static AntiRollBar bar(Material material, double diameter, double torsionLength, double bushingSpan,
                                  double arm, double linkMotionRatio) {
        return new AntiRollBar(material, new SolidSection(diameter),
                new UBarDimensions(torsionLength, bushingSpan, List.of(arm)), null, 0, linkMotionRatio);
    }

    /** An axle with the given essentials and an invented tyre. Lengths in m, rates in N/m. */
    public static Axle axle(double track, double rollCentre, double unsprungMass, double unsprungCgHeight,
                            double springRate, double springMotionRatio, double tyreRate, AntiRollBar bar) {
        return new Axle(track, rollCentre, unsprungMass, unsprungCgHeight, springRate, springMotionRatio, tyreRate,
                tyre(), bar);
    }

    /** A 1050 kg club car with bars at both ends, rigid chassis, symmetric (invented). */
    public static Vehicle clubCar() {
        Axle front = axle(1.46, 0.06, 80, 0.29, 55e3, 0.95, 230e3, solidBar(0.022, 0.90, 0.76, 0.20, 0.85));
        Axle rear = axle(1.44, 0.11, 70, 0.29, 45e3, 0.90, 230e3, solidBar(0.018, 1.00, 0.90, 0.18, 0.90));
        return new Vehicle("test club car (invented)", 1050, 0.60, null, 0.50, 2.45, null, front, rear, 0.06);
    }

    /** The club car weighed on corner scales, heavier on the right, total 1050 kg (invented). */
    public static Vehicle asymmetricClubCar() {
        return new Vehicle("test club car, corner weights (invented)", 1050, 0.60,
                new CornerMasses(300, 330, 200, 220), 0.50, 2.45, null, clubCar().front(), clubCar().rear(), 0.06);
    }

    /**
     * A plausible random car: stable, sprung CG above the roll axis, every figure within the ranges of a road
     * or club car (seeded for repeatable tests).
     */
    public static Vehicle random(Random random, boolean flexibleChassis) {
        double mass = 700 + 900 * random.nextDouble();
        double frontFraction = 0.42 + 0.2 * random.nextDouble();
        double cgHeight = 0.40 + 0.15 * random.nextDouble();
        double wheelbase = 2.2 + 0.7 * random.nextDouble();
        Axle front = randomAxle(random, true);
        Axle rear = randomAxle(random, random.nextBoolean());
        Double chassis = flexibleChassis ? 3e5 + 1e6 * random.nextDouble() : null;
        return new Vehicle("random test car (invented)", mass, frontFraction, null, cgHeight, wheelbase, chassis,
                front, rear, 0.06);
    }

    private static Axle randomAxle(Random random, boolean withBar) {
        double track = 1.35 + 0.25 * random.nextDouble();
        AntiRollBar bar = withBar ? solidBar(0.016 + 0.012 * random.nextDouble(), 0.8 + 0.3 * random.nextDouble(),
                0.7, 0.15 + 0.1 * random.nextDouble(), 0.6 + 0.35 * random.nextDouble()) : null;
        return axle(track, -0.02 + 0.15 * random.nextDouble(), 50 + 60 * random.nextDouble(),
                0.26 + 0.06 * random.nextDouble(), (30 + 50 * random.nextDouble()) * 1e3,
                0.7 + 0.3 * random.nextDouble(), (180 + 100 * random.nextDouble()) * 1e3, bar);
    }
}
