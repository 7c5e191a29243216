package barwright.physics;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * Inside-wheel lift (model.md 7): where the static inside load equals the transfer, both turn directions with
 * asymmetric corner masses, and the post-lift rule (the other axle takes the rest of the overturning moment).
 * Expected values are derived in each test from the model.md formulas, independently of the program's code.
 */
class InsideLiftTest {
    private static final double G = 9.80665;

    /** The corner-weighted club car with its CG raised so that both inside wheels lift below 3 g (invented). */
    private static Vehicle tallAsymmetricCar() {
        return TestCars.asymmetricClubCar().withCgHeight(0.80);
    }

    @ParameterizedTest
    @EnumSource(TurnDirection.class)
    void firstLiftIsStaticInsideLoadOverTransferPerAccel(TurnDirection direction) {
        // model.md 7: an inside wheel lifts at the a_y where static load minus dF reaches zero; before any lift
        // dF = c a_y, so a_lift = W_inside / c. Left turn: left wheels inside (300 kg front, 200 kg rear);
        // right turn: 330 kg and 220 kg.
        Vehicle car = TestCars.asymmetricClubCar();
        AnalysisResult result = VehicleAnalysis.analyse(car);
        boolean left = direction == TurnDirection.LEFT;
        double frontInside = (left ? 300 : 330) * G;
        double rearInside = (left ? 200 : 220) * G;
        double frontAlone = frontInside / result.front().loadTransfer().total();
        double rearAlone = rearInside / result.rear().loadTransfer().total();
        TurnResult turn = result.turn(direction);
        double first = Math.min(frontAlone, rearAlone);
        AxlePosition firstAxle = frontAlone <= rearAlone ? AxlePosition.FRONT : AxlePosition.REAR;
        assertThat(turn.cornering().firstLiftAxle()).isEqualTo(firstAxle);
        assertThat(turn.cornering().insideLift(firstAxle)).isCloseTo(first, withinPercentage(1e-10));
        double reported = firstAxle == AxlePosition.FRONT ? turn.frontInsideLift() : turn.rearInsideLift();
        assertThat(reported).isCloseTo(first, withinPercentage(1e-10));
    }

    @Test
    void heavierSideLiftsLaterAndTheDirectionsDiffer() {
        // the car is heavier on the right: its right wheels, inside in a right turn, lift later (model.md 7)
        AnalysisResult result = VehicleAnalysis.analyse(TestCars.asymmetricClubCar());
        TurnResult left = result.turn(TurnDirection.LEFT);
        TurnResult right = result.turn(TurnDirection.RIGHT);
        double firstLeft = Math.min(left.frontInsideLift(), left.rearInsideLift());
        double firstRight = Math.min(right.frontInsideLift(), right.rearInsideLift());
        assertThat(firstRight).isGreaterThan(firstLeft);
        // per model.md 7 the lift of the first axle is proportional to its inside static load: ratio 330/300 or
        // 220/200, both 1.1
        assertThat(firstRight / firstLeft).isCloseTo(1.1, withinPercentage(1e-9));
    }

    @ParameterizedTest
    @EnumSource(TurnDirection.class)
    void secondLiftFollowsThePostLiftRule(TurnDirection direction) {
        // model.md 7 after X lifts at a_L: dF_Y t_Y = m a h + m_s g h' phi - W_Xi t_X, with
        // phi = phi_L + (a - a_L) s2, s2 = m_s h' / (K_Y - m_s g h'). Setting dF_Y = W_Yi and solving the linear
        // equation by hand: a = (W_Yi t_Y + W_Xi t_X - m_s g h' (phi_L - a_L s2)) / (m h + m_s g h' s2).
        Vehicle car = tallAsymmetricCar();
        AnalysisResult result = VehicleAnalysis.analyse(car);
        SteadyCornering cornering = result.turn(direction).cornering();
        MassProperties m = result.masses();
        AxlePosition x = cornering.firstLiftAxle();
        AxlePosition y = x.other();
        double liftX = cornering.insideLift(x);
        double gravityMoment = m.sprungMass() * G * m.rollArm();
        double kY = result.axle(y).stiffness().rollStiffness();
        double s2 = m.sprungMass() * m.rollArm() / (kY - gravityMoment);
        double phiAtLift = result.rollGradient() * liftX;
        double insideX = staticInside(m, x, direction);
        double insideY = staticInside(m, y, direction);
        double trackX = car.axle(x).track();
        double trackY = car.axle(y).track();
        double expected = (insideY * trackY + insideX * trackX - gravityMoment * (phiAtLift - liftX * s2))
                / (m.mass() * car.cgHeight() + gravityMoment * s2);
        assertThat(expected).isGreaterThan(liftX).isLessThan(3 * G);
        assertThat(cornering.insideLift(y)).isCloseTo(expected, withinPercentage(1e-9));
        assertThat(cornering.rollover()).isCloseTo(expected, withinPercentage(1e-9));
        // roll after the first lift grows with slope s2 (model.md 7)
        double between = (liftX + expected) / 2;
        assertThat(cornering.rollAngle(between)).isCloseTo(phiAtLift + (between - liftX) * s2, withinPercentage(1e-10));
        // the moment balance still holds between the lifts, with X's transfer held at W_Xi
        double moment = cornering.loadTransfer(x, between) * trackX + cornering.loadTransfer(y, between) * trackY;
        assertThat(moment).isCloseTo(m.mass() * between * car.cgHeight()
                + gravityMoment * cornering.rollAngle(between), withinPercentage(1e-9));
        assertThat(cornering.loadTransfer(x, between)).isCloseTo(insideX, withinPercentage(1e-12));
    }

    @ParameterizedTest
    @EnumSource(TurnDirection.class)
    void wheelLoadsSumToTheWeightAndNeverGoNegative(TurnDirection direction) {
        // vertical equilibrium: the four loads carry m g at every a_y, before, between and after the lifts
        // (1e-12 relative: sums of the same numbers); a lifted wheel carries zero, never less
        for (Vehicle car : new Vehicle[]{tallAsymmetricCar(), TestCars.asymmetricClubCar(), TestCars.clubCar()}) {
            AnalysisResult result = VehicleAnalysis.analyse(car);
            SteadyCornering cornering = result.turn(direction).cornering();
            double weight = result.masses().mass() * G;
            for (int step = 0; step <= 300; step++) {
                double accel = step * 0.01 * G;
                WheelLoads loads = cornering.wheelLoads(accel);
                assertThat(loads.total()).isCloseTo(weight, withinPercentage(1e-10));
                assertThat(loads.frontInside()).isGreaterThanOrEqualTo(0);
                assertThat(loads.rearInside()).isGreaterThanOrEqualTo(0);
                assertThat(loads.frontOutside()).isPositive();
                assertThat(loads.rearOutside()).isPositive();
                if (accel >= cornering.insideLift(AxlePosition.FRONT)) {
                    assertThat(loads.frontInside()).isCloseTo(0, within(1e-9 * weight));
                }
            }
        }
    }

    @Test
    void transferIsContinuousThroughTheFirstLift() {
        // at a_L both rules give the same transfer (the balance holds on either side), so loads do not jump
        AnalysisResult result = VehicleAnalysis.analyse(tallAsymmetricCar());
        SteadyCornering cornering = result.turn(TurnDirection.LEFT).cornering();
        double lift = cornering.insideLift(cornering.firstLiftAxle());
        AxlePosition other = cornering.firstLiftAxle().other();
        double before = cornering.loadTransfer(other, lift * (1 - 1e-12));
        double after = cornering.loadTransfer(other, lift * (1 + 1e-12));
        assertThat(after).isCloseTo(before, withinPercentage(1e-6));
    }

    @Test
    void rollsOverWhenTheRemainingAxleCannotHoldTheBody() {
        // Once one axle is gone the body rolls against the other alone; if that axle's stiffness is below
        // m_s g h' there is no balance: both wheels are off together (the program's reading of model.md 7).
        Vehicle base = tallAsymmetricCar();
        Vehicle car = base.withRear(TestCars.axle(1.44, 0.11, 70, 0.29, 2e3, 0.6, 230e3, null));
        AnalysisResult result = VehicleAnalysis.analyse(car);
        SteadyCornering cornering = result.turn(TurnDirection.LEFT).cornering();
        assertThat(cornering.firstLiftAxle()).isEqualTo(AxlePosition.FRONT);
        assertThat(result.rear().stiffness().rollStiffness()).isLessThan(result.masses().gravityRollMoment());
        assertThat(cornering.rollover()).isEqualTo(cornering.insideLift(AxlePosition.FRONT));
    }

    private static double staticInside(MassProperties masses, AxlePosition axle, TurnDirection turn) {
        return axle == AxlePosition.FRONT ? masses.staticLoads().frontInside(turn)
                : masses.staticLoads().rearInside(turn);
    }
}
