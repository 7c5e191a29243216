package barwright.cli;

import barwright.io.AtomicFileWriter;
import barwright.io.DynamicsInputReader;
import barwright.io.LapLogReader;
import barwright.io.VehicleDocument;
import barwright.io.csv.CsvFileException;
import barwright.model.DynamicsInputs;
import barwright.model.LapLog;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.physics.dynamics.LapReplay;
import barwright.physics.dynamics.LateralInput;
import barwright.physics.dynamics.TransientAnalysis;
import barwright.physics.dynamics.TransientResult;
import barwright.report.dynamics.TransientCsv;
import barwright.report.dynamics.TransientJson;
import barwright.report.dynamics.TransientText;
import barwright.units.Conversions;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * {@code transient FILE (--step-g G [--rise-s S] | --sine-g G --frequency-hz F | --log LAP.csv) [--duration-s D]
 * [--json] [--csv OUT.csv] [--units si|us]}: the roll in motion (model.md 14).
 */
final class TransientCommand implements Command {
    static final double MAX_G = 3;
    static final double MAX_RISE_S = 10;
    static final double MAX_FREQUENCY_HZ = 20;
    static final double MAX_DURATION_S = 600;
    static final double DEFAULT_DURATION_S = 3;

    @Override
    public String name() {
        return "transient";
    }

    @Override
    public String synopsis() {
        return "transient FILE (--step-g G [--rise-s S] | --sine-g G --frequency-hz F | --log LAP.csv) "
                + "[--duration-s D] [--json] [--csv OUT.csv] [--units si|us]";
    }

    @Override
    public String summary() {
        return "the roll in motion: a step of lateral g, a sine, or a logged lap replayed (needs the roll inertia)";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of("json"),
                Set.of("step-g", "rise-s", "sine-g", "frequency-hz", "log", "duration-s", "csv", "units"));
        String file = parsed.onlyPositional("vehicle file");
        var units = parsed.units();
        int drives = (parsed.option("step-g", null) != null ? 1 : 0) + (parsed.option("sine-g", null) != null ? 1 : 0)
                + (parsed.option("log", null) != null ? 1 : 0);
        if (drives != 1) {
            throw new UsageException("give exactly one input: --step-g, --sine-g with --frequency-hz, or --log");
        }
        LapLog log = null;
        if (parsed.option("log", null) != null) {
            try {
                log = LapLogReader.read(Path.of(parsed.option("log", null)));
            } catch (CsvFileException refused) {
                err.println("barwright: the log " + parsed.option("log", null) + " was refused:");
                refused.problems().forEach(problem -> err.println("  " + problem));
                return Cli.REFUSED;
            }
        }
        double duration = within(parsed, "duration-s", log == null ? DEFAULT_DURATION_S : MAX_DURATION_S,
                1e-3, MAX_DURATION_S, "s");
        VehicleDocument document = VehicleInput.read(file);
        DynamicsInputs inputs = DynamicsInputReader.read(document.tree());
        AnalysisResult analysis = VehicleAnalysis.analyse(document.vehicle());

        TransientResult result;
        LapReplay replay = null;
        String drive;
        if (log != null) {
            result = TransientAnalysis.log(analysis, inputs, log, duration);
            replay = LapReplay.of(analysis, result);
            drive = String.format(Locale.ROOT, "the log %s, %d samples, %.1f s", parsed.option("log", null),
                    result.run().states().size(), result.run().states().get(result.run().states().size() - 1).time()
                            - log.start());
        } else if (parsed.option("step-g", null) != null) {
            double target = within(parsed, "step-g", 0, -MAX_G, MAX_G, "g");
            double rise = within(parsed, "rise-s", 0, 0, MAX_RISE_S, "s");
            result = TransientAnalysis.step(analysis, inputs,
                    new LateralInput.Step(Conversions.fromG(target), rise), duration);
            drive = String.format(Locale.ROOT, "a step to %.2f g (positive: a left turn) rising over %.3f s, "
                    + "%.2f s long", target, rise, duration);
        } else {
            if (parsed.option("frequency-hz", null) == null) {
                throw new UsageException("--sine-g needs --frequency-hz");
            }
            double amplitude = within(parsed, "sine-g", 0, -MAX_G, MAX_G, "g");
            double frequency = within(parsed, "frequency-hz", 1, 1e-3, MAX_FREQUENCY_HZ, "Hz");
            result = TransientAnalysis.sine(analysis, inputs,
                    new LateralInput.Sine(Conversions.fromG(amplitude), frequency), duration);
            drive = String.format(Locale.ROOT, "a sine of %.2f g at %.2f Hz, %.2f s long", amplitude, frequency,
                    duration);
        }
        if (parsed.option("csv", null) != null) {
            AtomicFileWriter.writeText(Path.of(parsed.option("csv", null)), TransientCsv.of(result, replay));
        }
        LapReplay replayed = replay;
        Printed.jsonOrText(out, parsed, () -> TransientJson.of(result),
                () -> new TransientText(units).of(document.vehicle().name(), drive, result, replayed));
        return Cli.OK;
    }

    private static double within(Arguments parsed, String option, double fallback, double min, double max,
                                 String unit) throws UsageException {
        double value = parsed.number(option, fallback);
        if (value < min || value > max) {
            throw new UsageException(String.format(Locale.ROOT, "--%s = %s: must be between %s and %s %s", option,
                    parsed.option(option, ""), fmt(min), fmt(max), unit));
        }
        return value;
    }

    private static String fmt(double value) {
        return value == Math.rint(value) ? Long.toString((long) value) : Double.toString(value);
    }
}
