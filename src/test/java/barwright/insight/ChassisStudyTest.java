package barwright.insight;

import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.model.Material;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.report.insight.ChassisText;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The chassis stiffness study against full analyses, model.md 6 in closed form and docs/validation.md. */
class ChassisStudyTest {
    /** Two routes to the same 2x2 solution (the study's and the full analysis's): round-off only. */
    private static final double SAME_MODEL = 1e-12;

    static List<String> samples() {
        return Samples.NAMES;
    }

    private static double share(Vehicle vehicle) {
        return VehicleAnalysis.analyse(vehicle).frontLoadTransferShare();
    }

    @Test
    void at_the_roadster_own_chassis_stiffness_the_study_is_the_full_analysis() {
        Vehicle roadster = Samples.vehicle("sprint-roadster");
        AnalysisResult analysis = VehicleAnalysis.analyse(roadster);
        ChassisStudyResult study = ChassisStudy.compute(roadster);
        assertThat(study.current().chassisStiffness()).isEqualTo(roadster.chassisTorsionalStiffness());
        assertThat(study.current().frontShare())
                .isCloseTo(analysis.frontLoadTransferShare(), within(SAME_MODEL));
        assertThat(study.current().rollGradient())
                .isCloseTo(analysis.rollGradient(), within(SAME_MODEL * analysis.rollGradient()));
    }

    @ParameterizedTest
    @MethodSource("samples")
    void along_the_sweep_the_study_is_the_full_analysis_of_the_car_with_that_chassis(String sample) {
        Vehicle vehicle = Samples.vehicle(sample);
        ChassisStudyResult study = ChassisStudy.compute(vehicle);
        assertThat(study.sweep()).hasSize(ChassisStudy.POINTS);
        assertThat(study.sweep().get(0).chassisStiffness())
                .isCloseTo(0.1 * study.totalRollStiffness(), within(1e-9 * study.totalRollStiffness()));
        assertThat(study.sweep().get(ChassisStudy.POINTS - 1).chassisStiffness())
                .isCloseTo(10 * study.totalRollStiffness(), within(1e-9 * study.totalRollStiffness()));
        for (int i = 0; i < study.sweep().size(); i += 10) {
            ChassisPoint point = study.sweep().get(i);
            AnalysisResult full = VehicleAnalysis.analyse(vehicle.withChassisTorsionalStiffness(point.chassisStiffness()));
            assertThat(point.frontShare()).isCloseTo(full.frontLoadTransferShare(), within(SAME_MODEL));
            assertThat(point.rollGradient()).isCloseTo(full.rollGradient(), within(SAME_MODEL * full.rollGradient()));
        }
        AnalysisResult rigid = VehicleAnalysis.analyse(vehicle.withChassisTorsionalStiffness(null));
        assertThat(study.rigid().frontShare()).isCloseTo(rigid.frontLoadTransferShare(), within(SAME_MODEL));
    }

    /**
     * model.md 6: as K_c grows the result tends to the rigid one (to be tested, the spec says). The 2x2 system's
     * solution differs from the rigid one by a term in 1/K_c, so ten times the stiffness leaves a tenth of the
     * difference (to 1 %, the next term being of order 1/K_c^2 at a thousand times the roll stiffness).
     */
    @ParameterizedTest
    @MethodSource("samples")
    void the_study_tends_to_the_rigid_result_as_the_chassis_stiffens(String sample) {
        ChassisStudy study = ChassisStudy.of(Samples.vehicle(sample), VehicleAnalysis.analyse(Samples.vehicle(sample)));
        double total = study.totalRollStiffness();
        double rigid = study.frontShare(null);
        double at1e3 = study.frontShare(1e3 * total) - rigid;
        double at1e4 = study.frontShare(1e4 * total) - rigid;
        assertThat(at1e4 / at1e3).isCloseTo(0.1, within(0.001));
        assertThat(Math.abs(study.frontShare(1e7 * total) - rigid)).isLessThan(1e-6);
        assertThat(study.rollGradient(1e7 * total)).isCloseTo(study.rollGradient(null), within(1e-6 * study.rollGradient(null)));
    }

    /**
     * model.md 6 with K_c = 0 decouples the ends: phi_f = m_sf h' / (K_f - m_sf g h'), so the elastic transfer
     * K_f phi_f / t_f follows the sprung mass each end carries (the sprung-mass split), not the roll stiffness.
     * Closed form in the test from the analysis's masses, stiffnesses and unsprung and geometric parts.
     */
    @ParameterizedTest
    @MethodSource("samples")
    void the_study_tends_to_the_sprung_mass_split_as_the_chassis_stiffness_vanishes(String sample) {
        Vehicle vehicle = Samples.vehicle(sample);
        AnalysisResult analysis = VehicleAnalysis.analyse(vehicle);
        var masses = analysis.masses();
        double arm = masses.rollArm();
        double frontStiffness = analysis.front().stiffness().rollStiffness();
        double rearStiffness = analysis.rear().stiffness().rollStiffness();
        double frontElastic = frontStiffness * masses.frontSprungMass() * arm
                / (frontStiffness - masses.frontSprungMass() * STANDARD_GRAVITY * arm) / vehicle.front().track();
        double rearElastic = rearStiffness * masses.rearSprungMass() * arm
                / (rearStiffness - masses.rearSprungMass() * STANDARD_GRAVITY * arm) / vehicle.rear().track();
        double front = analysis.front().loadTransfer().unsprung() + analysis.front().loadTransfer().geometric() + frontElastic;
        double rear = analysis.rear().loadTransfer().unsprung() + analysis.rear().loadTransfer().geometric() + rearElastic;
        double expected = front / (front + rear);
        ChassisStudyResult result = ChassisStudy.compute(vehicle);
        assertThat(result.decoupled().frontShare()).isCloseTo(expected, within(SAME_MODEL));
        ChassisStudy study = ChassisStudy.of(vehicle, analysis);
        // the first term in K_c: a millionth of the roll stiffness leaves a few millionths
        assertThat(study.frontShare(1e-6 * study.totalRollStiffness())).isCloseTo(expected, within(1e-5));
    }

    /**
     * docs/validation.md, section "Flexible chassis" (arithmetic): K_f = 1000, K_r = 500, K_c = 3000 N m/deg, roll moment split
     * 0.5/0.5, no gravity term: elastic front share 0.6500, rigid 0.6667, K_c -> 0 gives 0.5000. The car below
     * is built to be that case: no unsprung mass and roll centres on the ground (so all transfer is elastic),
     * half the sprung mass on each axle, equal tracks, tyres a million times stiffer than the springs, and a
     * CG 1 mm high so that the gravity term m_s g h' is 1.7e-4 of the front roll stiffness and moves the shares by
     * less than that: hence 1e-4.
     */
    @Test
    void a_car_built_to_the_checks_example_gives_its_shares() {
        double track = 1.4;
        Vehicle base = Samples.vehicle("road-saloon");
        double frontRate = 2 * 1000 / RADIANS_PER_DEGREE / (track * track); // K_spr = k t^2 / 2, motion ratio 1
        double rearRate = 2 * 500 / RADIANS_PER_DEGREE / (track * track);
        Axle front = new Axle(track, 0, 0, 0, frontRate, 1, frontRate * 1e6, base.front().tyre(), null);
        Axle rear = new Axle(track, 0, 0, 0, rearRate, 1, rearRate * 1e6, base.rear().tyre(), null);
        Vehicle example = new Vehicle("flexible chassis example (docs/validation.md)", 1000, 0.5, null, 1e-3, 2.5, null,
                front, rear, 0.06);
        ChassisStudy study = ChassisStudy.of(example, VehicleAnalysis.analyse(example));
        assertThat(study.frontShare(3000 / RADIANS_PER_DEGREE)).isCloseTo(0.6500, within(1e-4));
        assertThat(study.frontShare(null)).isCloseTo(2.0 / 3.0, within(1e-4));
        assertThat(study.frontShare(0.0)).isCloseTo(0.5000, within(1e-4));
        // the test's own no-gravity closed form of the same 2x2 system (Cramer's rule) gives the listed 0.65
        assertThat(elasticFrontShareWithoutGravity(1000, 500, 3000, 0.5)).isCloseTo(0.65, within(1e-12));
    }

    /**
     * model.md 6 without the gravity terms, by Cramer's rule: with a unit roll moment split s : 1 - s,
     * K_f phi_f = K_f (s K_r + K_c) / (K_f K_r + K_c (K_f + K_r)).
     */
    private static double elasticFrontShareWithoutGravity(double front, double rear, double chassis, double split) {
        return front * (split * rear + chassis) / (front * rear + chassis * (front + rear));
    }

    /**
     * The 80 % statement, checked by solving for it: at the stiffness the study states, four full analyses
     * (with and without the bar change, with that chassis and rigid) give a bar change 80 % of its rigid effect.
     * Brent works to 1e-9 decades of stiffness, so 1e-7 on the share is ample.
     */
    @ParameterizedTest
    @MethodSource("samples")
    void the_stated_stiffness_delivers_eighty_percent_of_the_rigid_effect(String sample) {
        Vehicle vehicle = Samples.vehicle(sample).withChassisTorsionalStiffness(null);
        ChassisStudyResult study = ChassisStudy.compute(vehicle);
        double stiffness = study.stiffnessForTarget();
        Vehicle changed = withStifferFrontBar(vehicle);
        double rigidEffect = share(changed) - share(vehicle);
        double flexibleEffect = share(changed.withChassisTorsionalStiffness(stiffness))
                - share(vehicle.withChassisTorsionalStiffness(stiffness));
        assertThat(flexibleEffect / rigidEffect).isCloseTo(0.8, within(1e-7));
        double softer = 0.9 * stiffness;
        double softerEffect = share(changed.withChassisTorsionalStiffness(softer))
                - share(vehicle.withChassisTorsionalStiffness(softer));
        assertThat(softerEffect / rigidEffect).isLessThan(0.8);
        assertThat(new ChassisText(barwright.units.UnitSystem.SI).statement(study))
                .contains(barwright.units.Figures.format(stiffness, barwright.units.Quantity.ROLL_STIFFNESS,
                        barwright.units.UnitSystem.SI, 0))
                .contains("Deakin et al., SAE 2000-01-3554");
    }

    /** The sample cars all have a front bar: the study's change is a front bar 10 % stiffer. */
    private static Vehicle withStifferFrontBar(Vehicle vehicle) {
        AntiRollBar bar = vehicle.front().bar();
        Material material = bar.material();
        Material stiffer = new Material(material.name(), material.youngsModulus() * 1.1, material.shearModulus() * 1.1,
                material.density(), material.yieldStrength());
        return vehicle.withFront(vehicle.front().withBar(bar.withMaterial(stiffer)));
    }

    /** model.md 2: every compliance term has E or G in its denominator, so raising both by 10 % adds 10 % of rate. */
    @ParameterizedTest
    @MethodSource("samples")
    void the_bar_change_is_ten_percent_of_bar_roll_stiffness(String sample) {
        Vehicle vehicle = Samples.vehicle(sample);
        double before = VehicleAnalysis.analyse(vehicle).front().stiffness().barRollStiffness();
        double after = VehicleAnalysis.analyse(withStifferFrontBar(vehicle)).front().stiffness().barRollStiffness();
        assertThat(after / before).isCloseTo(1.1, within(1e-12));
        assertThat(ChassisStudy.compute(vehicle).barChange()).isEqualTo("a front bar 10 % stiffer");
    }

    /** Physics: a stiffer chassis couples the body ends more, so more of a bar change reaches the other axle. */
    @ParameterizedTest
    @MethodSource("samples")
    void the_delivered_share_rises_with_chassis_stiffness(String sample) {
        ChassisStudyResult study = ChassisStudy.compute(Samples.vehicle(sample));
        for (int i = 1; i < study.sweep().size(); i++) {
            assertThat(study.sweep().get(i).deliveredShare()).isGreaterThan(study.sweep().get(i - 1).deliveredShare());
        }
        assertThat(study.sweep().get(study.sweep().size() - 1).deliveredShare()).isLessThan(1.0);
    }

    /**
     * Limit case (model.md 6): as K_c grows the flexible result tends to the rigid one, so the delivered share
     * tends to 1 from below, its shortfall falling as 1/K_c (the same first-order term as the share itself):
     * ten times stiffer leaves a tenth of it, to 1 % at a thousand times the roll stiffness; at 1e6 times
     * (before rounding in the 2x2 determinant takes over) it is within 1e-5 of 1.
     */
    @ParameterizedTest
    @MethodSource("samples")
    void the_delivered_share_tends_to_one_as_the_chassis_stiffens(String sample) {
        Vehicle vehicle = Samples.vehicle(sample);
        ChassisStudy study = ChassisStudy.of(vehicle, VehicleAnalysis.analyse(vehicle));
        double total = study.totalRollStiffness();
        double shortfall1e3 = 1 - study.deliveredShare(1e3 * total);
        double shortfall1e4 = 1 - study.deliveredShare(1e4 * total);
        assertThat(shortfall1e3).isPositive();
        assertThat(shortfall1e4 / shortfall1e3).isCloseTo(0.1, within(0.001));
        assertThat(study.deliveredShare(1e6 * total)).isCloseTo(1.0, within(1e-5));
    }

    /**
     * docs/validation.md, "Flexible chassis": on the car built to that example (no bar, so the study stiffens
     * the front springs by 10 %: K_f 1000 -> 1100 N m/deg with tyres a million times stiffer), the no-gravity
     * closed form gives the delivered share at K_c = 3000 N m/deg by hand:
     * (1100 x 3250 / 5 350 000 - 0.65) / (1100/1600 - 1000/1500) = 0.87477. The leftover gravity term and the
     * tyres move the shares by under 2e-4 (see above), their differences by under 1e-3 of this figure: 1e-3.
     */
    @Test
    void a_car_built_to_the_checks_example_delivers_the_hand_worked_share() {
        double track = 1.4;
        Vehicle base = Samples.vehicle("road-saloon");
        double frontRate = 2 * 1000 / RADIANS_PER_DEGREE / (track * track);
        double rearRate = 2 * 500 / RADIANS_PER_DEGREE / (track * track);
        Axle front = new Axle(track, 0, 0, 0, frontRate, 1, frontRate * 1e6, base.front().tyre(), null);
        Axle rear = new Axle(track, 0, 0, 0, rearRate, 1, rearRate * 1e6, base.rear().tyre(), null);
        Vehicle example = new Vehicle("flexible chassis example (docs/validation.md)", 1000, 0.5, null, 1e-3, 2.5,
                null, front, rear, 0.06);
        ChassisStudy study = ChassisStudy.of(example, VehicleAnalysis.analyse(example));
        double byHand = (elasticFrontShareWithoutGravity(1100, 500, 3000, 0.5)
                - elasticFrontShareWithoutGravity(1000, 500, 3000, 0.5)) / (1100.0 / 1600 - 1000.0 / 1500);
        assertThat(byHand).isCloseTo(0.87477, within(0.000005));
        assertThat(study.deliveredShare(3000 / RADIANS_PER_DEGREE)).isCloseTo(byHand, within(1e-3));
    }
}
