package barwright.cli;

import barwright.io.LapLogReader;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.io.csv.CsvFileException;
import barwright.model.LapLog;
import barwright.physics.fatigue.BarStressHistory;
import barwright.physics.fatigue.DefaultSpectrum;
import barwright.sizing.FatigueLap;
import barwright.sizing.FatigueLimit;

import java.io.IOException;
import java.nio.file.Path;

/**
 * {@code size ... --min-laps N [--fatigue-log LAP.csv]}: the least fatigue life of each sized bar, on the logged lap
 * (its a_y through the steady model) or on the default lap (invented, said so).
 */
final class MinimumLifeOption {
    private MinimumLifeOption() {
    }

    /**
     * @return the limit, or null where --min-laps is not given
     * @throws CsvFileException where the log is refused (each problem with its line)
     */
    static FatigueLimit read(Arguments parsed, VehicleDocument document)
            throws UsageException, VehicleFileException, CsvFileException, IOException {
        String logFile = parsed.option("fatigue-log", null);
        if (parsed.option("min-laps", null) == null) {
            if (logFile != null) {
                throw new UsageException("--fatigue-log goes with --min-laps N");
            }
            return null;
        }
        double laps = parsed.number("min-laps", 0);
        if (!(laps >= 1 && laps <= 1e9) || laps != Math.rint(laps)) {
            throw new UsageException("--min-laps " + parsed.option("min-laps", "") + ": must be a whole number of "
                    + "laps, 1 to 1000000000");
        }
        double[] lap;
        String description;
        if (logFile != null) {
            LapLog log = LapLogReader.read(Path.of(logFile));
            lap = log.lateral();
            description = "the log " + logFile + " (its lateral acceleration through the steady model)";
        } else {
            lap = BarStressHistory.fromSpectrum(DefaultSpectrum.CORNERS, 1);
            description = DefaultSpectrum.DESCRIPTION;
        }
        return new FatigueLimit(laps, FatigueLap.of(document, lap, description));
    }
}
