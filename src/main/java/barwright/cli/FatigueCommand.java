package barwright.cli;

import barwright.io.BarFatigueReader;
import barwright.io.DynamicsInputReader;
import barwright.io.LapLogReader;
import barwright.io.VehicleFileException;
import barwright.model.BarFatigueInputs;
import barwright.model.DynamicsInputs;
import barwright.model.LapLog;
import barwright.physics.fatigue.ReplayedStress;
import barwright.io.FatigueCsv;
import barwright.io.VehicleDocument;
import barwright.io.csv.CsvFileException;
import barwright.model.AxlePosition;
import barwright.physics.AnalysisPipeline;
import barwright.physics.fatigue.FatigueAnalysis;
import barwright.physics.fatigue.FatigueResult;
import barwright.physics.fatigue.MeanStressCorrection;
import barwright.model.SpectrumLevel;
import barwright.report.fatigue.FatigueJson;
import barwright.report.fatigue.FatigueText;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/** {@code fatigue FILE ...}: will the bar last the season? (docs/model.md 13). */
final class FatigueCommand implements Command {
    /** Lap time where none is given (s): a club circuit's lap, invented. */
    static final double DEFAULT_LAP_SECONDS = 90;

    @Override
    public String name() {
        return "fatigue";
    }

    @Override
    public String synopsis() {
        return "fatigue FILE (--log LAP.csv | --spectrum SPECTRUM.csv | --stress-history STRESS.csv) "
                + "[--laps-per-season N] [--lap-seconds 90] [--mean-stress goodman|gerber] [--json] [--units si|us]";
    }

    @Override
    public String summary() {
        return "fatigue life of each bar over one lap: a logged lap (timeS, lateralAccelerationG) replayed "
                + "through the roll in motion (needs the roll inertia and dampers), a spectrum of corners "
                + "(lateralAccelerationG, countPerLap) through the steady model, or a stress history (stressMPa) counted directly against the front "
                + "bar's material; rainflow counting, S-N line, Miner damage, laps and hours to failure";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"), Set.of("spectrum", "stress-history", "log",
                "laps-per-season", "lap-seconds", "mean-stress", "units"));
        String logFile = parsed.option("log", null);
        String spectrumFile = parsed.option("spectrum", null);
        String historyFile = parsed.option("stress-history", null);
        if ((logFile != null ? 1 : 0) + (spectrumFile != null ? 1 : 0) + (historyFile != null ? 1 : 0) != 1) {
            throw new UsageException("give exactly one of --log LAP.csv, --spectrum SPECTRUM.csv or "
                    + "--stress-history STRESS.csv");
        }
        if (logFile != null && parsed.option("lap-seconds", null) != null) {
            throw new UsageException("--lap-seconds does not go with --log: the log's own duration is the lap time");
        }
        double lapsPerSeason = parsed.number("laps-per-season", 0);
        if (lapsPerSeason < 0 || lapsPerSeason != Math.rint(lapsPerSeason) || lapsPerSeason > 1e7) {
            throw new UsageException("--laps-per-season " + parsed.option("laps-per-season", "")
                    + ": must be a whole number of laps, 1 to 10000000");
        }
        double lapSeconds = parsed.number("lap-seconds", DEFAULT_LAP_SECONDS);
        if (!(lapSeconds >= 1 && lapSeconds <= 86400)) {
            throw new UsageException("--lap-seconds " + parsed.option("lap-seconds", "") + ": must be 1 to 86400 s");
        }
        MeanStressCorrection correction = switch (parsed.option("mean-stress", "goodman")) {
            case "goodman" -> MeanStressCorrection.GOODMAN;
            case "gerber" -> MeanStressCorrection.GERBER;
            default -> throw new UsageException("--mean-stress " + parsed.option("mean-stress", "")
                    + ": use goodman or gerber");
        };
        VehicleDocument document = VehicleInput.read(parsed.onlyPositional("vehicle file"));
        var units = parsed.units();
        AnalysisPipeline pipeline = new AnalysisPipeline(document.vehicle());
        Map<String, FatigueResult> results = new LinkedHashMap<>();
        String source;
        try {
            if (logFile != null) {
                LapLog log = LapLogReader.read(Path.of(logFile));
                DynamicsInputs dynamics = DynamicsInputReader.read(document.tree());
                requireDampers(dynamics);
                Map<AxlePosition, BarFatigueInputs> inputs = new EnumMap<>(AxlePosition.class);
                for (AxlePosition position : AxlePosition.values()) {
                    if (document.vehicle().axle(position).bar() != null) {
                        inputs.put(position, BarFatigueReader.read(document, position)); // refused before the replay
                    }
                }
                ReplayedStress.LapStress stress = ReplayedStress.of(pipeline.analyse(), dynamics, log);
                lapSeconds = stress.lapSeconds();
                for (AxlePosition position : AxlePosition.values()) {
                    if (inputs.containsKey(position) && stress.of(position).length >= 2) {
                        results.put(position.key(), FatigueAnalysis.ofStressHistory(pipeline, position,
                                inputs.get(position), correction, stress.of(position), lapSeconds));
                    }
                }
                if (results.isEmpty()) {
                    throw new UsageException("the car has no bar to check");
                }
                source = String.format(Locale.ROOT, "Log %s (%d samples, %.1f s, one lap) replayed through the roll "
                        + "in motion (model.md 14); each bar's stress from its suspension's roll at each sample.",
                        logFile, log.times().length, lapSeconds);
            } else if (historyFile != null) {
                double[] history = FatigueCsv.readStressHistory(Path.of(historyFile));
                results.put("history", FatigueAnalysis.ofStressHistory(pipeline, AxlePosition.FRONT,
                        BarFatigueReader.read(document, AxlePosition.FRONT), correction, history, lapSeconds));
                source = "Stress history " + historyFile + " (" + history.length + " points, one lap), counted "
                        + "directly; material, surface and K_f of the front bar.";
            } else {
                List<SpectrumLevel> spectrum = FatigueCsv.readSpectrum(Path.of(spectrumFile));
                for (AxlePosition position : AxlePosition.values()) {
                    if (document.vehicle().axle(position).bar() != null) {
                        results.put(position.key(), FatigueAnalysis.ofSpectrum(pipeline, position,
                                BarFatigueReader.read(document, position), correction, spectrum, lapSeconds));
                    }
                }
                if (results.isEmpty()) {
                    throw new UsageException("the car has no bar to check");
                }
                source = "Spectrum " + spectrumFile + " (one lap) through the steady model: each corner from "
                        + "rest to its peak lateral acceleration and back.";
            }
        } catch (CsvFileException refused) {
            err.println("barwright: the " + (logFile != null ? "log " + logFile : historyFile != null
                    ? "stress history " + historyFile : "spectrum " + spectrumFile) + " was refused:");
            refused.problems().forEach(problem -> err.println("  " + problem));
            return Cli.REFUSED;
        }
        String described = source;
        double lapLength = lapSeconds;
        Printed.jsonOrText(out, parsed, () -> FatigueJson.of(results),
                () -> FatigueText.of(results, units, (int) lapsPerSeason, lapLength, described));
        return Cli.OK;
    }

    /**
     * Without dampers the roll model has no damping at all: every corner would ring on for the rest of the lap and
     * be counted as many cycles. So the replay needs both axles' damper curves.
     */
    private static void requireDampers(DynamicsInputs dynamics) throws VehicleFileException {
        for (AxlePosition position : AxlePosition.values()) {
            if (dynamics == null || dynamics.damper(position) == null) {
                throw new VehicleFileException(position.key() + ".damper is missing: the fatigue life of a replayed "
                        + "log needs both axles' damper curves (without them the roll rings undamped after every "
                        + "corner); give them (file-format.md, \"Roll dynamics\"), or use --spectrum");
            }
        }
    }
}
