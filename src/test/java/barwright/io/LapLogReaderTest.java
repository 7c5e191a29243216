package barwright.io;

import barwright.io.csv.CsvFileException;
import barwright.model.LapLog;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** A logged lap: read in SI, and refused whole with the line of every problem (file-format.md, "Logged lap"). */
class LapLogReaderTest {
    @Test
    void readsTimesAndConvertsGAndKph() throws Exception {
        LapLog log = LapLogReader.parse("timeS,lateralAccelerationG,longitudinalAccelerationG,speedKph\n"
                + "0,0.5,-1,36\n0.5,1,0,72\n");
        // standard gravity 9.80665 m/s^2 (NIST SP 811); 36 km/h = 10 m/s by definition
        assertThat(log.lateral()[0]).isCloseTo(0.5 * 9.80665, within(1e-12));
        assertThat(log.longitudinal()[0]).isCloseTo(-9.80665, within(1e-12));
        assertThat(log.speeds()[1]).isCloseTo(20, within(1e-12));
        assertThat(log.lateralAt(0.25)).isCloseTo(0.75 * 9.80665, within(1e-12));
    }

    @Test
    void timeThatGoesBackwardsIsRefusedWithItsLine() {
        assertThatThrownBy(() -> LapLogReader.parse("timeS,lateralAccelerationG\n0,0\n1,0.1\n1,0.2\n0.5,0\n"))
                .isInstanceOf(CsvFileException.class)
                .hasMessageContaining("line 4, column timeS = 1: time must increase")
                .hasMessageContaining("line 5, column timeS = 0.5");
    }

    @Test
    void nonNumericCellIsRefusedWithItsLineAndColumn() {
        assertThatThrownBy(() -> LapLogReader.parse("timeS,lateralAccelerationG\n0,0\n0.1,fast\n"))
                .isInstanceOf(CsvFileException.class)
                .hasMessageContaining("line 3, column lateralAccelerationG");
    }

    @Test
    void missingColumnIsRefused() {
        assertThatThrownBy(() -> LapLogReader.parse("timeS,longitudinalAccelerationG\n0,0\n0.1,0\n"))
                .isInstanceOf(CsvFileException.class)
                .hasMessageContaining("lateralAccelerationG")
                .hasMessageContaining("missing");
    }

    @Test
    void implausibleAccelerationIsRefusedWithItsRange() {
        assertThatThrownBy(() -> LapLogReader.parse("timeS,lateralAccelerationG\n0,0\n0.1,9\n"))
                .isInstanceOf(CsvFileException.class)
                .hasMessageContaining("line 3, column lateralAccelerationG = 9: must be between -5 and 5 g");
    }
}
