package barwright.measure;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Motion ratios against published and closed-form examples (docs/validation.md, "Workshop measurements", lists the values). */
class MotionRatioMeasurementTest {
    private static final double INCH = 0.0254;

    @Test
    void leverOfALinkThreeInchesInFromTheBallJointOnANineteenInchArm() throws MeasurementException {
        // the example; 16 / 19 = 0.8421 is the lever arithmetic (common practice)
        assertThat(MotionRatioMeasurement.lever(16 * INCH, 19 * INCH, 0)).isCloseTo(0.8421, within(0.0001));
    }

    @Test
    void leverWithTheCosineCorrectionAsInAPublishedExample() throws MeasurementException {
        // calculatormom.com "Motion Ratio Calculator", its worked example as read: mount 15 in from the pivot,
        // wheel centre 20 in, damper leaning 15 degrees: 0.75 x 0.9659 = 0.7244 (printed to 4 places)
        assertThat(MotionRatioMeasurement.lever(15 * INCH, 20 * INCH, Math.toRadians(15)))
                .isCloseTo(0.7244, within(0.00005));
    }

    @Test
    void readingsOnARotatingArmGiveTheLeverRatio() throws MeasurementException {
        // independent: an arm swinging about its pivot moves the wheel d2 sin(phi) and the mount d1 sin(phi)
        // vertically, so the measured ratio is d1/d2 at every height; with the damper leaning 15 degrees the
        // ratio along its axis is d1/d2 cos 15 (the published example above)
        List<TravelReading> readings = new ArrayList<>();
        for (int i = -4; i <= 4; i++) {
            double phi = Math.toRadians(2.5 * i);
            readings.add(new TravelReading(20 * INCH * Math.sin(phi), 15 * INCH * Math.sin(phi), "line " + (i + 6)));
        }
        MotionRatioFit fit = MotionRatioMeasurement.fit(readings, Math.toRadians(15));
        assertThat(fit.ratio()).isCloseTo(0.7244, within(0.00005));
        assertThat(fit.ratioChangePer100Mm()).isCloseTo(0, within(1e-9));
        assertThat(fit.outliers()).containsOnly(false);
    }

    @Test
    void aRisingRatioIsFoundByTheQuadratic() throws MeasurementException {
        // closed form: component = 0.6 w + 0.5 w^2 (w in m) has the ratio 0.6 + w, rising 0.1 per 100 mm
        List<TravelReading> readings = new ArrayList<>();
        for (int i = 0; i <= 8; i++) {
            double w = -0.04 + 0.01 * i;
            readings.add(new TravelReading(w, 0.6 * w + 0.5 * w * w, "line " + (i + 2)));
        }
        MotionRatioFit fit = MotionRatioMeasurement.fit(readings, 0);
        assertThat(fit.ratioChangePer100Mm()).isCloseTo(0.1, within(1e-9));
        // symmetric readings about 0: the straight line's slope is the ratio at mid-travel, 0.6
        assertThat(fit.ratio()).isCloseTo(0.6, within(1e-9));
    }

    @Test
    void readingsAtOneWheelHeightAreRefused() {
        List<TravelReading> same = List.of(new TravelReading(0.01, 0.005, "line 2"),
                new TravelReading(0.01, 0.006, "line 3"), new TravelReading(0.01, 0.007, "line 4"));
        assertThatThrownBy(() -> MotionRatioMeasurement.fit(same, 0)).isInstanceOf(MeasurementException.class)
                .hasMessageContaining("same wheel travel, 10 mm");
    }

    @Test
    void anAngleOfEightyDegreesOrMoreIsRefused() {
        assertThatThrownBy(() -> MotionRatioMeasurement.lever(0.3, 0.4, Math.toRadians(85)))
                .isInstanceOf(MeasurementException.class).hasMessageContaining("85 deg");
    }
}
