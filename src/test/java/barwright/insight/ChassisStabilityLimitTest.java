package barwright.insight;

import barwright.model.AntiRollBar;
import barwright.model.Material;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.MassProperties;
import barwright.physics.VehicleAnalysis;
import org.junit.jupiter.api.Test;

import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The chassis study where one body end cannot stand on its own axle: the 80 % stiffness is sought from the
 * stability limit of the flexible-chassis equations (model.md 6) and found.
 *
 * <p>The independent check written here: the two-end roll equations of model.md 6 solved by Cramer's rule, the
 * rigid case by its own closed form (model.md 5), the stability limit found by a plain bisection on the
 * determinant of the 2x2 matrix, and the 80 % stiffness by a plain bisection on the logarithm of K_c. Only the
 * axles' roll stiffnesses, the masses and the unsprung and geometric transfers are taken from the analysis
 * (each checked against closed forms in the physics tests). Within 1 %, as the issue asks; the two
 * calculations agree far closer (bisection to 1e-12 decades, Brent to 1e-9 decades).
 */
class ChassisStabilityLimitTest {
    private static final double WITHIN_ONE_PERCENT = 0.01;

    /**
     * The reproducer: the demo saloon with its front bar removed and front springs at 2 N/mm. An independent
     * root finding on the same model gave about 31 N m/deg (the report of the problem); here the test's own
     * calculation gives the reference.
     */
    @Test
    void the_saloon_with_a_soft_front_finds_the_eighty_percent_stiffness_above_the_stability_limit() {
        Vehicle saloon = Samples.vehicle("road-saloon");
        Vehicle soft = saloon.withFront(saloon.front().withBar(null).withSpringRate(2e3));
        // no bar at either end: the study makes its change with the front springs 10 % stiffer
        Vehicle changed = soft.withFront(soft.front().withSpringRate(2e3 * 1.1));
        ChassisStudyResult study = ChassisStudy.compute(soft);

        double expected = independentTarget(soft, changed);
        assertThat(expected * RADIANS_PER_DEGREE).isCloseTo(31, within(1.0)); // "about 31 N m/deg"
        assertThat(study.stiffnessForTarget()).isNotNull();
        assertThat(study.stiffnessForTarget()).isCloseTo(expected, within(WITHIN_ONE_PERCENT * expected));
        assertStabilityLimitStatedAndSweepClean(soft, study);
        assertThat(study.notes()).noneMatch(note -> note.startsWith("No chassis stiffness"));
    }

    /**
     * A car of this test's own: the demo hatchback (invented data) with its rear bar removed and rear springs at
     * 1 N/mm, so the rear end cannot hold its share of the sprung mass; the study's change is the front bar 10 %
     * stiffer (both elastic moduli raised).
     */
    @Test
    void a_hatchback_whose_rear_cannot_stand_alone_finds_the_independent_stiffness() {
        Vehicle hatchback = Samples.vehicle("club-hatchback").withChassisTorsionalStiffness(null);
        Vehicle soft = hatchback.withRear(hatchback.rear().withBar(null).withSpringRate(1e3));
        AntiRollBar bar = soft.front().bar();
        Material material = bar.material();
        Vehicle changed = soft.withFront(soft.front().withBar(bar.withMaterial(new Material(material.name(),
                material.youngsModulus() * 1.1, material.shearModulus() * 1.1, material.density(),
                material.yieldStrength()))));
        ChassisStudyResult study = ChassisStudy.compute(soft);

        double expected = independentTarget(soft, changed);
        assertThat(study.stiffnessForTarget()).isNotNull();
        assertThat(study.stiffnessForTarget()).isCloseTo(expected, within(WITHIN_ONE_PERCENT * expected));
        assertStabilityLimitStatedAndSweepClean(soft, study);
    }

    /**
     * The saloon of the reproducer with its rear springs softened too (10 N/mm), until the stability limit lies above the
     * start of the sweep (a tenth of the total roll stiffness): the points below it are left out with the
     * reason, and none is NaN.
     */
    @Test
    void sweep_points_below_the_stability_limit_are_left_out_with_the_reason() {
        Vehicle saloon = Samples.vehicle("road-saloon");
        Vehicle soft = saloon.withFront(saloon.front().withBar(null).withSpringRate(2e3))
                .withRear(saloon.rear().withSpringRate(10e3));
        ChassisStudyResult study = ChassisStudy.compute(soft);
        double limit = independentStabilityLimit(VehicleAnalysis.analyse(soft));
        assertThat(limit).isGreaterThan(ChassisStudy.LOWEST * study.totalRollStiffness());
        assertStabilityLimitStatedAndSweepClean(soft, study);
        Vehicle changed = soft.withFront(soft.front().withSpringRate(2e3 * 1.1));
        double expected = independentTarget(soft, changed);
        assertThat(study.stiffnessForTarget()).isCloseTo(expected, within(WITHIN_ONE_PERCENT * expected));
    }

    private static void assertStabilityLimitStatedAndSweepClean(Vehicle car, ChassisStudyResult study) {
        double limit = independentStabilityLimit(VehicleAnalysis.analyse(car));
        assertThat(limit).isPositive();
        String limitText = String.format(Locale.ROOT, "%.1f N·m/deg", limit * RADIANS_PER_DEGREE);
        assertThat(study.notes()).anyMatch(note -> note.contains("stability limit") && note.contains(limitText));
        for (ChassisPoint point : study.sweep()) {
            assertThat(point.chassisStiffness()).isGreaterThan(limit);
            assertThat(point.frontShare()).isFinite();
            assertThat(point.rollGradient()).isFinite();
            assertThat(point.deliveredShare()).isFinite();
        }
        if (limit > ChassisStudy.LOWEST * study.totalRollStiffness()) {
            assertThat(study.sweep()).hasSizeLessThan(ChassisStudy.POINTS);
            assertThat(study.notes()).anyMatch(note -> note.contains("left out"));
        }
        assertThat(study.decoupled()).isNull();
    }

    /** The stiffness at which the delivered share is 0.8, by bisection on log10 K_c from the stability limit up. */
    private static double independentTarget(Vehicle base, Vehicle changed) {
        AnalysisResult before = VehicleAnalysis.analyse(base);
        AnalysisResult after = VehicleAnalysis.analyse(changed);
        double rigidEffect = rigidShare(after) - rigidShare(before);
        DoubleUnaryOperator delivered = chassis -> (share(after, chassis) - share(before, chassis)) / rigidEffect;
        double limit = Math.max(independentStabilityLimit(before), independentStabilityLimit(after));
        double low = Math.log10(limit) + 1e-9;
        double high = Math.log10(1e3 * (before.front().stiffness().rollStiffness()
                + before.rear().stiffness().rollStiffness()));
        assertThat(delivered.applyAsDouble(Math.pow(10, low))).isLessThan(0.8);
        assertThat(delivered.applyAsDouble(Math.pow(10, high))).isGreaterThan(0.8);
        while (high - low > 1e-12) {
            double middle = (low + high) / 2;
            if (delivered.applyAsDouble(Math.pow(10, middle)) < 0.8) {
                low = middle;
            } else {
                high = middle;
            }
        }
        return Math.pow(10, (low + high) / 2);
    }

    /** The K_c at which det [[K_f + K_c - m_sf g h', -K_c], [-K_c, K_r + K_c - m_sr g h']] turns positive. */
    private static double independentStabilityLimit(AnalysisResult result) {
        double low = 0;
        double high = 1e9;
        assertThat(determinant(result, high)).isPositive();
        assertThat(determinant(result, low)).isNegative();
        for (int i = 0; i < 200; i++) {
            double middle = (low + high) / 2;
            if (determinant(result, middle) > 0) {
                high = middle;
            } else {
                low = middle;
            }
        }
        return high;
    }

    private static double determinant(AnalysisResult result, double chassis) {
        MassProperties masses = result.masses();
        double gravityArm = STANDARD_GRAVITY * masses.rollArm();
        double front = result.front().stiffness().rollStiffness() + chassis - masses.frontSprungMass() * gravityArm;
        double rear = result.rear().stiffness().rollStiffness() + chassis - masses.rearSprungMass() * gravityArm;
        return front * rear - chassis * chassis;
    }

    /** model.md 6 by Cramer's rule: elastic K phi / t at each end plus the unsprung and geometric parts. */
    private static double share(AnalysisResult result, double chassis) {
        MassProperties masses = result.masses();
        double arm = masses.rollArm();
        double gravityArm = STANDARD_GRAVITY * arm;
        double kf = result.front().stiffness().rollStiffness();
        double kr = result.rear().stiffness().rollStiffness();
        double a11 = kf + chassis - masses.frontSprungMass() * gravityArm;
        double a22 = kr + chassis - masses.rearSprungMass() * gravityArm;
        double b1 = masses.frontSprungMass() * arm;
        double b2 = masses.rearSprungMass() * arm;
        double det = a11 * a22 - chassis * chassis;
        double frontRoll = (b1 * a22 + chassis * b2) / det;
        double rearRoll = (a11 * b2 + chassis * b1) / det;
        return shareOf(result, kf * frontRoll, kr * rearRoll);
    }

    /** model.md 5, rigid: phi = m_s h' / (K_f + K_r - m_s g h') per a_y at both ends. */
    private static double rigidShare(AnalysisResult result) {
        MassProperties masses = result.masses();
        double kf = result.front().stiffness().rollStiffness();
        double kr = result.rear().stiffness().rollStiffness();
        double roll = masses.sprungMass() * masses.rollArm()
                / (kf + kr - masses.sprungMass() * STANDARD_GRAVITY * masses.rollArm());
        return shareOf(result, kf * roll, kr * roll);
    }

    private static double shareOf(AnalysisResult result, double frontMoment, double rearMoment) {
        double front = result.front().loadTransfer().unsprung() + result.front().loadTransfer().geometric()
                + frontMoment / result.vehicle().front().track();
        double rear = result.rear().loadTransfer().unsprung() + result.rear().loadTransfer().geometric()
                + rearMoment / result.vehicle().rear().track();
        return front / (front + rear);
    }
}
