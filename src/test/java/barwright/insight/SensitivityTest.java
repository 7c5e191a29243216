package barwright.insight;

import barwright.model.AxlePosition;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.TestCars;
import barwright.physics.TurnResult;
import barwright.physics.VehicleAnalysis;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Sensitivity: the stiffness rows against closed forms, a limit case, every direction as the trade expects. */
class SensitivityTest {
    /** Steps set in the code, compared after a multiplication or addition: round-off only. */
    private static final double STEP_TOLERANCE = 1e-12;

    static List<String> samples() {
        return Samples.NAMES;
    }

    private static Map<String, SensitivityRow> byKey(SensitivityResult result) {
        return result.rows().stream().collect(Collectors.toMap(row -> row.change().key(), Function.identity()));
    }

    /**
     * An independent closed form for every stiffness row. On a car with its roll centres and unsprung masses on
     * the ground and equal tracks only the elastic transfer K phi / t is left, so the front share is
     * K_f / (K_f + K_r) and the roll gradient m_s h' / (K_f + K_r - m_s g h') (model.md 5, algebra). Each axle's
     * roll stiffness is the springs and the bar in parallel, in series with the tyres (docs/validation.md,
     * "Roll stiffness of springs and tyres"); a solid bar's rate goes as D^4 (every compliance term of
     * model.md 2 has J or I in its denominator, both pi D^4 times a constant); spring and tyre roll stiffnesses
     * go as their rates. From the base car's three stiffnesses per axle, the test works out each changed car by
     * these laws alone, without analysing it. 1e-12 on a share and 1e-10 relative on a roll gradient: the two
     * routes differ in rounding only. A physics slip in any row (the wrong axle, a bar rate not going as D^4, a
     * tyre left out of the series) moves a figure by far more.
     */
    @Test
    void each_stiffness_row_matches_the_closed_form_of_an_elastic_only_car() {
        Vehicle car = elasticOnlyCar();
        AnalysisResult base = VehicleAnalysis.analyse(car);
        assertThat(base.front().loadTransfer().unsprung() + base.front().loadTransfer().geometric()).isZero();
        double sprungMass = car.mass() - car.front().unsprungMass() - car.rear().unsprungMass();
        double arm = car.mass() * car.cgHeight() / sprungMass; // roll axis on the ground, unsprung CGs too
        Map<String, SensitivityRow> rows = byKey(Sensitivity.of(car));
        double frontDiameter = car.front().bar().section().outerDiameter();
        double rearDiameter = car.rear().bar().section().outerDiameter();
        double frontBar = Math.pow((frontDiameter + InputChanges.BAR_STEP) / frontDiameter, 4);
        double rearBar = Math.pow((rearDiameter + InputChanges.BAR_STEP) / rearDiameter, 4);
        // scale factors {front springs, front bar, front tyres, rear springs, rear bar, rear tyres}
        Map<String, double[]> scales = Map.of(
                "frontBarDiameter", new double[]{1, frontBar, 1, 1, 1, 1},
                "rearBarDiameter", new double[]{1, 1, 1, 1, rearBar, 1},
                "frontSpringRate", new double[]{1.1, 1, 1, 1, 1, 1},
                "rearSpringRate", new double[]{1, 1, 1, 1.1, 1, 1},
                "frontTyreVerticalRate", new double[]{1, 1, 1.1, 1, 1, 1},
                "rearTyreVerticalRate", new double[]{1, 1, 1, 1, 1, 1.1});
        double baseFront = axleRoll(base, AxlePosition.FRONT, 1, 1, 1);
        double baseRear = axleRoll(base, AxlePosition.REAR, 1, 1, 1);
        for (var entry : scales.entrySet()) {
            double[] k = entry.getValue();
            double front = axleRoll(base, AxlePosition.FRONT, k[0], k[1], k[2]);
            double rear = axleRoll(base, AxlePosition.REAR, k[3], k[4], k[5]);
            SensitivityRow row = rows.get(entry.getKey());
            assertThat(row).as(entry.getKey()).isNotNull();
            assertThat(row.frontShareChange()).as(entry.getKey())
                    .isCloseTo(front / (front + rear) - baseFront / (baseFront + baseRear), within(1e-12));
            double rollChange = rollGradient(sprungMass, arm, front + rear) - rollGradient(sprungMass, arm, baseFront + baseRear);
            assertThat(row.rollGradientChange()).as(entry.getKey())
                    .isCloseTo(rollChange, within(1e-10 * base.rollGradient()));
        }
        // and the check has teeth: a bar change is a sizeable move of the share on this car
        assertThat(Math.abs(rows.get("frontBarDiameter").frontShareChange())).isGreaterThan(0.005);
    }

    /**
     * Limit case of the same car: with only the elastic part left, where the weight sits moves neither the front
     * share (K_f / (K_f + K_r) has no mass in it) nor the roll gradient (m_s and h' are unchanged when mass moves
     * along the car at the same height over a roll axis on the ground). Rounding only: 1e-12.
     */
    @Test
    void moving_ballast_on_an_elastic_only_car_moves_neither_share_nor_roll() {
        SensitivityRow ballast = byKey(Sensitivity.of(elasticOnlyCar())).get("ballastForward");
        assertThat(ballast.frontShareChange()).isCloseTo(0, within(1e-12));
        assertThat(ballast.rollGradientChange()).isCloseTo(0, within(1e-12 * Math.abs(ballast.before().rollGradient())));
    }

    /** Springs k_s, bar k_b in parallel, in series with tyres k_t, each scaled: the axle's roll stiffness. */
    private static double axleRoll(AnalysisResult base, AxlePosition position, double springs, double bar, double tyres) {
        var stiffness = base.axle(position).stiffness();
        double suspension = springs * stiffness.springRollStiffness() + bar * stiffness.barRollStiffness();
        return 1 / (1 / suspension + 1 / (tyres * stiffness.tyreRollStiffness()));
    }

    /** model.md 5: roll per a_y of a rigid body, phi = m_s h' / (K - m_s g h') (rad s^2/m). */
    private static double rollGradient(double sprungMass, double arm, double rollStiffness) {
        return sprungMass * arm / (rollStiffness - sprungMass * STANDARD_GRAVITY * arm);
    }

    /** Invented: bars at both ends, roll centres and unsprung CGs on the ground, equal tracks, rigid chassis. */
    private static Vehicle elasticOnlyCar() {
        var front = TestCars.axle(1.50, 0, 80, 0, 55e3, 0.95, 230e3, TestCars.solidBar(0.022, 0.90, 0.76, 0.20, 0.85));
        var rear = TestCars.axle(1.50, 0, 70, 0, 45e3, 0.90, 230e3, TestCars.solidBar(0.018, 1.00, 0.90, 0.18, 0.90));
        return new Vehicle("elastic only (invented)", 1050, 0.58, null, 0.48, 2.45, null, front, rear, 0.06);
    }

    /** The figures are for the turn with the lower limit (the left one on a tie). */
    @Test
    void the_turn_is_the_one_with_the_lower_limit() {
        Vehicle roadster = Samples.vehicle("sprint-roadster");
        AnalysisResult analysis = VehicleAnalysis.analyse(roadster);
        TurnDirection expected = analysis.rightTurn().limit() < analysis.leftTurn().limit()
                ? TurnDirection.RIGHT : TurnDirection.LEFT;
        assertThat(Sensitivity.of(roadster).turn()).isEqualTo(expected);
    }

    /** Each change is the stated step of issue 6 and no other change. */
    @ParameterizedTest
    @MethodSource("samples")
    void each_change_is_the_stated_step(String sample) {
        Vehicle vehicle = Samples.vehicle(sample);
        for (InputChange change : InputChanges.of(vehicle).changes()) {
            Vehicle changed = change.apply().apply(vehicle);
            double before = value(vehicle, change.key());
            double after = value(changed, change.key());
            assertThat(before).as(change.key()).isCloseTo(change.from(), within(STEP_TOLERANCE));
            assertThat(after).as(change.key()).isCloseTo(change.to(), within(STEP_TOLERANCE));
            double step = change.to() - change.from();
            if (change.key().endsWith("SpringRate") || change.key().endsWith("TyreVerticalRate")) {
                assertThat(change.to() / change.from()).isCloseTo(1.10, within(STEP_TOLERANCE));
            } else if (change.key().endsWith("BarDiameter") || change.key().endsWith("BarWall")) {
                assertThat(step).isCloseTo(1e-3, within(STEP_TOLERANCE));
            } else if (change.key().endsWith("RollCentreHeight")) {
                assertThat(step).isCloseTo(10e-3, within(STEP_TOLERANCE));
            } else if (change.key().equals("ballastForward")) {
                assertThat(step).isCloseTo(10, within(STEP_TOLERANCE));
                assertThat(changed.mass()).isEqualTo(vehicle.mass());
            } else if (change.key().equals("cgHeight")) {
                assertThat(step).isCloseTo(5e-3, within(STEP_TOLERANCE));
            } else if (change.key().endsWith("PickupPointHeight") || change.key().endsWith("RideHeight")) {
                assertThat(step).isCloseTo(10e-3, within(STEP_TOLERANCE));
            }
        }
    }

    /** The quantity a change key names, read from the car (SI), independently of {@link InputChanges}. */
    private static double value(Vehicle vehicle, String key) {
        AxlePosition axle = key.startsWith("front") ? AxlePosition.FRONT : AxlePosition.REAR;
        var a = vehicle.axle(axle);
        return switch (key.replaceFirst("^(front|rear)", "")) {
            case "BarArmHole" -> a.bar().selectedArmLength();
            case "BarDiameter" -> a.bar().section().outerDiameter();
            case "BarWall" -> ((TubeSection) a.bar().section()).wall();
            case "SpringRate" -> a.springRate();
            case "RollCentreHeight" -> a.rollCentreHeight();
            case "TyreVerticalRate" -> a.tyreVerticalRate();
            case "ballastForward" -> vehicle.mass() * vehicle.frontMassFraction();
            case "cgHeight" -> vehicle.cgHeight();
            case "RideHeight" -> a.suspension().rideHeightChange();
            case "PickupPointHeight" -> pickupHeight(a.suspension().linkage());
            default -> throw new IllegalArgumentException(key);
        };
    }

    /** The pickup point each linkage type raises in the sensitivity list: the one a setter shims. */
    private static double pickupHeight(barwright.model.Linkage linkage) {
        if (linkage instanceof barwright.model.DoubleWishbone arms) {
            return arms.lowerInner().z();
        }
        if (linkage instanceof barwright.model.Strut strut) {
            return strut.lowerInner().z();
        }
        if (linkage instanceof barwright.model.LiveAxlePanhard rod) {
            return rod.bodyEnd().z();
        }
        if (linkage instanceof barwright.model.SemiTrailingArm arm) {
            return arm.pivotInner().z();
        }
        throw new IllegalArgumentException("no sample has " + linkage);
    }

    /** Common practice: a stiffer front bar raises the front share of load transfer, a stiffer rear one lowers it. */
    @ParameterizedTest
    @MethodSource("samples")
    void a_stiffer_front_bar_raises_the_front_share_and_a_stiffer_rear_bar_lowers_it(String sample) {
        Map<String, SensitivityRow> rows = byKey(Sensitivity.of(Samples.vehicle(sample)));
        for (String key : List.of("frontBarArmHole", "frontBarDiameter", "frontBarWall")) {
            if (rows.containsKey(key)) {
                assertThat(rows.get(key).frontShareChange()).as(key).isPositive();
            }
        }
        for (String key : List.of("rearBarArmHole", "rearBarDiameter", "rearBarWall")) {
            if (rows.containsKey(key)) {
                assertThat(rows.get(key).frontShareChange()).as(key).isNegative();
            }
        }
    }

    /**
     * Common practice: on a car whose inside wheels stay down to the limit, a stiffer rear bar moves it towards
     * oversteer and a stiffer front bar towards understeer; moving weight forward adds understeer.
     */
    @Test
    void on_the_roadster_the_bars_move_the_limit_balance_the_way_the_trade_expects() {
        Vehicle roadster = Samples.vehicle("sprint-roadster");
        AnalysisResult analysis = VehicleAnalysis.analyse(roadster);
        for (TurnResult turn : List.of(analysis.leftTurn(), analysis.rightTurn())) {
            assertThat(Math.min(turn.frontInsideLift(), turn.rearInsideLift())).isGreaterThan(turn.limit());
        }
        Map<String, SensitivityRow> rows = byKey(Sensitivity.of(roadster));
        assertThat(rows.get("rearBarArmHole").tendency()).isEqualTo(Tendency.TOWARDS_OVERSTEER);
        assertThat(rows.get("rearBarDiameter").tendency()).isEqualTo(Tendency.TOWARDS_OVERSTEER);
        assertThat(rows.get("frontBarArmHole").tendency()).isEqualTo(Tendency.TOWARDS_UNDERSTEER);
        assertThat(rows.get("frontBarDiameter").tendency()).isEqualTo(Tendency.TOWARDS_UNDERSTEER);
        assertThat(rows.get("ballastForward").tendency()).isEqualTo(Tendency.TOWARDS_UNDERSTEER);
    }

    /**
     * Physics (model.md 5): roll per a_y is m_s h' / (K_f + K_r - m_s g h'); stiffer springs or tyres raise K and
     * lower it, a higher centre of mass raises h' and it.
     */
    @ParameterizedTest
    @MethodSource("samples")
    void stiffer_springs_lower_the_roll_gradient_and_a_higher_centre_of_mass_raises_it(String sample) {
        Map<String, SensitivityRow> rows = byKey(Sensitivity.of(Samples.vehicle(sample)));
        for (String key : List.of("frontSpringRate", "rearSpringRate", "frontTyreVerticalRate", "rearTyreVerticalRate")) {
            assertThat(rows.get(key).rollGradientChange()).as(key).isNegative();
        }
        assertThat(rows.get("cgHeight").rollGradientChange()).isPositive();
    }

    @ParameterizedTest
    @MethodSource("samples")
    void rows_are_sorted_by_effect(String sample) {
        List<SensitivityRow> rows = Sensitivity.of(Samples.vehicle(sample)).rows();
        for (int i = 1; i < rows.size(); i++) {
            SensitivityRow earlier = rows.get(i - 1);
            SensitivityRow later = rows.get(i);
            if (!later.analysed()) {
                continue;
            }
            assertThat(earlier.analysed()).isTrue();
            if (earlier.tendency().atLimit() && later.tendency().atLimit()) {
                assertThat(Math.abs(earlier.limitMarginChange())).isGreaterThanOrEqualTo(Math.abs(later.limitMarginChange()));
            } else if (!earlier.tendency().atLimit() && !later.tendency().atLimit()) {
                assertThat(Math.abs(earlier.frontShareChange())).isGreaterThanOrEqualTo(Math.abs(later.frontShareChange()));
            } else {
                assertThat(earlier.tendency().atLimit()).as("limit movers first").isTrue();
            }
        }
    }

    @Test
    void the_words_name_the_direction() {
        assertThat(Tendency.of(0.01 * STANDARD_GRAVITY, 0).words()).isEqualTo("towards oversteer");
        assertThat(Tendency.of(-0.01 * STANDARD_GRAVITY, 0).words()).isEqualTo("towards understeer");
        assertThat(Tendency.of(0, 0.01)).isEqualTo(Tendency.TOWARDS_UNDERSTEER_BELOW_LIMIT);
        assertThat(Tendency.of(0, 0)).isEqualTo(Tendency.NO_CHANGE);
    }

    /**
     * A car 2 mm of CG height short of no stable roll position (model.md 5: K_f + K_r = m_s g h', with h_s
     * rising m / m_s times as fast as h): its 5 mm CG change cannot be analysed, is said so, and sorts last.
     */
    @Test
    void a_change_that_leaves_no_stable_roll_is_refused_and_sorted_last() {
        Vehicle hatchback = Samples.vehicle("club-hatchback");
        AnalysisResult analysis = VehicleAnalysis.analyse(hatchback);
        double total = analysis.front().stiffness().rollStiffness() + analysis.rear().stiffness().rollStiffness();
        var masses = analysis.masses();
        double criticalArm = total / (masses.sprungMass() * STANDARD_GRAVITY);
        double criticalHeight = hatchback.cgHeight() + (criticalArm - masses.rollArm()) * masses.sprungMass() / masses.mass();
        Vehicle edge = hatchback.withCgHeight(criticalHeight - 2e-3);
        SensitivityResult result = Sensitivity.of(edge);
        SensitivityRow last = result.rows().get(result.rows().size() - 1);
        assertThat(last.change().key()).isEqualTo("cgHeight");
        assertThat(last.analysed()).isFalse();
        assertThat(last.refusal()).contains("No stable roll position");
    }

    @Test
    void a_solid_bar_has_no_wall_change_and_a_missing_bar_no_bar_changes() {
        InputChanges.Catalogue saloon = InputChanges.of(Samples.vehicle("road-saloon"));
        assertThat(saloon.changes()).noneMatch(change -> change.key().startsWith("rearBar"));
        assertThat(saloon.notApplicable()).anyMatch(reason -> reason.contains("no rear bar"));
        Vehicle hatchback = Samples.vehicle("club-hatchback");
        assertThat(hatchback.front().bar().section()).isInstanceOf(SolidSection.class);
        assertThat(InputChanges.of(hatchback).changes()).noneMatch(change -> change.key().equals("frontBarWall"));
    }
}
