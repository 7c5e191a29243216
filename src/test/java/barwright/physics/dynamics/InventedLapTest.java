package barwright.physics.dynamics;

import barwright.io.LapLogReader;
import barwright.model.LapLog;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

/** The shipped invented lap is the generator's output, and it reads as a log. */
class InventedLapTest {
    private static final Path SHIPPED = Path.of("sample-vehicles/laps/invented-circuit-lap.csv");

    @Test
    void shippedLapIsTheGeneratorsOutput() throws Exception {
        assertEquals(InventedLap.csv(), Files.readString(SHIPPED, StandardCharsets.UTF_8),
                "regenerate with InventedLap.main after changing the generator");
    }

    @Test
    void shippedLapReads() throws Exception {
        LapLog log = LapLogReader.read(SHIPPED);
        assertTrue(log.times().length > 3000, "over a minute at 50 Hz");
        assertEquals(1.0 / InventedLap.RATE, log.shortestInterval(), 1e-9);
    }
}
