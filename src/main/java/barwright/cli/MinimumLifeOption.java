package barwright.cli;

import barwright.io.BarFatigueReader;
import barwright.io.LapLogReader;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.io.csv.CsvFileException;
import barwright.model.AxlePosition;
import barwright.model.BarFatigueSettings;
import barwright.model.FatigueStrength;
import barwright.model.LapLog;
import barwright.physics.fatigue.BarStressHistory;
import barwright.physics.fatigue.DefaultSpectrum;
import barwright.physics.fatigue.MeanStressCorrection;
import barwright.physics.fatigue.Rainflow;
import barwright.sizing.FatigueLimit;

import java.io.IOException;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

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
    static FatigueLimit read(Arguments parsed, VehicleDocument document, List<AxlePosition> axles)
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
        Map<AxlePosition, BarFatigueSettings> settings = new EnumMap<>(AxlePosition.class);
        Map<String, FatigueStrength> custom = new HashMap<>();
        for (AxlePosition axle : axles) {
            BarFatigueReader.Given given = BarFatigueReader.given(document, axle);
            settings.put(axle, given.settings());
            if (given.ownStrength() != null) {
                custom.put(document.vehicle().axle(axle).bar().material().name(), given.ownStrength());
            }
        }
        return new FatigueLimit(laps, Rainflow.count(lap), settings, MeanStressCorrection.GOODMAN, custom,
                description);
    }
}
